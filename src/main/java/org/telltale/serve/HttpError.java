package org.telltale.serve;

/** A request the server refuses, with the status and the message the client gets as JSON. */
final class HttpError extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final int status;

    HttpError(int status, String message) {
        super(message, null, false, false);
        this.status = status;
    }

    int status() {
        return status;
    }
}
