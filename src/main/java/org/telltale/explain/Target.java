package org.telltale.explain;

import java.util.Locale;
import org.telltale.EnumKeys;

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
        return EnumKeys.parse("target", key == null ? null : key.strip().toLowerCase(Locale.ROOT), values(), Target::key);
    }
}
