package org.telltale.explain;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.telltale.model.ClassifierException;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;

/**
 * The probes of one document and the model's scores for them. Each round of new probes goes to
 * the classifier in one call (the connector batches and parallelises); a mask seen before is
 * answered from the cache and never sent twice, and two masks of one round that yield the same
 * text share one call. Texts are not kept across rounds, so memory stays at one round's texts.
 *
 * <p>Not thread-safe: one instance per document.
 */
final class ProbeSet {
    private final String documentId;
    private final TermIndex index;
    private final Masker masker;
    private final TextClassifier classifier;
    private final List<BitSet> rows = new ArrayList<>();
    private final List<Integer> rowScores = new ArrayList<>();
    private final Map<BitSet, Integer> byMask = new HashMap<>();
    private final List<double[]> scores = new ArrayList<>();
    private List<String> labels;
    private long modelNanos;

    ProbeSet(String documentId, TermIndex index, Masker masker, TextClassifier classifier) {
        this.documentId = documentId;
        this.index = index;
        this.masker = masker;
        this.classifier = classifier;
    }

    /** Appends probes (what each removes) and scores the ones not seen before in one call. */
    void add(List<BitSet> removed) {
        List<String> texts = new ArrayList<>();
        List<Integer> pendingRows = new ArrayList<>();
        List<Integer> pendingSlots = new ArrayList<>();
        Map<String, Integer> byText = new HashMap<>();
        for (BitSet mask : removed) {
            int row = rows.size();
            rows.add(mask);
            Integer known = byMask.get(mask);
            if (known == null) {
                String text = masker.mask(index, mask);
                known = byText.get(text);
                if (known == null) {
                    known = -1 - texts.size(); // provisional: the position in this round's call
                    byText.put(text, known);
                    texts.add(text);
                }
                byMask.put(mask, known);
            }
            rowScores.add(known);
            if (known < 0) {
                pendingRows.add(row);
                pendingSlots.add(-1 - known);
            }
        }
        if (texts.isEmpty()) {
            return;
        }
        long start = System.nanoTime();
        ScoreMatrix answer = classifier.score(texts);
        modelNanos += System.nanoTime() - start;
        if (answer.size() != texts.size()) {
            throw new ClassifierException("document " + documentId + ": the model answered " + answer.size()
                    + " rows for " + texts.size() + " texts");
        }
        if (labels == null) {
            labels = answer.labels();
        } else if (!labels.equals(answer.labels())) {
            throw new ClassifierException("document " + documentId + ": the model changed its labels from "
                    + labels + " to " + answer.labels());
        }
        int base = scores.size();
        for (int i = 0; i < texts.size(); i++) {
            scores.add(answer.row(i));
        }
        // Turn this round's provisional slots into cache positions.
        for (int k = 0; k < pendingRows.size(); k++) {
            rowScores.set(pendingRows.get(k), base + pendingSlots.get(k));
        }
        byMask.replaceAll((m, v) -> v < 0 ? base - 1 - v : v);
    }

    int size() {
        return rows.size();
    }

    /** Distinct texts sent to the model so far. */
    int calls() {
        return scores.size();
    }

    List<BitSet> rows() {
        return rows;
    }

    List<String> labels() {
        return labels;
    }

    /** The model's scores for every label on probe {@code row}. */
    double[] scores(int row) {
        return scores.get(rowScores.get(row));
    }

    /** The score of label column {@code label} for every probe, in row order. */
    double[] column(int label) {
        double[] out = new double[rows.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = scores.get(rowScores.get(i))[label];
        }
        return out;
    }

    long modelMillis() {
        return modelNanos / 1_000_000;
    }
}
