package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;
import java.util.List;
import org.apache.commons.math3.stat.inference.ChiSquareTest;
import org.junit.jupiter.api.Test;

/** Antithetic pairs of probes (Hammersley &amp; Morton 1956): what each partner removes. */
class PairingTest {

    @Test
    void aComplementRemovesExactlyWhatItsPartnerKeeps() {
        int d = 9;
        List<BitSet> probes = ProbeSampler.drawPaired(d, 400, null, Pairing.COMPLEMENT, new ProbeRandom(3));
        assertEquals(400, probes.size());
        for (int i = 0; i < probes.size(); i += 2) {
            BitSet both = (BitSet) probes.get(i).clone();
            assertTrue(!both.intersects(probes.get(i + 1)), "pair " + i);
            both.or(probes.get(i + 1));
            assertEquals(d, both.cardinality(), "pair " + i);
        }
    }

    @Test
    void aDisjointPartnerRemovesAsManyUnitsAndItsCountsFollowTheKernel() {
        // Chi-square goodness of fit (Commons Math) at the 0.001 level, fixed seed: it can fail.
        int d = 7;
        Kernel kernel = Kernel.cosine(0.25);
        double[] cumulative = ProbeSampler.matchedCounts(kernel, d);
        List<BitSet> probes = ProbeSampler.drawPaired(d, 40_001, cumulative, Pairing.DISJOINT, new ProbeRandom(11));
        assertEquals(40_001, probes.size()); // an odd count ends with a lone draw
        long[] partnerCounts = new long[d];
        for (int i = 0; i + 1 < probes.size(); i += 2) {
            BitSet first = probes.get(i);
            BitSet second = probes.get(i + 1);
            int k = first.cardinality();
            assertEquals(k, second.cardinality(), "pair " + i);
            BitSet shared = (BitSet) first.clone();
            shared.and(second);
            assertEquals(Math.max(0, 2 * k - d), shared.cardinality(), "pair " + i + ": as few shared as possible");
            partnerCounts[k - 1]++;
        }
        double[] expected = new double[d];
        for (int k = 1; k <= d; k++) {
            expected[k - 1] = kernel.sampled(d, k); // Ribeiro, Singh & Guestrin 2016, §3.3
        }
        assertTrue(new ChiSquareTest().chiSquareTest(expected, partnerCounts) > 0.001,
                java.util.Arrays.toString(partnerCounts));
    }
}
