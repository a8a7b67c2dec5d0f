package org.telltale.explain;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * Fits the weighted linear surrogate g(z) = b₀ + Σ b_j z_j of the explained target on the probes'
 * presence vectors: kernel weights, selection of K units on the bit matrix, a weighted refit on
 * the K chosen columns, and intervals from the same pass.
 *
 * <p>Under the cosine kernel the refit is weighted ridge regression (λ from the settings; none in
 * exact mode, where the design of all subsets has full rank). Under the Shapley kernel it is
 * weighted least squares subject to g(∅) = f(∅) and g(x) = f(x), solved by eliminating the
 * intercept and one weight. Both are solved from the (K+1)×(K+1) weighted normal equations,
 * accumulated straight from the bit matrix: a 0/1 design centred in the weight metric keeps them
 * well conditioned, and nothing of size N × K is materialised.
 *
 * <p>Intervals: the heteroskedasticity-consistent ("sandwich") covariance of the weighted
 * estimator, A⁻¹ (Σ wᵢ² eᵢ² xᵢxᵢᵀ) A⁻¹ with A the penalised Gram matrix (White 1980, Econometrica
 * 48(4), eq. (3); with the n/(n−p) factor of MacKinnon &amp; White 1985, "HC1"). Probes are
 * independent draws, so this is the sampling covariance of the weights around the weights the fit
 * converges to as probes grow, whatever the misfit of the surrogate — unlike the textbook WLS
 * covariance, which assumes the residuals are noise of variance σ²/wᵢ. The interval is
 * weight ± z·se, widened on one side by the shrinkage the ridge penalty applies at this number
 * of probes (the gap to the unpenalised fit), so it covers the converged weight and always holds
 * its own estimate. The selection step is held fixed: the interval says nothing about it.
 */
final class SurrogateFit {
    private final ExplainSettings settings;
    private final Kernel kernel;
    private final double z;

    SurrogateFit(ExplainSettings settings) {
        this.settings = settings;
        this.kernel = settings.weighting() == Weighting.SHAPLEY ? Kernel.shapley() : Kernel.cosine(settings.bandwidth());
        this.z = new NormalDistribution(null, 0, 1).inverseCumulativeProbability(1 - (1 - settings.level()) / 2);
    }

    Kernel kernel() {
        return kernel;
    }

    /** The normal quantile of the interval level. */
    double z() {
        return z;
    }

    /** The probes as the fit sees them: the weighted rows (constraint probes set apart). */
    static final class Design {
        final int d;
        final PresenceMatrix x;
        final double[] y;
        final double[] w;
        final double full;
        final double empty;
        final boolean exact;
        final boolean shapley;
        private CrossProducts products;

        private Design(int d, PresenceMatrix x, double[] y, double[] w, double full, double empty, boolean exact,
                boolean shapley) {
            this.d = d;
            this.x = x;
            this.y = y;
            this.w = w;
            this.full = full;
            this.empty = empty;
            this.exact = exact;
            this.shapley = shapley;
        }

        int rows() {
            return y.length;
        }

        /** The same probes under other weights (a bandwidth chosen after sampling, {@link BandwidthChoice}). */
        Design reweighted(double[] weights) {
            return new Design(d, x, y, weights, full, empty, exact, shapley);
        }

        /** The design of the given rows only (same weights), in the order given. */
        Design rows(int[] which) {
            double[] sy = new double[which.length];
            double[] sw = new double[which.length];
            for (int i = 0; i < which.length; i++) {
                sy[i] = y[which[i]];
                sw[i] = w[which[i]];
            }
            return new Design(d, x.rows(which), sy, sw, full, empty, exact, shapley);
        }

        /** As {@link #reweighted(double[])}, with the cross-products already gathered under those weights. */
        Design reweighted(double[] weights, CrossProducts gathered) {
            Design out = reweighted(weights);
            out.products = gathered;
            return out;
        }

        /** Whether fits on this design work from its cross-products ({@link CrossProducts#MAX_UNITS}). */
        boolean fitsFromCrossProducts() {
            return d <= CrossProducts.MAX_UNITS;
        }

        /** The design's cross-products, gathered on first use and kept (one pass over the removed units). */
        CrossProducts crossProducts() {
            if (products == null) {
                products = CrossProducts.of(x, y, w);
            }
            return products;
        }
    }

