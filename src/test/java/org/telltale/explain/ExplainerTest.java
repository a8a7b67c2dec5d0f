package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.util.CombinatoricsUtils;
import org.junit.jupiter.api.Test;
import org.telltale.TelltaleException;
import org.telltale.text.Analyzers;
import org.telltale.text.Document;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;
import org.telltale.text.UnitKind;

class ExplainerTest {
    private static final String TEXT = "the courier lost my parcel again and support never replied to my refund request";

    /** A score linear in word presence: the surrogate family contains the model, so weights are exact. */
    private static final Map<String, Double> TRUE_WEIGHTS = Map.of(
            "lost", -0.11, "never", -0.07, "refund", 0.05, "parcel", 0.02, "support", 0.013);

    private static double linear(Set<String> words) {
        double s = 0.5;
        for (String w : words) {
            s += TRUE_WEIGHTS.getOrDefault(w, 0.0);
        }
        return s;
    }

    @Test
    void recoversTheWeightsOfAModelLinearInWordPresenceFromAllSubsets() {
        // Common practice: a least-squares fit whose model family contains the truth returns it.
        FunctionClassifier model = new FunctionClassifier(ExplainerTest::linear);
        ExplainSettings settings = ExplainSettings.defaults().withWords(ExplainSettings.ALL_UNITS).withProbes(1 << 13);
        Explanation e = new Explainer(model, settings).explain(Document.unlabelled("t1", TEXT), "yes");
        assertTrue(e.method().exact());
        assertEquals(13, e.method().units()); // "my" occurs twice: 14 tokens, 13 words
        assertEquals(1 << 13, e.probes());
        for (Explanation.TermWeight t : e.terms()) {
            assertEquals(TRUE_WEIGHTS.getOrDefault(t.term(), 0.0), t.weight(), 1e-9, t.term());
        }
        assertEquals(1.0, e.fit().r2(), 1e-9);
        assertEquals(model.yes(TEXT), e.fit().prediction(), 1e-9);
    }

    @Test
    void recoversLinearWeightsApproximatelyFromSampledProbes() {
        FunctionClassifier model = new FunctionClassifier(ExplainerTest::linear);
        ExplainSettings settings = ExplainSettings.defaults().withWords(5).withSelect(Selection.FORWARD);
        Explanation e = new Explainer(model, settings).explain(Document.unlabelled("t2", TEXT), "yes");
        assertFalse(e.method().exact());
        assertEquals(5, e.terms().size());
        for (Explanation.TermWeight t : e.terms()) {
            double truth = TRUE_WEIGHTS.get(t.term());
            assertEquals(truth, t.weight(), 0.02 * Math.abs(truth) + 1e-4, t.term());
            assertTrue(t.low() <= t.weight() && t.weight() <= t.high(), t.term());
        }
        assertEquals("lost", e.terms().get(0).term());
    }

    /** f(S): the model's score with only the units in S present. */
    private static double value(FunctionClassifier model, TermIndex index, int subset, int d) {
        BitSet removed = new BitSet();
        for (int j = 0; j < d; j++) {
            if ((subset >>> j & 1) == 0) {
                removed.set(j);
            }
        }
        return model.yes(Masker.cutting().mask(index, removed));
    }

