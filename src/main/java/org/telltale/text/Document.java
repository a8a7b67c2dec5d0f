package org.telltale.text;

import java.util.Objects;
import java.util.Optional;

/**
 * One text to classify: its id, its text and, where the corpus has one, its gold label.
 *
 * @param id    unique within its corpus; derived from the position when the corpus has no id field
 * @param text  the original text, never rewritten; spans are offsets into it
 * @param label the gold label, or {@code null} when the corpus carries none
 */
public record Document(String id, String text, String label) {
    public Document {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(text, "text");
    }

    /** A document without a gold label. */
    public static Document unlabelled(String id, String text) {
        return new Document(id, text, null);
    }

    public Optional<String> goldLabel() {
        return Optional.ofNullable(label);
    }
}
