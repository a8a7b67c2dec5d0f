package org.telltale.explain;

import java.util.Locale;
import org.telltale.EnumKeys;

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
        return EnumKeys.parse("weighting", key == null ? null : key.strip().toLowerCase(Locale.ROOT), values(), Weighting::key);
    }
}
