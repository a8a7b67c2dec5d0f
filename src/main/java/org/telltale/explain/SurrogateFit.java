package org.telltale.explain;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.BitSet;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.apache.commons.math3.stat.ranking.NaNStrategy;
import org.apache.commons.math3.util.KthSelector;

/**
 * Fits the weighted linear surrogate g(z) = b₀ + Σ b_j z_j of the explained label's score on the
 * probes' presence vectors: kernel weights, selection of K units, a weighted refit on the selected
 * units, and percentile-bootstrap intervals over the probes.
 *
 * <p>Under the cosine kernel the refit is weighted ridge regression (λ from the settings; none in
 * exact mode, where the design of all subsets has full rank). Under the Shapley kernel the refit
 * is weighted least squares subject to the two constraints g(∅) = f(∅) and g(x) = f(x), solved
 * exactly by eliminating the intercept and one weight.
 */
final class SurrogateFit {
    /** Bootstrap work beyond this many multiply-adds is cut by using fewer resamples. */
    private static final double BOOTSTRAP_WORK = 4e8;
    private static final int MIN_RESAMPLES = 20;

    private final ExplainSettings settings;
    private final Kernel kernel;

    SurrogateFit(ExplainSettings settings) {
        this.settings = settings;
        this.kernel = settings.weighting() == Weighting.SHAPLEY ? Kernel.shapley() : Kernel.cosine(settings.bandwidth());
    }

    /**
     * @param removed what each probe removed; row 0 is the original (nothing removed)
     * @param y       the explained label's score for each probe
     * @param draws   the number of drawn probes exact mode stands for (ignored unless exact)
     * @param random  the stream for bootstrap resamples; null for no intervals
     */
    Surrogate fit(int d, List<BitSet> removed, double[] y, boolean exact, int draws, ProbeRandom random) {
        boolean shapley = settings.weighting() == Weighting.SHAPLEY;
        List<BitSet> rows = new ArrayList<>();
        List<Double> ys = new ArrayList<>();
        List<Double> ws = new ArrayList<>();
        double full = y[0];
        double empty = Double.NaN;
        for (int i = 0; i < removed.size(); i++) {
            int k = removed.get(i).cardinality();
            if (kernel.constrains(d, k)) {
                if (k == d) {
                    empty = y[i];
                }
                continue;
            }
            rows.add(removed.get(i));
            ys.add(y[i]);
            ws.add(exact ? kernel.exact(d, k, draws) : kernel.sampled(d, k));
        }
        if (shapley && Double.isNaN(empty)) {
            throw new IllegalStateException("a Shapley fit needs the probe that removes every unit");
        }
        double[] fy = ys.stream().mapToDouble(Double::doubleValue).toArray();
        double[] fw = ws.stream().mapToDouble(Double::doubleValue).toArray();
        PresenceMatrix x = PresenceMatrix.fromRemoved(rows, d);

        int[] units = select(d, x, fy, fw, shapley ? empty : 0.0);
        double[][] design = dense(x, units);
        double lambda = exact || shapley ? 0.0 : settings.ridge();
        Fitted main = shapley ? constrained(design, fy, fw, null, empty, full, 0.0)
                : ridge(design, fy, fw, null, lambda, true);
        if (main == null && shapley) {
            main = constrained(design, fy, fw, null, empty, full, Math.max(settings.ridge(), 1e-9));
        }
        if (main == null) {
            main = ridge(design, fy, fw, null, Math.max(settings.ridge(), 1e-9), true);
        }
        double prediction = main.intercept;
        for (double b : main.weights) {
            prediction += b;
        }
        double r2 = weightedR2(design, fy, fw, main);

        double[] low = main.weights.clone();
        double[] high = main.weights.clone();
        int resamples = 0;
        if (!exact && random != null && settings.bootstrap() > 0 && units.length > 0 && fy.length > 1) {
            int p = units.length + 1;
            int b = (int) Math.min(settings.bootstrap(),
                    Math.max(MIN_RESAMPLES, BOOTSTRAP_WORK / ((double) fy.length * p * p)));
            double[][] draws2 = new double[units.length][b];
            int ok = 0;
            double[] counts = new double[fy.length];
            for (int r = 0; r < b; r++) {
                Arrays.fill(counts, 0);
                for (int i = 0; i < fy.length; i++) {
                    counts[random.nextInt(fy.length)] += 1;
                }
                Fitted f = shapley ? constrained(design, fy, fw, counts, empty, full, 0.0)
                        : ridge(design, fy, fw, counts, lambda, false);
                if (f == null) {
                    continue; // a resample that left a selected unit constant: no estimate from it
                }
                for (int j = 0; j < units.length; j++) {
                    draws2[j][ok] = f.weights[j];
                }
                ok++;
            }
            if (ok >= 2) {
                double alpha = (1 - settings.level()) / 2;
                Percentile percentile = new Percentile().withEstimationType(Percentile.EstimationType.R_7)
                        .withNaNStrategy(NaNStrategy.FAILED).withKthSelector(new KthSelector());
                for (int j = 0; j < units.length; j++) {
                    double[] sample = Arrays.copyOf(draws2[j], ok);
                    low[j] = percentile.evaluate(sample, 100 * alpha);
                    high[j] = percentile.evaluate(sample, 100 * (1 - alpha));
                }
                resamples = ok;
            }
        }
        return new Surrogate(units, main.intercept, main.weights, low, high, prediction, r2, resamples);
    }

