package org.telltale.connect;

import java.util.ArrayList;
import java.util.List;
import org.telltale.UsageException;

/**
 * Splits the command of an {@code exec:} spec into program and arguments: whitespace separates,
 * single or double quotes group, a backslash escapes the next character (outside single quotes).
 * No shell is involved, so no variables, globs or pipes.
 */
final class CommandSplitter {
    private CommandSplitter() {
    }

    static List<String> split(String command) {
        List<String> words = new ArrayList<>();
        StringBuilder word = new StringBuilder();
        boolean inWord = false;
        char quote = 0;
        for (int i = 0; i < command.length(); i++) {
            char c = command.charAt(i);
            if (quote == '\'') {
                if (c == '\'') {
                    quote = 0;
                } else {
                    word.append(c);
                }
            } else if (c == '\\' && i + 1 < command.length()) {
                word.append(command.charAt(++i));
                inWord = true;
            } else if (quote == '"') {
                if (c == '"') {
                    quote = 0;
                } else {
                    word.append(c);
                }
            } else if (c == '\'' || c == '"') {
                quote = c;
                inWord = true;
            } else if (Character.isWhitespace(c)) {
                if (inWord) {
                    words.add(word.toString());
                    word.setLength(0);
                    inWord = false;
                }
            } else {
                word.append(c);
                inWord = true;
            }
        }
        if (quote != 0) {
            throw new UsageException("{model} exec:" + command + ": unclosed " + quote + " quote");
        }
        if (inWord) {
            words.add(word.toString());
        }
        if (words.isEmpty()) {
            throw new UsageException("{model} exec: names no command (expected exec:COMMAND ARGS…)");
        }
        return words;
    }
}
