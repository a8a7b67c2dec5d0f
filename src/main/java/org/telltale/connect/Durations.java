package org.telltale.connect;

import java.time.Duration;
import java.time.format.DateTimeParseException;
import java.util.Locale;

/** Reads and writes durations the way the command line takes them: {@code 500ms}, {@code 30s}, {@code 2m}, {@code 1h} or ISO-8601. */
public final class Durations {
    private Durations() {
    }

    /** Parses {@code 250ms}, {@code 30s}, {@code 1.5s}, {@code 2m}, {@code 1h}, a bare number of seconds, or ISO-8601 {@code PT30S}. */
    public static Duration parse(String text) {
        String t = text.strip().toLowerCase(Locale.ROOT);
        try {
            if (t.startsWith("pt") || t.startsWith("p")) {
                return Duration.parse(t.toUpperCase(Locale.ROOT));
            }
            if (t.endsWith("ms")) {
                return Duration.ofMillis(Math.round(Double.parseDouble(t.substring(0, t.length() - 2))));
            }
            double factor = 1000;
            String number = t;
            if (t.endsWith("s")) {
                number = t.substring(0, t.length() - 1);
            } else if (t.endsWith("m")) {
                number = t.substring(0, t.length() - 1);
                factor = 60_000;
            } else if (t.endsWith("h")) {
                number = t.substring(0, t.length() - 1);
                factor = 3_600_000;
            }
            double value = Double.parseDouble(number);
            if (!Double.isFinite(value) || value < 0) {
                throw new NumberFormatException();
            }
            return Duration.ofMillis(Math.round(value * factor));
        } catch (NumberFormatException | DateTimeParseException e) {
            throw new IllegalArgumentException("not a duration: '" + text + "' (expected e.g. 500ms, 30s, 2m)");
        }
    }

    /** {@code 30s}, {@code 1.5s} or {@code 250ms}. */
    public static String format(Duration d) {
        long ms = d.toMillis();
        if (ms < 1000) {
            return ms + "ms";
        }
        if (ms % 1000 == 0) {
            return (ms / 1000) + "s";
        }
        return String.format(Locale.ROOT, "%.1fs", ms / 1000.0);
    }
}
