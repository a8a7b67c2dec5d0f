package org.telltale.text;

/**
 * The half-open character range {@code [start, end)} of one occurrence in the original text, in
 * UTF-16 code units as {@link String} indexes them.
 */
public record Span(int start, int end) implements Comparable<Span> {
    public Span {
        if (start < 0 || end < start) {
            throw new IllegalArgumentException("span must satisfy 0 <= start <= end: [" + start + ", " + end + ")");
        }
    }

    public int length() {
        return end - start;
    }

    public boolean overlaps(Span other) {
        return start < other.end && other.start < end;
    }

    @Override
    public int compareTo(Span other) {
        return start != other.start ? Integer.compare(start, other.start) : Integer.compare(end, other.end);
    }
}
