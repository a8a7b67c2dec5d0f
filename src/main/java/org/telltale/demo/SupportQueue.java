package org.telltale.demo;

import java.util.Locale;

/**
 * The queues of the demo scenario: where Quillmoor Broadband, a fictional provider, routes each
 * inbound support message. The weight is the queue's share of the message stream.
 */
public enum SupportQueue {
    BILLING(30),
    OUTAGE(25),
    ACCESS(20),
    RETURNS(15),
    MOVING(10);

    private final int weight;

    SupportQueue(int weight) {
        this.weight = weight;
    }

    /** The gold label written to the corpus. */
    public String label() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Relative share of the message stream, in percent. */
    public int weight() {
        return weight;
    }
}
