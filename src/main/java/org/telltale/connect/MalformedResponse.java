package org.telltale.connect;

/**
 * An answer that is not what the protocol says: not JSON, the wrong shape, an error object. Not
 * retried; the message already carries a snippet of the response.
 */
final class MalformedResponse extends RuntimeException {
    private static final long serialVersionUID = 1L;

    MalformedResponse(String message) {
        super(message);
    }
}
