package org.telltale.model;

import java.util.List;

/**
 * The black box Telltale audits: a batch of texts in, a labelled score matrix out. Built-in
 * models, HTTP services, Open Inference Protocol servers and subprocesses all sit behind this one
 * interface, so the explainer never knows what the model is.
 *
 * <p>Implementations must be safe to call from several threads at once; connectors that cannot
 * serve concurrent calls serialise them internally.
 */
public interface TextClassifier extends AutoCloseable {

    /**
     * Scores {@code texts} and returns one row per text, in order.
     *
     * @throws ClassifierException when the model cannot be reached or its answer is invalid
     */
    ScoreMatrix score(List<String> texts);

    /**
     * Scores {@code texts} like {@link #score(List)}; {@code ids} (one per text, or null) name the
     * documents in error messages, e.g. the first document whose scores fail validation.
     */
    default ScoreMatrix score(List<String> texts, List<String> ids) {
        return score(texts);
    }

    /** How many requests this classifier has retried so far (0 for in-process models); for run summaries. */
    default long retries() {
        return 0;
    }

    /**
     * How many requests the connector kept in flight, one line for run summaries (e.g. the level
     * an adaptive limit settled at); empty when that does not apply.
     */
    default String concurrency() {
        return "";
    }

    /** A short description for logs and reports, e.g. the file name or URL; never a secret. */
    String describe();

    /** Releases connections, threads or the subprocess. */
    @Override
    default void close() {
    }
}
