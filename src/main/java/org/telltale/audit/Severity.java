package org.telltale.audit;

import java.util.Locale;

/**
 * How urgently a finding needs a reviewer, from {@link #HIGH} down to {@link #LOW}; the rules are
 * in {@link SeverityRules} and docs/audit.md.
 */
public enum Severity {
    HIGH,
    MEDIUM,
    LOW;

    /** The lower-case name used on the command line, in JSON and in reports. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** Whether this severity is at least as severe as {@code other}. */
    public boolean atLeast(Severity other) {
        return ordinal() <= other.ordinal();
    }

    public static Severity fromKey(String key) {
        for (Severity s : values()) {
            if (s.key().equals(key)) {
                return s;
            }
        }
        throw new IllegalArgumentException("unknown severity '" + key + "' (expected high, medium or low)");
    }
}
