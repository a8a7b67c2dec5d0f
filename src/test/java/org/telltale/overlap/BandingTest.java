package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class BandingTest {
    private static final double[] SIMILARITY = {0.2, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8};
    // MMDS Example 3.11 (b = 20, r = 5), the table of 1 − (1 − s^r)^b (from memory of the book's table).
    private static final double[] BOOK = {0.006, 0.047, 0.186, 0.470, 0.802, 0.975, 0.9996};

    @Test
    void candidateProbabilityReproducesTheBookTable() {
        Banding banding = new Banding(5, 20);
        for (int i = 0; i < SIMILARITY.length; i++) {
            double tolerance = i == SIMILARITY.length - 1 ? 0.00005 : 0.0005;
            assertEquals(BOOK[i], banding.candidateProbability(SIMILARITY[i]), tolerance, "s = " + SIMILARITY[i]);
        }
        // MMDS §3.4.2: the threshold of the S-curve is about (1/b)^(1/r), for b = 20, r = 5 about 0.55.
        assertEquals(0.55, banding.steepestPoint(), 0.005);
    }

    @Test
    void bandingOfRealSignaturesFollowsTheSCurve() {
        // MMDS §3.4: with real MinHash signatures, the share of pairs of similarity s that share a
        // band is 1 − (1 − s^r)^b, up to binomial sampling error.
        Banding banding = new Banding(5, 20);
        MinHasher hasher = new MinHasher(banding.hashes(), 2024);
        KnownSimilaritySets sets = new KnownSimilaritySets(17);
        int trials = 1500;
        for (int i = 0; i < SIMILARITY.length; i++) {
            int shared = (int) Math.round(SIMILARITY[i] * 100);
            int candidates = 0;
            for (int t = 0; t < trials; t++) {
                long[][] ab = sets.pair(100, shared);
                long[] sa = hasher.signature(ab[0]);
                long[] sb = hasher.signature(ab[1]);
                boolean shareBand = false;
                for (int band = 0; band < banding.bands() && !shareBand; band++) {
                    shareBand = banding.bandKey(sa, band) == banding.bandKey(sb, band);
                }
                candidates += shareBand ? 1 : 0;
            }
            double expected = BOOK[i];
            double observed = (double) candidates / trials;
            double se = Math.sqrt(Math.max(expected * (1 - expected), 1e-3) / trials);
            assertEquals(expected, observed, 4 * se + 1e-9,
                    "s = " + SIMILARITY[i] + ": false-negative rate " + (1 - observed) + ", S-curve " + (1 - expected));
        }
    }

    @Test
    void chosenBandingMeetsTheRecallFloorWithinTheBudget() {
        for (double threshold : new double[] {0.5, 0.7, 0.8, 0.9, 0.95}) {
            Banding chosen = Banding.forThreshold(threshold, 128);
            assertTrue(chosen.hashes() <= 128, chosen.toString());
            assertTrue(chosen.candidateProbability(threshold) >= Banding.RECALL_AT_THRESHOLD, chosen + " at " + threshold);
            // No banding within the budget that meets the floor has a smaller false-positive area
            // (checked by brute force over all r, b).
            for (int r = 1; r <= 128; r++) {
                for (int b = 1; r * b <= 128; b++) {
                    Banding other = new Banding(r, b);
                    if (other.candidateProbability(threshold) >= Banding.RECALL_AT_THRESHOLD) {
                        assertTrue(other.falsePositiveArea(threshold) >= chosen.falsePositiveArea(threshold) - 1e-9,
                                other + " beats " + chosen + " at " + threshold);
                    }
                }
            }
        }
    }

    @Test
    void areasMatchClosedFormsForOneRowOneBand() {
        // With r = b = 1, P(s) = s: ∫₀^t s ds = t²/2 and ∫ₜ¹ (1 − s) ds = (1 − t)²/2 (calculus).
        Banding identity = new Banding(1, 1);
        assertEquals(0.32, identity.falsePositiveArea(0.8), 1e-12);
        assertEquals(0.02, identity.falseNegativeArea(0.8), 1e-12);
    }
}
