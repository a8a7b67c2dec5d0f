package org.telltale.text;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.UnknownKeyException;
import org.telltale.UsageException;

/** The corpus layouts Telltale reads. */
public enum CorpusFormat {
    /** JSON Lines: one JSON object per line (RFC 8259 values, jsonlines.org framing). */
    JSONL,
    /** Comma-separated values with a header row (RFC 4180). */
    CSV,
    /** A folder holding one sub-folder per label, each holding {@code .txt} files. */
    FOLDER;

    /** The lower-case name used on the command line. */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The format named {@code key} in any case; @throws UnknownKeyException for another name */
    public static CorpusFormat fromKey(String key) {
        return EnumKeys.parse("corpus format", key == null ? null : key.toLowerCase(Locale.ROOT), values(),
                CorpusFormat::key);
    }

    /**
     * The format of {@code path} by its shape: a directory is a label folder, {@code .jsonl} and
     * {@code .ndjson} are JSON Lines, {@code .csv} is CSV.
     */
    public static CorpusFormat detect(Path path) {
        if (Files.isDirectory(path)) {
            return FOLDER;
        }
        String name = String.valueOf(path.getFileName()).toLowerCase(Locale.ROOT);
        if (name.endsWith(".jsonl") || name.endsWith(".ndjson")) {
            return JSONL;
        }
        if (name.endsWith(".csv")) {
            return CSV;
        }
        throw new UsageException("cannot tell the corpus format of " + path
                + " from its name (expected a folder, .jsonl, .ndjson or .csv); choose one with {format} jsonl|csv|folder");
    }
}
