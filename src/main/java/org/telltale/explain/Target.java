package org.telltale.explain;

import java.util.Locale;

/**
 * What the surrogate is fitted to: the explained label's probability, or its log-odds
 * log p(label) − log p(rest). {@link #AUTO} takes log-odds when the model answers logits or when
 * its probabilities are saturated, and the probability otherwise.
 */
public enum Target {
    PROBABILITY("probability"),
    LOG_ODDS("log-odds"),
    AUTO("auto");

    private final String key;

    Target(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public static Target fromKey(String key) {
        for (Target t : values()) {
            if (t.key.equals(key.strip().toLowerCase(Locale.ROOT))) {
                return t;
            }
        }
        throw new IllegalArgumentException("target must be probability, log-odds or auto: " + key);
    }
}
