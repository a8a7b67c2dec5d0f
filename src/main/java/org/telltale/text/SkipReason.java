package org.telltale.text;

/**
 * Why a corpus record was not turned into a document. Reasons marked {@code bad} stop the read
 * unless {@code --skip-bad} is given; the others (files that are not documents at all) are always
 * passed over, and always counted.
 */
public enum SkipReason {
    INVALID_JSON("invalid JSON", true),
    TOO_DEEP("nested too deeply", true),
    NOT_AN_OBJECT("not a JSON object", true),
    MISSING_TEXT("missing text", true),
    MISTYPED_FIELD("mistyped field", true),
    INVALID_UTF8("invalid UTF-8", true),
    TOO_LONG("too long", true),
    DUPLICATE_ID("duplicate id", true),
    BINARY_FILE("binary file", false),
    NOT_TXT("not a .txt file", false),
    OUTSIDE_LABEL_FOLDER("outside a label folder", false),
    LINK_OUTSIDE("link leading outside the corpus", false),
    BROKEN_LINK("broken link", false),
    LINKED_FOLDER("link to a folder", false),
    HIDDEN("hidden file or folder", false);

    private final String phrase;
    private final boolean bad;

    SkipReason(String phrase, boolean bad) {
        this.phrase = phrase;
        this.bad = bad;
    }

    /** Short words for summaries: "2 invalid JSON, 1 missing text". */
    public String phrase() {
        return phrase;
    }

    /** True when the record is broken (stops the read without skip-bad); false for non-documents. */
    public boolean bad() {
        return bad;
    }
}