    @Test
    void shapleyWeightingEqualsShapleyValuesComputedByEnumeration() {
        // Shapley (1953): φ_i = Σ_{S ⊆ N∖{i}} |S|!(M−|S|−1)!/M! · (f(S ∪ {i}) − f(S)); Lundberg & Lee
        // 2017, Theorem 2: the Shapley-kernel weighted fit over all coalitions recovers it.
        FunctionClassifier model = new FunctionClassifier(words -> {
            double z = 2.0 * (words.contains("lost") ? 1 : 0) - 1.5 * (words.contains("refund") ? 1 : 0)
                    + (words.contains("never") && words.contains("replied") ? 1.2 : 0)
                    + 0.3 * words.size() / 10.0 - 0.4;
            return 1 / (1 + Math.exp(-z));
        });
        String text = "courier lost parcel support never replied refund request again";
        TermIndex index = TermIndex.of(text, Analyzers.standard(), UnitKind.WORD);
        int d = index.size();
        assertEquals(9, d);
        double[] phi = new double[d];
        for (int i = 0; i < d; i++) {
            for (int s = 0; s < 1 << d; s++) {
                if ((s >>> i & 1) != 0) {
                    continue;
                }
                int size = Integer.bitCount(s);
                double weight = CombinatoricsUtils.factorialDouble(size) * CombinatoricsUtils.factorialDouble(d - size - 1)
                        / CombinatoricsUtils.factorialDouble(d);
                phi[i] += weight * (value(model, index, s | 1 << i, d) - value(model, index, s, d));
            }
        }
        ExplainSettings settings = ExplainSettings.defaults().withWeighting(Weighting.SHAPLEY)
                .withWords(ExplainSettings.ALL_UNITS).withProbes(1 << d);
        Explanation e = new Explainer(model, settings).explain(Document.unlabelled("s1", text), "yes");
        assertTrue(e.method().exact());
        Map<String, Double> got = new HashMap<>();
        e.terms().forEach(t -> got.put(t.term(), t.weight()));
        for (int i = 0; i < d; i++) {
            assertEquals(phi[i], got.get(index.units().get(i).term()), 1e-9, index.units().get(i).term());
        }
        // Efficiency: the intercept is f(∅) and the prediction is f(x) exactly.
        assertEquals(value(model, index, 0, d), e.fit().intercept(), 1e-12);
        assertEquals(model.yes(text), e.fit().prediction(), 1e-12);
    }

    @Test
    void sendsEachRoundInOneCallAndNeverTheSameTextTwice() {
        FunctionClassifier model = new FunctionClassifier(ExplainerTest::linear);
        ExplainSettings settings = ExplainSettings.defaults().withProbes(600);
        Explanation e = new Explainer(model, settings).explain(Document.unlabelled("t3", "lost parcel never"), null);
        // 3 units: 8 subsets fit in the budget, so exact mode sends each once, in one call.
        assertEquals(1, model.calls.get());
        assertEquals(8, model.seen.size());
        assertEquals(8, new HashSet<>(model.seen).size());
        assertEquals(8, e.method().calls());

        FunctionClassifier model2 = new FunctionClassifier(ExplainerTest::linear);
        String text = "lost parcel never refund support courier again";
        Explanation e2 = new Explainer(model2, ExplainSettings.defaults().withProbes(100)).explain(
                Document.unlabelled("t4", text), null);
        assertFalse(e2.method().exact()); // 128 subsets > 100 probes
        assertEquals(1, model2.calls.get());
        assertEquals(new HashSet<>(model2.seen).size(), model2.seen.size());
        assertEquals(text, model2.seen.get(0)); // probe 0 is the untouched document
        assertTrue(e2.method().calls() < 100, "repeated masks must be answered from the cache");
        assertEquals(100, e2.probes());
    }

    @Test
    void explainsThePredictedLabelByDefaultAndRejectsUnknownLabels() {
        FunctionClassifier model = new FunctionClassifier(words -> words.contains("lost") ? 0.2 : 0.9);
        Explainer explainer = new Explainer(model, ExplainSettings.defaults().withProbes(300));
        Explanation e = explainer.explain(Document.unlabelled("t5", TEXT), null);
        assertEquals("no", e.label());
        assertEquals("no", e.predicted());
        assertEquals(0.8, e.score(), 1e-12);
        assertEquals(0.8, e.scores().get("no"), 1e-12);
        TelltaleException bad = assertThrows(TelltaleException.class,
                () -> explainer.explain(Document.unlabelled("t5", TEXT), "maybe"));
        assertTrue(bad.getMessage().contains("t5") && bad.getMessage().contains("maybe"), bad.getMessage());
    }

