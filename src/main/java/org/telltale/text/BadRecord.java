package org.telltale.text;

/**
 * A record a reader could not turn into a document. Readers throw it; {@link CorpusReader}
 * either counts it (skip-bad, or a reason that is never fatal) or turns it into a
 * {@link org.telltale.TelltaleException} whose message names the place.
 */
final class BadRecord extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final SkipReason reason;

    /** @param message names the place first, e.g. {@code tickets.jsonl:17 (id 'T-9'): missing text} */
    BadRecord(SkipReason reason, String message) {
        super(message, null, false, false);
        this.reason = reason;
    }

    SkipReason reason() {
        return reason;
    }
}
