package org.telltale.spark;

import java.util.Locale;
import org.telltale.UsageException;

/** The corpus formats the Spark fronts read through Spark's own readers. */
enum SparkFormat {
    JSONL, CSV, PARQUET;

    static SparkFormat of(String key, String path) {
        if (key != null) {
            return switch (key.toLowerCase(Locale.ROOT)) {
                case "jsonl" -> JSONL;
                case "csv" -> CSV;
                case "parquet" -> PARQUET;
                default -> throw new UsageException("unknown corpus format '" + key + "' (expected jsonl, csv or parquet)");
            };
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
