package org.telltale.connect;

import java.time.Duration;

/**
 * A failed request that may succeed when tried again: a timeout, a reset connection, HTTP 429 or
 * 5xx, a subprocess that died. Carries the delay the service asked for (Retry-After), if any.
 */
final class TransientFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient Duration retryAfter;

    TransientFailure(String message, Duration retryAfter, Throwable cause) {
        super(message, cause);
        this.retryAfter = retryAfter;
    }

    TransientFailure(String message) {
        this(message, null, null);
    }

    TransientFailure(String message, Throwable cause) {
        this(message, null, cause);
    }

    /** The delay the service asked for, or null when it named none. */
    Duration retryAfter() {
        return retryAfter;
    }
}