    /**
     * @param removed what each probe removed; row 0 is the original (nothing removed)
     * @param y       the explained target for each probe
     * @param exact   every subset enumerated once
     * @param draws   the number of drawn probes exact mode stands for (ignored unless exact)
     */
    Design design(int d, List<BitSet> removed, double[] y, boolean exact, int draws) {
        boolean shapley = settings.weighting() == Weighting.SHAPLEY;
        boolean matched = !exact && settings.sampling() == Sampling.KERNEL;
        double drawnWeight = matched ? ProbeSampler.meanWeight(kernel, d) : Double.NaN;
        List<BitSet> rows = new ArrayList<>(removed.size());
        double[] fy = new double[removed.size()];
        double[] fw = new double[removed.size()];
        double full = y[0];
        double empty = Double.NaN;
        int n = 0;
        for (int i = 0; i < removed.size(); i++) {
            int k = removed.get(i).cardinality();
            if (kernel.constrains(d, k)) {
                if (k == d) {
                    empty = y[i];
                }
                continue;
            }
            rows.add(removed.get(i));
            fy[n] = y[i];
            fw[n] = exact ? kernel.exact(d, k, draws) : matched && k > 0 ? drawnWeight : kernel.sampled(d, k);
            n++;
        }
        if (shapley && Double.isNaN(empty)) {
            throw new IllegalStateException("a Shapley fit needs the probe that removes every unit");
        }
        return new Design(d, PresenceMatrix.fromRemoved(rows, d), java.util.Arrays.copyOf(fy, n),
                java.util.Arrays.copyOf(fw, n), full, empty, exact, shapley);
    }

    /** Design, selection of {@code k} units (every unit for {@link ExplainSettings#ALL_UNITS}) and refit. */
    Surrogate fit(int d, List<BitSet> removed, double[] y, boolean exact, int draws) {
        Design design = design(d, removed, y, exact, draws);
        return fitUnits(design, select(design, settings.words()));
    }

    /** The selected feature indexes, in selection order: at most {@code k}, every unit when k ≥ d. */
    int[] select(Design design, int k) {
        int d = design.d;
        if (k >= d || design.rows() == 0) {
            int[] all = new int[d];
            for (int j = 0; j < d; j++) {
                all[j] = j;
            }
            return all;
        }
        double[] target = design.y;
        if (design.shapley) {
            target = design.y.clone();
            for (int i = 0; i < target.length; i++) {
                target[i] -= design.empty;
            }
        }
        if (settings.select() == Selection.FORWARD && design.fitsFromCrossProducts()) {
            // Centring removes any constant taken off the target, so the Shapley fit's y − f(∅) selects as y does.
            return ForwardSelection.select(design.crossProducts(), k).stream().mapToInt(Integer::intValue).toArray();
        }
        WeightedCentered view = new WeightedCentered(design.x, target, design.w);
        List<Integer> chosen = switch (settings.select()) {
            case FORWARD -> ForwardSelection.select(view, view.target(), k);
            case LASSO -> LarsPath.run(view, view.target(), k, true).active();
        };
        return chosen.stream().mapToInt(Integer::intValue).toArray();
    }

    /** The refit on the given units, with intervals; exact designs get zero-width intervals. */
    Surrogate fitUnits(Design design, int[] units) {
        double lambda = design.exact || design.shapley ? 0.0 : settings.ridge();
        Solved s = design.shapley ? constrained(design, units) : ridge(design, units, lambda, true);
        int p = units.length;
        double[] low = new double[p];
        double[] high = new double[p];
        double[] se = new double[p];
        for (int j = 0; j < p; j++) {
            se[j] = design.exact ? 0.0 : Math.sqrt(Math.max(0, s.variance[j]));
            double unpenalised = design.exact ? s.weights[j] : s.unpenalised[j];
            low[j] = Math.min(s.weights[j], unpenalised) - z * se[j];
            high[j] = Math.max(s.weights[j], unpenalised) + z * se[j];
        }
        double prediction = s.intercept;
        for (double b : s.weights) {
            prediction += b;
        }
        return new Surrogate(units, s.intercept, s.weights, low, high, se, prediction, s.r2, design.rows());
    }

    /**
     * The refit's intercept and weights on the given units, as {@link #fitUnits} computes them,
     * without the second pass over the probes for intervals and R² (those are NaN): what scoring
     * held-out probes needs ({@link BandwidthChoice}).
     */
    Surrogate pointFit(Design design, int[] units) {
        if (design.shapley) {
            return fitUnits(design, units);
        }
        double lambda = design.exact ? 0.0 : settings.ridge();
        Solved s = ridge(design, units, lambda, false);
        double[] none = new double[units.length];
        java.util.Arrays.fill(none, Double.NaN);
        double prediction = s.intercept;
        for (double b : s.weights) {
            prediction += b;
        }
        return new Surrogate(units, s.intercept, s.weights, none, none, none, prediction, Double.NaN, design.rows());
    }

    /** The result of one refit before intervals are formed. */
    private record Solved(double intercept, double[] weights, double[] unpenalised, double[] variance, double r2) {
    }

