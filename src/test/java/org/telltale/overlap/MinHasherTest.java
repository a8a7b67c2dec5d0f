package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class MinHasherTest {

    @Test
    void estimatesStayWithinTheTheoreticalStandardError() {
        // Broder 1997; MMDS §3.3.3: the share of agreeing components is an unbiased estimate of
        // Jaccard similarity s with standard error sqrt(s(1 − s)/k).
        int k = 128;
        MinHasher hasher = new MinHasher(k, 42);
        KnownSimilaritySets sets = new KnownSimilaritySets(99);
        Random random = new Random(5);
        int pairs = 600;
        int within2 = 0;
        int within4 = 0;
        double sumZ = 0;
        for (int p = 0; p < pairs; p++) {
            int union = 40 + random.nextInt(200);
            int shared = 1 + random.nextInt(union - 1);
            long[][] ab = sets.pair(union, shared);
            double s = (double) shared / union;
            assertEquals(s, Shingler.jaccard(ab[0], ab[1]), 1e-12);
            double estimate = MinHasher.estimate(hasher.signature(ab[0]), hasher.signature(ab[1]));
            double z = (estimate - s) / Math.sqrt(s * (1 - s) / k);
            sumZ += z;
            within2 += Math.abs(z) <= 2 ? 1 : 0;
            within4 += Math.abs(z) <= 4 ? 1 : 0;
        }
        // Normal approximation: 95.4% within 2 SE; allow sampling error of 600 pairs (SE 0.9%).
        assertTrue(within2 >= 0.92 * pairs, "within 2 SE: " + within2 + " of " + pairs);
        assertTrue(within4 >= pairs - 1, "within 4 SE: " + within4 + " of " + pairs);
        // Unbiased: the mean z of independent pairs has standard error 1/sqrt(600) ≈ 0.04.
        assertEquals(0.0, sumZ / pairs, 0.2, "mean standardised error");
    }

    @Test
    void identicalSetsAgreeEverywhereAndDisjointSetsAlmostNowhere() {
        // Broder 1997: P[agree] = Jaccard, 1 for equal sets and 0 for disjoint ones.
        MinHasher hasher = new MinHasher(256, 3);
        KnownSimilaritySets sets = new KnownSimilaritySets(4);
        long[][] same = sets.pair(50, 50);
        assertEquals(1.0, MinHasher.estimate(hasher.signature(same[0]), hasher.signature(same[1])));
        long[][] disjoint = sets.pair(100, 0);
        assertEquals(0.0, MinHasher.estimate(hasher.signature(disjoint[0]), hasher.signature(disjoint[1])));
    }

    @Test
    void seedsGiveDifferentFamiliesButTheSameSeedTheSameSignature() {
        long[] set = {11, 22, 33, 44};
        assertEquals(java.util.Arrays.toString(new MinHasher(16, 1).signature(set)),
                java.util.Arrays.toString(new MinHasher(16, 1).signature(set)));
        assertTrue(MinHasher.estimate(new MinHasher(16, 1).signature(set), new MinHasher(16, 2).signature(set)) < 0.5);
    }
}
