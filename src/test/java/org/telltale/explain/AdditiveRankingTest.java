package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.telltale.text.Document;

class AdditiveRankingTest {
    private static final double Z = 1.959963984540054;

    @Test
    void tiedUnitsThatTheLastPlaceCutsAreTakenInTheOrderOfTheDocument() {
        // Hand-worked (common practice): three units tie at 3 for the second place; the one that
        // occurs first in the text (unit 3, at character 10) takes it.
        double[] w = {5, 3, -3, 3, 1};
        double[] se = new double[5];
        int[] first = {40, 30, 20, 10, 0};
        assertArrayEquals(new int[] {0, 3}, AdditiveRanking.top(w, se, 2, Z, first));
        assertArrayEquals(new int[] {0, 3, 2}, AdditiveRanking.top(w, se, 3, Z, first));
        // A run that fits whole is taken whole, whatever its order in the text.
        assertEquals(Set.of(0, 1, 2, 3), toSet(AdditiveRanking.top(w, se, 4, Z, first)));
    }

    @Test
    void weightsWithinTheirUncertaintyOfEachOtherAreTiedAndOthersAreNot() {
        // Hand-worked: the gap 0.1 between units 1 and 2 against z·√(se₁² + se₂²).
        double[] w = {5, 3.0, 2.9, 1};
        int[] first = {0, 20, 10, 30};
        double[] wide = {0, 0.1, 0.1, 0}; // 1.96 · 0.141 = 0.28 > 0.1: tied, unit 2 comes first
        double[] narrow = {0, 0.01, 0.01, 0}; // 0.028 < 0.1: unit 1 is larger
        assertArrayEquals(new int[] {0, 2}, AdditiveRanking.top(w, wide, 2, Z, first));
        assertArrayEquals(new int[] {0, 1}, AdditiveRanking.top(w, narrow, 2, Z, first));
    }

    @Test
    void theFitOnEveryUnitIsTheUnpenalisedReferenceFitWithItsSandwichErrors() {
        // Reference: SurrogateFit's refit on the same columns without penalty, whose weights are
        // checked against the QR fit (WeightedLeastSquaresTest: Longley, scikit-learn Ridge) and
        // whose HC1 sandwich (White 1980) IntervalCoverageTest checks for coverage. The model has
        // an interaction, so residuals and standard errors are not zero.
        int d = 12;
        ExplainSettings settings = ExplainSettings.defaults().withRidge(0);
        SurrogateFit fitter = new SurrogateFit(settings);
        SurrogateFit.Design design = design(fitter, d, 600, 7, removed -> {
            double y = 0.3;
            for (int j = 0; j < d; j++) {
                y += removed.get(j) ? 0 : 0.05 * (j + 1);
            }
            return y + (!removed.get(0) && !removed.get(1) ? 0.4 : 0);
        });
        AdditiveRanking.FullFit full = AdditiveRanking.fit(design);
        assertNotNull(full);
        int[] all = new int[d];
        for (int j = 0; j < d; j++) {
            all[j] = j;
        }
        Surrogate reference = fitter.fitUnits(design, all);
        for (int j = 0; j < d; j++) {
            assertEquals(reference.weights()[j], full.weights()[j], 1e-9, "weight " + j);
            assertEquals(reference.se()[j], full.se()[j], 1e-9, "se " + j);
            assertTrue(full.se()[j] > 1e-4, "the interaction leaves residuals: se " + j + " " + full.se()[j]);
        }
        assertEquals(reference.intercept(), full.intercept(), 1e-9);
        assertEquals(reference.prediction(), full.prediction(), 1e-9);
        assertEquals(reference.r2(), full.r2(), 1e-9);
    }

