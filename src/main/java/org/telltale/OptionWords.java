package org.telltale;

import java.util.Map;

/**
 * The edge between the core's words and the command line's. Core code names a setting by its own
 * name and never writes an option name, in two forms:
 * <ul>
 * <li>a refused value leads with the setting's name ({@code "parallelMax must be at least 1: 0"}),
 * which {@link #usage} turns into {@code "--parallel-max must be at least 1: 0"};
 * <li>any other message that mentions a setting — a hint, a place — writes it as a placeholder, its
 * name in braces ({@code "out.html: file exists; pass {force} to replace it"}), which
 * {@link #render} turns into {@code "pass --force to replace it"}.
 * </ul>
 * Every front that takes options — the {@code telltale} commands and the Spark fronts, which share
 * option names — renders each message it prints here, once: {@code cli.ErrorHandler} and
 * {@code spark.SparkMain} for errors, and whatever prints core text that holds a placeholder.
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
            Map.entry("size", "--size"),
            Map.entry("model", "--model"),
            Map.entry("protocol", "--protocol"),
            Map.entry("header", "--header"),
            Map.entry("scores", "--scores"),
            Map.entry("format", "--format"),
            Map.entry("textField", "--text-field"),
            Map.entry("skipBad", "--skip-bad"),
            Map.entry("out", "--out"),
            Map.entry("force", "--force"),
            Map.entry("resume", "--resume"),
            Map.entry("json", "--json"));

    private OptionWords() {
    }

    /**
     * {@code message} with a leading setting name replaced by its option's name and its placeholders
     * {@linkplain #render rendered}; other text unchanged.
     */
    public static String of(String message) {
        int space = message.indexOf(' ');
        String option = space < 0 ? null : OPTIONS.get(message.substring(0, space));
        return render(option == null ? message : option + message.substring(space));
    }

    /**
     * {@code message} with every placeholder of a known setting ({@code {force}}) replaced by its
     * option's name ({@code --force}); braces around anything else stay as they are. {@code null}
     * stays {@code null}.
     */
    public static String render(String message) {
        if (message == null || message.indexOf('{') < 0) {
            return message;
        }
        // One pass: a message may carry a snippet of a document or an answer, of any length.
        StringBuilder out = new StringBuilder(message.length());
        int copied = 0; // message[0, copied) is in out
        int open = -1;  // the last '{' not closed yet
        for (int i = 0; i < message.length(); i++) {
            char c = message.charAt(i);
            if (c == '{') {
                open = i;
            } else if (c == '}' && open >= 0) {
                String option = OPTIONS.get(message.substring(open + 1, i));
                if (option != null) {
                    out.append(message, copied, open).append(option);
                    copied = i + 1;
                }
                open = -1;
            }
        }
        return out.append(message, copied, message.length()).toString();
    }

    /** Whether {@code setting} is a name the core may use, leading a message or in a placeholder. */
    public static boolean knows(String setting) {
        return OPTIONS.containsKey(setting);
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
        return new UsageException(option + ": " + render(refused.getMessage()));
    }
}
