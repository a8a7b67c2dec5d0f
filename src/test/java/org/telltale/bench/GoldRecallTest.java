package org.telltale.bench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.telltale.explain.Explanation;

class GoldRecallTest {
    private static Explanation.TermWeight t(String term, double w) {
        return new Explanation.TermWeight(term, w, w, w, List.of());
    }

    // Worked by hand from the definition of recall in Ribeiro, Singh & Guestrin 2016, §5.2:
    // top-2 by |weight| is {c, a}; gold {a, b, c, d} has 4 features, 2 recovered -> 0.5.
    @Test
    void recallCountsGoldFeaturesAmongTheTopK() {
        List<Explanation.TermWeight> terms = List.of(t("a", 0.5), t("b", 0.1), t("c", -0.9), t("e", 0.05));
        assertEquals(0.5, GoldRecall.recall(terms, Set.of("a", "b", "c", "d"), 2), 1e-12);
        assertEquals(0.75, GoldRecall.recall(terms, Set.of("a", "b", "c", "d"), 3), 1e-12);
        assertEquals(1.0, GoldRecall.recall(terms, Set.of("c"), 1), 1e-12);
        assertTrue(Double.isNaN(GoldRecall.recall(terms, Set.of(), 2)));
    }

    // Common practice (set overlap with sign match), worked by hand: top-3 of a = {c-, a+, b+},
    // top-3 of b = {c-, a-, e+}; only c agrees in sign -> 1/3.
    @Test
    void agreementNeedsTheSameTermWithTheSameSign() {
        List<Explanation.TermWeight> a = List.of(t("a", 0.5), t("b", 0.1), t("c", -0.9));
        List<Explanation.TermWeight> b = List.of(t("a", -0.5), t("e", 0.2), t("c", -0.7));
        assertEquals(1.0 / 3.0, GoldRecall.agreement(a, b, 3), 1e-12);
        assertEquals(1.0, GoldRecall.agreement(a, a, 3), 1e-12);
        assertEquals(1.0, GoldRecall.agreement(List.of(), List.of(), 3), 1e-12);
    }

    // Worked by hand: the converged top 3 is {c−, a+, b+}, of which b's interval [−0.1, 0.3] holds
    // zero, so only c and a count; the other answer reports c with its sign and a with the wrong one.
    @Test
    void effectAgreementCountsOnlyConvergedPlacesWhoseIntervalExcludesZero() {
        List<Explanation.TermWeight> converged = List.of(new Explanation.TermWeight("a", 0.5, 0.4, 0.6, List.of()),
                new Explanation.TermWeight("b", 0.1, -0.1, 0.3, List.of()),
                new Explanation.TermWeight("c", -0.9, -1.0, -0.8, List.of()));
        List<Explanation.TermWeight> other = List.of(t("a", -0.5), t("e", 0.2), t("c", -0.7));
        assertEquals(0.5, GoldRecall.effectAgreement(converged, other, 3), 1e-12);
        assertEquals(1.0, GoldRecall.effectAgreement(List.of(t("x", 0.0)), other, 3), 1e-12);
    }

    @Test
    void zeroWeightsAreNotSelected() {
        List<Explanation.TermWeight> terms = List.of(t("a", 0.0), t("b", 0.0));
        assertEquals(0.0, GoldRecall.recall(terms, Set.of("a"), 2), 1e-12);
    }
}
