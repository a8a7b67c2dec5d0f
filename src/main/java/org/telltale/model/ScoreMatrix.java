package org.telltale.model;

import java.util.Arrays;
import java.util.List;

/**
 * What a classifier answers for a batch: one row of scores per text, in the order the texts were
 * sent, one column per label. Scores are probabilities (rows sum to 1) once a connector has
 * validated and, for logits, normalised them.
 */
public record ScoreMatrix(List<String> labels, double[][] rows) {
    public ScoreMatrix {
        labels = List.copyOf(labels);
        for (double[] row : rows) {
            if (row.length != labels.size()) {
                throw new IllegalArgumentException("row of " + row.length + " scores for " + labels.size() + " labels");
            }
        }
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
        return o instanceof ScoreMatrix m && labels.equals(m.labels) && Arrays.deepEquals(rows, m.rows);
    }

    @Override
    public int hashCode() {
        return 31 * labels.hashCode() + Arrays.deepHashCode(rows);
    }

    @Override
    public String toString() {
        return "ScoreMatrix[labels=" + labels + ", rows=" + rows.length + "]";
    }
}
