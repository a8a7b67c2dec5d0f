package org.telltale.explain;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Ridge regression on all columns by conjugate gradients on (XᵀX + λI)b = Xᵀy (Hestenes &amp;
 * Stiefel 1952; Golub &amp; Van Loan, Matrix Computations, 4th ed., §11.3). Each iteration costs
 * two passes over the design, O(N·d), and never forms XᵀX; λ > 0 bounds the condition number, so
 * the iteration count stays modest.
 */
final class RidgeGradient {
    static final int MAX_ITERATIONS = 200;
    private static final double TOLERANCE = 1e-10;

    private RidgeGradient() {
    }

    /** The ridge coefficients of every column of {@code x} (already centred and weighted). */
    static double[] solve(Columns x, double[] y, double lambda) {
        int n = x.rows();
        int d = x.columns();
        double[] b = new double[d];
        double[] r = new double[d];
        x.transposeTimes(y, r);
        double[] p = r.clone();
        double[] xp = new double[n];
        double[] ap = new double[d];
        double rr = ForwardSelection.dot(r, r);
        double stop = TOLERANCE * TOLERANCE * Math.max(rr, Double.MIN_NORMAL);
        for (int it = 0; it < MAX_ITERATIONS && rr > stop; it++) {
            x.times(p, xp);
            x.transposeTimes(xp, ap);
            for (int j = 0; j < d; j++) {
                ap[j] += lambda * p[j];
            }
            double alpha = rr / ForwardSelection.dot(p, ap);
            for (int j = 0; j < d; j++) {
                b[j] += alpha * p[j];
                r[j] -= alpha * ap[j];
            }
            double next = ForwardSelection.dot(r, r);
            double beta = next / rr;
            rr = next;
            for (int j = 0; j < d; j++) {
                p[j] = r[j] + beta * p[j];
            }
        }
        return b;
    }

    /** The k columns of largest absolute ridge coefficient, largest first; ties by index. */
    static List<Integer> largest(Columns x, double[] y, double lambda, int k) {
        double[] b = solve(x, y, lambda);
        List<Integer> order = new ArrayList<>(b.length);
        for (int j = 0; j < b.length; j++) {
            order.add(j);
        }
        order.sort(Comparator.<Integer>comparingDouble(j -> -Math.abs(b[j])).thenComparingInt(j -> j));
        return List.copyOf(order.subList(0, Math.min(k, order.size())));
    }
}
