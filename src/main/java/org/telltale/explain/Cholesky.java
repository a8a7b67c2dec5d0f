package org.telltale.explain;

/**
 * The Cholesky factorisation A = L·Lᵀ of a small symmetric positive definite matrix stored
 * row-major in one array (Golub &amp; Van Loan, Matrix Computations, 4th ed., Algorithm 4.2.1),
 * for the K×K normal equations of a surrogate refit. Written out rather than taken from Commons
 * Math so that a refit allocates two arrays, not a matrix object per row and column.
 */
final class Cholesky {
    /** A pivot below this share of the diagonal's largest entry counts as singular. */
    private static final double SINGULAR = 1e-13;

    private final double[] l;
    private final int p;

    private Cholesky(double[] l, int p) {
        this.l = l;
        this.p = p;
    }

    /** The factor of the p×p matrix {@code a} (only its lower triangle is read), or null when not positive definite. */
    static Cholesky of(double[] a, int p) {
        double[] l = new double[p * p];
        double scale = 0;
        for (int j = 0; j < p; j++) {
            scale = Math.max(scale, Math.abs(a[j * p + j]));
        }
        for (int j = 0; j < p; j++) {
            double d = a[j * p + j];
            for (int k = 0; k < j; k++) {
                d -= l[j * p + k] * l[j * p + k];
            }
            if (!(d > SINGULAR * scale)) {
                return null;
            }
            double root = Math.sqrt(d);
            l[j * p + j] = root;
            for (int i = j + 1; i < p; i++) {
                double s = a[i * p + j];
                for (int k = 0; k < j; k++) {
                    s -= l[i * p + k] * l[j * p + k];
                }
                l[i * p + j] = s / root;
            }
        }
        return new Cholesky(l, p);
    }

    /** x with A·x = b. */
    double[] solve(double[] b) {
        double[] x = b.clone();
        for (int i = 0; i < p; i++) {
            double s = x[i];
            for (int k = 0; k < i; k++) {
                s -= l[i * p + k] * x[k];
            }
            x[i] = s / l[i * p + i];
        }
        for (int i = p - 1; i >= 0; i--) {
            double s = x[i];
            for (int k = i + 1; k < p; k++) {
                s -= l[k * p + i] * x[k];
            }
            x[i] = s / l[i * p + i];
        }
        return x;
    }

    /** A⁻¹, row-major. */
    double[] inverse() {
        double[] inv = new double[p * p];
        double[] e = new double[p];
        for (int j = 0; j < p; j++) {
            java.util.Arrays.fill(e, 0);
            e[j] = 1;
            double[] col = solve(e);
            for (int i = 0; i < p; i++) {
                inv[i * p + j] = col[i];
            }
        }
        return inv;
    }

    /** Copies the lower triangle of the p×p matrix {@code g} onto its upper triangle. */
    static void symmetrise(double[] g, int p) {
        for (int a = 0; a < p; a++) {
            for (int b = 0; b < a; b++) {
                g[b * p + a] = g[a * p + b];
            }
        }
    }
}
