package org.telltale.text;

import java.util.BitSet;

/**
 * Rebuilds a document without some of its units by cutting their spans out of the original
 * string, optionally writing a filler in each cut's place. Every character outside the cut spans
 * stays exactly as it was.
 *
 * <p>One pass over the index's spans, sorted once when the index was built, and one pass over
 * the text: O(text length + spans) per probe, with the result string as the only allocation
 * beyond one builder.
 *
 * <p>Immutable and thread-safe.
 */
public final class Masker {
    private final String filler;

    /** @param filler written in place of each removed span; empty to cut cleanly */
    public Masker(String filler) {
        this.filler = filler == null ? "" : filler;
    }

    public static Masker cutting() {
        return new Masker("");
    }

    public String filler() {
        return filler;
    }

    /** The text of {@code index} without the units whose bits are set in {@code removed}. */
    public String mask(TermIndex index, BitSet removed) {
        if (removed.isEmpty()) {
            return index.text();
        }
        String text = index.text();
        StringBuilder out = new StringBuilder(text.length());
        int cursor = 0;
        for (int i = 0, n = index.spanCount(); i < n; i++) {
            if (removed.get(index.spanUnit(i))) {
                out.append(text, cursor, index.spanStart(i)).append(filler);
                cursor = index.spanEnd(i);
            }
        }
        return out.append(text, cursor, text.length()).toString();
    }

    /** The text of {@code index} keeping only the units marked present ({@code present.length == index.size()}). */
    public String mask(TermIndex index, boolean[] present) {
        if (present.length != index.size()) {
            throw new IllegalArgumentException("presence vector has " + present.length + " entries for " + index.size() + " units");
        }
        String text = index.text();
        StringBuilder out = null;
        int cursor = 0;
        for (int i = 0, n = index.spanCount(); i < n; i++) {
            if (!present[index.spanUnit(i)]) {
                if (out == null) {
                    out = new StringBuilder(text.length());
                }
                out.append(text, cursor, index.spanStart(i)).append(filler);
                cursor = index.spanEnd(i);
            }
        }
        return out == null ? text : out.append(text, cursor, text.length()).toString();
    }
}
