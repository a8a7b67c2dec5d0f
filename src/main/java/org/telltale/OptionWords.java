package org.telltale;

import java.util.Map;

/**
 * The edge between the core's words and the command line's: core classes name a setting by its
 * own name ({@code "parallelMax must be at least 1: 0"}), and every front that takes options —
 * the {@code telltale} commands and the Spark fronts, which share option names — turns such a
 * message into one about the option ({@code "--parallel-max must be at least 1: 0"}) here, once.
 */
public final class OptionWords {
    /** Setting name in the core → option name on the command line. */
    private static final Map<String, String> OPTIONS = Map.ofEntries(
            Map.entry("parallelMax", "--parallel-max"),
            Map.entry("parallel", "--parallel"),
            Map.entry("batch", "--batch"),
            Map.entry("retries", "--retries"),
            Map.entry("timeout", "--timeout"),
            Map.entry("sample", "--sample"),
            Map.entry("probes", "--probes"),
            Map.entry("words", "--words"),
            Map.entry("picks", "--picks"),
            Map.entry("threshold", "--threshold"),
            Map.entry("shingle", "--shingle"),
            Map.entry("signature", "--signature"),
            Map.entry("threads", "--threads"),
            Map.entry("port", "--port"),
            Map.entry("maxBatch", "--max-batch"),
            Map.entry("maxBody", "--max-body"),
            Map.entry("ngrams", "--ngrams"),
            Map.entry("holdout", "--holdout"),
            Map.entry("smoothing", "--smoothing"),
            Map.entry("l2", "--l2"),
            Map.entry("maxIterations", "--max-iterations"),
            Map.entry("bandwidth", "--bandwidth"),
            Map.entry("size", "--size"));

    private OptionWords() {
    }

    /** {@code message} with a leading setting name replaced by its option's name; other messages unchanged. */
    public static String of(String message) {
        int space = message.indexOf(' ');
        String option = space < 0 ? null : OPTIONS.get(message.substring(0, space));
        return option == null ? message : option + message.substring(space);
    }

    /** A setting the core refused, as a usage error (exit code 2) in the option's words. */
    public static UsageException usage(IllegalArgumentException refused) {
        return new UsageException(of(refused.getMessage()));
    }

    /**
     * A value the core could not read for {@code option} ({@code "unknown protocol 'grpc'; one of: native, …"}),
     * as a usage error that names the option first.
     */
    public static UsageException value(String option, IllegalArgumentException refused) {
        return new UsageException(option + ": " + refused.getMessage());
    }
}
