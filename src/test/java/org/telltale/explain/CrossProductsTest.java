package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;

/**
 * The cross-product path against a direct computation over the probes (the definitions, common
 * practice) and against Apache Commons Math's OLSMultipleLinearRegression (QR decomposition) as
 * an outside reference.
 */
class CrossProductsTest {
    private static final int N = 600;

    /** Probes of d units, a planted sparse score with an interaction and noise, cosine weights. */
    private record Probes(PresenceMatrix x, double[] y, double[] w) {
    }

    private static Probes probes(int d, long seed) {
        List<BitSet> removed = ProbeSampler.draw(d, N, new ProbeRandom(seed));
        removed.add(0, new BitSet()); // probe 0, the document itself
        PresenceMatrix x = PresenceMatrix.fromRemoved(removed, d);
        ProbeRandom random = new ProbeRandom(seed + 1);
        double[] y = new double[x.rows()];
        double[] w = new double[x.rows()];
        for (int i = 0; i < y.length; i++) {
            double z1 = x.present(i, 1) ? 1 : 0;
            double z4 = x.present(i, 4 % d) ? 1 : 0;
            double z7 = x.present(i, 7 % d) ? 1 : 0;
            y[i] = 40 + 2.5 * z1 - 1.5 * z4 + 0.8 * z4 * z7 + 0.3 * random.nextDouble();
            w[i] = Kernel.cosine(0.25).sampled(d, d - x.presentCount(i));
        }
        return new Probes(x, y, w);
    }

    private static double z(PresenceMatrix x, int i, int j) {
        return x.present(i, j) ? 1.0 : 0.0;
    }

    @Test
    void centredGramCrossAndTotalEqualTheirDefinitionsOverTheProbes() {
        for (int d : new int[] {5, 64, 70, 130}) {
            Probes p = probes(d, d);
            CrossProducts s = CrossProducts.of(p.x(), p.y(), p.w());
            double total = 0;
            double ySum = 0;
            double[] mean = new double[d];
            for (int i = 0; i < p.y().length; i++) {
                total += p.w()[i];
                ySum += p.w()[i] * p.y()[i];
                for (int j = 0; j < d; j++) {
                    mean[j] += p.w()[i] * z(p.x(), i, j);
                }
            }
            double yMean = ySum / total;
            assertEquals(total, s.total, 1e-9 * total);
            assertEquals(yMean, s.yMean(), 1e-12 * Math.abs(yMean));
            double sst = 0;
            for (int i = 0; i < p.y().length; i++) {
                sst += p.w()[i] * (p.y()[i] - yMean) * (p.y()[i] - yMean);
            }
            assertEquals(sst, s.centredTotal(), 1e-9 * sst, "d = " + d);
            for (int a = 0; a < d; a++) {
                assertEquals(mean[a] / total, s.presenceMean(a), 1e-12, "mean " + a);
                double cross = 0;
                for (int i = 0; i < p.y().length; i++) {
                    cross += p.w()[i] * (z(p.x(), i, a) - mean[a] / total) * (p.y()[i] - yMean);
                }
                assertEquals(cross, s.centredCross(a), 1e-9 * Math.max(1, Math.abs(cross)), "cross " + a);
                for (int b = 0; b < d; b += 3) {
                    double g = 0;
                    for (int i = 0; i < p.y().length; i++) {
                        g += p.w()[i] * (z(p.x(), i, a) - mean[a] / total) * (z(p.x(), i, b) - mean[b] / total);
                    }
                    assertEquals(g, s.centredGram(a, b), 1e-9 * Math.max(1, Math.abs(g)), "gram " + a + ", " + b);
                }
            }
        }
    }

