package org.telltale.model;

import java.util.Arrays;

/**
 * One document as a sparse row: the vocabulary columns that occur and their values (counts, or
 * transformed counts), columns in increasing order.
 *
 * <p>Not a copying value, on purpose: a built-in model vectorises every probe text into one of
 * these, so the row <em>does not copy</em> the arrays it is given nor the ones it hands out. They
 * are owned by whoever built them, and nobody changes them afterwards (every method here makes a
 * new row). Equality and {@link #toString} go by content, for tests and messages.
 */
public final class SparseCounts {
    private final int[] columns;
    private final double[] values;

    /** A row over {@code columns} and {@code values}, which it keeps as given (not copied). */
    public SparseCounts(int[] columns, double[] values) {
        if (columns.length != values.length) {
            throw new IllegalArgumentException(columns.length + " columns but " + values.length + " values");
        }
        this.columns = columns;
        this.values = values;
    }

    /** The columns that occur, in increasing order; the row's own array, not to be changed. */
    public int[] columns() {
        return columns;
    }

    /** The value of each column in {@link #columns}; the row's own array, not to be changed. */
    public double[] values() {
        return values;
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

    @Override
    public boolean equals(Object o) {
        return o instanceof SparseCounts other && Arrays.equals(columns, other.columns) && Arrays.equals(values, other.values);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.hashCode(columns) + Arrays.hashCode(values);
    }

    @Override
    public String toString() {
        return "SparseCounts[columns=" + Arrays.toString(columns) + ", values=" + Arrays.toString(values) + "]";
    }
}
