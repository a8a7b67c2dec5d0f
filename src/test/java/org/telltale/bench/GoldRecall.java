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
}
