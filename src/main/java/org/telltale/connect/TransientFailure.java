package org.telltale.connect;

import java.time.Duration;

/**
 * A failed request that may succeed when tried again: a timeout, a reset connection, HTTP 429 or
 * 5xx, a subprocess that died. Carries the delay the service asked for (Retry-After), if any, and
 * whether the failure says the service is over capacity (429, 503, a timeout), which makes an
 * adaptive limit back off.
 */
final class TransientFailure extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final transient Duration retryAfter;
    private final Overload overload;

    /** What a failure says about the service's capacity. */
    enum Overload {
        /** Nothing: a reset, a refused connection, a 500, a crash. */
        NONE,
        /** The service refused the request for now: 429 or 503. */
        REJECTED,
        /** No answer within the timeout. */
        TIMED_OUT
    }

    TransientFailure(String message, Duration retryAfter, Throwable cause, Overload overload) {
        super(message, cause);
        this.retryAfter = retryAfter;
        this.overload = overload;
    }

    TransientFailure(String message, Duration retryAfter, Throwable cause) {
        this(message, retryAfter, cause, Overload.NONE);
    }

    TransientFailure(String message) {
        this(message, null, null, Overload.NONE);
    }

    TransientFailure(String message, Throwable cause) {
        this(message, null, cause, Overload.NONE);
    }

    /** The delay the service asked for, or null when it named none. */
    Duration retryAfter() {
        return retryAfter;
    }

    /** Whether, and how, the service signalled it is over capacity: 429, 503 or no answer in time. */
    Overload overload() {
        return overload;
    }
}
