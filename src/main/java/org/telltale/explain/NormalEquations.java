package org.telltale.explain;

/**
 * The weighted, centred normal equations of a refit on a few chosen units: Σw, the weighted mean
 * of y and of each chosen presence column, the centred Gram matrix G = Σ w (z − z̄)(z − z̄)ᵀ and
 * the centred products c = Σ w (z − z̄)(y − ȳ). Centring in the weight metric takes the
 * intercept out of the system (common practice; e.g. Draper &amp; Smith, Applied Regression
 * Analysis, §9.2), and the weights solve (G + λI) b = c.
 */
/* Holds the arrays it is built with, not copies: made once per refit and read by it alone. */
record NormalEquations(double total, double yMean, double[] mean, double[] gram, double[] cross) {

    /** From the design's cross-products: no pass over the probes. */
    static NormalEquations of(CrossProducts products, int[] units) {
        double[] mean = new double[units.length];
        for (int j = 0; j < units.length; j++) {
            mean[j] = products.presenceMean(units[j]);
        }
        return new NormalEquations(products.total, products.yMean(), mean, products.centredGram(units),
                products.centredCross(units));
    }

    /** From the probes themselves: two passes over the chosen columns, O(N·p²). */
    static NormalEquations of(SurrogateFit.Design design, int[] units) {
        int n = design.rows();
        int p = units.length;
        PresenceMatrix x = design.x;
        double[] w = design.w;
        double[] y = design.y;
        double total = 0;
        double yMean = 0;
        double[] mean = new double[p];
        for (int i = 0; i < n; i++) {
            double wi = w[i];
            total += wi;
            yMean += wi * y[i];
            for (int j = 0; j < p; j++) {
                if (x.present(i, units[j])) {
                    mean[j] += wi;
                }
            }
        }
        if (!(total > 0)) {
            return new NormalEquations(total, 0, mean, new double[p * p], new double[p]);
        }
        yMean /= total;
        for (int j = 0; j < p; j++) {
            mean[j] /= total;
        }
        double[] g = new double[p * p];
        double[] r = new double[p];
        double[] row = new double[p];
        for (int i = 0; i < n; i++) {
            double wi = w[i];
            if (wi == 0) {
                continue;
            }
            for (int j = 0; j < p; j++) {
                row[j] = (x.present(i, units[j]) ? 1.0 : 0.0) - mean[j];
            }
            double yi = y[i] - yMean;
            for (int a = 0; a < p; a++) {
                double va = wi * row[a];
                r[a] += va * yi;
                for (int b = 0; b <= a; b++) {
                    g[a * p + b] += va * row[b];
                }
            }
        }
        Cholesky.symmetrise(g, p);
        return new NormalEquations(total, yMean, mean, g, r);
    }
}
