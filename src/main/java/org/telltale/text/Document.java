package org.telltale.text;

import java.util.Objects;
import java.util.Optional;

/**
 * One text to classify: its id, its text and, where the corpus has one, its gold label.
 *
 * <p>{@code origin} says where the document came from ({@code tickets.jsonl:17},
 * {@code corpus/billing/0001.txt}) so later errors can name the place. It is provenance, not
 * identity: {@link #equals} and {@link #hashCode} ignore it.
 *
 * @param id     unique within its corpus; derived from the position when the corpus has no id
 * @param text   the original text, never rewritten; spans are offsets into it
 * @param label  the gold label, or {@code null} when the corpus carries none
 * @param origin file and line (or file) the document was read from, or {@code null}
 * @param line   the line of the corpus file where the document's record begins (1-based: the JSON
 *               Lines line, the first line of the CSV record), or 0 when the document is a whole
 *               file or was not read from one; provenance like {@code origin}
 */
public record Document(String id, String text, String label, String origin, long line) {
    public Document {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(text, "text");
        if (line < 0) {
            throw new IllegalArgumentException("line must be 0 (none) or positive: " + line);
        }
    }

    /** A document whose origin names no line of a corpus file. */
    public Document(String id, String text, String label, String origin) {
        this(id, text, label, origin, 0);
    }

    /** A document that was not read from a file. */
    public Document(String id, String text, String label) {
        this(id, text, label, null);
    }

    /** A document without a gold label. */
    public static Document unlabelled(String id, String text) {
        return new Document(id, text, null, null);
    }

    public Optional<String> goldLabel() {
        return Optional.ofNullable(label);
    }

    /** {@code document 'T-17' (tickets.jsonl:17)}, for error messages. */
    public String describe() {
        return origin == null ? "document '" + id + "'" : "document '" + id + "' (" + origin + ")";
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof Document d && id.equals(d.id) && text.equals(d.text) && Objects.equals(label, d.label);
    }

    @Override
    public int hashCode() {
        return Objects.hash(id, text, label);
    }
}
