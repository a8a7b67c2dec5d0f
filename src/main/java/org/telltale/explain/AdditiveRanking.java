package org.telltale.explain;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Which K units to report when the model is additive in the units: one weighted least-squares fit
 * on every unit, and the K largest of its weights, with units whose weights cannot be told apart
 * taken in the order of the document.
 *
 * <p>Why: a model whose target is a sum of per-unit effects (the log-odds of multinomial naive
 * Bayes are additive in word counts, Manning, Raghavan &amp; Schütze 2008, §13.2) is fitted exactly
 * by the surrogate on all d units, while a fit on K of hundreds of units carries every left-out
 * effect in its residual: its weights are then too noisy to order units whose effects differ by a
 * few hundredths, and another seed reports others. Many words also have <em>identical</em> effects
 * (every word seen once in one class only has the same log-likelihood ratio), and among tied units
 * any choice is as faithful as another; taking the earliest in the document makes it the same
 * choice for every seed instead of the sampling noise's.
 *
 * <p>The fit on all units is taken only when it is affordable and determined (at most
 * {@link #MAX_UNITS} units and at least {@link #PROBES_PER_UNIT} weighted probes per unit) and
 * when it shows the model additive here: it leaves at most {@link #UNEXPLAINED} of the weighted
 * variance of the target unexplained. Otherwise, as on models with interactions, the selection's
 * own choice stands. The fit is unpenalised (the ridge's shrinkage differs from unit to unit with
 * how often each was removed, which would order tied units by the draw), its standard errors are
 * the sandwich of {@link SurrogateFit} (White 1980, HC1), and it is computed from the removed units
 * of each probe, which keeps the Gram matrix's cost at Σ k² for probes removing k units.
 */
final class AdditiveRanking {
    /** The most units a fit on every unit is tried for (its cost grows as d³). */
    static final int MAX_UNITS = 512;
    /** The fewest probes per unit for a fit on every unit. */
    static final int PROBES_PER_UNIT = 4;
    /** The most weighted variance a fit on every unit may leave for the model to count as additive. */
    static final double UNEXPLAINED = 0.001;

    /** How an explanation's notes begin when its weights come from the fit on every unit. */
    static final String NOTE = "the model is additive in the units here";

    private AdditiveRanking() {
    }

    /** The note that says the weights are the units' own effects, from a fit on all {@code d} units. */
    static String note(int d, double r2) {
        return String.format(java.util.Locale.ROOT, "%s (a fit on all %d units leaves %.1g of the weighted"
                + " variance unexplained): each weight is the unit's own effect, and units whose effects cannot be"
                + " told apart are reported in the order of the text", NOTE, d, Math.max(0, 1 - r2));
    }

    /** The fit on every unit: weights (effect of keeping the unit), their standard errors, intercept, g(1) and R². */
    record FullFit(double[] weights, double[] se, double intercept, double prediction, double r2) {
    }

    /**
     * The surrogate on every unit with its K largest weights reported, or null when the model is
     * not additive here or a fit on every unit is not affordable (then the selection's choice
     * stands). Its intercept, prediction g(1) and R² are those of the fit on every unit, so the
     * weights of the units left out are in its prediction; each reported weight is the unit's own
     * effect, not one that also carries the effects of the units left out, as a refit on K units
     * would (which can even turn a weight's sign).
     *
     * @param firstPosition per unit, where it first occurs in the document (ties are taken in this order)
     */
    static Surrogate surrogate(SurrogateFit.Design design, int k, double z, int[] firstPosition) {
        return surrogate(design, k, k, z, firstPosition);
    }

    /**
     * As {@link #surrogate(SurrogateFit.Design, int, double, int[])} for K reported units, with
     * the {@code places} ≥ K largest weights in order: the units after the K-th are the ones the
     * stopping rule compares the reported units with ({@link Separation}); {@link #first} keeps K.
     */
    static Surrogate surrogate(SurrogateFit.Design design, int k, int places, double z, int[] firstPosition) {
        if (design.shapley || design.exact || k >= design.d || design.d > MAX_UNITS
                || design.rows() < PROBES_PER_UNIT * design.d) {
            return null;
        }
        FullFit fit = fit(design, 1 - UNEXPLAINED);
        if (fit == null) {
            return null;
        }
        int[] units = top(fit.weights(), fit.se(), places, z, firstPosition);
        int p = units.length;
        double[] weights = new double[p];
        double[] se = new double[p];
        double[] low = new double[p];
        double[] high = new double[p];
        for (int i = 0; i < p; i++) {
            weights[i] = fit.weights()[units[i]];
            se[i] = fit.se()[units[i]];
            low[i] = weights[i] - z * se[i];
            high[i] = weights[i] + z * se[i];
        }
        return new Surrogate(units, fit.intercept(), weights, low, high, se, fit.prediction(), fit.r2(), design.rows());
    }

    /** The surrogate with only its first k units reported (intercept, prediction and R² stay the fit's on every unit). */
    static Surrogate first(Surrogate s, int k) {
        int p = Math.min(k, s.units().length);
        return new Surrogate(Arrays.copyOf(s.units(), p), s.intercept(), Arrays.copyOf(s.weights(), p),
                Arrays.copyOf(s.low(), p), Arrays.copyOf(s.high(), p), Arrays.copyOf(s.se(), p), s.prediction(),
                s.r2(), s.rows());
    }

    /**
     * The k units with the largest |weight|. Units are sorted by |weight| and cut into runs whose
     * neighbours differ by less than z times the standard error of their difference (or by a
     * rounding error of the largest weight); each run is taken in the order of the document, so a
     * run that the k-th place cuts is filled in that order.
     */
    static int[] top(double[] w, double[] se, int k, double z, int[] firstPosition) {
        int d = w.length;
        Integer[] order = new Integer[d];
        for (int j = 0; j < d; j++) {
            order[j] = j;
        }
        Arrays.sort(order, (a, b) -> {
            int c = Double.compare(Math.abs(w[b]), Math.abs(w[a]));
            return c != 0 ? c : Integer.compare(firstPosition[a], firstPosition[b]);
        });
        double rounding = 1e-9 * (d == 0 ? 0 : Math.abs(w[order[0]]));
        List<Integer> chosen = new ArrayList<>(k);
        int start = 0;
        while (chosen.size() < k && start < d) {
            int end = start + 1;
            while (end < d) {
                int a = order[end - 1];
                int b = order[end];
                double gap = Math.abs(w[a]) - Math.abs(w[b]);
                if (gap > z * Math.sqrt(se[a] * se[a] + se[b] * se[b]) + rounding) {
                    break;
                }
                end++;
            }
            // Within a run the order is the text's, so the first k of more places are the k places.
            List<Integer> run = new ArrayList<>(Arrays.asList(order).subList(start, end));
            run.sort((a, b) -> Integer.compare(firstPosition[a], firstPosition[b]));
            for (int j : run) {
                if (chosen.size() < k) {
                    chosen.add(j);
                }
            }
            start = end;
        }
        return chosen.stream().mapToInt(Integer::intValue).toArray();
    }

    /**
     * The unpenalised weighted fit on every unit, from the units each probe removed: with r the
     * removal indicators (r = 1 − z), the centred Gram matrix is Σ wᵢ rᵢrᵢᵀ − W m mᵀ and the
     * keeping weights are the negated removal weights. Null when the Gram matrix is singular.
     */
    static FullFit fit(SurrogateFit.Design design) {
        return fit(design, Double.NEGATIVE_INFINITY);
    }

    /**
     * As {@link #fit(SurrogateFit.Design)}, or null as soon as its R² falls below {@code leastR2}:
     * the sandwich, a d³ step beside the solve's d³/3, is then not formed.
     */
    static FullFit fit(SurrogateFit.Design design, double leastR2) {
        int n = design.rows();
        int d = design.d;
        double[] w = design.w;
        double[] y = design.y;
        int[][] removed = null;
        double total;
        double yMean;
        double[] mean;
        double[] gram;
        double[] rhs;
        CrossProducts products = design.fitsFromCrossProducts() ? design.crossProducts() : null;
        if (products != null) {
            // The selection's cross-products hold the same Gram matrix: the centred products of the
            // removal indicators equal those of presence, and their products with y are negated.
            total = products.total;
            yMean = products.yMean();
            mean = new double[d];
            gram = new double[d * d];
            rhs = new double[d];
            for (int a = 0; a < d; a++) {
                mean[a] = 1.0 - products.presenceMean(a);
                rhs[a] = -products.centredCross(a);
                for (int b = 0; b < d; b++) {
                    gram[a * d + b] = products.centredGram(a, b);
                }
            }
        } else {
            removed = removedUnits(design);
            total = 0;
            yMean = 0;
            mean = new double[d];
            for (int i = 0; i < n; i++) {
                total += w[i];
                yMean += w[i] * y[i];
                for (int j : removed[i]) {
                    mean[j] += w[i];
                }
            }
            if (!(total > 0)) {
                return null;
            }
            yMean /= total;
            for (int j = 0; j < d; j++) {
                mean[j] /= total;
            }
            gram = centredOuter(removed, w, mean, total, d);
            rhs = new double[d];
            for (int i = 0; i < n; i++) {
                double v = w[i] * (y[i] - yMean);
                for (int j : removed[i]) {
                    rhs[j] += v;
                }
            }
            // Σ wᵢ (rᵢ − m)(yᵢ − ȳ) = Σ wᵢ rᵢ (yᵢ − ȳ), since Σ wᵢ (yᵢ − ȳ) = 0.
        }
        if (!(total > 0)) {
            return null;
        }
        Cholesky cholesky = Cholesky.of(gram, d);
        if (cholesky == null) {
            return null;
        }
        double[] beta = cholesky.solve(rhs);
        double offset = 0;
        for (int j = 0; j < d; j++) {
            offset += beta[j] * mean[j];
        }
        double prediction = yMean - offset; // g(1): nothing removed
        double[] weights = new double[d];
        double intercept = prediction;
        for (int j = 0; j < d; j++) {
            weights[j] = -beta[j];
            intercept -= weights[j];
        }
        if (products != null) {
            // Most documents are not additive: their R² follows from the cross-products, with no pass.
            double sst = products.centredTotal();
            double quick = sst <= 1e-300 ? 1.0 : 1.0 - products.residualSquares(intercept, allUnits(d), weights) / sst;
            if (!(quick >= leastR2)) {
                return null;
            }
            removed = removedUnits(design);
        }
        double[] s = new double[n];
        double ssRes = 0;
        double ssTot = 0;
        for (int i = 0; i < n; i++) {
            double fitted = prediction;
            for (int j : removed[i]) {
                fitted += beta[j];
            }
            double e = y[i] - fitted;
            ssRes += w[i] * e * e;
            ssTot += w[i] * (y[i] - yMean) * (y[i] - yMean);
            s[i] = w[i] * w[i] * e * e;
        }
        double r2 = ssTot <= 1e-300 ? 1.0 : 1.0 - ssRes / ssTot;
        if (!(r2 >= leastR2)) {
            return null;
        }
        double sTotal = 0;
        for (double v : s) {
            sTotal += v;
        }
        double[] meat = centredOuterCorrected(removed, s, mean, sTotal, d);
        double[] inverse = cholesky.inverse();
        double[] variance = sandwichDiagonal(inverse, meat, d, n);
        double[] se = new double[d];
        for (int j = 0; j < d; j++) {
            se[j] = Math.sqrt(Math.max(0, variance[j]));
        }
        return new FullFit(weights, se, intercept, prediction, r2);
    }

    private static int[] allUnits(int d) {
        int[] all = new int[d];
        for (int j = 0; j < d; j++) {
            all[j] = j;
        }
        return all;
    }

    /** The units each probe removed, probe by probe. */
    private static int[][] removedUnits(SurrogateFit.Design design) {
        int[][] removed = new int[design.rows()][];
        int[] buffer = new int[design.d];
        for (int i = 0; i < removed.length; i++) {
            removed[i] = Arrays.copyOf(buffer, design.x.removedUnits(i, buffer));
        }
        return removed;
    }

    /** Σ vᵢ (rᵢ − m)(rᵢ − m)ᵀ for weights v summing to {@code sum} whose weighted mean of r is m. */
    private static double[] centredOuter(int[][] removed, double[] v, double[] m, double sum, int d) {
        double[] out = outer(removed, v, d);
        for (int a = 0; a < d; a++) {
            for (int b = 0; b < d; b++) {
                out[a * d + b] -= sum * m[a] * m[b];
            }
        }
        return out;
    }

    /** Σ vᵢ (rᵢ − m)(rᵢ − m)ᵀ for any weights v (m is not their mean): expands the products. */
    private static double[] centredOuterCorrected(int[][] removed, double[] v, double[] m, double sum, int d) {
        double[] out = outer(removed, v, d);
        double[] vr = new double[d];
        for (int i = 0; i < removed.length; i++) {
            for (int j : removed[i]) {
                vr[j] += v[i];
            }
        }
        for (int a = 0; a < d; a++) {
            for (int b = 0; b < d; b++) {
                out[a * d + b] += -vr[a] * m[b] - m[a] * vr[b] + sum * m[a] * m[b];
            }
        }
        return out;
    }

    /** Σ vᵢ rᵢrᵢᵀ over the removed units of each probe: Σ kᵢ² operations. */
    private static double[] outer(int[][] removed, double[] v, int d) {
        double[] out = new double[d * d];
        for (int i = 0; i < removed.length; i++) {
            double vi = v[i];
            if (vi == 0) {
                continue;
            }
            int[] r = removed[i];
            for (int x = 0; x < r.length; x++) {
                int base = r[x] * d;
                for (int y = 0; y < r.length; y++) {
                    out[base + r[y]] += vi;
                }
            }
        }
        return out;
    }

    /** diag(A⁻¹ M A⁻¹) · n/(n − d − 1): the HC1 sandwich variances (White 1980; MacKinnon &amp; White 1985). */
    private static double[] sandwichDiagonal(double[] inverse, double[] meat, int d, int n) {
        double[] out = new double[d];
        if (n <= d + 1) {
            Arrays.fill(out, Double.POSITIVE_INFINITY);
            return out;
        }
        double[] row = new double[d];
        double factor = (double) n / (n - d - 1);
        for (int j = 0; j < d; j++) {
            // row = (A⁻¹ M)_j·, then the diagonal entry is row · A⁻¹_·j (A⁻¹ is symmetric).
            Arrays.fill(row, 0);
            for (int k = 0; k < d; k++) {
                double a = inverse[j * d + k];
                if (a == 0) {
                    continue;
                }
                int base = k * d;
                for (int c = 0; c < d; c++) {
                    row[c] += a * meat[base + c];
                }
            }
            double v = 0;
            for (int c = 0; c < d; c++) {
                v += row[c] * inverse[c * d + j];
            }
            out[j] = v * factor;
        }
        return out;
    }
}
