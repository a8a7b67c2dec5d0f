package org.telltale.text;

import java.util.Objects;

/**
 * How to read a corpus: its format (or {@code null} to detect it from the path), the field
 * names that hold id, text and label (JSON Lines keys, CSV header columns; unused for label
 * folders), and whether bad records are skipped and counted instead of stopping the read.
 */
public record CorpusSettings(CorpusFormat format, String idField, String textField, String labelField, boolean skipBad) {
    /** Detected format, fields {@code id}, {@code text}, {@code label}, stop at the first bad record. */
    public static final CorpusSettings DEFAULTS = new CorpusSettings(null, "id", "text", "label", false);

    public CorpusSettings {
        Objects.requireNonNull(idField, "idField");
        Objects.requireNonNull(textField, "textField");
        Objects.requireNonNull(labelField, "labelField");
    }

    public CorpusSettings withFormat(CorpusFormat newFormat) {
        return new CorpusSettings(newFormat, idField, textField, labelField, skipBad);
    }

    public CorpusSettings withFields(String newIdField, String newTextField, String newLabelField) {
        return new CorpusSettings(format, newIdField, newTextField, newLabelField, skipBad);
    }

    public CorpusSettings withSkipBad(boolean newSkipBad) {
        return new CorpusSettings(format, idField, textField, labelField, newSkipBad);
    }
}
