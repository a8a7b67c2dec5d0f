package org.telltale.explain;

import java.util.Locale;
import org.telltale.EnumKeys;

/**
 * How the number of removed units of a drawn probe is chosen. {@link #UNIFORM} draws it uniformly
 * in 1..d and weights each probe by the kernel; {@link #KERNEL} draws it with probability
 * proportional to the kernel weight of that count and gives every drawn probe the same weight.
 * Both estimate the same weighted fit (the expected normal equations agree up to a constant
 * factor); the second spends no probes on counts the kernel weighs near zero.
 */
public enum Sampling {
    UNIFORM("uniform"),
    KERNEL("kernel");

    private final String key;

    Sampling(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    public static Sampling fromKey(String key) {
        return EnumKeys.parse("sampling", key == null ? null : key.strip().toLowerCase(Locale.ROOT), values(), Sampling::key);
    }
}
