package org.telltale.model;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * How well predictions match gold labels: the confusion matrix, accuracy and macro-F1, with a
 * plain-text rendering for terminals. Build one with {@link ConfusionCounter}.
 *
 * <p>Macro-F1 is the unweighted mean of the per-label F1 over every label that occurs as a gold
 * label or as a prediction; a label that is never predicted has precision 0, one that never
 * occurs in the gold labels has recall 0 (the conventions of scikit-learn's {@code f1_score}).
 *
 * @param labels the row and column labels: the model's labels, then gold labels it does not know
 * @param counts {@code counts[g][p]}: documents with gold label {@code g} predicted as {@code p}
 */
public record Evaluation(List<String> labels, long[][] counts) {
    public Evaluation {
        labels = List.copyOf(labels);
        long[][] copy = new long[counts.length][];
        for (int i = 0; i < counts.length; i++) {
            if (counts[i].length != labels.size()) {
                throw new IllegalArgumentException("row " + i + " has " + counts[i].length + " cells for "
                        + labels.size() + " labels");
            }
            copy[i] = counts[i].clone();
        }
        if (copy.length != labels.size()) {
            throw new IllegalArgumentException(copy.length + " rows for " + labels.size() + " labels");
        }
        counts = copy;
    }

    /** Quality figures of one label. */
    public record LabelQuality(String label, double precision, double recall, double f1, long support,
            long predicted) {
    }

    public long count(int gold, int predicted) {
        return counts[gold][predicted];
    }

    public long total() {
        long n = 0;
        for (long[] row : counts) {
            for (long v : row) {
                n += v;
            }
        }
        return n;
    }

    public long correct() {
        long n = 0;
        for (int i = 0; i < counts.length; i++) {
            n += counts[i][i];
        }
        return n;
    }

    /** Correct predictions over all; NaN when nothing was counted. */
    public double accuracy() {
        long total = total();
        return total == 0 ? Double.NaN : (double) correct() / total;
    }

    public List<LabelQuality> perLabel() {
        List<LabelQuality> out = new ArrayList<>();
        for (int j = 0; j < labels.size(); j++) {
            long support = 0;
            long predicted = 0;
            for (int k = 0; k < labels.size(); k++) {
                support += counts[j][k];
                predicted += counts[k][j];
            }
            long hit = counts[j][j];
            double precision = predicted == 0 ? 0 : (double) hit / predicted;
            double recall = support == 0 ? 0 : (double) hit / support;
            double f1 = precision + recall == 0 ? 0 : 2 * precision * recall / (precision + recall);
            out.add(new LabelQuality(labels.get(j), precision, recall, f1, support, predicted));
        }
        return out;
    }

    /** Mean F1 over the labels that occur as gold or prediction; NaN when nothing was counted. */
    public double macroF1() {
        double sum = 0;
        int n = 0;
        for (LabelQuality q : perLabel()) {
            if (q.support() > 0 || q.predicted() > 0) {
                sum += q.f1();
                n++;
            }
        }
        return n == 0 ? Double.NaN : sum / n;
    }

    /**
     * A terminal rendering: a summary line, then the matrix with gold labels down and predictions
     * across, recall at the end of each row, precision and F1 under each column.
     */
    public String render() {
        StringBuilder out = new StringBuilder();
        out.append(String.format(Locale.ROOT, "accuracy %.4f (%d of %d)   macro-F1 %.4f%n", accuracy(), correct(),
                total(), macroF1()));
        String corner = "gold \\ predicted";
        int first = corner.length();
        for (String label : labels) {
            first = Math.max(first, label.length());
        }
        int cell = 7;
        for (String label : labels) {
            cell = Math.max(cell, label.length());
        }
        for (long[] row : counts) {
            for (long v : row) {
                cell = Math.max(cell, Long.toString(v).length());
            }
        }
        String firstFormat = "%-" + first + "s";
        String cellFormat = "  %" + cell + "s";
        out.append(String.format(Locale.ROOT, firstFormat, corner));
        for (String label : labels) {
            out.append(String.format(Locale.ROOT, cellFormat, label));
        }
        out.append(String.format(Locale.ROOT, cellFormat, "recall")).append(System.lineSeparator());
        List<LabelQuality> quality = perLabel();
        for (int g = 0; g < labels.size(); g++) {
            out.append(String.format(Locale.ROOT, firstFormat, labels.get(g)));
            for (int p = 0; p < labels.size(); p++) {
                out.append(String.format(Locale.ROOT, cellFormat, counts[g][p]));
            }
            out.append(String.format(Locale.ROOT, cellFormat, fixed(quality.get(g).recall())))
                    .append(System.lineSeparator());
        }
        out.append(String.format(Locale.ROOT, firstFormat, "precision"));
        quality.forEach(q -> out.append(String.format(Locale.ROOT, cellFormat, fixed(q.precision()))));
        out.append(System.lineSeparator());
        out.append(String.format(Locale.ROOT, firstFormat, "F1"));
        quality.forEach(q -> out.append(String.format(Locale.ROOT, cellFormat, fixed(q.f1()))));
        out.append(System.lineSeparator());
        return out.toString();
    }

    private static String fixed(double v) {
        return String.format(Locale.ROOT, "%.3f", v);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Evaluation e && labels.equals(e.labels) && java.util.Arrays.deepEquals(counts, e.counts);
    }

    @Override
    public int hashCode() {
        return 31 * labels.hashCode() + java.util.Arrays.deepHashCode(counts);
    }
}