    @Test
    void aModelAdditiveInTheWordsIsRankedByItsOwnEffectsWithTiesInTextOrder() {
        // A score linear in word presence (common practice: the surrogate family holds the model,
        // so a fit on every unit recovers it exactly from sampled probes). Thirty words, two of them
        // ("delta", "kappa") tied for the fifth place: the earlier in the text is reported.
        Map<String, Double> effect = new java.util.HashMap<>();
        StringBuilder text = new StringBuilder();
        String[] named = {"alpha", "beta", "gamma", "delta", "epsilon", "zeta", "eta", "theta", "iota", "kappa"};
        double[] namedEffect = {0.09, -0.08, 0.07, 0.05, 0.02, 0.01, 0.015, 0.012, -0.011, 0.05};
        for (int i = 0; i < named.length; i++) {
            effect.put(named[i], namedEffect[i]);
        }
        for (int i = 0; i < 20; i++) {
            effect.put("filler" + (char) ('a' + i), 0.001 * (i % 5));
        }
        effect.keySet().stream().sorted().forEach(w -> text.append(w).append(' '));
        FunctionClassifier model = new FunctionClassifier(words -> {
            double p = 0.2;
            for (String w : words) {
                p += effect.getOrDefault(w, 0.0);
            }
            return p;
        });
        Explanation e = new Explainer(model, ExplainSettings.defaults().withWords(5))
                .explain(Document.unlabelled("additive", text.toString()), "yes");
        assertEquals(30, e.method().units());
        List<String> terms = e.terms().stream().map(Explanation.TermWeight::term).toList();
        assertEquals(List.of("alpha", "beta", "gamma", "delta", "kappa"), terms, "with K = 5 both tied words fit");
        // With K = 4 they tie for the last place; "delta" comes before "kappa" in the text.
        Explanation four = new Explainer(model, ExplainSettings.defaults().withWords(4))
                .explain(Document.unlabelled("additive", text.toString()), "yes");
        assertEquals(Set.of("alpha", "beta", "gamma", "delta"),
                Set.copyOf(four.terms().stream().map(Explanation.TermWeight::term).toList()), four.terms().toString());
        for (Explanation.TermWeight t : e.terms()) {
            assertEquals(effect.get(t.term()), t.weight(), 1e-9, t.term());
            assertTrue(t.low() <= t.weight() && t.weight() <= t.high(), t.toString());
        }
        assertEquals(model.yes(text.toString()), e.fit().prediction(), 1e-9);
        assertEquals(1.0, e.fit().r2(), 1e-9);
    }

    @Test
    void aModelWithAnInteractionKeepsTheSelectionsChoice() {
        // An AND of two words cannot be written as a sum of word effects: the fit on every unit
        // leaves far more than 0.1 % of the variance, so no ranking comes from it.
        int d = 12;
        SurrogateFit fitter = new SurrogateFit(ExplainSettings.defaults());
        SurrogateFit.Design design = design(fitter, d, 600, 3,
                removed -> !removed.get(0) && !removed.get(1) ? 0.9 : 0.1);
        int[] first = new int[d];
        assertNull(AdditiveRanking.surrogate(design, 3, Z, first));
        SurrogateFit.Design additive = design(fitter, d, 600, 3, removed -> removed.get(0) ? 0.1 : 0.9);
        assertNotNull(AdditiveRanking.surrogate(additive, 3, Z, first));
    }

    private static SurrogateFit.Design design(SurrogateFit fitter, int d, int n, long seed,
            java.util.function.ToDoubleFunction<BitSet> target) {
        ProbeRandom random = ProbeRandom.forDocument(seed, "design");
        List<BitSet> removed = new ArrayList<>();
        removed.add(new BitSet());
        removed.addAll(ProbeSampler.draw(d, n - 1, ProbeSampler.matchedCounts(fitter.kernel(), d), random));
        double[] y = removed.stream().mapToDouble(target).toArray();
        return fitter.design(d, removed, y, false, n - 1);
    }

    private static Set<Integer> toSet(int[] units) {
        Set<Integer> out = new java.util.HashSet<>();
        for (int u : units) {
            out.add(u);
        }
        return out;
    }
}
