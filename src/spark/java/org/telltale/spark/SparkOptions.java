package org.telltale.spark;

import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.telltale.UsageException;

/**
 * The command line of a Spark front: {@code --name VALUE} options and {@code --flag} switches,
 * each known by name. The option names, defaults and checks are those of the matching
 * {@code telltale} command; unknown or repeated options and missing values are usage errors (exit 2).
 */
final class SparkOptions {
    private final Map<String, String> values = new HashMap<>();
    private final Map<String, List<String>> repeated = new HashMap<>();
    private final Set<String> flags = new HashSet<>();

    private SparkOptions() {
    }

    static SparkOptions parse(String[] args, List<String> valueOptions, List<String> flagOptions) {
        return parse(args, valueOptions, List.of(), flagOptions);
    }

    /** As above, with options that may be given more than once ({@code --header A=B --header C=D}). */
    static SparkOptions parse(String[] args, List<String> valueOptions, List<String> repeatable, List<String> flagOptions) {
        SparkOptions options = new SparkOptions();
        for (int i = 0; i < args.length; i++) {
            String arg = args[i];
            String name = arg;
            String inline = null;
            int eq = arg.indexOf('=');
            if (arg.startsWith("--") && eq > 0) {
                name = arg.substring(0, eq);
                inline = arg.substring(eq + 1);
            }
            if (repeatable.contains(name)) {
                String value = inline;
                if (value == null) {
                    if (i + 1 >= args.length) {
                        throw new UsageException("missing value for " + name);
                    }
                    value = args[++i];
                }
                options.repeated.computeIfAbsent(name, k -> new java.util.ArrayList<>()).add(value);
            } else if (valueOptions.contains(name)) {
                String value = inline;
                if (value == null) {
                    if (i + 1 >= args.length) {
                        throw new UsageException("missing value for " + name);
                    }
                    value = args[++i];
                }
                if (options.values.put(name, value) != null) {
                    throw new UsageException(name + " given twice");
                }
            } else if (flagOptions.contains(name) && inline == null) {
                options.flags.add(name);
            } else {
                throw new UsageException("unknown option '" + arg + "'");
            }
        }
        return options;
    }

    String required(String name) {
        String value = values.get(name);
        if (value == null) {
            throw new UsageException("missing " + name);
        }
        return value;
    }

    String get(String name, String fallback) {
        return values.getOrDefault(name, fallback);
    }

    List<String> all(String name) {
        return repeated.getOrDefault(name, List.of());
    }

    boolean has(String name) {
        return values.containsKey(name) || flags.contains(name);
    }

    int integer(String name, int fallback) {
        String value = values.get(name);
        if (value == null) {
            return fallback;
        }
        try {
            return Integer.parseInt(value.trim());
        } catch (NumberFormatException e) {
            throw new UsageException(name + " must be an integer: '" + value + "'");
        }
    }

    Integer integerOrNull(String name) {
        return values.containsKey(name) ? integer(name, 0) : null;
    }

    long longValue(String name, long fallback) {
        String value = values.get(name);
        if (value == null) {
            return fallback;
        }
        try {
            return Long.parseLong(value.trim());
        } catch (NumberFormatException e) {
            throw new UsageException(name + " must be an integer: '" + value + "'");
        }
    }

    double decimal(String name, double fallback) {
        String value = values.get(name);
        if (value == null) {
            return fallback;
        }
        try {
            return Double.parseDouble(value.trim().toLowerCase(Locale.ROOT));
        } catch (NumberFormatException e) {
            throw new UsageException(name + " must be a number: '" + value + "'");
        }
    }
}
