package org.telltale.report.terminal;

/**
 * Makes document text safe to print on a terminal: control characters (which could move the
 * cursor, retitle the window or recolour the screen) and bidirectional overrides (which could
 * reorder what is shown) become visible escapes like {@code \u001b}; newlines and tabs stay.
 */
final class SafeText {
    private SafeText() {
    }

    static String of(CharSequence text) {
        StringBuilder out = new StringBuilder(text.length());
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\t') {
                out.append(c);
            } else if (c == '\r') {
                continue; // CRLF shown as LF
            } else if (Character.isISOControl(c) || isBidiControl(c)) {
                out.append(String.format(java.util.Locale.ROOT, "\\u%04x", (int) c));
            } else {
                out.append(c);
            }
        }
        return out.toString();
    }

    /** One line: like {@link #of} but newlines and tabs become spaces. */
    static String line(CharSequence text) {
        return of(text).replace('\n', ' ').replace('\t', ' ');
    }

    private static boolean isBidiControl(char c) {
        return (c >= '\u202a' && c <= '\u202e') || (c >= '\u2066' && c <= '\u2069') || c == '\u200e' || c == '\u200f'
                || c == '\u061c';
    }
}
