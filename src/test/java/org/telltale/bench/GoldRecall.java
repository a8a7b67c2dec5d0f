package org.telltale.bench;

import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.telltale.explain.Explanation;

/**
 * The two measures of the faithfulness bench: gold-feature recall of an explanation's top K terms
 * (Ribeiro, Singh &amp; Guestrin 2016, §5.2: the share of the gold features that the explanation
 * recovers), and top-K agreement of two explanations (the share of the top K terms that both
 * report with the same sign).
 */
final class GoldRecall {
    private GoldRecall() {
    }

    /** The top {@code k} terms by absolute weight, ties broken by term, with their weights. */
    static Map<String, Double> top(List<Explanation.TermWeight> terms, int k) {
        Map<String, Double> out = new LinkedHashMap<>();
        terms.stream()
                .sorted(Comparator.comparingDouble((Explanation.TermWeight t) -> -Math.abs(t.weight()))
                        .thenComparing(Explanation.TermWeight::term))
                .filter(t -> t.weight() != 0.0)
                .limit(k)
                .forEach(t -> out.put(t.term(), t.weight()));
        return out;
    }

    /** |top-k ∩ gold| / |gold|; NaN when the gold set is empty (nothing to recover). */
    static double recall(List<Explanation.TermWeight> terms, Set<String> gold, int k) {
        if (gold.isEmpty()) {
            return Double.NaN;
        }
        long found = top(terms, k).keySet().stream().filter(gold::contains).count();
        return (double) found / gold.size();
    }

    /** The share of the larger top-k set whose terms appear in both with the same sign; 1 when both are empty. */
    static double agreement(List<Explanation.TermWeight> a, List<Explanation.TermWeight> b, int k) {
        Map<String, Double> ta = top(a, k);
        Map<String, Double> tb = top(b, k);
        int size = Math.max(ta.size(), tb.size());
        if (size == 0) {
            return 1.0;
        }
        int agree = 0;
        for (Map.Entry<String, Double> e : ta.entrySet()) {
            Double other = tb.get(e.getKey());
            if (other != null && Math.signum(other) == Math.signum(e.getValue())) {
                agree++;
            }
        }
        return (double) agree / size;
    }

    /**
     * Agreement on the places that matter: of the converged answer's top k, the units whose
     * interval excludes zero (an effect the converged answer can tell from none), the share that
     * {@code other}'s top k reports with the same sign; 1 when the converged top k has none. Places
     * held by units without a detectable effect are left out, since their order is sampling noise
     * under any budget (common practice for comparing rankings with ties, here ties with zero).
     */
    static double effectAgreement(List<Explanation.TermWeight> converged, List<Explanation.TermWeight> other, int k) {
        Map<String, Double> tb = top(other, k);
        List<Explanation.TermWeight> sorted = converged.stream()
                .sorted(java.util.Comparator.comparingDouble((Explanation.TermWeight t) -> -Math.abs(t.weight())))
                .limit(k).toList();
        int effects = 0;
        int agree = 0;
        for (Explanation.TermWeight t : sorted) {
            if (t.low() <= 0 && 0 <= t.high()) {
                continue;
            }
            effects++;
            Double w = tb.get(t.term());
            if (w != null && Math.signum(w) == Math.signum(t.weight())) {
                agree++;
            }
        }
        return effects == 0 ? 1.0 : (double) agree / effects;
    }
}