    @Test
    void severalWeightingsInOnePassEqualOnePassEach() {
        Probes p = probes(70, 3);
        double[][] weights = new double[3][];
        for (int s = 0; s < 3; s++) {
            weights[s] = new double[p.w().length];
            for (int i = 0; i < p.w().length; i++) {
                weights[s][i] = p.w()[i] * (1 + s * (i % 5));
            }
        }
        CrossProducts[] together = CrossProducts.of(p.x(), p.y(), weights);
        for (int s = 0; s < 3; s++) {
            CrossProducts alone = CrossProducts.of(p.x(), p.y(), weights[s]);
            // The same sums in the same order: the same bits.
            assertEquals(alone.total, together[s].total, 0.0);
            assertEquals(alone.centredTotal(), together[s].centredTotal(), 0.0);
            for (int a = 0; a < 70; a++) {
                assertEquals(alone.centredCross(a), together[s].centredCross(a), 0.0);
                for (int b = 0; b < 70; b++) {
                    assertEquals(alone.centredGram(a, b), together[s].centredGram(a, b), 0.0);
                }
            }
        }
    }

    @Test
    void twoHalvesSharingProbeZeroJoinToTheProductsOfAllProbes() {
        Probes p = probes(45, 21);
        int n = p.y().length;
        int[][] halves = new int[2][];
        for (int h = 0; h < 2; h++) {
            List<Integer> rows = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                if (i == 0 || i % 2 == h) {
                    rows.add(i);
                }
            }
            halves[h] = rows.stream().mapToInt(Integer::intValue).toArray();
        }
        CrossProducts[] parts = new CrossProducts[2];
        for (int h = 0; h < 2; h++) {
            double[] y = new double[halves[h].length];
            double[] w = new double[halves[h].length];
            for (int i = 0; i < y.length; i++) {
                y[i] = p.y()[halves[h][i]];
                w[i] = p.w()[halves[h][i]];
            }
            parts[h] = CrossProducts.of(p.x().rows(halves[h]), y, w);
        }
        CrossProducts joined = CrossProducts.joined(parts[0], parts[1], p.w()[0]);
        CrossProducts all = CrossProducts.of(p.x(), p.y(), p.w());
        assertEquals(all.total, joined.total, 1e-12 * all.total);
        assertEquals(all.centredTotal(), joined.centredTotal(), 1e-9 * all.centredTotal());
        for (int a = 0; a < 45; a++) {
            assertEquals(all.presenceMean(a), joined.presenceMean(a), 1e-12);
            assertEquals(all.centredCross(a), joined.centredCross(a), 1e-9);
            for (int b = 0; b < 45; b++) {
                assertEquals(all.centredGram(a, b), joined.centredGram(a, b), 1e-9);
            }
        }
    }

    @Test
    void residualSquaresEqualTheSumOverTheProbesOfAnySurrogate() {
        Probes p = probes(40, 11);
        CrossProducts s = CrossProducts.of(p.x(), p.y(), p.w());
        int[] units = {3, 1, 17, 39};
        double[] weights = {0.4, 2.2, -1.1, 0.05};
        double intercept = 37.5;
        double sse = 0;
        for (int i = 0; i < p.y().length; i++) {
            double g = intercept;
            for (int j = 0; j < units.length; j++) {
                g += weights[j] * z(p.x(), i, units[j]);
            }
            sse += p.w()[i] * (p.y()[i] - g) * (p.y()[i] - g);
        }
        assertEquals(sse, s.residualSquares(intercept, units, weights), 1e-9 * sse);
    }

    @Test
    void normalEquationsFromCrossProductsGiveCommonsMathsWeightedLeastSquares() {
        // Reference library: Commons Math OLSMultipleLinearRegression (Householder QR), no
        // intercept, on rows scaled by √w with a √w column for the intercept (weighted least
        // squares as ordinary least squares, Draper & Smith §9.2).
        Probes p = probes(60, 5);
        int[] units = {1, 4, 7, 20, 33};
        CrossProducts s = CrossProducts.of(p.x(), p.y(), p.w());
        NormalEquations normal = NormalEquations.of(s, units);
        double[] beta = Cholesky.of(normal.gram(), units.length).solve(normal.cross());
        double intercept = normal.yMean();
        for (int j = 0; j < units.length; j++) {
            intercept -= normal.mean()[j] * beta[j];
        }
        int n = p.y().length;
        double[][] rows = new double[n][units.length + 1];
        double[] target = new double[n];
        for (int i = 0; i < n; i++) {
            double root = Math.sqrt(p.w()[i]);
            rows[i][0] = root;
            for (int j = 0; j < units.length; j++) {
                rows[i][j + 1] = root * z(p.x(), i, units[j]);
            }
            target[i] = root * p.y()[i];
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression(1e-14);
        ols.setNoIntercept(true);
        ols.newSampleData(target, rows);
        double[] reference = ols.estimateRegressionParameters();
        assertEquals(reference[0], intercept, 1e-9);
        for (int j = 0; j < units.length; j++) {
            assertEquals(reference[j + 1], beta[j], 1e-9, "unit " + units[j]);
        }
        assertEquals(ols.calculateResidualSumOfSquares(), s.residualSquares(intercept, units, beta), 1e-8);
        // And the same equations formed from the probes directly.
        NormalEquations direct = NormalEquations.of(designOf(p, 60), units);
        for (int a = 0; a < units.length; a++) {
            assertEquals(direct.cross()[a], normal.cross()[a], 1e-9);
            for (int b = 0; b < units.length; b++) {
                assertEquals(direct.gram()[a * units.length + b], normal.gram()[a * units.length + b], 1e-9);
            }
        }
    }

    @Test
    void forwardSelectionFromCrossProductsChoosesAsOverTheProbesAndAsBruteForceRefits() {
        for (int d : new int[] {12, 70, 130}) {
            Probes p = probes(d, 100 + d);
            WeightedCentered view = new WeightedCentered(p.x(), p.y(), p.w());
            List<Integer> overProbes = ForwardSelection.select(view, view.target(), 8);
            List<Integer> fromProducts = ForwardSelection.select(CrossProducts.of(p.x(), p.y(), p.w()), 8);
            assertEquals(overProbes, fromProducts, "d = " + d);
            if (d == 12) {
                assertEquals(bruteForce(p, d, 6), fromProducts.subList(0, 6));
            }
        }
    }

    /**
     * Forward stepwise selection by its definition (Hastie, Tibshirani &amp; Friedman, The Elements
     * of Statistical Learning, §3.3.2): at each step refit with every remaining column added and
     * keep the one of least weighted residual sum of squares, each refit by Commons Math's QR.
     */
    private static List<Integer> bruteForce(Probes p, int d, int steps) {
        int n = p.y().length;
        List<Integer> chosen = new ArrayList<>();
        for (int step = 0; step < steps; step++) {
            int best = -1;
            double bestRss = Double.POSITIVE_INFINITY;
            for (int j = 0; j < d; j++) {
                if (chosen.contains(j)) {
                    continue;
                }
                List<Integer> cols = new ArrayList<>(chosen);
                cols.add(j);
                double[][] rows = new double[n][cols.size() + 1];
                double[] target = new double[n];
                for (int i = 0; i < n; i++) {
                    double root = Math.sqrt(p.w()[i]);
                    rows[i][0] = root;
                    for (int c = 0; c < cols.size(); c++) {
                        rows[i][c + 1] = root * z(p.x(), i, cols.get(c));
                    }
                    target[i] = root * p.y()[i];
                }
                OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression(1e-14);
                ols.setNoIntercept(true);
                ols.newSampleData(target, rows);
                double rss = ols.calculateResidualSumOfSquares();
                if (rss < bestRss) {
                    bestRss = rss;
                    best = j;
                }
            }
            chosen.add(best);
        }
        return chosen;
    }

    private static SurrogateFit.Design designOf(Probes p, int d) {
        List<BitSet> removed = new ArrayList<>();
        for (int i = 0; i < p.y().length; i++) {
            BitSet r = new BitSet();
            for (int j = 0; j < d; j++) {
                if (!p.x().present(i, j)) {
                    r.set(j);
                }
            }
            removed.add(r);
        }
        SurrogateFit fitter = new SurrogateFit(ExplainSettings.defaults());
        SurrogateFit.Design design = fitter.design(d, removed, p.y(), false, removed.size() - 1);
        return design.reweighted(p.w());
    }
}
