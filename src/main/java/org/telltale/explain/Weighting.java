package org.telltale.explain;

import java.util.Locale;

/** How probes are weighted in the surrogate fit. */
public enum Weighting {
    /** π = exp(−D²/σ²), D the cosine distance of the probe's presence vector from all-present. */
    COSINE,
    /** The Shapley kernel; the empty and full coalitions enter as exact constraints. */
    SHAPLEY;

    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static Weighting fromKey(String key) {
        for (Weighting w : values()) {
            if (w.key().equals(key.toLowerCase(Locale.ROOT))) {
                return w;
            }
        }
        throw new IllegalArgumentException("unknown weighting '" + key + "' (expected cosine or shapley)");
    }
}
