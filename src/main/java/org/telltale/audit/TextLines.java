package org.telltale.audit;

import java.util.ArrayList;
import java.util.List;
import org.telltale.text.Span;

/** The lines of a text as spans without their terminators (LF, CRLF or CR), blank lines included. */
final class TextLines {
    private TextLines() {
    }

    static List<Span> of(String text) {
        List<Span> lines = new ArrayList<>();
        int n = text.length();
        int start = 0;
        while (true) {
            int end = start;
            while (end < n && text.charAt(end) != '\n' && text.charAt(end) != '\r') {
                end++;
            }
            lines.add(new Span(start, end));
            if (end >= n) {
                return lines;
            }
            start = end + (text.charAt(end) == '\r' && end + 1 < n && text.charAt(end + 1) == '\n' ? 2 : 1);
        }
    }

    /**
     * The span including its terminator, so that cutting it removes the line rather than leaving
     * a blank one behind.
     */
    static Span withTerminator(String text, Span line) {
        int end = line.end();
        if (end < text.length() && text.charAt(end) == '\r') {
            end++;
        }
        if (end < text.length() && text.charAt(end) == '\n') {
            end++;
        }
        return new Span(line.start(), end);
    }
}
