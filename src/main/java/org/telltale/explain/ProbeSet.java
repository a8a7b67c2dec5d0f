package org.telltale.explain;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.telltale.model.ClassifierException;
import org.telltale.model.MaskScorer;
import org.telltale.model.ProbeScoring;
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
    /**
     * A round goes to the model in one call unless its texts would exceed this many characters
     * together; then in calls of as many texts as fit (at least one). A 2,000-probe round of a
     * 5,000-character document is one call; of a 1 MB document, calls of 64 texts.
     */
    static final long MAX_CHARS_PER_CALL = 64L << 20;

    private final String documentId;
    private final TermIndex index;
    private final Masker masker;
    private final TextClassifier classifier;
    private final MaskScorer masks;
    private final List<BitSet> rows = new ArrayList<>();
    private final List<Integer> rowScores = new ArrayList<>();
    private final Map<BitSet, Integer> byMask = new HashMap<>();
    private final List<double[]> scores = new ArrayList<>();
    private final List<double[]> logits = new ArrayList<>();
    private boolean withLogits = true;
    private List<String> labels;
    private long modelNanos;

    private final long maxCharsPerCall;

    ProbeSet(String documentId, TermIndex index, Masker masker, TextClassifier classifier) {
        this(documentId, index, masker, classifier, null, MAX_CHARS_PER_CALL);
    }

    /**
     * @param scoring the model's own scoring of masks, asked to prepare for this document (the
     *                time counts as the model's), or {@code null} to send every probe's text
     */
    ProbeSet(String documentId, TermIndex index, Masker masker, TextClassifier classifier, ProbeScoring scoring) {
        this(documentId, index, masker, classifier, scoring, MAX_CHARS_PER_CALL);
    }

    ProbeSet(String documentId, TermIndex index, Masker masker, TextClassifier classifier, long maxCharsPerCall) {
        this(documentId, index, masker, classifier, null, maxCharsPerCall);
    }

    private ProbeSet(String documentId, TermIndex index, Masker masker, TextClassifier classifier,
            ProbeScoring scoring, long maxCharsPerCall) {
        long start = System.nanoTime();
        this.masks = scoring == null ? null : scoring.prepare(index, masker);
        this.modelNanos = scoring == null ? 0 : System.nanoTime() - start;
        this.maxCharsPerCall = maxCharsPerCall;
        this.documentId = documentId;
        this.index = index;
        this.masker = masker;
        this.classifier = classifier;
    }

    /** Appends probes (what each removes) and scores the ones not seen before. */
    void add(List<BitSet> removed) {
        List<BitSet> fresh = new ArrayList<>();
        for (BitSet mask : removed) {
            rows.add(mask);
            Integer known = byMask.get(mask);
            if (known == null) {
                known = -1 - fresh.size(); // provisional: the position among this round's new masks
                byMask.put(mask, known);
                fresh.add(mask);
            }
            rowScores.add(known);
        }
        if (fresh.isEmpty()) {
            return;
        }
        if (masks != null) {
            long start = System.nanoTime();
            ScoreMatrix answer = masks.score(fresh);
            modelNanos += System.nanoTime() - start;
            int[] slot = new int[fresh.size()];
            for (int k = 0; k < slot.length; k++) {
                slot[k] = scores.size() + k;
            }
            keep(answer, slot.length);
            resolve(slot);
            return;
        }
        int[] slot = new int[fresh.size()];
        int perCall = (int) Math.max(1, Math.min(fresh.size(), maxCharsPerCall / Math.max(1, index.text().length())));
        for (int from = 0; from < fresh.size(); from += perCall) {
            int to = Math.min(fresh.size(), from + perCall);
            // Masked lazily, chunk by chunk, so memory holds one call's texts at most.
            List<String> texts = new ArrayList<>(to - from);
            Map<String, Integer> byText = new HashMap<>();
            for (int k = from; k < to; k++) {
                String text = masker.mask(index, fresh.get(k));
                Integer same = byText.putIfAbsent(text, texts.size());
                slot[k] = scores.size() + (same == null ? texts.size() : same);
                if (same == null) {
                    texts.add(text);
                }
            }
            long start = System.nanoTime();
            ScoreMatrix answer = classifier.score(texts);
            modelNanos += System.nanoTime() - start;
            keep(answer, texts.size());
        }
        resolve(slot);
    }

    /** Checks one answer and keeps its rows after the ones already scored. */
    private void keep(ScoreMatrix answer, int sent) {
        if (answer.size() != sent) {
            throw new ClassifierException("document " + documentId + ": the model answered " + answer.size()
                    + " rows for " + sent + " texts");
        }
        if (labels == null) {
            labels = answer.labels();
        } else if (!labels.equals(answer.labels())) {
            throw new ClassifierException("document " + documentId + ": the model changed its labels from "
                    + labels + " to " + answer.labels());
        }
        // One copy of the answer's rows per batch (a ScoreMatrix hands out copies), kept as they are.
        double[][] rows = answer.rows();
        double[][] answerLogits = answer.logits();
        withLogits &= answer.hasLogits();
        for (int i = 0; i < sent; i++) {
            scores.add(rows[i]);
            logits.add(answerLogits == null ? null : answerLogits[i]);
        }
    }

    /** Points the provisional rows of this round at their scores. */
    private void resolve(int[] slot) {
        for (int i = 0; i < rowScores.size(); i++) {
            int v = rowScores.get(i);
            if (v < 0) {
                rowScores.set(i, slot[-1 - v]);
            }
        }
        byMask.replaceAll((m, v) -> v < 0 ? slot[-1 - v] : v);
    }

    int size() {
        return rows.size();
    }

    /** Distinct texts sent to the model so far (distinct masks, when they are scored without texts). */
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

    /** True when every answer so far came with the model's logits. */
    boolean hasLogits() {
        return withLogits && !scores.isEmpty();
    }

    /** The model's logits on probe {@code row}; only when {@link #hasLogits()}. */
    double[] logits(int row) {
        return logits.get(rowScores.get(row));
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
