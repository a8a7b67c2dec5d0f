package org.telltale.cli;

import java.nio.file.Path;
import org.telltale.OptionWords;
import org.telltale.UnknownKeyException;
import org.telltale.UsageException;
import org.telltale.text.Corpora;
import org.telltale.text.CorpusFormat;
import org.telltale.text.CorpusReader;
import org.telltale.text.CorpusSettings;
import picocli.CommandLine.Option;

/**
 * The options that choose and read a corpus. Use as {@code @Mixin CorpusOptions corpus;} and
 * call {@link #open()} in try-with-resources; {@code --corpus} is optional here so that commands
 * can offer {@code --text} instead (check {@link #given()}).
 */
final class CorpusOptions {
    @Option(names = "--corpus", paramLabel = "FILE",
            description = "Corpus to read: a .jsonl or .csv file, or a folder with one sub-folder per label.")
    Path corpus;

    @Option(names = "--format", paramLabel = "FORMAT",
            description = "Corpus format: jsonl, csv or folder (default: from the file name or folder).")
    String format;

    @Option(names = "--id-field", paramLabel = "NAME", defaultValue = "id",
            description = "JSON key or CSV column holding the document id (default: ${DEFAULT-VALUE}; missing ids come from the position).")
    String idField;

    @Option(names = "--text-field", paramLabel = "NAME", defaultValue = "text",
            description = "JSON key or CSV column holding the text (default: ${DEFAULT-VALUE}).")
    String textField;

    @Option(names = "--label-field", paramLabel = "NAME", defaultValue = "label",
            description = "JSON key or CSV column holding the gold label, if any (default: ${DEFAULT-VALUE}).")
    String labelField;

    @Option(names = "--skip-bad",
            description = "Skip and count bad lines (invalid JSON or UTF-8, missing or mistyped fields, duplicate ids) instead of stopping.")
    boolean skipBad;

    /** True when {@code --corpus} was given. */
    boolean given() {
        return corpus != null;
    }

    Path path() {
        return corpus;
    }

    /** The reader settings these options describe. */
    CorpusSettings settings() {
        return new CorpusSettings(format(format), idField, textField, labelField, skipBad);
    }

    /** The format {@code --format} names, {@code null} when not given; a usage error for an unknown name. */
    static CorpusFormat format(String key) {
        try {
            return key == null ? null : CorpusFormat.fromKey(key);
        } catch (UnknownKeyException e) {
            throw OptionWords.value("--format", e);
        }
    }

    /** Opens the corpus; a usage error when {@code --corpus} is missing. */
    CorpusReader open() {
        if (corpus == null) {
            throw new UsageException("missing --corpus FILE");
        }
        return Corpora.open(corpus, settings());
    }
}
