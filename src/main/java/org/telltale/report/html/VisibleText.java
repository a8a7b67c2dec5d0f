package org.telltale.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Splits untrusted text into plain runs and the invisible or direction-changing characters inside
 * it, so that a report can show each of those as a visible badge instead of letting it reorder or
 * hide the text around it (Unicode Technical Report #36, "Unicode Security Considerations", on
 * bidirectional spoofing). The plain runs are still escaped by the template engine.
 */
public final class VisibleText {
    private VisibleText() {
    }

    /**
     * A run of text: either plain text ({@code control == null}) or exactly one hidden character,
     * with {@code control} its short visible name such as {@code "RLO U+202E"}.
     */
    public record Chunk(String text, String control) {
    }

    /** The chunks of {@code text[start, end)}. */
    public static List<Chunk> chunks(String text, int start, int end) {
        List<Chunk> chunks = new ArrayList<>(2);
        int runStart = start;
        for (int i = start; i < end; i++) {
            String name = hiddenName(text.charAt(i));
            if (name != null) {
                if (i > runStart) {
                    chunks.add(new Chunk(text.substring(runStart, i), null));
                }
                chunks.add(new Chunk(text.substring(i, i + 1), name));
                runStart = i + 1;
            }
        }
        if (end > runStart) {
            chunks.add(new Chunk(text.substring(runStart, end), null));
        }
        return chunks;
    }

    /**
     * A short string (id, label, term) with every hidden character written out as
     * {@code [RLO U+202E]}, for places where a badge would be too heavy.
     */
    public static String inline(String text) {
        if (text == null) {
            return null;
        }
        StringBuilder out = null;
        for (int i = 0; i < text.length(); i++) {
            String name = hiddenName(text.charAt(i));
            if (name != null && out == null) {
                out = new StringBuilder(text.length() + 16).append(text, 0, i);
            }
            if (out != null) {
                if (name == null) {
                    out.append(text.charAt(i));
                } else {
                    out.append('[').append(name).append(']');
                }
            }
        }
        return out == null ? text : out.toString();
    }

    /** The visible name of a character that must not act unseen, or {@code null} for ordinary text. */
    static String hiddenName(char c) {
        String abbr = switch (c) {
            case '\u061c' -> "ALM";
            case '\u200b' -> "ZWSP";
            case '\u200c' -> "ZWNJ";
            case '\u200d' -> "ZWJ";
            case '\u200e' -> "LRM";
            case '\u200f' -> "RLM";
            case '\u202a' -> "LRE";
            case '\u202b' -> "RLE";
            case '\u202c' -> "PDF";
            case '\u202d' -> "LRO";
            case '\u202e' -> "RLO";
            case '\u2060' -> "WJ";
            case '\u2066' -> "LRI";
            case '\u2067' -> "RLI";
            case '\u2068' -> "FSI";
            case '\u2069' -> "PDI";
            case '\ufeff' -> "BOM";
            default -> null;
        };
        if (abbr == null && isOtherControl(c)) {
            abbr = "CTRL";
        }
        return abbr == null ? null : abbr + String.format(Locale.ROOT, " U+%04X", (int) c);
    }

    private static boolean isOtherControl(char c) {
        // Tab, line feed and carriage return are layout the reader expects; every other C0/C1
        // control, and DEL, is shown.
        return (c < 0x20 && c != '\t' && c != '\n' && c != '\r') || (c >= 0x7f && c <= 0x9f);
    }
}