    @Test
    void aDocumentWithoutUnitsGivesAnEmptyExplanationWithANote() {
        FunctionClassifier model = new FunctionClassifier(words -> 0.3);
        Explanation e = new Explainer(model, ExplainSettings.defaults()).explain(Document.unlabelled("t6", " ... "), "yes");
        assertTrue(e.terms().isEmpty());
        assertEquals(1, e.probes());
        assertEquals(0.3, e.fit().prediction(), 1e-12);
        assertFalse(e.method().notes().isEmpty());
    }

    @Test
    void spansPointAtEveryOccurrenceOfTheTerm() {
        FunctionClassifier model = new FunctionClassifier(words -> words.contains("my") ? 0.7 : 0.4);
        Explanation e = new Explainer(model, ExplainSettings.defaults().withWords(1)).explain(
                Document.unlabelled("t7", TEXT), "yes");
        Explanation.TermWeight top = e.terms().get(0);
        assertEquals("my", top.term());
        List<String> cut = new ArrayList<>();
        top.spans().forEach(s -> cut.add(TEXT.substring(s.start(), s.end())));
        assertEquals(List.of("my", "my"), cut);
        assertEquals(0.3, top.weight(), 0.01);
    }

    @Test
    void aCappedDocumentSaysWhichUnitsItLeftOut() {
        FunctionClassifier model = new FunctionClassifier(ExplainerTest::linear);
        Explanation e = new Explainer(model, ExplainSettings.defaults().withMaxUnits(4).withProbes(64)).explain(
                Document.unlabelled("t8", TEXT), "yes");
        assertEquals(4, e.method().units());
        assertTrue(e.method().exact()); // 2^4 subsets fit in 64 probes
        assertTrue(e.method().notes().stream().anyMatch(n -> n.contains("kept 4 of 13")), e.method().notes().toString());
        // Kept: "my" (twice), then the earliest: "the", "courier", "lost". "refund" is left out.
        assertEquals(java.util.Set.of("my", "the", "courier", "lost"),
                e.terms().stream().map(Explanation.TermWeight::term).collect(java.util.stream.Collectors.toSet()));
        for (String seen : model.seen) {
            assertTrue(seen.contains("refund"), "a left-out unit stays in every probe: " + seen);
        }
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.EnumSource(value = Selection.class, names = {"FORWARD", "LASSO"})
    void everySelectionFindsTheWordsALinearModelUses(Selection selection) {
        // Common practice: with the truth in the model family, each selection rule recovers its support.
        FunctionClassifier model = new FunctionClassifier(ExplainerTest::linear);
        ExplainSettings settings = ExplainSettings.defaults().withWords(5).withSelect(selection).withProbes(1500);
        Explanation e = new Explainer(model, settings).explain(Document.unlabelled("t9", TEXT), "yes");
        assertEquals(TRUE_WEIGHTS.keySet(),
                e.terms().stream().map(Explanation.TermWeight::term).collect(java.util.stream.Collectors.toSet()));
        assertEquals("lost", e.terms().get(0).term());
    }

    @Test
    void sampledShapleyFitsKeepTheirTwoConstraintsExactly() {
        // Lundberg & Lee 2017, Theorem 2: g(empty) = f(empty) and g(x) = f(x), whatever the sample.
        FunctionClassifier model = new FunctionClassifier(words -> 1 / (1 + Math.exp(-(words.contains("lost") ? 1.5 : 0)
                - (words.contains("never") && words.contains("refund") ? 0.8 : 0) + 0.4)));
        ExplainSettings settings = ExplainSettings.defaults().withWeighting(Weighting.SHAPLEY).withProbes(400);
        Explanation e = new Explainer(model, settings).explain(Document.unlabelled("t10", TEXT), "yes");
        assertFalse(e.method().exact());
        assertEquals(model.yes(""), e.fit().intercept(), 1e-12);
        assertEquals(model.yes(TEXT), e.fit().prediction(), 1e-12);
        assertEquals(model.yes(TEXT) - model.yes(""), e.terms().stream().mapToDouble(Explanation.TermWeight::weight).sum(), 1e-12);
        assertEquals("lost", e.terms().get(0).term());
    }
}
