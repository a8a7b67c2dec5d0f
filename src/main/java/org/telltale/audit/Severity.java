package org.telltale.audit;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;

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

    /** @throws UnknownKeyException for a name other than {@code high}, {@code medium} or {@code low} */
    public static Severity fromKey(String key) {
        return EnumKeys.parse("severity", key, values(), Severity::key);
    }
}
