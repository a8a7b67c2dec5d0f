package org.telltale.text;

import java.util.Locale;

/** What one explanation feature stands for. */
public enum UnitKind {
    /** One feature per distinct term; masking removes every occurrence of it. */
    WORD,
    /** Each occurrence of a term is a feature of its own. */
    OCCURRENCE,
    /** Each non-blank line is a feature. */
    LINE;

    /** The lower-case name used on the command line and in JSON. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    public static UnitKind fromKey(String key) {
        for (UnitKind kind : values()) {
            if (kind.key().equals(key)) {
                return kind;
            }
        }
        throw new IllegalArgumentException("unknown unit '" + key + "' (expected word, occurrence or line)");
    }
}
