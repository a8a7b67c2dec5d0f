package org.telltale.audit;

import java.util.Arrays;
import java.util.List;
import java.util.function.Predicate;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.telltale.text.Span;

/**
 * Which {@link ArtefactKind} each character of one document belongs to, decided from the text's
 * layout alone: header blocks and field lines, address and identifier patterns, and lines the
 * corpus repeats verbatim. Where places overlap, the earlier kind in {@link ArtefactKind} wins.
 *
 * <p>Immutable once built.
 */
public final class Places {
    /** RFC 5322 §2.2: a field name is printable ASCII without colon; we also forbid spaces, as the RFC does. */
    private static final Pattern FIELD = Pattern.compile("^([A-Za-z0-9][A-Za-z0-9_.-]{0,59}):(?:[ \\t]|$)");
    /** Field names that only metadata uses: hyphenated (Message-ID, Queue-Code), X-prefixed or upper case. */
    private static final Pattern METADATA_NAME = Pattern.compile(
            "(?:[A-Za-z][A-Za-z0-9]*(?:-[A-Za-z0-9]+)+|[A-Z][A-Z0-9_]+)");
    /** The mbox separator line ("From sender date") that precedes an RFC 5322 message in a mailbox. */
    private static final Pattern MBOX_FROM = Pattern.compile("^From \\S+");

    private static final Pattern ADDRESS = Pattern.compile(String.join("|",
            "[A-Za-z0-9._%+-]+@[A-Za-z0-9-]+(?:\\.[A-Za-z0-9-]+)+", // e-mail (RFC 5322 addr-spec, common subset)
            "(?i:\\b(?:https?|ftp)://[^\\s<>\"']+)", // URL (RFC 3986 schemes in common use)
            "(?i:\\bwww\\.[^\\s<>\"']+)",
            "\\b\\d{1,3}(?:\\.\\d{1,3}){3}\\b", // IPv4 dotted quad
            "(?i:\\b(?:[a-z0-9](?:[a-z0-9-]{0,61}[a-z0-9])?\\.)+[a-z]{2,24}\\b)")); // host name (RFC 1123)

    private static final String MONTH = "(?:Jan|Feb|Mar|Apr|May|Jun|Jul|Aug|Sep|Oct|Nov|Dec)[a-z]*\\.?";
    private static final Pattern IDENTIFIER = Pattern.compile(String.join("|",
            "\\b\\d{4}-\\d{2}-\\d{2}(?:[T ]\\d{2}:\\d{2}(?::\\d{2})?)?", // ISO 8601 date and time
            "\\b\\d{1,2}[/.]\\d{1,2}[/.]\\d{2,4}\\b", // numeric day/month/year
            "\\b\\d{1,2} " + MONTH + " \\d{4}\\b", // RFC 5322 date: 22 Aug 2002
            "\\b" + MONTH + " \\d{1,2},? \\d{4}\\b", // Aug 22, 2002
            "\\b\\d{1,2}:\\d{2}(?::\\d{2})?(?:\\s?[AaPp][Mm])?\\b", // time of day
            "(?<=\\s)[+-]\\d{4}\\b", // time-zone offset
            "\\b[A-Z]{2,8}[-_#/]?\\d{2,}\\b", // queue or ticket code: INC0012, OGX-4471
            "\\b[A-Za-z]{1,8}[-_#]\\d+\\b", // prefixed number: ref-17, case#9
            "#\\d+\\b", // numbered reference
            "\\b\\d{4,}\\b", // long number: order, ticket, account
            "\\b(?=[A-Za-z0-9]*\\d)(?=[A-Za-z0-9]*[A-Za-z])[A-Za-z0-9]{6,}\\b")); // mixed code or hex id

    private final byte[] kinds;

    private Places(byte[] kinds) {
        this.kinds = kinds;
    }

    /** The places of {@code text}; {@code boilerplate} says whether a trimmed line is repeated across the corpus. */
    public static Places of(String text, Predicate<String> boilerplate) {
        byte[] kinds = new byte[text.length()];
        Arrays.fill(kinds, (byte) ArtefactKind.CONTENT.ordinal());
        List<Span> lines = TextLines.of(text);
        for (Span line : lines) {
            if (boilerplate.test(text.substring(line.start(), line.end()))) {
                mark(kinds, line, ArtefactKind.BOILERPLATE);
            }
        }
        markPattern(kinds, text, IDENTIFIER, ArtefactKind.IDENTIFIER);
        markPattern(kinds, text, ADDRESS, ArtefactKind.ADDRESS);
        for (Span region : headerRegions(text, lines)) {
            mark(kinds, region, ArtefactKind.HEADER);
        }
        return new Places(kinds);
    }

    /** The kind of an occurrence: the most specific place any of its characters sits in. */
    public ArtefactKind kindOf(Span span) {
        int best = ArtefactKind.CONTENT.ordinal();
        for (int i = span.start(); i < span.end() && i < kinds.length; i++) {
            best = Math.min(best, kinds[i]);
        }
        return ArtefactKind.values()[best];
    }

    /**
     * The header regions of a text: the leading block of field lines (after an optional mbox
     * {@code From } line; folded continuation lines included, RFC 5322 §2.2.3), every run of two
     * or more field lines elsewhere, single field lines whose name is metadata-style, and the
     * name of any other field line.
     */
    static List<Span> headerRegions(String text, List<Span> lines) {
        java.util.ArrayList<Span> regions = new java.util.ArrayList<>();
        int i = 0;
        if (!lines.isEmpty() && MBOX_FROM.matcher(slice(text, lines.get(0))).find()) {
            regions.add(lines.get(0));
            i = 1;
        }
        while (i < lines.size()) {
            int runStart = i;
            int fields = 0;
            int j = i;
            while (j < lines.size()) {
                String line = slice(text, lines.get(j));
                if (FIELD.matcher(line).find()) {
                    fields++;
                } else if (fields > 0 && !line.isBlank() && (line.charAt(0) == ' ' || line.charAt(0) == '\t')) {
                    // folded continuation of the field above
                } else {
                    break;
                }
                j++;
            }
            boolean leading = runStart <= 1 && (j >= lines.size() || slice(text, lines.get(j)).isBlank());
            if (fields >= 2 || (fields == 1 && leading)) {
                regions.add(new Span(lines.get(runStart).start(), lines.get(j - 1).end()));
            } else if (fields == 1) {
                String line = slice(text, lines.get(runStart));
                Matcher m = FIELD.matcher(line);
                m.find();
                int start = lines.get(runStart).start();
                regions.add(METADATA_NAME.matcher(m.group(1)).matches()
                        ? new Span(start, lines.get(j - 1).end())
                        : new Span(start, start + m.end(1)));
            }
            i = Math.max(j, i + 1);
        }
        return regions;
    }

    private static String slice(String text, Span span) {
        return text.substring(span.start(), span.end());
    }

    private static void markPattern(byte[] kinds, String text, Pattern pattern, ArtefactKind kind) {
        Matcher m = pattern.matcher(text);
        while (m.find()) {
            mark(kinds, new Span(m.start(), m.end()), kind);
        }
    }

    private static void mark(byte[] kinds, Span span, ArtefactKind kind) {
        byte k = (byte) kind.ordinal();
        for (int i = span.start(); i < span.end(); i++) {
            if (kinds[i] > k) {
                kinds[i] = k;
            }
        }
    }
}
