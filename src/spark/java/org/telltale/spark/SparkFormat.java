package org.telltale.spark;

import java.util.Locale;
import org.telltale.EnumKeys;
import org.telltale.OptionWords;
import org.telltale.UnknownKeyException;
import org.telltale.UsageException;

/** The corpus formats the Spark fronts read through Spark's own readers. */
enum SparkFormat {
    JSONL, CSV, PARQUET;

    /** The lower-case name used on the command line. */
    String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The format named {@code key} in any case; @throws UnknownKeyException for another name */
    static SparkFormat fromKey(String key) {
        return EnumKeys.parse("corpus format", key == null ? null : key.toLowerCase(Locale.ROOT), values(),
                SparkFormat::key);
    }

    /**
     * The format {@code --format} names ({@code key}), or when it is not given ({@code null}) the
     * one {@code path}'s name tells; a usage error for an unknown name or a name that tells none.
     */
    static SparkFormat of(String key, String path) {
        if (key != null) {
            try {
                return fromKey(key);
            } catch (UnknownKeyException e) {
                throw OptionWords.value("--format", e);
            }
        }
        String name = path.toLowerCase(Locale.ROOT);
        while (name.endsWith("/")) {
            name = name.substring(0, name.length() - 1);
        }
        if (name.endsWith(".jsonl") || name.endsWith(".ndjson") || name.endsWith(".json")) {
            return JSONL;
        }
        if (name.endsWith(".csv")) {
            return CSV;
        }
        if (name.endsWith(".parquet")) {
            return PARQUET;
        }
        throw new UsageException("cannot tell the corpus format of " + path
                + " from its name (expected .jsonl, .ndjson, .csv or .parquet); choose one with --format jsonl|csv|parquet");
    }
}
