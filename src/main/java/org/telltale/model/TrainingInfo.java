package org.telltale.model;

import java.util.Map;
import java.util.TreeMap;

/**
 * Where a built-in model came from, kept in its file so an audit can say what it audited.
 *
 * @param corpus              the corpus file name as given to {@code train}
 * @param corpusSha256        SHA-256 of the corpus file's bytes, lower-case hex
 * @param documents           documents read from the corpus
 * @param trainingDocuments   documents the model was fitted on
 * @param holdoutDocuments    documents kept back for evaluation
 * @param perLabel            documents read, by gold label
 * @param holdout             the fraction asked for with {@code --holdout}
 * @param seed                the seed of the holdout split
 * @param date                when training finished, ISO-8601 in UTC
 */
public record TrainingInfo(
        String corpus,
        String corpusSha256,
        int documents,
        int trainingDocuments,
        int holdoutDocuments,
        Map<String, Integer> perLabel,
        double holdout,
        long seed,
        String date) {
    public TrainingInfo {
        perLabel = Map.copyOf(perLabel);
    }

    /** {@link #perLabel} in label order, for stable output. */
    public Map<String, Integer> perLabelSorted() {
        return new TreeMap<>(perLabel);
    }
}
