package org.telltale.bench;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.telltale.explain.ForwardSelection;
import org.telltale.explain.Kernel;
import org.telltale.explain.LarsPath;
import org.telltale.explain.PresenceMatrix;
import org.telltale.explain.ProbeRandom;
import org.telltale.explain.ProbeSampler;
import org.telltale.explain.WeightedCentered;
import org.telltale.explain.WeightedLeastSquares;

/**
 * The explanation engine's numeric kernels for d units and N probes: drawing the probes, the
 * weighted ridge fit of the surrogate on all d units, and choosing K = 10 units by forward
 * selection or the lasso path. The target is a planted sparse linear score so the selections do
 * real work. Run by bench/kernels.sh.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class KernelBench {
    @Param({"50", "200", "1000"})
    public int d;

    @Param({"1000", "2000"})
    public int n;

    private List<BitSet> removed;
    private PresenceMatrix presence;
    private double[][] dense;
    private double[] y;
    private double[] w;
    private WeightedCentered centered;

    @Setup
    public void setup() {
        ProbeRandom random = new ProbeRandom(7L);
        removed = new ArrayList<>(ProbeSampler.draw(d, n, random));
        presence = PresenceMatrix.fromRemoved(removed, d);
        dense = new double[n][d];
        y = new double[n];
        w = new double[n];
        Kernel kernel = Kernel.cosine(0.25);
        for (int i = 0; i < n; i++) {
            BitSet r = removed.get(i);
            for (int j = 0; j < d; j++) {
                dense[i][j] = r.get(j) ? 0 : 1;
            }
            // Ten planted units carry the score; noise keeps the fit honest.
            double score = 0.1;
            for (int j = 0; j < 10; j++) {
                score += dense[i][j * (d / 10)] * (j % 2 == 0 ? 0.3 : -0.2);
            }
            y[i] = score + 0.01 * (random.nextDouble() - 0.5);
            w[i] = kernel.sampled(d, r.cardinality());
        }
        centered = new WeightedCentered(presence, y, w);
    }

    @Benchmark
    public List<BitSet> sampleProbes() {
        return ProbeSampler.draw(d, n, new ProbeRandom(11L));
    }

    @Benchmark
    public PresenceMatrix presenceMatrix() {
        return PresenceMatrix.fromRemoved(removed, d);
    }

    @Benchmark
    public WeightedLeastSquares.Solution ridgeFit() {
        return WeightedLeastSquares.fit(dense, y, w, true, 1.0);
    }

    @Benchmark
    public List<Integer> forwardSelection() {
        return ForwardSelection.select(new WeightedCentered(presence, y, w), centered.target(), 10);
    }

    @Benchmark
    public LarsPath.Path larsSelection() {
        return LarsPath.run(new WeightedCentered(presence, y, w), centered.target(), 10, true);
    }
}
