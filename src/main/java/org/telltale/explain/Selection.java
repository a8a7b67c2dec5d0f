package org.telltale.explain;

import java.util.Locale;

/** How the K reported units are chosen before the weighted refit. */
public enum Selection {
    /** {@code none} when there are at most K units, {@code forward} otherwise. */
    AUTO,
    /** Greedy forward selection by residual reduction. */
    FORWARD,
    /** The first K variables to enter the lasso path (K-LASSO). */
    LARS,
    /** The K largest absolute weights of a ridge fit on all units. */
    LARGEST,
    /** Every unit. */
    NONE;

    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static Selection fromKey(String key) {
        for (Selection s : values()) {
            if (s.key().equals(key.toLowerCase(Locale.ROOT))) {
                return s;
            }
        }
        throw new IllegalArgumentException(
                "unknown selection '" + key + "' (expected auto, forward, lars, largest or none)");
    }
}
