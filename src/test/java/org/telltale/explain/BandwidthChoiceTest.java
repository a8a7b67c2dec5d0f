package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.junit.jupiter.api.Test;

class BandwidthChoiceTest {
    private static final int D = 8;

    /** Probes of a d-unit document (probe 0 first) with uniform counts, and an interacting target. */
    private static List<BitSet> probes(int n, long seed) {
        List<BitSet> rows = new ArrayList<>();
        rows.add(new BitSet());
        rows.addAll(ProbeSampler.draw(D, n - 1, new ProbeRandom(seed)));
        return rows;
    }

    private static double[] target(List<BitSet> rows) {
        double[] y = new double[rows.size()];
        for (int i = 0; i < y.length; i++) {
            BitSet r = rows.get(i);
            boolean a = !r.get(0);
            boolean b = !r.get(1);
            y[i] = 0.2 + (a && b ? 0.5 : 0) + (!r.get(2) ? 0.1 : 0) - (!r.get(3) ? 0.05 : 0) + 0.01 * (i % 7) / 7.0;
        }
        return y;
    }

    @Test
    void reweightedProbesCarryTheKernelOfTheOtherBandwidth() {
        // Ribeiro, Singh & Guestrin 2016, §3.3: under uniform counts a probe's weight is π_σ(k).
        SurrogateFit fitter = new SurrogateFit(ExplainSettings.defaults().withSampling(Sampling.UNIFORM));
        List<BitSet> rows = probes(200, 5);
        SurrogateFit.Design design = fitter.design(D, rows, target(rows), false, 199);
        int[] removed = new int[design.rows()];
        for (int i = 0; i < removed.length; i++) {
            removed[i] = D - design.x.presentCount(i);
        }
        double[] w = BandwidthChoice.reweight(design, removed, 0.25, 0.1);
        Kernel narrow = Kernel.cosine(0.1);
        for (int i = 0; i < w.length; i++) {
            assertEquals(narrow.sampled(D, removed[i]), w[i], 1e-12, "probe " + i);
        }
    }

    @Test
    void aSurrogateThatHoldsTheModelKeepsTheProposal() {
        // A model linear in presence, every unit fitted, no penalty: each candidate's held-out error
        // is zero, and the tie goes to the bandwidth the probes were drawn for (common practice).
        ExplainSettings settings = ExplainSettings.defaults().withRidge(0);
        SurrogateFit fitter = new SurrogateFit(settings);
        List<BitSet> rows = new ArrayList<>();
        rows.add(new BitSet());
        rows.addAll(ProbeSampler.draw(D, 299, ProbeSampler.matchedCounts(fitter.kernel(), D), new ProbeRandom(9)));
        double[] y = new double[rows.size()];
        for (int i = 0; i < y.length; i++) {
            for (int j = 0; j < D; j++) {
                y[i] += rows.get(i).get(j) ? 0 : 0.03 * (j + 1);
            }
        }
        SurrogateFit.Design design = fitter.design(D, rows, y, false, 299);
        BandwidthChoice.Choice choice = BandwidthChoice.choose(fitter, design, rows, y, 299, 0.25, D);
        assertEquals(0.25, choice.bandwidth());
        for (double r2 : choice.heldOut()) {
            assertEquals(1.0, r2, 1e-9);
        }
    }
}
