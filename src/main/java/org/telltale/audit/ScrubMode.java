package org.telltale.audit;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;

/** How a scrub row cut its artefacts out of the documents (docs/audit.md, "Scrub test"). */
public enum ScrubMode {
    /** Whole lines: header field lines and repeated lines, each with its line end. */
    LINES,
    /** Whole matches: every address at a host, every identifier of a shape. */
    MATCHES,
    /** The terms alone, every occurrence: content artefacts. */
    TERMS,
    /** Several of the above at once: the row that removes artefacts of more than one mode. */
    MIXED;

    /** How an artefact of {@code kind} is removed. */
    public static ScrubMode of(ArtefactKind kind) {
        return switch (kind) {
            case HEADER, BOILERPLATE -> LINES;
            case ADDRESS, IDENTIFIER -> MATCHES;
            case CONTENT -> TERMS;
        };
    }

    /** The lower-case name used in JSON and in reports. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** @throws UnknownKeyException for a name other than {@code lines}, {@code matches}, {@code terms} or {@code mixed} */
    public static ScrubMode fromKey(String key) {
        return EnumKeys.parse("scrub mode", key, values(), ScrubMode::key);
    }
}
