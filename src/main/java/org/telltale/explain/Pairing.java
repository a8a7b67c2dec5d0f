package org.telltale.explain;

import java.util.Locale;
import org.telltale.EnumKeys;

/**
 * Whether drawn probes come in antithetic pairs (Hammersley &amp; Morton 1956, "A new Monte Carlo
 * technique: antithetic variates"): two probes whose removals are negatively correlated, so that
 * what one leaves in the other takes out. {@link #NONE} draws every probe independently;
 * {@link #COMPLEMENT} pairs a probe with its complement (the paired sampling of Covert &amp; Lee
 * 2021, "Improving KernelSHAP", AISTATS, valid when the removed-count distribution is symmetric,
 * as the Shapley kernel's is); {@link #DISJOINT} pairs it with a probe that removes as many units,
 * as few of them shared as possible, so each probe keeps its own distribution under any kernel.
 */
public enum Pairing {
    NONE("none"),
    COMPLEMENT("complement"),
    DISJOINT("disjoint");

    private final String key;

    Pairing(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public static Pairing fromKey(String key) {
        return EnumKeys.parse("pairing", key == null ? null : key.strip().toLowerCase(Locale.ROOT), values(), Pairing::key);
    }
}
