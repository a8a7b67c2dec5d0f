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

    /** A short description for logs and reports, e.g. the file name or URL; never a secret. */
    String describe();

    /** Releases connections, threads or the subprocess. */
    @Override
    default void close() {
    }
}
