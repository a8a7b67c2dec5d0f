package org.telltale.explain;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.CholeskyDecomposition;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.RealMatrix;

/**
 * Least angle regression and its lasso modification (Efron, Hastie, Johnstone &amp; Tibshirani
 * 2004, "Least Angle Regression", Annals of Statistics 32(2), §2 and §3.1): the piecewise-linear
 * path of coefficients from all-zero to the least-squares fit, one knot per variable entering
 * (or, for the lasso, leaving) the active set.
 *
 * <p>Each step needs the correlations Xᵀr and the products Xᵀu with the equiangular direction,
 * both O(N·d), plus a Cholesky solve of the active Gram matrix, O(k³) with k ≤ K active: running
 * the path until K variables are active costs O(N·d·K). No d×d matrix is ever formed.
 */
public final class LarsPath {
    private static final double TINY = 1e-12;

    /**
     * One knot: the largest absolute correlation there and the coefficients of every column (copied
     * in and out: a knot is made once per step of the path, beside an O(N·d) step).
     */
    public record Knot(double correlation, double[] coefficients) {
        public Knot {
            coefficients = coefficients.clone();
        }

        @Override
        public double[] coefficients() {
            return coefficients.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Knot k && Double.compare(correlation, k.correlation) == 0
                    && Arrays.equals(coefficients, k.coefficients);
        }

        @Override
        public int hashCode() {
            return 31 * Double.hashCode(correlation) + Arrays.hashCode(coefficients);
        }

        @Override
        public String toString() {
            return "Knot[correlation=" + correlation + ", coefficients=" + Arrays.toString(coefficients) + "]";
        }
    }

    /** The knots from the all-zero start, and the order in which variables entered. */
    public record Path(List<Knot> knots, List<Integer> entered, List<Integer> active) {
    }

    private LarsPath() {
    }

    /**
     * Runs the path on {@code x} (taken as given: centre and scale it first) until {@code maxActive}
     * variables are active or the least-squares fit is reached.
     *
     * @param lasso drop a variable whose coefficient crosses zero (the lasso path) instead of
     *              letting it change sign (plain LARS)
     */
    public static Path run(Columns x, double[] y, int maxActive, boolean lasso) {
        int n = x.rows();
        int d = x.columns();
        int limit = Math.min(maxActive, Math.min(d, n - 1));
        double[] beta = new double[d];
        double[] residual = y.clone();
        double[] corr = new double[d];
        double[] a = new double[d];
        boolean[] inActive = new boolean[d];
        List<Integer> active = new ArrayList<>();
        List<double[]> activeColumns = new ArrayList<>();
        List<Integer> entered = new ArrayList<>();
        List<Knot> knots = new ArrayList<>();
        int justDropped = -1;
        x.transposeTimes(residual, corr);
        knots.add(new Knot(maxAbs(corr), beta.clone()));
        int first = argMaxAbs(corr, inActive);
        if (limit <= 0 || first < 0 || Math.abs(corr[first]) <= TINY) {
            return new Path(knots, entered, List.copyOf(active));
        }
        addColumn(x, first, active, activeColumns, inActive, entered);
        int fullRank = Math.min(d, n - 1);
        int maxSteps = 8 * d + 8; // the lasso may drop and re-enter variables; this bounds cycling
        for (int step = 0; step < maxSteps; step++) {
            int k = active.size();
            double big = 0;
            for (int j : active) {
                big = Math.max(big, Math.abs(corr[j]));
            }
            if (k == 0 || big <= TINY) {
                break;
            }
            double[] signs = new double[k];
            for (int i = 0; i < k; i++) {
                signs[i] = corr[active.get(i)] < 0 ? -1 : 1;
            }
            RealMatrix gram = new Array2DRowRealMatrix(k, k);
            for (int i = 0; i < k; i++) {
                for (int j = 0; j <= i; j++) {
                    double g = dot(activeColumns.get(i), activeColumns.get(j));
                    gram.setEntry(i, j, g);
                    gram.setEntry(j, i, g);
                }
            }
            DecompositionSolver solver = new CholeskyDecomposition(gram, 1e-14, 1e-14).getSolver();
            double[] gs = solver.solve(new ArrayRealVector(signs, false)).toArray();
            double norm = 1.0 / Math.sqrt(dot(signs, gs)); // A_A of the paper, eq. (2.5)
            double[] w = new double[k];
            for (int i = 0; i < k; i++) {
                w[i] = norm * gs[i];
            }
            double[] u = new double[n]; // the equiangular direction, eq. (2.6)
            for (int i = 0; i < k; i++) {
                double[] column = activeColumns.get(i);
                for (int r = 0; r < n; r++) {
                    u[r] += w[i] * column[r];
                }
            }
            x.transposeTimes(u, a);

            double gamma = big / norm; // all the way to the least-squares fit on the active set
            int entering = -1;
            if (k < fullRank) {
                for (int j = 0; j < d; j++) {
                    if (inActive[j]) {
                        continue;
                    }
                    double g = Math.min(positiveOr((big - corr[j]) / (norm - a[j])),
                            positiveOr((big + corr[j]) / (norm + a[j]))); // eq. (2.13)
                    if (j == justDropped && g < 1e-9 * big / norm) {
                        continue; // its correlation still ties with the active ones: not a new event
                    }
                    if (g < gamma) {
                        gamma = g;
                        entering = j;
                    }
                }
            }
            int dropping = -1;
            if (lasso) {
                for (int i = 0; i < k; i++) {
                    double g = -beta[active.get(i)] / w[i]; // eq. (3.4)-(3.5)
                    if (g > TINY && g < gamma) {
                        gamma = g;
                        dropping = i;
                    }
                }
            }
            for (int i = 0; i < k; i++) {
                beta[active.get(i)] += gamma * w[i];
            }
            for (int r = 0; r < n; r++) {
                residual[r] -= gamma * u[r];
            }
            x.transposeTimes(residual, corr); // recomputed, not updated, to keep rounding in check
            justDropped = -1;
            if (dropping >= 0) {
                int j = active.remove(dropping);
                activeColumns.remove(dropping);
                inActive[j] = false;
                beta[j] = 0;
                justDropped = j;
                knots.add(new Knot(big - gamma * norm, beta.clone()));
            } else if (entering >= 0) {
                knots.add(new Knot(big - gamma * norm, beta.clone()));
                if (active.size() >= maxActive) {
                    break; // asked for no more variables: stop at the knot where the next would enter
                }
                addColumn(x, entering, active, activeColumns, inActive, entered);
            } else {
                knots.add(new Knot(0.0, beta.clone()));
                break; // reached the least-squares fit on the active set
            }
        }
        return new Path(knots, entered, List.copyOf(active));
    }

    private static void addColumn(Columns x, int j, List<Integer> active, List<double[]> columns,
            boolean[] inActive, List<Integer> entered) {
        double[] column = new double[x.rows()];
        x.column(j, column);
        active.add(j);
        columns.add(column);
        inActive[j] = true;
        entered.add(j);
    }

    private static double positiveOr(double g) {
        return g > TINY ? g : Double.POSITIVE_INFINITY;
    }

    private static int argMaxAbs(double[] v, boolean[] skip) {
        int best = -1;
        for (int j = 0; j < v.length; j++) {
            if (!skip[j] && (best < 0 || Math.abs(v[j]) > Math.abs(v[best]))) {
                best = j;
            }
        }
        return best;
    }

    private static double maxAbs(double[] v) {
        return Arrays.stream(v).map(Math::abs).max().orElse(0);
    }

    private static double dot(double[] a, double[] b) {
        return ForwardSelection.dot(a, b);
    }
}
