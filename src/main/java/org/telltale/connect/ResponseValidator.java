package org.telltale.connect;

import org.telltale.model.Softmax;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicReference;
import org.telltale.model.ClassifierException;

/**
 * Checks every answer before anyone sees it: one row per text, the same labels as every earlier
 * answer, finite values, and — for probabilities — values in [0, 1] with rows summing to 1 ± 1e-3.
 * Logits pass the finiteness check and then a softmax. A service that names the same labels in
 * another order has its columns put back in the first order; a different label set is an error.
 *
 * <p>Thread-safe: the first answer fixes the labels for the connector's life.
 */
final class ResponseValidator {
    static final double SUM_TOLERANCE = 1e-3;

    private final ScoreKind kind;
    private final AtomicReference<List<String>> labels = new AtomicReference<>();

    ResponseValidator(ScoreKind kind) {
        this.kind = kind;
    }

    /** The labels fixed by the first answer, or null before any. */
    List<String> labels() {
        return labels.get();
    }

    /**
     * Validates one batch's raw answer and returns its rows as probabilities in the fixed label order.
     *
     * @param where names the batch and maps a row to a document for error messages
     */
    double[][] validate(RawScores raw, int expectedRows, BatchPlace where) {
        return validate(raw, expectedRows, where, null);
    }

    /** The score kind this validator reads. */
    ScoreKind kind() {
        return kind;
    }

    /**
     * As {@link #validate(RawScores, int, BatchPlace)}; when the answer is logits and
     * {@code logitsOut} is given, it receives each row's logits in the fixed label order.
     */
    double[][] validate(RawScores raw, int expectedRows, BatchPlace where, double[][] logitsOut) {
        if (raw.rows().length != expectedRows) {
            throw where.error("the model answered " + raw.rows().length + " rows for " + expectedRows + " texts", raw);
        }
        List<String> got = raw.labels();
        if (got.isEmpty()) {
            throw where.error("the model answered no labels", raw);
        }
        if (new HashSet<>(got).size() != got.size()) {
            throw where.error("the model answered duplicate labels " + got, raw);
        }
        labels.compareAndSet(null, List.copyOf(got));
        List<String> fixed = labels.get();
        int[] column = columnMap(fixed, got, where, raw);
        double[][] out = new double[expectedRows][];
        for (int r = 0; r < expectedRows; r++) {
            double[] row = raw.rows()[r];
            if (row == null || row.length != got.size()) {
                throw where.error("the model answered " + (row == null ? 0 : row.length) + " scores for "
                        + where.document(r) + ", not one for each of " + got.size() + " labels", raw);
            }
            double[] ordered = new double[fixed.size()];
            for (int j = 0; j < row.length; j++) {
                double v = row[j];
                if (!Double.isFinite(v)) {
                    throw where.error("the model answered a non-finite score, " + v + ", for " + where.document(r)
                            + " and label '" + got.get(j) + "'", raw);
                }
                ordered[column[j]] = v;
            }
            if (kind == ScoreKind.LOGITS && logitsOut != null) {
                logitsOut[r] = ordered;
            }
            out[r] = kind == ScoreKind.LOGITS ? Softmax.of(ordered) : checkProbabilities(ordered, r, where, raw);
        }
        return out;
    }

    private double[] checkProbabilities(double[] row, int r, BatchPlace where, RawScores raw) {
        double sum = 0;
        for (int j = 0; j < row.length; j++) {
            if (row[j] < 0 || row[j] > 1) {
                throw where.error("the model answered score " + row[j] + " for " + where.document(r) + " and label '" + labels.get().get(j)
                        + "', outside [0, 1] (if the model answers logits, use {scores} logits)", raw);
            }
            sum += row[j];
        }
        if (Math.abs(sum - 1) > SUM_TOLERANCE) {
            throw where.error("the model answered scores for " + where.document(r) + " summing to " + String.format(Locale.ROOT, "%.6f", sum)
                    + ", not 1 ± 1e-3 (if the model answers logits, use {scores} logits)", raw);
        }
        return row;
    }

    private static int[] columnMap(List<String> fixed, List<String> got, BatchPlace where, RawScores raw) {
        if (got.size() != fixed.size() || !new HashSet<>(got).containsAll(fixed)) {
            throw where.error("the model answered labels " + got + " but earlier answers had " + fixed, raw);
        }
        int[] map = new int[got.size()];
        for (int j = 0; j < got.size(); j++) {
            map[j] = fixed.indexOf(got.get(j));
        }
        return map;
    }

    /** Where a batch sits in the caller's list: for naming the batch and the offending document. */
    record BatchPlace(int batch, int offset, int size, List<String> ids, Redactor redactor) {

        String document(int row) {
            int index = offset + row;
            if (ids != null && index < ids.size()) {
                return "document '" + ids.get(index) + "' (index " + index + ")";
            }
            return "document index " + index;
        }

        String name() {
            return "batch " + batch + " (documents " + offset + "–" + (offset + size - 1) + ")";
        }

        ClassifierException error(String what, RawScores raw) {
            return new ClassifierException(redactor.redact(name() + ": " + what
                    + "; response: " + raw.snippet()));
        }
    }
}
