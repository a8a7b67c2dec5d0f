package org.telltale.model;

import java.util.Arrays;
import java.util.List;

/**
 * What a classifier answers for a batch: one row of scores per text, in the order the texts were
 * sent, one column per label. Scores are probabilities (rows sum to 1) once a connector has
 * validated and, for logits, normalised them. When the model answered logits (the built-in models
 * always do), {@code logits} keeps them beside the probabilities, row for row: a saturated
 * probability of 1.0 still has a finite, informative logit. Otherwise {@code logits} is null.
 * The matrix keeps copies of the arrays it is given and hands out copies: it is a value.
 */
public record ScoreMatrix(List<String> labels, double[][] rows, double[][] logits) {
    public ScoreMatrix {
        labels = List.copyOf(labels);
        rows = copy(rows);
        logits = logits == null ? null : copy(logits);
        for (double[] row : rows) {
            if (row.length != labels.size()) {
                throw new IllegalArgumentException("row of " + row.length + " scores for " + labels.size() + " labels");
            }
        }
        if (logits != null) {
            if (logits.length != rows.length) {
                throw new IllegalArgumentException(logits.length + " rows of logits for " + rows.length + " rows of scores");
            }
            for (double[] row : logits) {
                if (row.length != labels.size()) {
                    throw new IllegalArgumentException("row of " + row.length + " logits for " + labels.size() + " labels");
                }
            }
        }
    }

    /** Probabilities only. */
    public ScoreMatrix(List<String> labels, double[][] rows) {
        this(labels, rows, null);
    }

    /** A copy of every row of scores. */
    @Override
    public double[][] rows() {
        return copy(rows);
    }

    /** A copy of every row of logits, or {@code null} without them. */
    @Override
    public double[][] logits() {
        return logits == null ? null : copy(logits);
    }

    private static double[][] copy(double[][] rows) {
        double[][] out = new double[rows.length][];
        for (int i = 0; i < rows.length; i++) {
            out[i] = rows[i].clone();
        }
        return out;
    }

    /** True when the model's logits came with its probabilities. */
    public boolean hasLogits() {
        return logits != null;
    }

    /** A copy of one row of logits; only when {@link #hasLogits()}. */
    public double[] logitRow(int row) {
        return logits[row].clone();
    }

    public int size() {
        return rows.length;
    }

    /** The column of {@code label}, or -1 when the classifier has no such label. */
    public int labelIndex(String label) {
        return labels.indexOf(label);
    }

    public double score(int row, int labelIndex) {
        return rows[row][labelIndex];
    }

    /** The label with the highest score in {@code row}; ties go to the first label. */
    public String predicted(int row) {
        double[] r = rows[row];
        int best = 0;
        for (int j = 1; j < r.length; j++) {
            if (r[j] > r[best]) {
                best = j;
            }
        }
        return labels.get(best);
    }

    /** A copy of one row. */
    public double[] row(int row) {
        return rows[row].clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ScoreMatrix m && labels.equals(m.labels) && Arrays.deepEquals(rows, m.rows)
                && Arrays.deepEquals(logits, m.logits);
    }

    @Override
    public int hashCode() {
        return 31 * (31 * labels.hashCode() + Arrays.deepHashCode(rows)) + Arrays.deepHashCode(logits);
    }

    @Override
    public String toString() {
        return "ScoreMatrix[labels=" + labels + ", rows=" + rows.length + (logits == null ? "" : ", with logits") + "]";
    }
}
