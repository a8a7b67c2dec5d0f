package org.telltale.audit;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;

/** Which documents the scrub test rewrote and scored again. */
public enum ScrubScope {
    /** The explained documents, the stratified sample (the default). */
    EXPLAINED,
    /** The whole corpus (setting {@code scrubAll}). */
    CORPUS;

    /** The scope of an audit that scrubs the whole corpus or only the explained documents. */
    public static ScrubScope of(boolean scrubAll) {
        return scrubAll ? CORPUS : EXPLAINED;
    }

    /** The lower-case name used in JSON and in reports. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** @throws UnknownKeyException for a name other than {@code explained} or {@code corpus} */
    public static ScrubScope fromKey(String key) {
        return EnumKeys.parse("scrub scope", key, values(), ScrubScope::key);
    }
}
