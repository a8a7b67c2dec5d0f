package org.telltale.explain;

/**
 * The design {@code √W (X − 1·mᵀ)} and target {@code √W (y − ȳ)}, with m and ȳ the weighted
 * means, without ever building it: centering in the W-metric removes the intercept, and scaling
 * rows by √w turns weighted least squares into ordinary least squares (common practice; e.g.
 * Draper &amp; Smith, Applied Regression Analysis, §9.2). The selection algorithms run on this view.
 */
public final class WeightedCentered implements Columns {
    private final Columns x;
    private final double[] sqrtW;
    private final double[] means;
    private final double[] target;
    private final double targetMean;
    private final double[] scratch;

    public WeightedCentered(Columns x, double[] y, double[] w) {
        int n = x.rows();
        if (y.length != n || w.length != n) {
            throw new IllegalArgumentException("rows: design " + n + ", target " + y.length + ", weights " + w.length);
        }
        this.x = x;
        this.sqrtW = new double[n];
        double total = 0;
        double ySum = 0;
        for (int i = 0; i < n; i++) {
            if (!(w[i] >= 0) || Double.isInfinite(w[i])) {
                throw new IllegalArgumentException("weight " + w[i] + " at row " + i);
            }
            sqrtW[i] = Math.sqrt(w[i]);
            total += w[i];
            ySum += w[i] * y[i];
        }
        if (!(total > 0)) {
            throw new IllegalArgumentException("all weights are zero");
        }
        this.means = new double[x.columns()];
        x.transposeTimes(w, means);
        for (int j = 0; j < means.length; j++) {
            means[j] /= total;
        }
        this.targetMean = ySum / total;
        this.target = new double[n];
        for (int i = 0; i < n; i++) {
            target[i] = sqrtW[i] * (y[i] - targetMean);
        }
        this.scratch = new double[n];
    }

    @Override
    public int rows() {
        return x.rows();
    }

    @Override
    public int columns() {
        return x.columns();
    }

    /** The centered, √w-scaled target. Do not modify. */
    public double[] target() {
        return target;
    }

    public double targetMean() {
        return targetMean;
    }

    /** The weighted mean of every column. Do not modify. */
    public double[] means() {
        return means;
    }

    @Override
    public void transposeTimes(double[] v, double[] out) {
        double along = 0;
        for (int i = 0; i < scratch.length; i++) {
            scratch[i] = sqrtW[i] * v[i];
            along += scratch[i];
        }
        x.transposeTimes(scratch, out);
        for (int j = 0; j < means.length; j++) {
            out[j] -= means[j] * along;
        }
    }

    @Override
    public void times(double[] b, double[] out) {
        x.times(b, out);
        double shift = 0;
        for (int j = 0; j < means.length; j++) {
            shift += means[j] * b[j];
        }
        for (int i = 0; i < out.length; i++) {
            out[i] = sqrtW[i] * (out[i] - shift);
        }
    }

    /**
     * Row by row over a bit matrix, every column at once: the same products summed in the same
     * order as column by column, so the same bits, without materialising a column.
     */
    @Override
    public void squaredNorms(double[] out) {
        if (!(x instanceof PresenceMatrix bits)) {
            Columns.super.squaredNorms(out);
            return;
        }
        bits.centredSquaredNorms(sqrtW, means, out);
    }

    @Override
    public void column(int j, double[] out) {
        x.column(j, out);
        double m = means[j];
        for (int i = 0; i < out.length; i++) {
            out[i] = sqrtW[i] * (out[i] - m);
        }
    }
}
