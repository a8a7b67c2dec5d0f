package org.telltale.explain;

/** A dense, row-major design matrix; used for small problems and for checks against references. */
public final class DenseColumns implements Columns {
    private final double[][] rows;
    private final int columns;

    public DenseColumns(double[][] rows) {
        this.rows = rows;
        this.columns = rows.length == 0 ? 0 : rows[0].length;
        for (double[] row : rows) {
            if (row.length != columns) {
                throw new IllegalArgumentException("ragged design matrix: " + row.length + " vs " + columns);
            }
        }
    }

    @Override
    public int rows() {
        return rows.length;
    }

    @Override
    public int columns() {
        return columns;
    }

    @Override
    public void transposeTimes(double[] v, double[] out) {
        java.util.Arrays.fill(out, 0, columns, 0.0);
        for (int i = 0; i < rows.length; i++) {
            double vi = v[i];
            if (vi != 0.0) {
                double[] row = rows[i];
                for (int j = 0; j < columns; j++) {
                    out[j] += row[j] * vi;
                }
            }
        }
    }

    @Override
    public void times(double[] b, double[] out) {
        for (int i = 0; i < rows.length; i++) {
            double s = 0;
            double[] row = rows[i];
            for (int j = 0; j < columns; j++) {
                s += row[j] * b[j];
            }
            out[i] = s;
        }
    }

    @Override
    public void column(int j, double[] out) {
        for (int i = 0; i < rows.length; i++) {
            out[i] = rows[i][j];
        }
    }
}
