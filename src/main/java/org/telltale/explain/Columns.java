package org.telltale.explain;

/**
 * A read-only N×d design matrix seen through the two operations term selection needs: the
 * product {@code Xᵀv} with all columns at once and the materialisation of one column. Selection
 * touches every column only through {@link #transposeTimes}, which is what keeps it at O(N·d) per
 * selected term.
 */
public interface Columns {
    int rows();

    int columns();

    /** {@code out[j] = Σ_i X[i][j]·v[i]} for every column j. */
    void transposeTimes(double[] v, double[] out);

    /** {@code out[i] = Σ_j X[i][j]·b[j]} for every row i. */
    void times(double[] b, double[] out);

    /** Writes column {@code j} into {@code out} (length {@link #rows()}). */
    void column(int j, double[] out);

    /**
     * {@code out[j] = Σ_i X[i][j]²} for every column j, each sum taken over the rows in order, as
     * materialising column j and taking its dot product with itself would.
     */
    default void squaredNorms(double[] out) {
        double[] col = new double[rows()];
        for (int j = 0; j < columns(); j++) {
            column(j, col);
            double s = 0;
            for (double v : col) {
                s += v * v;
            }
            out[j] = s;
        }
    }
}
