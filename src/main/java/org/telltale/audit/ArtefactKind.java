package org.telltale.audit;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;

/**
 * Where a term's occurrences sit in the text. Every kind but {@link #CONTENT} marks a place where
 * collection artefacts live rather than the task's evidence. The order is the precedence used when
 * one occurrence fits several places: a host name inside a header block counts as {@code header}.
 */
public enum ArtefactKind {
    /** Inside a leading block of {@code Name: value} lines (RFC 5322 §2.2) or a run of field lines. */
    HEADER,
    /** Part of an e-mail address, URL, host name or IP address. */
    ADDRESS,
    /** Part of a code, ticket or order number, hex id, date or time. */
    IDENTIFIER,
    /** Inside a line repeated verbatim across many documents: signatures, disclaimers, footers. */
    BOILERPLATE,
    /** Anywhere else: the text a reader would call the message. */
    CONTENT;

    /** The lower-case name used on the command line, in JSON and in reports. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** @throws UnknownKeyException for a name other than the five kinds' keys */
    public static ArtefactKind fromKey(String key) {
        return EnumKeys.parse("kind", key, values(), ArtefactKind::key);
    }
}