    /**
     * Weighted ridge on the chosen columns, centred in the weight metric; the intercept is not
     * penalised. Without {@code intervals}, only the intercept and weights are computed.
     */
    private static Solved ridge(Design design, int[] units, double lambda, boolean intervals) {
        int n = design.rows();
        int p = units.length;
        PresenceMatrix x = design.x;
        double[] w = design.w;
        double[] y = design.y;
        NormalEquations normal = design.fitsFromCrossProducts() ? NormalEquations.of(design.crossProducts(), units)
                : NormalEquations.of(design, units);
        double total = normal.total();
        if (!(total > 0)) {
            return new Solved(0, new double[p], new double[p], new double[p], 1.0);
        }
        double yMean = normal.yMean();
        double[] mean = normal.mean();
        double[] g = normal.gram();
        double[] r = normal.cross();
        double[] row = new double[p];
        double[] beta = solveRidge(g, r, p, lambda);
        if (beta == null) {
            lambda = 1e-9 * Math.max(1, total);
            beta = solveRidge(g, r, p, lambda);
        }
        double intercept = yMean;
        for (int j = 0; j < p; j++) {
            intercept -= mean[j] * beta[j];
        }
        if (!intervals) {
            return new Solved(intercept, beta, beta, null, Double.NaN);
        }
        double[] unpenalised = lambda > 0 ? solveRidge(g, r, p, 0) : beta;
        if (unpenalised == null) {
            unpenalised = beta;
        }
        // Second pass: residuals for R² and the meat of the sandwich.
        double[] meat = new double[p * p];
        double ssRes = 0;
        double ssTot = 0;
        int used = 0;
        for (int i = 0; i < n; i++) {
            double wi = w[i];
            if (wi == 0) {
                continue;
            }
            used++;
            centredRow(x, i, units, mean, row);
            double fitted = yMean;
            for (int j = 0; j < p; j++) {
                fitted += beta[j] * row[j];
            }
            double e = y[i] - fitted;
            ssRes += wi * e * e;
            ssTot += wi * (y[i] - yMean) * (y[i] - yMean);
            double s = wi * wi * e * e;
            for (int a = 0; a < p; a++) {
                double va = s * row[a];
                for (int b = 0; b <= a; b++) {
                    meat[a * p + b] += va * row[b];
                }
            }
        }
        Cholesky.symmetrise(meat, p);
        double[] variance = sandwichDiagonal(g, meat, p, lambda, used, p + 1);
        return new Solved(intercept, beta, unpenalised, variance, r2(ssRes, ssTot));
    }

    /**
     * Weighted least squares subject to g(∅) = f(∅) and g(x) = f(x): the intercept is f(∅), and
     * with Δ = f(x) − f(∅) the last weight is Δ minus the others, which leaves an unconstrained
     * fit of y − f(∅) − z_last·Δ on the columns z_i − z_last (Lundberg &amp; Lee 2017, Theorem 2
     * with its two infinite weights as equality constraints). The last weight's variance is
     * 1ᵀ Cov 1 of the others.
     */
    private static Solved constrained(Design design, int[] units) {
        int s = units.length;
        double empty = design.empty;
        double delta = design.full - empty;
        if (s == 0) {
            return new Solved(empty, new double[0], new double[0], new double[0], r2Constant(design, empty));
        }
        if (s == 1) {
            double[] one = {delta};
            return new Solved(empty, one, one, new double[1], r2Of(design, units, empty, one));
        }
        int n = design.rows();
        int q = s - 1;
        int lastUnit = units[q];
        PresenceMatrix x = design.x;
        double[] g = new double[q * q];
        double[] r = new double[q];
        double[] row = new double[q];
        for (int i = 0; i < n; i++) {
            double wi = design.w[i];
            if (wi == 0) {
                continue;
            }
            double t = reducedRow(x, i, units, lastUnit, design.y[i], empty, delta, row);
            for (int a = 0; a < q; a++) {
                double va = wi * row[a];
                r[a] += va * t;
                for (int b = 0; b <= a; b++) {
                    g[a * q + b] += va * row[b];
                }
            }
        }
        Cholesky.symmetrise(g, q);
        double lambda = 0;
        double[] phi = solveRidge(g, r, q, 0);
        if (phi == null) {
            lambda = 1e-9;
            phi = solveRidge(g, r, q, lambda);
        }
        double[] meat = new double[q * q];
        int used = 0;
        for (int i = 0; i < n; i++) {
            double wi = design.w[i];
            if (wi == 0) {
                continue;
            }
            used++;
            double t = reducedRow(x, i, units, lastUnit, design.y[i], empty, delta, row);
            double e = t;
            for (int a = 0; a < q; a++) {
                e -= phi[a] * row[a];
            }
            double sq = wi * wi * e * e;
            for (int a = 0; a < q; a++) {
                double va = sq * row[a];
                for (int b = 0; b <= a; b++) {
                    meat[a * q + b] += va * row[b];
                }
            }
        }
        Cholesky.symmetrise(meat, q);
        double[] cov = sandwich(g, meat, q, lambda, used, q);
        double[] weights = new double[s];
        double[] variance = new double[s];
        double sum = 0;
        double lastVariance = 0;
        for (int a = 0; a < q; a++) {
            weights[a] = phi[a];
            sum += phi[a];
            variance[a] = cov[a * q + a];
            for (int b = 0; b < q; b++) {
                lastVariance += cov[a * q + b];
            }
        }
        weights[q] = delta - sum;
        variance[q] = lastVariance;
        return new Solved(empty, weights, weights, variance, r2Of(design, units, empty, weights));
    }