    /** The selected feature indexes, in selection order. */
    private int[] select(int d, PresenceMatrix x, double[] y, double[] w, double offset) {
        int k = settings.words();
        Selection s = settings.select();
        if (s == Selection.AUTO) {
            s = d <= k ? Selection.NONE : Selection.FORWARD;
        }
        if (s == Selection.NONE || y.length == 0) {
            int[] all = new int[d];
            for (int j = 0; j < d; j++) {
                all[j] = j;
            }
            return all;
        }
        double[] target = y;
        if (offset != 0.0) {
            target = y.clone();
            for (int i = 0; i < target.length; i++) {
                target[i] -= offset;
            }
        }
        WeightedCentered view = new WeightedCentered(x, target, w);
        List<Integer> chosen = switch (s) {
            case FORWARD -> ForwardSelection.select(view, view.target(), k);
            case LARS -> LarsPath.run(view, view.target(), k, true).active();
            case LARGEST -> RidgeGradient.largest(view, view.target(), Math.max(settings.ridge(), 1e-9), k);
            default -> throw new IllegalStateException(s.toString());
        };
        return chosen.stream().mapToInt(Integer::intValue).toArray();
    }

    private static double[][] dense(PresenceMatrix x, int[] units) {
        double[][] out = new double[x.rows()][units.length];
        for (int i = 0; i < out.length; i++) {
            for (int j = 0; j < units.length; j++) {
                out[i][j] = x.present(i, units[j]) ? 1.0 : 0.0;
            }
        }
        return out;
    }

    private record Fitted(double intercept, double[] weights) {
    }

    /**
     * Weighted ridge on the selected columns; {@code counts} multiplies the weights (a bootstrap
     * resample). QR for the main fit, normal equations for resamples. Null when singular.
     */
    private static Fitted ridge(double[][] x, double[] y, double[] w, double[] counts, double lambda, boolean qr) {
        if (qr) {
            try {
                WeightedLeastSquares.Solution s = WeightedLeastSquares.fit(x, y, w, true, lambda);
                return new Fitted(s.intercept(), s.coefficients());
            } catch (IllegalArgumentException singular) {
                return null;
            }
        }
        int p = x.length == 0 ? 0 : x[0].length;
        double[] beta = normalEquations(x, y, w, counts, lambda, true, p);
        if (beta == null) {
            return null;
        }
        return new Fitted(beta[0], Arrays.copyOfRange(beta, 1, p + 1));
    }

