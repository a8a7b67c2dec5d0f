package org.telltale.connect;

import java.util.List;

/**
 * One way of sending a single batch to a model and getting its raw answer back. Implementations
 * throw {@link TransientFailure} for failures worth retrying (timeouts, resets, 429, 5xx, a
 * crashed subprocess) and {@link org.telltale.model.ClassifierException} for the rest. Batching,
 * parallelism, retries and validation are the job of {@link ChunkedClassifier}, not of the scorer.
 *
 * <p>A request goes in three steps so that only the middle one holds a place in flight:
 * {@link #prepare} encodes the batch (once, however often it is retried), {@link Exchange#send}
 * talks to the model, {@link Reply#decode} reads the answer after the place is given back.
 */
interface BatchScorer extends AutoCloseable {

    RawScores score(List<String> texts);

    /** Encodes {@code texts} for sending; by default all the work happens in {@link Exchange#send}. */
    default Exchange prepare(List<String> texts) {
        return () -> Reply.of(score(texts), true);
    }

    /** Where the model is, for {@code describe()}; never a secret. */
    String describe();

    @Override
    default void close() {
    }

    /** A prepared request; {@link #send} may be called again to retry it. */
    interface Exchange {
        Reply send();
    }

    /** An answer as received, to be decoded. */
    interface Reply {
        RawScores decode();

        /** False when the latency says nothing of the model's load (e.g. a process had to start first). */
        default boolean measured() {
            return true;
        }

        static Reply of(RawScores raw, boolean measured) {
            return new Reply() {
                @Override
                public RawScores decode() {
                    return raw;
                }

                @Override
                public boolean measured() {
                    return measured;
                }
            };
        }
    }
}
