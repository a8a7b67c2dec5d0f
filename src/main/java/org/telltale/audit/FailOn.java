package org.telltale.audit;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;

/**
 * The gate of an audit: the least severity of an open artefact that makes the audit fail (exit
 * code 3), or {@link #NEVER}. Every front that runs an audit reads its gate here.
 */
public enum FailOn {
    HIGH(Severity.HIGH),
    MEDIUM(Severity.MEDIUM),
    LOW(Severity.LOW),
    /** No artefact fails the audit. */
    NEVER(null);

    private final Severity least;

    FailOn(Severity least) {
        this.least = least;
    }

    /** The lower-case name used on the command line, in JSON and in reports. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The least severity that fails the audit, or {@code null} for {@link #NEVER}. */
    public Severity least() {
        return least;
    }

    /** @throws UnknownKeyException for a name other than {@code high}, {@code medium}, {@code low} or {@code never} */
    public static FailOn fromKey(String key) {
        return EnumKeys.parse("gate", key, values(), FailOn::key);
    }
}
