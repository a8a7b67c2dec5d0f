package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;
import java.util.HashMap;
import java.util.Map;
import org.apache.commons.math3.stat.inference.ChiSquareTest;
import org.junit.jupiter.api.Test;

class ProbeSamplerTest {

    @Test
    void splitMixProducesTheReferenceSequence() {
        // SplitMix64 (Steele, Lea & Flood 2014; Vigna's splitmix64.c) from state 0: first outputs
        // 0xe220a8397b1dcdaf, 0x6e789e6aa1b965f4, 0x06c45d188009454f (from memory of the reference code).
        ProbeRandom r = new ProbeRandom(0L);
        assertEquals(0xe220a8397b1dcdafL, r.nextLong());
        assertEquals(0x6e789e6aa1b965f4L, r.nextLong());
        assertEquals(0x06c45d188009454fL, r.nextLong());
    }

    @Test
    void documentStreamsDependOnSeedAndIdOnly() {
        assertEquals(ProbeRandom.forDocument(7, "ticket-41").nextLong(), ProbeRandom.forDocument(7, "ticket-41").nextLong());
        assertNotEquals(ProbeRandom.forDocument(7, "ticket-41").nextLong(), ProbeRandom.forDocument(7, "ticket-42").nextLong());
        assertNotEquals(ProbeRandom.forDocument(7, "ticket-41").nextLong(), ProbeRandom.forDocument(8, "ticket-41").nextLong());
        // FNV-1a 64 of "a" is 0xaf63dc4c8601ec8c (Fowler, Noll & Vo, the published test vectors; from memory).
        assertEquals(0xaf63dc4c8601ec8cL, ProbeRandom.hash("a"));
    }

    @Test
    void removedCountIsUniformAndEverySubsetOfAGivenSizeIsEquallyLikely() {
        // Ribeiro, Singh & Guestrin 2016, §3.3: size uniform in 1..d, then a uniform subset of it.
        // Chi-square goodness of fit (Commons Math) at the 0.001 level, fixed seed: it can fail.
        int d = 5;
        int n = 60_000;
        ProbeRandom random = new ProbeRandom(12345);
        long[] bySize = new long[d];
        Map<BitSet, Long> pairs = new HashMap<>();
        for (int i = 0; i < n; i++) {
            BitSet removed = ProbeSampler.draw(d, random);
            int k = removed.cardinality();
            assertTrue(k >= 1 && k <= d && removed.length() <= d);
            bySize[k - 1]++;
            if (k == 2) {
                pairs.merge(removed, 1L, Long::sum);
            }
        }
        double[] uniform = new double[d];
        java.util.Arrays.fill(uniform, 1.0);
        assertTrue(new ChiSquareTest().chiSquareTest(uniform, bySize) > 0.001, java.util.Arrays.toString(bySize));
        assertEquals(10, pairs.size()); // C(5, 2) subsets of size 2, all seen
        long[] counts = pairs.values().stream().mapToLong(Long::longValue).toArray();
        double[] flat = new double[counts.length];
        java.util.Arrays.fill(flat, 1.0);
        assertTrue(new ChiSquareTest().chiSquareTest(flat, counts) > 0.001, pairs.toString());
    }

    @Test
    void samplingProbabilitiesSumToOne() {
        // Σ_k C(d, k) · 1/(d·C(d, k)) = 1 over k = 1..d (definition of the sampler).
        for (int d = 1; d <= 12; d++) {
            double total = 0;
            for (int k = 1; k <= d; k++) {
                total += org.apache.commons.math3.util.CombinatoricsUtils.binomialCoefficientDouble(d, k)
                        * ProbeSampler.probability(d, k);
            }
            assertEquals(1.0, total, 1e-12);
        }
    }

    @Test
    void cosineKernelFollowsItsDefinition() {
        // Ribeiro et al. 2016, §3.3: π = exp(−D²/σ²); D = 1 − cos(z, 1) with cos = √((d−k)/d).
        Kernel k = Kernel.cosine(0.25);
        assertEquals(1.0, k.sampled(10, 0), 0);
        double dist = 1 - Math.sqrt(0.5);
        assertEquals(Math.exp(-dist * dist / 0.0625), k.sampled(10, 5), 1e-15);
        // Lundberg & Lee 2017, Theorem 2: π(M=4, |z|=1) = 3 / (C(4,1)·1·3) = 1/4.
        assertEquals(0.25, Kernel.shapley().exact(4, 3, 1), 1e-15);
        assertTrue(Kernel.shapley().constrains(4, 0) && Kernel.shapley().constrains(4, 4));
    }
}
