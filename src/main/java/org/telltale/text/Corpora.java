package org.telltale.text;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.telltale.TelltaleException;

/**
 * Opens corpora: {@code Corpora.open(path, settings)} gives a lazy {@link CorpusReader} of
 * JSON Lines, CSV or a label folder. Use it in try-with-resources.
 *
 * <pre>{@code
 * try (CorpusReader reader = Corpora.open(path, CorpusSettings.DEFAULTS.withSkipBad(true))) {
 *     while (reader.hasNext()) { Document doc = reader.next(); ... }
 *     System.err.println(reader.skipped().summary());
 * }
 * }</pre>
 */
public final class Corpora {
    /** The longest JSON line or {@code .txt} file read, in bytes, and CSV record, in characters (32 Mi). */
    public static final int MAX_RECORD_BYTES = 32 * 1024 * 1024;

    private Corpora() {
    }

    /** Opens {@code path} with default settings (detected format, fields id/text/label). */
    public static CorpusReader open(Path path) {
        return open(path, CorpusSettings.DEFAULTS);
    }

    /** Opens {@code path} in the given format with default fields. */
    public static CorpusReader open(Path path, CorpusFormat format) {
        return open(path, CorpusSettings.DEFAULTS.withFormat(format));
    }

    public static CorpusReader open(Path path, CorpusSettings settings) {
        if (!Files.exists(path)) {
            throw new TelltaleException("corpus not found: " + path);
        }
        CorpusFormat format = settings.format() != null ? settings.format() : CorpusFormat.detect(path);
        if (format == CorpusFormat.FOLDER && !Files.isDirectory(path)) {
            throw new TelltaleException(path + " is not a folder; the folder format needs one sub-folder per label");
        }
        if (format != CorpusFormat.FOLDER && Files.isDirectory(path)) {
            throw new TelltaleException(path + " is a folder, not a " + format.key() + " file");
        }
        try {
            return switch (format) {
                case JSONL -> new JsonLinesReader(path, settings);
                case CSV -> new CsvReader(path, settings);
                case FOLDER -> new FolderReader(path, settings);
            };
        } catch (IOException e) {
            throw new TelltaleException("cannot open corpus " + path + ": " + e.getMessage(), e);
        }
    }

    /** Every document of {@code path}; for small corpora and tests. */
    public static List<Document> readAll(Path path, CorpusSettings settings) {
        try (CorpusReader reader = open(path, settings)) {
            return reader.readAll();
        }
    }
}
