package org.telltale.report.terminal;

import java.util.ArrayList;
import java.util.List;
import org.telltale.explain.Explanation;
import org.telltale.text.Span;

/**
 * The document text with every span of a selected unit marked in place. Without colour a span is
 * written {@code [word]+} or {@code [word]-} for raising or lowering the explained label's score;
 * with colour the word is green or purple, bold for the three strongest units, and the sign
 * follows in the same colour. Long texts are cut after {@link #MAX_CHARS} characters with a note.
 */
public final class MarkedLine {
    public static final int MAX_CHARS = 4000;

    private MarkedLine() {
    }

    private record Mark(Span span, double weight, boolean strong) {
    }

    public static String render(Explanation e, boolean color) {
        Ansi ansi = new Ansi(color);
        String text = e.text() == null ? "" : e.text();
        List<Mark> marks = new ArrayList<>();
        int rank = 0;
        for (Explanation.TermWeight t : e.terms()) {
            rank++;
            if (t.weight() == 0) {
                continue;
            }
            for (Span s : t.spans()) {
                marks.add(new Mark(s, t.weight(), rank <= 3));
            }
        }
        marks.sort((a, b) -> a.span().compareTo(b.span()));
        int limit = Math.min(text.length(), MAX_CHARS);
        StringBuilder out = new StringBuilder();
        int cursor = 0;
        for (Mark m : marks) {
            Span s = m.span();
            if (s.start() < cursor || s.end() > limit) {
                continue; // overlapping (line units over words) or beyond the cut
            }
            out.append(SafeText.of(text.substring(cursor, s.start())));
            String word = SafeText.line(text.substring(s.start(), s.end()));
            boolean up = m.weight() > 0;
            if (ansi.on()) {
                String sign = up ? "+" : "-";
                out.append(up ? ansi.raises(word + sign, m.strong()) : ansi.lowers(word + sign, m.strong()));
            } else {
                out.append('[').append(word).append(']').append(up ? '+' : '-');
            }
            cursor = s.end();
        }
        out.append(SafeText.of(text.substring(Math.min(cursor, limit), limit)));
        if (limit < text.length()) {
            out.append(String.format(java.util.Locale.ROOT, " ... (%d more characters not shown)", text.length() - limit));
        }
        out.append('\n');
        return out.toString();
    }
}
