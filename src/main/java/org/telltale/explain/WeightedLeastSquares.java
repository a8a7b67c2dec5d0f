package org.telltale.explain;

import java.util.Arrays;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.QRDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularMatrixException;

/**
 * Weighted least squares with an optional ridge penalty on the slopes, solved by Householder QR
 * (Commons Math) of the √w-scaled design with √λ·I rows appended: minimising
 * Σ wᵢ (yᵢ − b₀ − xᵢᵀb)² + λ‖b‖² is ordinary least squares on that augmented system (common
 * practice; Hastie, Tibshirani &amp; Friedman, Elements of Statistical Learning, 2nd ed., ex. 3.12).
 * QR rather than normal equations keeps the condition number from being squared.
 */
public final class WeightedLeastSquares {
    private WeightedLeastSquares() {
    }

    /** Intercept (0 when not fitted) and slopes (copied in and out: one solution per QR fit, beside its O(n·p²)). */
    public record Solution(double intercept, double[] coefficients) {
        public Solution {
            coefficients = coefficients.clone();
        }

        @Override
        public double[] coefficients() {
            return coefficients.clone();
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Solution s && Double.compare(intercept, s.intercept) == 0
                    && Arrays.equals(coefficients, s.coefficients);
        }

        @Override
        public int hashCode() {
            return 31 * Double.hashCode(intercept) + Arrays.hashCode(coefficients);
        }

        @Override
        public String toString() {
            return "Solution[intercept=" + intercept + ", coefficients=" + Arrays.toString(coefficients) + "]";
        }

        /** The fitted value at {@code row}. */
        public double predict(double[] row) {
            double s = intercept;
            for (int j = 0; j < coefficients.length; j++) {
                s += coefficients[j] * row[j];
            }
            return s;
        }
    }

    /**
     * Fits {@code y ≈ b₀ + x·b} with row weights {@code w} (non-negative) and ridge {@code lambda}
     * (0 for plain least squares). The intercept, when asked for, is not penalised.
     *
     * @throws IllegalArgumentException when the weighted design is rank-deficient and lambda is 0
     */
    public static Solution fit(double[][] x, double[] y, double[] w, boolean intercept, double lambda) {
        int n = x.length;
        int p = n == 0 ? 0 : x[0].length;
        int offset = intercept ? 1 : 0;
        int cols = p + offset;
        int extra = lambda > 0 ? p : 0;
        if (cols == 0) {
            return new Solution(0, new double[0]);
        }
        RealMatrix a = new Array2DRowRealMatrix(n + extra, cols);
        double[] b = new double[n + extra];
        for (int i = 0; i < n; i++) {
            double s = Math.sqrt(w[i]);
            if (intercept) {
                a.setEntry(i, 0, s);
            }
            for (int j = 0; j < p; j++) {
                a.setEntry(i, j + offset, s * x[i][j]);
            }
            b[i] = s * y[i];
        }
        double root = Math.sqrt(lambda);
        for (int j = 0; j < extra; j++) {
            a.setEntry(n + j, j + offset, root);
        }
        double[] beta;
        try {
            beta = new QRDecomposition(a, 1e-13).getSolver().solve(new ArrayRealVector(b, false)).toArray();
        } catch (SingularMatrixException e) {
            throw new IllegalArgumentException("the weighted design is rank-deficient (" + n + " rows, " + cols
                    + " columns); use a ridge penalty", e);
        }
        double[] slopes = new double[p];
        System.arraycopy(beta, offset, slopes, 0, p);
        return new Solution(intercept ? beta[0] : 0.0, slopes);
    }
}
