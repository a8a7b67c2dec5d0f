package org.telltale;

import java.util.List;

/**
 * A name that none of a closed set of values carries ({@code "unknown unit 'words'; one of: word,
 * occurrence, line"}). Every enum parser throws it, so callers catch one type: the command line
 * turns it into a usage error naming the option (exit code 2, {@link OptionWords#value}), a file
 * reader into an error naming the file and the field.
 */
public class UnknownKeyException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    /** @param what the kind of value, as the message names it ({@code "unit"}, {@code "corpus format"}) */
    public UnknownKeyException(String what, String key, List<String> accepted) {
        super("unknown " + what + " '" + key + "'; one of: " + String.join(", ", accepted));
    }
}
