package org.telltale.overlap;

import java.text.Normalizer;
import java.util.Locale;

/**
 * Turns a document's text into the form two copies of one document share. In order:
 * <ol>
 *   <li>Unicode NFKC (compatibility composition: full-width letters, ligatures, non-breaking spaces
 *       become their plain forms);</li>
 *   <li>case folding: upper-case then lower-case with {@link Locale#ROOT}, so "STRASSE" and
 *       "straße" meet and no default locale (Turkish dotless i) interferes;</li>
 *   <li>reply quoting removed: every {@code >} at the start of a line (after spaces) is dropped,
 *       so "&gt; &gt; text" becomes "text";</li>
 *   <li>whitespace collapsed: every run of white space (any Unicode space separator, tabs, line
 *       breaks) becomes one space, and the ends are trimmed — except that {@link #forShingles}
 *       keeps a paragraph break (a blank line) as a newline, because shingles never cross it.</li>
 * </ol>
 * Stateless and thread-safe.
 */
public final class TextNormalizer {
    private TextNormalizer() {
    }

    /** The normalised text whose hash decides exact duplicates. */
    public static String forExact(String text) {
        return normalise(text, false);
    }

    /** The normalised text with paragraph breaks kept as {@code '\n'}: the input of shingling. */
    static String forShingles(String text) {
        return normalise(text, true);
    }

    static String fold(String text) {
        if (isAscii(text)) {
            // ASCII is unchanged by NFKC, and for ASCII upper-then-lower equals lower.
            return text.toLowerCase(Locale.ROOT);
        }
        String nfkc = Normalizer.normalize(text, Normalizer.Form.NFKC);
        return nfkc.toUpperCase(Locale.ROOT).toLowerCase(Locale.ROOT);
    }

    /**
     * Steps 3 and 4 in one pass over the folded text (for ASCII, folding happens in the same pass):
     * a {@code >} at a line start counts as white space, so a line of quote markers only is blank.
     */
    private static String normalise(String text, boolean keepParagraphs) {
        boolean ascii = isAscii(text);
        String in = ascii ? text : fold(text);
        int n = in.length();
        char[] out = new char[n];
        int size = 0;
        boolean lineStart = true;
        int newlines = 0;
        boolean pendingSpace = false;
        for (int i = 0; i < n; i++) {
            char c = in.charAt(i);
            if (c == '\n' || (c == '\r' && (i + 1 >= n || in.charAt(i + 1) != '\n'))) {
                newlines++;
                lineStart = true;
                pendingSpace = true;
            } else if (c == '\r' || isSpace(c) || (lineStart && c == '>')) {
                pendingSpace = true;
            } else {
                if (pendingSpace && size > 0) {
                    out[size++] = keepParagraphs && newlines >= 2 ? '\n' : ' ';
                }
                pendingSpace = false;
                newlines = 0;
                lineStart = false;
                out[size++] = ascii && c >= 'A' && c <= 'Z' ? (char) (c + ('a' - 'A')) : c;
            }
        }
        return new String(out, 0, size);
    }

    private static boolean isAscii(String text) {
        for (int i = 0; i < text.length(); i++) {
            if (text.charAt(i) >= 0x80) {
                return false;
            }
        }
        return true;
    }

    static boolean isSpace(char c) {
        return Character.isWhitespace(c) || Character.isSpaceChar(c);
    }
}
