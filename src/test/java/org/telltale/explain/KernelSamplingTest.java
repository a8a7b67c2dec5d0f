package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;
import java.util.HashMap;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.stat.inference.ChiSquareTest;
import org.junit.jupiter.api.Test;
import org.telltale.text.Document;

/**
 * Kernel-matched sampling of the removed count: counts drawn in proportion to the kernel's weight,
 * every drawn probe weighted alike. It is importance sampling of the same weighted regression that
 * uniform counts with kernel weights estimate (common practice; the sampling proposal of Lundberg
 * &amp; Lee 2017, §4.1, for the Shapley kernel), so both must converge to the fit on every subset.
 */
class KernelSamplingTest {
    private static final String TEXT = "the courier lost my parcel again and support never replied to my refund request";

    /** Not linear in presence: an interaction of two words, an "or" and a main effect. */
    private static double interacting(Set<String> words) {
        double s = 0.5;
        if (words.contains("lost") && words.contains("parcel")) {
            s -= 0.2;
        }
        if (words.contains("refund") || words.contains("support")) {
            s += 0.06;
        }
        if (words.contains("never")) {
            s -= 0.08;
        }
        return s;
    }

    @Test
    void removedCountsFollowTheKernelAndSubsetsOfOneSizeAreEquallyLikely() {
        // Chi-square goodness of fit (Commons Math) at the 0.001 level, fixed seed: it can fail.
        int d = 6;
        int n = 60_000;
        Kernel kernel = Kernel.cosine(0.25);
        double[] cumulative = ProbeSampler.matchedCounts(kernel, d);
        ProbeRandom random = new ProbeRandom(4242);
        long[] bySize = new long[d];
        Map<BitSet, Long> triples = new HashMap<>();
        for (int i = 0; i < n; i++) {
            BitSet removed = ProbeSampler.draw(d, cumulative, random);
            int k = removed.cardinality();
            assertTrue(k >= 1 && k <= d && removed.length() <= d);
            bySize[k - 1]++;
            if (k == 3) {
                triples.merge(removed, 1L, Long::sum);
            }
        }
        double[] expected = new double[d];
        for (int k = 1; k <= d; k++) {
            // Ribeiro, Singh & Guestrin 2016, §3.3: π = exp(−D²/σ²), D the cosine distance.
            double dist = k == d ? 1 : 1 - Math.sqrt((double) (d - k) / d);
            expected[k - 1] = Math.exp(-dist * dist / (0.25 * 0.25));
        }
        assertTrue(new ChiSquareTest().chiSquareTest(expected, bySize) > 0.001, java.util.Arrays.toString(bySize));
        assertEquals(20, triples.size()); // C(6, 3)
        double[] flat = new double[triples.size()];
        java.util.Arrays.fill(flat, 1.0);
        assertTrue(new ChiSquareTest().chiSquareTest(flat,
                triples.values().stream().mapToLong(Long::longValue).toArray()) > 0.001, triples.toString());
    }

    @Test
    void theShapleyKernelGivesNoDrawToItsTwoConstrainedCounts() {
        double[] c = ProbeSampler.matchedCounts(Kernel.shapley(), 5);
        assertEquals(c[3], c[4], 0.0); // removing all 5 is the constraint g(∅) = f(∅), never drawn
        // Lundberg & Lee 2017, Theorem 2: weight (M − 1)/(C(M,|z|)·|z|·(M − |z|)) per coalition, times
        // the C(5, k) coalitions of each size: ∝ 1/(k(5 − k)), i.e. 1/4, 1/6, 1/6, 1/4 for k = 1..4.
        assertEquals(0.25 / (0.25 + 1.0 / 6 + 1.0 / 6 + 0.25), c[0] / c[4], 1e-12);
    }

    @Test
    void bothSamplingsConvergeToTheFitOnEverySubset() {
        FunctionClassifier model = new FunctionClassifier(KernelSamplingTest::interacting);
        Document doc = Document.unlabelled("k1", TEXT);
        // σ pinned: the exact fit is the one of σ = 0.25, and the sampled fits must estimate that one.
        ExplainSettings base = ExplainSettings.defaults().withWords(ExplainSettings.ALL_UNITS).withLevel(0.9999)
                .withChooseBandwidth(false);
        Explanation exact = new Explainer(model, base.withProbes(1 << 13)).explain(doc, "yes");
        assertTrue(exact.method().exact());
        Map<String, Double> truth = new HashMap<>();
        exact.terms().forEach(t -> truth.put(t.term(), t.weight()));
        double[] width = new double[2];
        for (Sampling sampling : Sampling.values()) {
            Explanation e = new Explainer(model, base.withProbes(8000).withSampling(sampling)).explain(doc, "yes");
            assertFalse(e.method().exact());
            assertEquals(sampling.key(), e.method().sampling());
            assertEquals(13, e.terms().size());
            for (Explanation.TermWeight t : e.terms()) {
                // 99.99 % sandwich intervals (White 1980) around the sampled fit hold the exact one.
                double w = truth.get(t.term());
                assertTrue(t.low() <= w && w <= t.high(), sampling + " " + t.term() + ": " + w + " not in ["
                        + t.low() + ", " + t.high() + "]");
                width[sampling.ordinal()] += t.high() - t.low();
            }
        }
        // Matched counts weigh every probe alike: Kish's effective sample size is N rather than
        // (Σπ)²/Σπ² ≈ 0.51 N under uniform counts (docs/method.md), so the intervals are narrower.
        assertTrue(width[Sampling.KERNEL.ordinal()] < width[Sampling.UNIFORM.ordinal()],
                java.util.Arrays.toString(width));
    }
}
