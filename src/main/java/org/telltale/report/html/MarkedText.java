package org.telltale.report.html;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.telltale.TelltaleException;
import org.telltale.explain.Explanation;
import org.telltale.text.Span;

/**
 * An explanation's original text cut into segments, each either plain or one marked occurrence of
 * a selected term, in reading order. Every span of every selected term becomes exactly one marked
 * segment, so a reader can count them against the JSON.
 */
public final class MarkedText {
    private MarkedText() {
    }

    /** A marked occurrence: which ledger row it belongs to, its direction and its tint level. */
    public record Mark(int row, boolean toward, int level) {
    }

    /** A piece of the text; {@code mark} is {@code null} for text between occurrences. */
    public record Segment(List<VisibleText.Chunk> chunks, Mark mark) {
    }

    private record Placed(Span span, Mark mark) {
    }

    /**
     * Cuts {@code text} at the spans of {@code terms}; {@code levels[i]} is the tint of term i.
     * Spans that overlap an earlier one are shortened to start where it ends (term units of one
     * explanation never overlap, but a hand-edited file may), and are still marked.
     */
    static List<Segment> of(String docId, String text, List<Explanation.TermWeight> terms, int[] levels) {
        List<Placed> placed = new ArrayList<>();
        for (int row = 0; row < terms.size(); row++) {
            Explanation.TermWeight term = terms.get(row);
            Mark mark = new Mark(row, term.weight() >= 0, levels[row]);
            for (Span span : term.spans()) {
                if (span.end() > text.length()) {
                    throw new TelltaleException("document " + docId + ": span [" + span.start() + ", " + span.end()
                            + ") of term '" + term.term() + "' lies beyond the text's " + text.length() + " characters");
                }
                placed.add(new Placed(span, mark));
            }
        }
        return cut(text, 0, text.length(), placed);
    }

    /**
     * The segments of {@code text[from, to)} with every one of {@code spans} that reaches into it
     * marked by {@code mark}, clipped to the window: a context view around a term.
     */
    static List<Segment> window(String text, int from, int to, List<Span> spans, Mark mark) {
        List<Placed> placed = new ArrayList<>();
        for (Span span : spans) {
            int start = Math.max(from, span.start());
            int end = Math.min(to, span.end());
            if (start < end) {
                placed.add(new Placed(new Span(start, end), mark));
            }
        }
        return cut(text, from, to, placed);
    }

    private static List<Segment> cut(String text, int from, int to, List<Placed> placed) {
        placed.sort(Comparator.comparing(Placed::span));
        List<Segment> segments = new ArrayList<>(placed.size() * 2 + 1);
        int at = from;
        for (Placed p : placed) {
            int start = Math.max(p.span().start(), at);
            int end = Math.max(p.span().end(), start);
            if (start > at) {
                segments.add(new Segment(VisibleText.chunks(text, at, start), null));
            }
            segments.add(new Segment(VisibleText.chunks(text, start, end), p.mark()));
            at = end;
        }
        if (at < to) {
            segments.add(new Segment(VisibleText.chunks(text, at, to), null));
        }
        return segments;
    }
}
