package org.telltale.connect;

import java.util.List;

/**
 * Removes secret header values from any text that may reach a user: error messages, response
 * snippets, descriptions. A secret is replaced by {@code [redacted]} wherever it appears.
 */
final class Redactor {
    static final String MARK = "[redacted]";
    private final List<String> secrets;

    Redactor(List<String> secrets) {
        this.secrets = secrets.stream().filter(s -> s != null && !s.isEmpty()).toList();
    }

    static Redactor none() {
        return new Redactor(List.of());
    }

    String redact(String text) {
        if (text == null) {
            return null;
        }
        String out = text;
        for (String s : secrets) {
            out = out.replace(s, MARK);
        }
        return out;
    }
}
