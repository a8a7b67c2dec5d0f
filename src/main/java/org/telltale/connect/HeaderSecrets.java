package org.telltale.connect;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.function.UnaryOperator;
import org.telltale.UsageException;

/**
 * The HTTP headers of {@code --header NAME=ENVVAR}: each value is read from the environment
 * variable, sent with every request, and never shown — descriptions name only the header and the
 * variable, and every message passes through the {@link Redactor} that this class builds.
 */
final class HeaderSecrets {
    private final Map<String, String> values;
    private final Map<String, String> sources;

    private HeaderSecrets(Map<String, String> values, Map<String, String> sources) {
        this.values = values;
        this.sources = sources;
    }

    static HeaderSecrets resolve(Map<String, String> headerToVariable, UnaryOperator<String> environment) {
        Map<String, String> values = new LinkedHashMap<>();
        for (Map.Entry<String, String> e : headerToVariable.entrySet()) {
            String header = e.getKey();
            if (!header.matches("[!#$%&'*+.^_`|~0-9A-Za-z-]+")) {
                throw new UsageException("{header} " + header + "=" + e.getValue() + ": not a valid HTTP header name");
            }
            if (header.toLowerCase(Locale.ROOT).equals("content-length") || header.toLowerCase(Locale.ROOT).equals("host")) {
                throw new UsageException("{header} " + header + ": this header is set by the HTTP client");
            }
            String value = environment.apply(e.getValue());
            if (value == null || value.isEmpty()) {
                throw new UsageException("{header} " + header + "=" + e.getValue() + ": the environment variable "
                        + e.getValue() + " is not set or empty");
            }
            if (value.chars().anyMatch(c -> c == '\r' || c == '\n')) {
                throw new UsageException("{header} " + header + "=" + e.getValue() + ": the value holds a line break");
            }
            values.put(header, value);
        }
        return new HeaderSecrets(values, new LinkedHashMap<>(headerToVariable));
    }

    Map<String, String> values() {
        return values;
    }

    Redactor redactor() {
        return new Redactor(new ArrayList<>(values.values()));
    }

    /** e.g. {@code header Authorization from $MODEL_TOKEN}; "" when there are none. */
    String describe() {
        if (sources.isEmpty()) {
            return "";
        }
        StringBuilder sb = new StringBuilder();
        sources.forEach((h, v) -> sb.append(sb.length() == 0 ? "" : ", ").append("header ").append(h).append(" from $").append(v));
        return sb.toString();
    }
}
