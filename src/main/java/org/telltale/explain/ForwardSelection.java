package org.telltale.explain;

import java.util.ArrayList;
import java.util.List;

/**
 * Greedy forward selection: at each step add the column that most reduces the residual sum of
 * squares of a least-squares fit on the columns chosen so far (Miller, Subset Selection in
 * Regression, 2nd ed., §3.2).
 *
 * <p>It never forms the d×d Gram matrix. The chosen columns are kept as an orthonormal basis
 * q₁…q_k (classical Gram–Schmidt, re-orthogonalised once: "twice is enough", Kahan as reported by
 * Parlett 1980, analysed by Giraud et al. 2005), and every candidate j carries only its coefficients c_jk = q_kᵀx_j.
 * The gain of candidate j is then (x_jᵀr)² / ‖x_j − Σ c_jk q_k‖², computable from c_j alone;
 * adding one term costs one product Xᵀq, O(N·d), so choosing K terms costs O(N·d·K) time and
 * O(N·K + d·K) memory beyond the design itself.
 */
public final class ForwardSelection {
    /** A candidate whose remaining norm falls below this share of its own norm is collinear. */
    private static final double COLLINEAR = 1e-10;

    private ForwardSelection() {
    }

    /**
     * Chooses up to {@code k} columns of {@code x} to explain {@code y}, in the order chosen. The
     * design is taken as given: centre and weight it first (see {@link WeightedCentered}).
     */
    public static List<Integer> select(Columns x, double[] y, int k) {
        int n = x.rows();
        int d = x.columns();
        int steps = Math.min(k, d);
        double[] norm2 = new double[d];
        double[] col = new double[n];
        x.squaredNorms(norm2);
        double[] xty = new double[d];
        x.transposeTimes(y, xty);

        List<double[]> basis = new ArrayList<>(steps);
        double[] qty = new double[steps];
        double[] explained = new double[d]; // Σ_k c_jk (q_kᵀy)
        double[] removed = new double[d]; // Σ_k c_jk²
        boolean[] chosen = new boolean[d];
        List<Integer> order = new ArrayList<>(steps);

        for (int step = 0; step < steps; step++) {
            int best = mostGain(norm2, removed, xty, explained, chosen);
            if (best < 0) {
                break; // every remaining column is collinear with the chosen ones or constant
            }
            x.column(best, col);
            double[] q = col.clone();
            for (int pass = 0; pass < 2; pass++) {
                for (double[] b : basis) {
                    double c = dot(b, q);
                    for (int i = 0; i < n; i++) {
                        q[i] -= c * b[i];
                    }
                }
            }
            double norm = Math.sqrt(dot(q, q));
            for (int i = 0; i < n; i++) {
                q[i] /= norm;
            }
            double[] c = new double[d]; // c[j] = qᵀx_j, folded into the running sums below
            x.transposeTimes(q, c);
            qty[step] = dot(q, y);
            for (int j = 0; j < d; j++) {
                explained[j] += c[j] * qty[step];
                removed[j] += c[j] * c[j];
            }
            basis.add(q);
            chosen[best] = true;
            order.add(best);
        }
        return order;
    }

    /**
     * The same greedy selection from a design's cross-products, without the probes: O(d·K²) for
     * K steps after the O(Σ k²) pass that gathered them. The coefficients c_jk = q_kᵀx_j of the
     * Gram–Schmidt basis above are the entries of the Cholesky factor of the centred Gram matrix
     * G restricted to the chosen columns and extended to every column (the pivoted, incremental
     * Cholesky factorisation: Golub &amp; Van Loan, Matrix Computations, 4th ed., §4.2.8), so
     * c_j,step = (G_j,best − Σ_{l&lt;step} c_jl c_best,l) / √rest_best and q_stepᵀy =
     * (x_bestᵀy − Σ c_best,l q_lᵀy) / √rest_best; forward stepwise selection in this form is
     * Hastie, Tibshirani &amp; Friedman, The Elements of Statistical Learning, 2nd ed., §3.3.2.
     * Gains, the collinearity test and ties (the lowest column wins) are those of
     * {@link #select(Columns, double[], int)}; the sums differ from it only in rounding.
     */
    static List<Integer> select(CrossProducts x, int k) {
        int d = x.d;
        int steps = Math.min(k, d);
        double[] norm2 = new double[d];
        double[] xty = new double[d];
        for (int j = 0; j < d; j++) {
            norm2[j] = x.centredGram(j, j);
            xty[j] = x.centredCross(j);
        }
        double[][] factor = new double[steps][]; // factor[l][j] = c_jl
        double[] explained = new double[d]; // Σ_l c_jl (q_lᵀy)
        double[] removed = new double[d]; // Σ_l c_jl²
        boolean[] chosen = new boolean[d];
        List<Integer> order = new ArrayList<>(steps);
        for (int step = 0; step < steps; step++) {
            int best = mostGain(norm2, removed, xty, explained, chosen);
            if (best < 0) {
                break;
            }
            double root = Math.sqrt(norm2[best] - removed[best]);
            double qty = (xty[best] - explained[best]) / root;
            double[] c = new double[d];
            for (int j = 0; j < d; j++) {
                double s = x.centredGram(j, best);
                for (int l = 0; l < step; l++) {
                    s -= factor[l][j] * factor[l][best];
                }
                c[j] = s / root;
                explained[j] += c[j] * qty;
                removed[j] += c[j] * c[j];
            }
            factor[step] = c;
            chosen[best] = true;
            order.add(best);
        }
        return order;
    }

    static double dot(double[] a, double[] b) {
        double s = 0;
        for (int i = 0; i < a.length; i++) {
            s += a[i] * b[i];
        }
        return s;
    }

    /**
     * The column not yet chosen whose residual part explains most of y's residual: gain
     * (x_jᵀy − Σ c_jl q_lᵀy)² / (‖x_j‖² − Σ c_jl²). Constant columns and columns collinear with the
     * chosen ones are skipped; on ties the lowest column wins. −1 when none is left.
     */
    private static int mostGain(double[] norm2, double[] removed, double[] xty, double[] explained, boolean[] chosen) {
        int best = -1;
        double bestGain = 0;
        for (int j = 0; j < norm2.length; j++) {
            if (chosen[j] || !(norm2[j] > 0)) {
                continue;
            }
            double rest = norm2[j] - removed[j];
            if (rest <= COLLINEAR * norm2[j]) {
                continue;
            }
            double proj = xty[j] - explained[j];
            double gain = proj * proj / rest;
            if (gain > bestGain) {
                bestGain = gain;
                best = j;
            }
        }
        return best;
    }
}
