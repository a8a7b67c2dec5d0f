package org.telltale.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.telltale.explain.Explanation;
import org.telltale.report.EffectScale;

/** Builds the {@link DocumentView} of an explanation: formats numbers, tints and marks. */
final class DocumentViews {
    private static final double WHISKER_MARGIN = 4;

    private DocumentViews() {
    }

    static DocumentView of(Explanation e, String anchor) {
        List<Explanation.TermWeight> terms = e.terms();
        EffectScale effect = EffectScale.of(e);
        int[] levels = levels(terms, effect);
        double scale = effect.full();
        List<DocumentView.LedgerRow> rows = new ArrayList<>(terms.size());
        int spanCount = 0;
        for (int i = 0; i < terms.size(); i++) {
            Explanation.TermWeight t = terms.get(i);
            spanCount += t.spans().size();
            rows.add(row(i, t, levels[i], scale, e.label()));
        }
        List<MarkedText.Segment> segments = e.text() == null ? null : MarkedText.of(e.id(), e.text(), terms, levels);
        double r2 = e.fit() == null ? Double.NaN : e.fit().r2();
        double r2Clamped = Double.isNaN(r2) ? 0 : Math.max(0, Math.min(1, r2));
        return new DocumentView(
                anchor,
                VisibleText.inline(e.id()),
                VisibleText.inline(e.label()),
                VisibleText.inline(e.predicted() == null ? e.label() : e.predicted()),
                VisibleText.inline(e.gold()),
                Numbers.plain(e.score(), 3),
                bars(e),
                e.probes(),
                Numbers.plain(r2, 3),
                Numbers.coord(r2Clamped * 100),
                e.fit() == null ? "n/a" : Numbers.signed(e.fit().intercept()),
                e.fit() == null ? "n/a" : Numbers.plain(e.fit().prediction(), 3),
                List.copyOf(rows),
                segments,
                spanCount,
                e.text() == null ? 0 : e.text().length(),
                method(e.method()),
                e.method() == null ? List.of() : e.method().notes().stream().map(VisibleText::inline).toList());
    }

    private static String method(Explanation.Method m) {
        if (m == null) {
            return null;
        }
        StringBuilder line = new StringBuilder();
        line.append(m.units()).append(' ').append(m.unit()).append(" units · ");
        line.append("shapley".equals(m.weighting()) ? "Shapley kernel"
                : "cosine kernel σ " + Numbers.plain(m.bandwidth(), 2));
        line.append(" · ").append(m.selection()).append(" selection");
        line.append(" · explains the ").append(m.logOdds() ? "log-odds (from " + m.source() + ")" : "probability");
        line.append(" · a full bar is ").append(EffectScale.of(m).fullText());
        line.append(" · ").append(m.exact() ? "exact enumeration" : m.calls() + " model calls");
        if (m.level() > 0 && m.level() < 1) {
            line.append(" · ").append(Numbers.plain(m.level() * 100, 0)).append("% intervals");
            line.append(" (").append(m.interval()).append(')');
        }
        if (Double.isFinite(m.stability())) {
            line.append(" · stability ").append(Numbers.plain(m.stability(), 2));
        }
        return VisibleText.inline(line.toString());
    }

    /**
     * Tint level of each term: its absolute weight as a share of a full bar of the score range
     * ({@link EffectScale}), in {@link Palette#LEVELS} equal steps, so equal weights get equal tints
     * in every document and a document of near-zero weights stays pale.
     */
    static int[] levels(List<Explanation.TermWeight> terms, EffectScale scale) {
        int[] levels = new int[terms.size()];
        for (int i = 0; i < levels.length; i++) {
            double share = scale.share(terms.get(i).weight());
            levels[i] = Math.max(1, Math.min(Palette.LEVELS, (int) Math.ceil(share * Palette.LEVELS)));
        }
        return levels;
    }

    private static DocumentView.LedgerRow row(int i, Explanation.TermWeight t, int level, double scale, String label) {
        boolean toward = t.weight() >= 0;
        int n = t.spans().size();
        String weight = Numbers.signed(t.weight());
        String low = Numbers.signed(EffectScale.low(t));
        String high = Numbers.signed(EffectScale.high(t));
        String description = "weight " + weight + ", interval " + low + " to " + high + ", "
                + (toward ? "toward " : "away from ") + VisibleText.inline(label) + ", " + n + (n == 1 ? " occurrence" : " occurrences");
        return new DocumentView.LedgerRow(i, VisibleText.inline(t.term()), weight, low, high, n, toward, level,
                x(0, scale), x(EffectScale.low(t), scale), x(EffectScale.high(t), scale), x(t.weight(), scale), description);
    }

    private static String x(double v, double scale) {
        double clamped = Double.isNaN(v) ? 0 : Math.max(-scale, Math.min(scale, v));
        return Numbers.coord(50 + (50 - WHISKER_MARGIN) * clamped / scale);
    }

    private static List<DocumentView.LabelBar> bars(Explanation e) {
        Map<String, Double> scores = e.scores() == null || e.scores().isEmpty()
                ? Map.of(e.label(), e.score()) : e.scores();
        boolean probabilities = scores.values().stream().allMatch(s -> s >= 0 && s <= 1);
        double max = scores.values().stream().mapToDouble(Math::abs).max().orElse(1);
        double denominator = probabilities || max == 0 ? 1 : max;
        String predicted = e.predicted() == null ? e.label() : e.predicted();
        List<DocumentView.LabelBar> bars = new ArrayList<>();
        for (Map.Entry<String, Double> s : scores.entrySet()) {
            double width = Math.abs(s.getValue()) / denominator * 100;
            bars.add(new DocumentView.LabelBar(VisibleText.inline(s.getKey()), Numbers.plain(s.getValue(), 3), Numbers.coord(width),
                    s.getKey().equals(e.label()), s.getKey().equals(predicted)));
        }
        return List.copyOf(bars);
    }
}
