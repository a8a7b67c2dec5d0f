package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;

class SelectionTest {
    /** Counts how often selection touches the whole design. */
    static final class CountingColumns implements Columns {
        final Columns inner;
        int transposeTimes;
        int times;
        int columns;

        CountingColumns(Columns inner) {
            this.inner = inner;
        }

        @Override
        public int rows() {
            return inner.rows();
        }

        @Override
        public int columns() {
            return inner.columns();
        }

        @Override
        public void transposeTimes(double[] v, double[] out) {
            transposeTimes++;
            inner.transposeTimes(v, out);
        }

        @Override
        public void times(double[] b, double[] out) {
            times++;
            inner.times(b, out);
        }

        @Override
        public void column(int j, double[] out) {
            columns++;
            inner.column(j, out);
        }
    }

    private static final int N = 600;
    private static final int D = 150;

    private static PresenceMatrix design(ProbeRandom r) {
        List<BitSet> removed = new ArrayList<>();
        removed.add(new BitSet());
        removed.addAll(ProbeSampler.draw(D, N - 1, r));
        return PresenceMatrix.fromRemoved(removed, D);
    }

    private static double[] response(PresenceMatrix x, ProbeRandom r) {
        double[] y = new double[N];
        for (int i = 0; i < N; i++) {
            y[i] = 0.3 + 0.05 * (r.nextDouble() - 0.5);
            for (int j = 0; j < 12; j++) {
                if (x.present(i, j * 7)) {
                    y[i] += (j % 2 == 0 ? 1 : -1) * (0.3 - 0.02 * j);
                }
            }
        }
        return y;
    }

    @Test
    void forwardSelectionTouchesTheDesignOncePerChosenTerm() {
        ProbeRandom r = new ProbeRandom(5);
        PresenceMatrix x = design(r);
        double[] w = new double[N];
        java.util.Arrays.fill(w, 1.0);
        WeightedCentered view = new WeightedCentered(x, response(x, r), w);
        CountingColumns counted = new CountingColumns(view);
        int k = 10;
        List<Integer> chosen = ForwardSelection.select(counted, view.target(), k);
        assertEquals(k, chosen.size());
        // O(N·d·K): one full product per step plus one for Xᵀy; one column read per unit for its norm.
        assertEquals(k + 1, counted.transposeTimes);
        assertEquals(D + k, counted.columns);
        assertEquals(0, counted.times);
    }

    @Test
    void larsTouchesTheDesignTwicePerStep() {
        ProbeRandom r = new ProbeRandom(6);
        PresenceMatrix x = design(r);
        double[] w = new double[N];
        java.util.Arrays.fill(w, 1.0);
        WeightedCentered view = new WeightedCentered(x, response(x, r), w);
        CountingColumns counted = new CountingColumns(view);
        LarsPath.Path path = LarsPath.run(counted, view.target(), 10, true);
        assertEquals(10, path.active().size());
        int steps = path.knots().size() - 1;
        assertEquals(1 + 2 * steps, counted.transposeTimes);
        assertTrue(counted.columns <= path.entered().size(), "only entering columns are read");
    }

    @Test
    void forwardSelectionChoosesWhatExplicitRefitsWithCommonsMathChoose() {
        // Reference: the definition of forward selection, evaluated by refitting Commons Math OLS
        // for every candidate at every step (O(N·d²·K), fine at this size).
        ProbeRandom r = new ProbeRandom(7);
        int d = 30;
        int n = 200;
        double[][] x = new double[n][d];
        double[] y = new double[n];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < d; j++) {
                x[i][j] = r.nextDouble() < 0.5 ? 1 : 0;
            }
            y[i] = 2 * x[i][4] - 1.5 * x[i][11] + x[i][20] + 0.7 * x[i][2] * x[i][3] + 0.3 * r.nextDouble();
        }
        double[] w = new double[n];
        java.util.Arrays.fill(w, 1.0);
        WeightedCentered view = new WeightedCentered(new DenseColumns(x), y, w);
        List<Integer> fast = ForwardSelection.select(view, view.target(), 6);
        List<Integer> slow = new ArrayList<>();
        for (int step = 0; step < 6; step++) {
            int best = -1;
            double bestRss = Double.POSITIVE_INFINITY;
            for (int j = 0; j < d; j++) {
                if (slow.contains(j)) {
                    continue;
                }
                List<Integer> cols = new ArrayList<>(slow);
                cols.add(j);
                double[][] sub = new double[n][cols.size()];
                for (int i = 0; i < n; i++) {
                    for (int c = 0; c < cols.size(); c++) {
                        sub[i][c] = x[i][cols.get(c)];
                    }
                }
                OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression();
                ols.newSampleData(y, sub);
                double rss = ols.calculateResidualSumOfSquares();
                if (rss < bestRss) {
                    bestRss = rss;
                    best = j;
                }
            }
            slow.add(best);
        }
        assertEquals(slow, fast);
    }

    @Test
    void largestRidgeAgreesWithTheDirectRidgeSolution() {
        // Reference: WeightedLeastSquares (QR, checked against scikit-learn Ridge) on all columns.
        ProbeRandom r = new ProbeRandom(8);
        PresenceMatrix x = design(r);
        double[] y = response(x, r);
        double[] w = new double[N];
        for (int i = 0; i < N; i++) {
            w[i] = Kernel.cosine(0.25).sampled(D, D - x.presentCount(i));
        }
        WeightedCentered view = new WeightedCentered(x, y, w);
        double[] cg = RidgeGradient.solve(view, view.target(), 1.0);
        double[][] dense = new double[N][D];
        for (int i = 0; i < N; i++) {
            for (int j = 0; j < D; j++) {
                dense[i][j] = x.present(i, j) ? 1 : 0;
            }
        }
        double[] direct = WeightedLeastSquares.fit(dense, y, w, true, 1.0).coefficients();
        for (int j = 0; j < D; j++) {
            assertEquals(direct[j], cg[j], 1e-6, "unit " + j);
        }
    }
}
