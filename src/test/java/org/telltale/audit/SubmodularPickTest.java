package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.telltale.audit.SubmodularPick.Row;

class SubmodularPickTest {

    /** The best coverage over every subset of {@code budget} rows, by enumeration. */
    private static double bruteForce(List<Row> rows, int budget) {
        Map<String, Double> importance = SubmodularPick.importance(rows);
        double best = 0;
        for (int mask = 0; mask < 1 << rows.size(); mask++) {
            if (Integer.bitCount(mask) != Math.min(budget, rows.size())) {
                continue;
            }
            List<Integer> picked = new ArrayList<>();
            for (int i = 0; i < rows.size(); i++) {
                if ((mask & 1 << i) != 0) {
                    picked.add(i);
                }
            }
            best = Math.max(best, SubmodularPick.coverage(rows, importance, picked));
        }
        return best;
    }

    private static List<Row> randomRows(Random random, int n, int vocabulary) {
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            Map<String, Double> weights = new HashMap<>();
            int k = 1 + random.nextInt(4);
            for (int t = 0; t < k; t++) {
                weights.put("t" + random.nextInt(vocabulary), random.nextGaussian());
            }
            rows.add(new Row("d" + i, weights));
        }
        return rows;
    }

    @Test
    void greedyStaysWithinOneMinusOneOverEOfBruteForce() {
        // Nemhauser, Wolsey and Fisher (1978): greedy maximisation of a monotone submodular
        // function under a cardinality constraint reaches at least (1 − 1/e) of the optimum.
        long seed = 20261201L;
        Random random = new Random(seed);
        int optimalAlso = 0;
        for (int trial = 0; trial < 200; trial++) {
            List<Row> rows = randomRows(random, 4 + random.nextInt(7), 6 + random.nextInt(10));
            int budget = 1 + random.nextInt(4);
            SubmodularPick.Picks picks = SubmodularPick.pick(rows, budget);
            Map<String, Double> importance = SubmodularPick.importance(rows);
            List<Integer> indexes = picks.ids().stream().map(id -> Integer.parseInt(id.substring(1))).toList();
            double greedy = SubmodularPick.coverage(rows, importance, indexes);
            double best = bruteForce(rows, budget);
            assertTrue(greedy >= (1 - 1 / Math.E) * best - 1e-9,
                    "seed " + seed + " trial " + trial + ": greedy " + greedy + " < (1-1/e) * " + best);
            assertTrue(greedy <= best + 1e-9);
            assertEquals(Math.min(budget, rows.size()), picks.ids().size());
            if (Math.abs(greedy - best) < 1e-9) {
                optimalAlso++;
            }
            if (budget == 1) {
                assertEquals(best, greedy, 1e-9, "one pick is always the single best document");
            }
        }
        assertTrue(optimalAlso > 100, "greedy is usually optimal on small instances: " + optimalAlso);
    }

    @Test
    void greedyTrapInstanceFromTheBound() {
        // A hand instance where greedy is not optimal: d0 covers {a, b}, d1 = {a, c}, d2 = {b, d};
        // weights chosen so that d0 has the largest single gain but {d1, d2} covers all four terms. Importances: a = sqrt(0.81 + 0.81) = 1.2728,
        // b = 1.2728, c = sqrt(0.64) = 0.8, d = 0.8. Gains: d0 = 2.5456, d1 = d2 = 2.0728.
        // Greedy: d0, then d1 (gain 0.8): total 3.3456; optimum {d1, d2}: 4.1456 (arithmetic by hand).
        List<Row> rows = List.of(
                new Row("d0", Map.of("a", 0.81, "b", 0.81)),
                new Row("d1", Map.of("a", 0.81, "c", 0.64)),
                new Row("d2", Map.of("b", 0.81, "d", 0.64)));
        SubmodularPick.Picks picks = SubmodularPick.pick(rows, 2);
        assertEquals(List.of("d0", "d1"), picks.ids());
        assertEquals(4.1456, bruteForce(rows, 2), 1e-4);
        assertEquals(3.3456 / 4.1456, picks.coverage(), 1e-4);
    }
}
