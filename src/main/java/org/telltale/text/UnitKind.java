package org.telltale.text;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;

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

    /** @throws UnknownKeyException for a name other than {@code word}, {@code occurrence} or {@code line} */
    public static UnitKind fromKey(String key) {
        return EnumKeys.parse("unit", key, values(), UnitKind::key);
    }
}
