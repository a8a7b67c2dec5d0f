package org.telltale;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;

/** Waiting for work handed to a thread pool, so that a worker's failure reaches the caller as itself. */
public final class Futures {
    private Futures() {
    }

    /**
     * The result of {@code future}; a worker's unchecked exception or {@code Error} is rethrown
     * unwrapped (the error handler names it, and an {@code Error} keeps its one-line report).
     *
     * @param waitingFor what the caller waits for, for the message when it is interrupted
     */
    public static <R> R await(Future<R> future, String waitingFor) {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for " + waitingFor, e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException unchecked) {
                throw unchecked;
            }
            if (cause instanceof Error error) {
                throw error;
            }
            throw new IllegalStateException(cause);
        }
    }
}
