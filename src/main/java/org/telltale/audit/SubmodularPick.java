package org.telltale.audit;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;

/**
 * Chooses B documents whose explanations together cover the most important terms: the submodular
 * pick of Ribeiro, Singh and Guestrin (2016, §4, Algorithm 2). A term's global importance is
 * I_j = sqrt(Σ_i |W_ij|) over all explanations; the coverage of a set V of documents is
 * c(V) = Σ_j I_j · [some i in V has W_ij ≠ 0]. Coverage is monotone submodular, so the greedy
 * choice, adding the document with the largest gain each step, is within 1 − 1/e of the best
 * set (Nemhauser, Wolsey and Fisher 1978).
 *
 * <p>Ties go to the earlier document, and every sum runs in term order, so the result depends
 * only on the input order.
 */
public final class SubmodularPick {

    /** The picked ids in the order chosen, and the share of total importance they cover. */
    public record Picks(List<String> ids, double coverage) {
        public Picks {
            ids = List.copyOf(ids);
        }
    }

    /**
     * One document's explanation as the pick sees it: the absolute weight of each selected term.
     * Kept sorted, so that sums run in one order and the result is the same in every JVM.
     */
    public record Row(String id, Map<String, Double> weights) {
        public Row {
            weights = Collections.unmodifiableMap(new TreeMap<>(weights));
        }
    }

    private SubmodularPick() {
    }

    /** Global importance I_j of every term over {@code rows}. */
    public static Map<String, Double> importance(List<Row> rows) {
        Map<String, Double> sums = new TreeMap<>();
        for (Row row : rows) {
            row.weights().forEach((term, w) -> sums.merge(term, Math.abs(w), Double::sum));
        }
        sums.replaceAll((term, sum) -> Math.sqrt(sum));
        return sums;
    }

    /** The coverage c(V) of the rows at {@code picked} indexes. */
    public static double coverage(List<Row> rows, Map<String, Double> importance, List<Integer> picked) {
        Set<String> covered = new TreeSet<>();
        for (int i : picked) {
            rows.get(i).weights().forEach((term, w) -> {
                if (w != 0) {
                    covered.add(term);
                }
            });
        }
        return covered.stream().mapToDouble(importance::get).sum();
    }

    /** The greedy pick of {@code budget} documents (fewer when there are fewer rows). */
    public static Picks pick(List<Row> rows, int budget) {
        Map<String, Double> importance = importance(rows);
        double total = importance.values().stream().mapToDouble(Double::doubleValue).sum();
        Set<String> covered = new java.util.HashSet<>();
        boolean[] taken = new boolean[rows.size()];
        List<String> ids = new ArrayList<>();
        double reached = 0;
        for (int step = 0; step < Math.min(budget, rows.size()); step++) {
            int best = -1;
            double bestGain = -1;
            for (int i = 0; i < rows.size(); i++) {
                if (taken[i]) {
                    continue;
                }
                double gain = 0;
                for (Map.Entry<String, Double> e : rows.get(i).weights().entrySet()) {
                    if (e.getValue() != 0 && !covered.contains(e.getKey())) {
                        gain += importance.get(e.getKey());
                    }
                }
                if (gain > bestGain) {
                    best = i;
                    bestGain = gain;
                }
            }
            taken[best] = true;
            ids.add(rows.get(best).id());
            reached += bestGain;
            rows.get(best).weights().forEach((term, w) -> {
                if (w != 0) {
                    covered.add(term);
                }
            });
        }
        return new Picks(ids, total == 0 ? 0 : reached / total);
    }
}
