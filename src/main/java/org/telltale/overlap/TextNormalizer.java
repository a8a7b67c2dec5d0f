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
        return collapse(unquote(fold(text)), false);
    }

    /** The normalised text with paragraph breaks kept as {@code '\n'}: the input of shingling. */
    static String forShingles(String text) {
        return collapse(unquote(fold(text)), true);
    }

    static String fold(String text) {
        String nfkc = Normalizer.normalize(text, Normalizer.Form.NFKC);
        return nfkc.toUpperCase(Locale.ROOT).toLowerCase(Locale.ROOT);
    }

    /** Drops quote markers at line starts; lines made only of markers become blank lines. */
    static String unquote(String text) {
        StringBuilder out = new StringBuilder(text.length());
        boolean lineStart = true;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                lineStart = true;
                out.append(c);
            } else if (lineStart && c == '>') {
                out.append(' ');
            } else {
                if (!isSpace(c)) {
                    lineStart = false;
                }
                out.append(c);
            }
        }
        return out.toString();
    }

    private static String collapse(String text, boolean keepParagraphs) {
        StringBuilder out = new StringBuilder(text.length());
        int i = 0;
        int n = text.length();
        while (i < n) {
            char c = text.charAt(i);
            if (!isSpace(c)) {
                out.append(c);
                i++;
                continue;
            }
            int newlines = 0;
            while (i < n && isSpace(text.charAt(i))) {
                char s = text.charAt(i);
                if (s == '\n' || (s == '\r' && (i + 1 >= n || text.charAt(i + 1) != '\n'))) {
                    newlines++;
                }
                i++;
            }
            if (out.length() > 0 && i < n) {
                out.append(keepParagraphs && newlines >= 2 ? '\n' : ' ');
            }
        }
        return out.toString();
    }

    static boolean isSpace(char c) {
        return Character.isWhitespace(c) || Character.isSpaceChar(c);
    }
}
