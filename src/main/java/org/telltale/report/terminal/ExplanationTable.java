package org.telltale.report.terminal;

import java.util.List;
import java.util.Locale;
import org.telltale.explain.Explanation;

/**
 * The readable terminal view of one explanation: a heading with the prediction, the explained
 * label, fit quality and probes; a table of the selected units (weight, interval, occurrences,
 * and a bar whose length is the weight's share of the largest); the notes; and a caution.
 */
public final class ExplanationTable {
    private static final int BAR = 12;
    private static final int TERM_WIDTH = 28;

    private ExplanationTable() {
    }

    /** The view as text lines ending in '\n'; ANSI colour only when {@code color}. */
    public static String render(Explanation e, boolean color) {
        Ansi ansi = new Ansi(color);
        StringBuilder out = new StringBuilder();
        out.append(ansi.bold("document " + SafeText.line(e.id()))).append('\n');
        out.append(String.format(Locale.ROOT, "  predicted %s", SafeText.line(e.predicted() == null ? "?" : e.predicted())));
        Double predictedScore = e.predicted() == null ? null : e.scores().get(e.predicted());
        if (predictedScore != null) {
            out.append(String.format(Locale.ROOT, " (%.3f)", predictedScore));
        }
        if (e.gold() != null) {
            out.append("   gold ").append(SafeText.line(e.gold()));
        }
        out.append('\n');
        out.append(String.format(Locale.ROOT, "  explained %s, score %.3f; surrogate predicts %.3f, fit quality (weighted R2) %.3f%n",
                SafeText.line(e.label()), e.score(), e.fit().prediction(), e.fit().r2()));
        out.append("  ").append(probeLine(e)).append('\n');
        out.append('\n');
        if (e.terms().isEmpty()) {
            out.append("  (no terms)\n");
        } else {
            out.append(header(e, ansi));
            double largest = 0;
            for (Explanation.TermWeight t : e.terms()) {
                largest = Math.max(largest, Math.abs(t.weight()));
            }
            int rank = 0;
            for (Explanation.TermWeight t : e.terms()) {
                rank++;
                out.append(row(rank, t, largest, ansi)).append('\n');
            }
        }
        Explanation.Method m = e.method();
        if (m != null) {
            for (String note : m.notes()) {
                out.append("  note: ").append(SafeText.line(note)).append('\n');
            }
        }
        out.append(ansi.dim("  A local approximation of the model near this text, not a cause.")).append('\n');
        return out.toString();
    }

    private static String probeLine(Explanation e) {
        Explanation.Method m = e.method();
        if (m == null) {
            return e.probes() + " probes";
        }
        StringBuilder s = new StringBuilder();
        s.append(String.format(Locale.ROOT, "%d probes, %d model calls, %d %s units, %s weighting", e.probes(), m.calls(),
                m.units(), m.unit(), m.weighting()));
        if (m.exact()) {
            s.append(", exact");
        } else if (Double.isFinite(m.stability())) {
            s.append(String.format(Locale.ROOT, ", split-half agreement %.2f", m.stability()));
        }
        return s.toString();
    }

    private static String header(Explanation e, Ansi ansi) {
        String level = e.method() == null || e.method().exact() ? "interval"
                : String.format(Locale.ROOT, "%d%% interval", Math.round(100 * e.method().level()));
        return ansi.dim(String.format(Locale.ROOT, "  %3s  %-" + TERM_WIDTH + "s %9s  %-21s %5s  %s%n", "#", "term",
                "weight", level, "occ.", "effect"));
    }

    private static String row(int rank, Explanation.TermWeight t, double largest, Ansi ansi) {
        String term = SafeText.line(t.term());
        if (term.length() > TERM_WIDTH) {
            term = term.substring(0, TERM_WIDTH - 1) + "~";
        }
        int length = largest == 0 ? 0 : (int) Math.round(BAR * Math.abs(t.weight()) / largest);
        boolean up = t.weight() >= 0;
        String bar = (up ? "+" : "-").repeat(Math.max(length, t.weight() == 0 ? 0 : 1));
        String coloured = up ? ansi.raises(bar, false) : ansi.lowers(bar, false);
        String interval = String.format(Locale.ROOT, "[%+.4f, %+.4f]", t.low(), t.high());
        return String.format(Locale.ROOT, "  %3d  %-" + TERM_WIDTH + "s %+9.4f  %-21s %5d  %s", rank, term, t.weight(),
                interval, t.spans().size(), coloured);
    }

    /** Several explanations, separated by a blank line. */
    public static String render(List<Explanation> explanations, boolean color) {
        StringBuilder out = new StringBuilder();
        for (Explanation e : explanations) {
            if (out.length() > 0) {
                out.append('\n');
            }
            out.append(render(e, color));
        }
        return out.toString();
    }
}