    private static void centredRow(PresenceMatrix x, int i, int[] units, double[] mean, double[] row) {
        for (int j = 0; j < units.length; j++) {
            row[j] = (x.present(i, units[j]) ? 1.0 : 0.0) - mean[j];
        }
    }

    /** Fills the reduced columns z_j − z_last of row i and returns its reduced target. */
    private static double reducedRow(PresenceMatrix x, int i, int[] units, int lastUnit, double y, double empty,
            double delta, double[] row) {
        double zl = x.present(i, lastUnit) ? 1.0 : 0.0;
        for (int j = 0; j < row.length; j++) {
            row[j] = (x.present(i, units[j]) ? 1.0 : 0.0) - zl;
        }
        return y - empty - zl * delta;
    }

    /** Solves (G + λI) b = r; null when not positive definite. */
    private static double[] solveRidge(double[] g, double[] r, int p, double lambda) {
        double[] a = g.clone();
        for (int j = 0; j < p; j++) {
            a[j * p + j] += lambda;
        }
        Cholesky c = Cholesky.of(a, p);
        return c == null ? null : c.solve(r);
    }

    private static double[] sandwichDiagonal(double[] g, double[] meat, int p, double lambda, int n, int params) {
        double[] cov = sandwich(g, meat, p, lambda, n, params);
        double[] out = new double[p];
        for (int j = 0; j < p; j++) {
            out[j] = cov[j * p + j];
        }
        return out;
    }

    /** A⁻¹ M A⁻¹ · n/(n − params), A = G + λI (White 1980 with the HC1 factor). */
    private static double[] sandwich(double[] g, double[] meat, int p, double lambda, int n, int params) {
        double[] a = g.clone();
        for (int j = 0; j < p; j++) {
            a[j * p + j] += lambda;
        }
        Cholesky c = Cholesky.of(a, p);
        double[] cov = new double[p * p];
        if (c == null || n <= params) {
            java.util.Arrays.fill(cov, Double.POSITIVE_INFINITY);
            return cov;
        }
        double[] inv = c.inverse();
        double[] tmp = new double[p * p];
        for (int i = 0; i < p; i++) {
            for (int k = 0; k < p; k++) {
                double v = inv[i * p + k];
                if (v == 0) {
                    continue;
                }
                for (int j = 0; j < p; j++) {
                    tmp[i * p + j] += v * meat[k * p + j];
                }
            }
        }
        double factor = (double) n / (n - params);
        for (int i = 0; i < p; i++) {
            for (int j = 0; j < p; j++) {
                double s = 0;
                for (int k = 0; k < p; k++) {
                    s += tmp[i * p + k] * inv[k * p + j];
                }
                cov[i * p + j] = s * factor;
            }
        }
        return cov;
    }

    private static double r2(double ssRes, double ssTot) {
        if (ssTot <= 1e-300) {
            return ssRes <= 1e-300 ? 1.0 : 0.0;
        }
        return 1.0 - ssRes / ssTot;
    }

    private static double r2Of(Design design, int[] units, double intercept, double[] weights) {
        double total = 0;
        double mean = 0;
        for (int i = 0; i < design.rows(); i++) {
            total += design.w[i];
            mean += design.w[i] * design.y[i];
        }
        if (total == 0) {
            return 1.0;
        }
        mean /= total;
        double ssRes = 0;
        double ssTot = 0;
        for (int i = 0; i < design.rows(); i++) {
            double g = intercept;
            for (int j = 0; j < units.length; j++) {
                if (design.x.present(i, units[j])) {
                    g += weights[j];
                }
            }
            double wi = design.w[i];
            ssRes += wi * (design.y[i] - g) * (design.y[i] - g);
            ssTot += wi * (design.y[i] - mean) * (design.y[i] - mean);
        }
        return r2(ssRes, ssTot);
    }

    private static double r2Constant(Design design, double value) {
        return r2Of(design, new int[0], value, new double[0]);
    }
}
