package org.telltale.model;

/**
 * One document as a sparse row: the vocabulary columns that occur and their values (counts, or
 * transformed counts), columns in increasing order.
 */
public record SparseCounts(int[] columns, double[] values) {
    public SparseCounts {
        if (columns.length != values.length) {
            throw new IllegalArgumentException(columns.length + " columns but " + values.length + " values");
        }
    }

    public int nonZeros() {
        return columns.length;
    }

    /** The same columns with each value replaced by {@code log(1 + value)}. */
    public SparseCounts log1p() {
        double[] v = new double[values.length];
        for (int k = 0; k < v.length; k++) {
            v[k] = Math.log1p(values[k]);
        }
        return new SparseCounts(columns, v);
    }

    /** The sum of the values, e.g. the number of known tokens. */
    public double total() {
        double s = 0;
        for (double v : values) {
            s += v;
        }
        return s;
    }
}
