package org.telltale.overlap;

/**
 * Two documents that are exact or near duplicates.
 *
 * @param kind        which corpora the documents come from
 * @param first       id of the first document (the train document of a {@link PairKind#TRAIN_TEST} pair)
 * @param second      id of the second document (the test document of a train–test pair)
 * @param similarity  exact Jaccard similarity of their shingle sets (1 for exact duplicates)
 * @param exact       whether their normalised texts are identical
 * @param firstLabel  gold label of the first document, or {@code null}
 * @param secondLabel gold label of the second document, or {@code null}
 */
public record OverlapPair(PairKind kind, String first, String second, double similarity, boolean exact,
                          String firstLabel, String secondLabel) {
    /** Whether both labels agree; {@code null} when either document has no label. */
    public Boolean sameLabel() {
        if (firstLabel == null || secondLabel == null) {
            return null;
        }
        return firstLabel.equals(secondLabel);
    }
}
