package org.telltale.audit;

import java.util.Locale;

/**
 * The keys that make the same place in different documents one artefact: a header field by its
 * name, a repeated line by its template, an address by its host, an identifier by its shape. Each
 * key is written so that the variants a reviewer would call "the same" meet (docs/audit.md,
 * "Artefacts"). Every function reads its input once; inputs are single lines or single matches.
 *
 * <p>Stateless.
 */
public final class PlaceKeys {
    private PlaceKeys() {
    }

    /** A header field's key: its name in lower case (RFC 5322 §1.2.2, field names are case-insensitive). */
    public static String fieldKey(String name) {
        return name.toLowerCase(Locale.ROOT);
    }

    /**
     * A repeated line's template: lower case, runs of white space as one space, trimmed, every digit
     * as {@code #}, leading quote markers of a reply ({@code > }) left out, so that "Exported by
     * Casefile Archive 3.2", "exported by  casefile archive 3.4" and "> Exported by Casefile Archive
     * 3.2" are one line.
     */
    public static String lineTemplate(String line) {
        StringBuilder out = new StringBuilder(line.length());
        boolean space = false;
        for (int i = quoteEnd(line); i < line.length(); i++) {
            char c = line.charAt(i);
            if (Character.isWhitespace(c)) {
                space = out.length() > 0;
                continue;
            }
            if (space) {
                out.append(' ');
                space = false;
            }
            out.append(Character.isDigit(c) ? '#' : Character.toLowerCase(c));
        }
        return out.toString();
    }

    /**
     * A repeated line as shown: trimmed, without the quote markers of a quoted reply, so that
     * "> Odile Brandvold | Network Care" is shown as the line it quotes.
     */
    public static String lineShown(String line) {
        return line.substring(quoteEnd(line)).strip();
    }

    /** Where the leading quote markers ({@code >}, RFC 3676 §4.5) and the white space around them end. */
    private static int quoteEnd(String line) {
        int i = 0;
        while (i < line.length() && (line.charAt(i) == '>' || Character.isWhitespace(line.charAt(i)))) {
            i++;
        }
        return i;
    }

    /** An identifier's shape as written: letters and punctuation kept, every digit as {@code #} ({@code HR-#####}). */
    public static String shape(String match) {
        StringBuilder out = new StringBuilder(match.length());
        for (int i = 0; i < match.length(); i++) {
            char c = match.charAt(i);
            out.append(Character.isDigit(c) ? '#' : c);
        }
        return out.toString();
    }

    /** An identifier's key: its shape in lower case. */
    public static String shapeKey(String match) {
        return shape(match).toLowerCase(Locale.ROOT);
    }

    /**
     * The host of an address match, in lower case: the part after {@code @} of an e-mail address,
     * the authority of a URL without user, port, path, query or fragment (RFC 3986 §3.2), the
     * match itself for a host name or an IP address; trailing dots and punctuation left out.
     */
    public static String host(String match) {
        String s = match;
        int at = s.lastIndexOf('@');
        int scheme = s.indexOf("://");
        if (scheme >= 0) {
            s = s.substring(scheme + 3);
            int end = firstOf(s, "/?#");
            s = s.substring(0, end);
            int user = s.lastIndexOf('@');
            if (user >= 0) {
                s = s.substring(user + 1);
            }
        } else if (at >= 0) {
            s = s.substring(at + 1);
        } else {
            s = s.substring(0, firstOf(s, "/?#"));
        }
        int port = s.indexOf(':');
        if (port >= 0) {
            s = s.substring(0, port);
        }
        int end = s.length();
        while (end > 0 && !Character.isLetterOrDigit(s.charAt(end - 1))) {
            end--;
        }
        return s.substring(0, end).toLowerCase(Locale.ROOT);
    }

    private static int firstOf(String s, String stops) {
        for (int i = 0; i < s.length(); i++) {
            if (stops.indexOf(s.charAt(i)) >= 0) {
                return i;
            }
        }
        return s.length();
    }
}