    /**
     * Weighted least squares subject to g(∅) = f(∅) and g(x) = f(x): the intercept is f(∅), and
     * with Δ = f(x) − f(∅) the last weight is Δ minus the others, which leaves an unconstrained
     * fit of y − f(∅) − z_last·Δ on the columns z_i − z_last (Lundberg &amp; Lee 2017, Theorem 2
     * with its two infinite weights as equality constraints).
     */
    private static Fitted constrained(double[][] x, double[] y, double[] w, double[] counts, double empty,
            double full, double lambda) {
        int s = x.length == 0 ? 0 : x[0].length;
        double delta = full - empty;
        if (s == 0) {
            return new Fitted(empty, new double[0]);
        }
        if (s == 1) {
            return new Fitted(empty, new double[] {delta});
        }
        int last = s - 1;
        double[][] reduced = new double[x.length][last];
        double[] target = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            double zl = x[i][last];
            for (int j = 0; j < last; j++) {
                reduced[i][j] = x[i][j] - zl;
            }
            target[i] = y[i] - empty - zl * delta;
        }
        double[] phi;
        if (counts == null) {
            try {
                phi = WeightedLeastSquares.fit(reduced, target, w, false, lambda).coefficients();
            } catch (IllegalArgumentException singular) {
                return null;
            }
        } else {
            phi = normalEquations(reduced, target, w, counts, lambda, false, last);
            if (phi == null) {
                return null;
            }
        }
        double[] weights = Arrays.copyOf(phi, s);
        double sum = 0;
        for (int j = 0; j < last; j++) {
            sum += phi[j];
        }
        weights[last] = delta - sum;
        return new Fitted(empty, weights);
    }

    /** Solves the weighted normal equations with LU; null when (near) singular. */
    private static double[] normalEquations(double[][] x, double[] y, double[] w, double[] counts, double lambda,
            boolean intercept, int p) {
        int off = intercept ? 1 : 0;
        int m = p + off;
        double[][] g = new double[m][m];
        double[] r = new double[m];
        double[] row = new double[m];
        for (int i = 0; i < x.length; i++) {
            double wi = w[i] * (counts == null ? 1.0 : counts[i]);
            if (wi == 0) {
                continue;
            }
            if (intercept) {
                row[0] = 1.0;
            }
            System.arraycopy(x[i], 0, row, off, p);
            for (int a = 0; a < m; a++) {
                double va = wi * row[a];
                if (va == 0) {
                    continue;
                }
                r[a] += va * y[i];
                for (int b = 0; b <= a; b++) {
                    g[a][b] += va * row[b];
                }
            }
        }
        for (int a = 0; a < m; a++) {
            for (int b = 0; b < a; b++) {
                g[b][a] = g[a][b];
            }
            if (a >= off) {
                g[a][a] += lambda;
            }
        }
        RealMatrix gram = new Array2DRowRealMatrix(g, false);
        LUDecomposition lu = new LUDecomposition(gram, 1e-12);
        if (!lu.getSolver().isNonSingular()) {
            return null;
        }
        return lu.getSolver().solve(new ArrayRealVector(r, false)).toArray();
    }

    private static double weightedR2(double[][] x, double[] y, double[] w, Fitted f) {
        double total = 0;
        double mean = 0;
        for (int i = 0; i < y.length; i++) {
            total += w[i];
            mean += w[i] * y[i];
        }
        if (total == 0) {
            return 1.0;
        }
        mean /= total;
        double ssTot = 0;
        double ssRes = 0;
        for (int i = 0; i < y.length; i++) {
            double g = f.intercept;
            for (int j = 0; j < f.weights.length; j++) {
                g += f.weights[j] * x[i][j];
            }
            ssRes += w[i] * (y[i] - g) * (y[i] - g);
            ssTot += w[i] * (y[i] - mean) * (y[i] - mean);
        }
        if (ssTot <= 1e-300) {
            return ssRes <= 1e-300 ? 1.0 : 0.0;
        }
        return 1.0 - ssRes / ssTot;
    }
}
