package org.telltale.report.terminal;

import java.util.List;
import java.util.Locale;
import org.telltale.explain.Explanation;
import org.telltale.report.EffectScale;

/**
 * The readable terminal view of one explanation: a heading with the prediction, the explained
 * label, fit quality and probes; a table of the selected units (weight, interval, occurrences,
 * and a bar whose length is a fixed share of the score range, see {@link EffectScale}); the notes;
 * and a caution.
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
        Explanation.Method method = e.method();
        if (method != null && method.logOdds()) {
            out.append(String.format(Locale.ROOT, "  explained the log-odds of %s (from %s): %+.3f at score %.3f;"
                    + " surrogate predicts %+.3f, fit quality (weighted R2) %.3f%n", SafeText.line(e.label()),
                    method.source(), method.targetValue(), e.score(), e.fit().prediction(), e.fit().r2()));
        } else {
            out.append(String.format(Locale.ROOT, "  explained %s, score %.3f; surrogate predicts %.3f, fit quality (weighted R2) %.3f%n",
                    SafeText.line(e.label()), e.score(), e.fit().prediction(), e.fit().r2()));
        }
        out.append("  ").append(probeLine(e)).append('\n');
        out.append('\n');
        if (e.terms().isEmpty()) {
            out.append("  (no terms)\n");
        } else {
            EffectScale scale = EffectScale.of(e);
            boolean nothing = scale.nothingMeasurable(e);
            out.append(header(e, ansi));
            int rank = 0;
            for (Explanation.TermWeight t : e.terms()) {
                rank++;
                out.append(row(rank, t, scale, nothing, ansi)).append('\n');
            }
            if (nothing) {
                out.append(String.format(Locale.ROOT, "  no measurable effect: no weight reaches %s in %s; the model's score"
                        + " hardly moved when units were removed%n", EffectScale.signed(EffectScale.NEGLIGIBLE * scale.full())
                        .substring(1), scale.unit()));
            } else {
                out.append(ansi.dim(String.format(Locale.ROOT, "  a full bar is a weight of %s in %s%n",
                        scale.fullText(), scale.unit())));
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
        } else if (m.probesToGo() == 0) {
            s.append(", reported units separated from the next");
        } else if (m.probesToGo() > 0) {
            s.append(String.format(Locale.ROOT, ", about %d more probes to separate the reported units", m.probesToGo()));
        } else if ("sandwich".equals(m.interval())) {
            s.append(", the last reported units are not separated from the next");
        }
        if (Double.isFinite(m.stability())) {
            s.append(String.format(Locale.ROOT, ", split-half agreement %.2f", m.stability()));
        }
        return s.toString();
    }

    private static String header(Explanation e, Ansi ansi) {
        String level = e.method() == null || e.method().exact() ? "interval"
                : String.format(Locale.ROOT, "%d%% interval", Math.round(100 * e.method().level()));
        return ansi.dim(String.format(Locale.ROOT, "  %3s  %-" + TERM_WIDTH + "s %10s  %-23s %5s  %s%n", "#", "term",
                "weight", level, "occ.", "effect"));
    }

    private static String row(int rank, Explanation.TermWeight t, EffectScale scale, boolean nothing, Ansi ansi) {
        String term = SafeText.line(t.term());
        if (term.length() > TERM_WIDTH) {
            term = term.substring(0, TERM_WIDTH - 1) + "~";
        }
        String coloured = "";
        if (!nothing) {
            int length = (int) Math.round(BAR * scale.share(t.weight()));
            boolean up = t.weight() >= 0;
            String bar = length == 0 ? "." : (up ? "+" : "-").repeat(length) + (scale.beyond(t.weight()) ? ">" : "");
            coloured = up ? ansi.raises(bar, false) : ansi.lowers(bar, false);
        }
        String interval = "[" + EffectScale.signed(EffectScale.low(t)) + ", " + EffectScale.signed(EffectScale.high(t)) + "]";
        return String.format(Locale.ROOT, "  %3d  %-" + TERM_WIDTH + "s %10s  %-23s %5d  %s", rank, term,
                EffectScale.signed(t.weight()), interval, t.spans().size(), coloured).stripTrailing();
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
