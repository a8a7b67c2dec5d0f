package org.telltale.connect;

import java.util.List;

/**
 * One way of sending a single batch to a model and getting its raw answer back. Implementations
 * throw {@link TransientFailure} for failures worth retrying (timeouts, resets, 429, 5xx, a
 * crashed subprocess) and {@link org.telltale.model.ClassifierException} for the rest. Batching,
 * parallelism, retries and validation are the job of {@link ChunkedClassifier}, not of the scorer.
 */
interface BatchScorer extends AutoCloseable {

    RawScores score(List<String> texts);

    /** Where the model is, for {@code describe()}; never a secret. */
    String describe();

    @Override
    default void close() {
    }
}
