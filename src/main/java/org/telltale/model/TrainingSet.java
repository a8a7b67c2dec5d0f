package org.telltale.model;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;

/**
 * The documents a model is fitted on, as sparse count rows over a vocabulary built from these
 * documents alone, with the index of each row's gold label.
 *
 * @param labels     sorted label names
 * @param vocabulary every feature seen in the rows, sorted
 * @param rows       raw counts per document
 * @param labelOf    for each row, its label's index in {@code labels} (copied in and out; read one
 *                   row's with {@link #labelOf(int)})
 */
public record TrainingSet(List<String> labels, Vocabulary vocabulary, List<SparseCounts> rows, int[] labelOf) {
    public TrainingSet {
        labels = List.copyOf(labels);
        rows = List.copyOf(rows);
        labelOf = labelOf.clone();
        if (rows.size() != labelOf.length) {
            throw new IllegalArgumentException(rows.size() + " rows but " + labelOf.length + " labels");
        }
    }

    /** A copy of every row's label index. */
    @Override
    public int[] labelOf() {
        return labelOf.clone();
    }

    /** The label index of row {@code i}. */
    public int labelOf(int i) {
        return labelOf[i];
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof TrainingSet t && labels.equals(t.labels) && vocabulary.terms().equals(t.vocabulary.terms())
                && rows.equals(t.rows) && Arrays.equals(labelOf, t.labelOf);
    }

    @Override
    public int hashCode() {
        return Objects.hash(labels, vocabulary.terms(), rows, Arrays.hashCode(labelOf));
    }

    @Override
    public String toString() {
        return "TrainingSet[labels=" + labels + ", vocabulary=" + vocabulary.size() + " terms, rows=" + rows.size()
                + ", labelOf=" + Arrays.toString(labelOf) + "]";
    }

    /**
     * Builds the set from term counts and gold labels in the same order.
     *
     * @throws IllegalArgumentException when there are no documents or a label is missing
     */
    public static TrainingSet of(List<Map<String, Integer>> counts, List<String> gold) {
        if (counts.isEmpty()) {
            throw new IllegalArgumentException("no training documents");
        }
        if (counts.size() != gold.size()) {
            throw new IllegalArgumentException(counts.size() + " documents but " + gold.size() + " labels");
        }
        Set<String> terms = new LinkedHashSet<>();
        counts.forEach(c -> terms.addAll(c.keySet()));
        Vocabulary vocabulary = Vocabulary.sortedOf(terms);
        List<String> labels = new ArrayList<>(new TreeSet<>(gold));
        Map<String, Integer> labelIndex = new HashMap<>();
        for (int j = 0; j < labels.size(); j++) {
            labelIndex.put(labels.get(j), j);
        }
        List<SparseCounts> rows = new ArrayList<>(counts.size());
        int[] labelOf = new int[counts.size()];
        for (int i = 0; i < counts.size(); i++) {
            rows.add(vocabulary.vectorize(counts.get(i)));
            labelOf[i] = labelIndex.get(gold.get(i));
        }
        return new TrainingSet(labels, vocabulary, rows, labelOf);
    }

    public int size() {
        return rows.size();
    }
}
