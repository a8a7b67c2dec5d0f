package org.telltale.audit;

import java.nio.CharBuffer;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.Predicate;
import com.google.re2j.Matcher;
import com.google.re2j.Pattern;
import org.telltale.text.Span;

/**
 * Which {@link ArtefactKind} each character of one document belongs to, decided from the text's
 * layout alone: header blocks and field lines, address and identifier patterns, and lines the
 * corpus repeats verbatim. Where places overlap, the earlier kind in {@link ArtefactKind} wins.
 *
 * <p>Immutable once built.
 */
public final class Places {
    /**
     * RFC 5322 §2.2: a field name is printable ASCII without colon; we also forbid spaces, as the RFC
     * does. Applied with {@code lookingAt} at a line start and at most 62 characters long, so its
     * work per line is bounded whatever the line's length (java.util.regex is fine here).
     */
    private static final java.util.regex.Pattern FIELD =
            java.util.regex.Pattern.compile("([A-Za-z0-9][A-Za-z0-9_.-]{0,59}):(?:[ \\t]|$)");
    /**
     * Field names that only metadata uses: hyphenated (Message-ID, Queue-Code), X-prefixed or upper
     * case. Applied to a field name of at most 60 characters only.
     */
    private static final java.util.regex.Pattern METADATA_NAME = java.util.regex.Pattern.compile(
            "(?:[A-Za-z][A-Za-z0-9]*(?:-[A-Za-z0-9]+)+|[A-Z][A-Z0-9_]+)");

    /*
     * The address and identifier patterns run over whole documents, which are untrusted: a run of
     * 200,000 letters or of "a." must cost no more than its length. They are RE2/J patterns: RE2/J
     * simulates the automaton of the pattern over the text (Thompson's construction, as in RE2), so
     * one search takes time linear in the text and no stack that grows with it (RE2/J README:
     * "linear time regular expressions for Java").
     *
     * A find loop is linear overall only if no search reads far past the match it returns. Within
     * one alternation, a branch of higher priority that is still alive when a lower one matched keeps
     * the search reading (in "ab.cd%ab.cd%..." the e-mail branch outlives every host-name match), and
     * a loop of such searches becomes quadratic. So each kind of address or identifier is a pattern
     * of its own, written so that what can follow a match's end is bounded: greedy runs end at a
     * character outside their class, and the host-name label is at most 63 characters (RFC 1035).
     * Matches of different patterns may overlap; marking takes their union.
     */
    private static final List<Pattern> ADDRESS = List.of(
            Pattern.compile("[A-Za-z0-9._%+-]+@[A-Za-z0-9-]+(?:\\.[A-Za-z0-9-]+)+"), // e-mail (RFC 5322 addr-spec, common subset)
            Pattern.compile("(?i)\\b(?:https?|ftp)://[^\\s<>\"']+"), // URL (RFC 3986 schemes in common use)
            Pattern.compile("(?i)\\bwww\\.[^\\s<>\"']+"),
            Pattern.compile("\\b\\d{1,3}(?:\\.\\d{1,3}){3}\\b"), // IPv4 dotted quad
            Pattern.compile("(?i)\\b(?:[a-z0-9](?:[a-z0-9-]{0,61}[a-z0-9])?\\.)+[a-z]{2,24}\\b")); // host name (RFC 1123)

    private static final String MONTH = "(?:Jan|Feb|Mar|Apr|May|Jun|Jul|Aug|Sep|Oct|Nov|Dec)[a-z]*\\.?";
    private static final List<Pattern> IDENTIFIER = List.of(
            Pattern.compile("\\b\\d{4}-\\d{2}-\\d{2}(?:[T ]\\d{2}:\\d{2}(?::\\d{2})?)?"), // ISO 8601 date and time
            Pattern.compile("\\b\\d{1,2}[/.]\\d{1,2}[/.]\\d{2,4}\\b"), // numeric day/month/year
            Pattern.compile("\\b\\d{1,2} " + MONTH + " \\d{4}\\b"), // RFC 5322 date: 22 Aug 2002
            Pattern.compile("\\b" + MONTH + " \\d{1,2},? \\d{4}\\b"), // Aug 22, 2002
            Pattern.compile("\\b\\d{1,2}:\\d{2}(?::\\d{2})?(?:\\s?[AaPp][Mm])?\\b"), // time of day
            // time-zone offset after white space: RE2 has no look-behind, so the space is matched
            // and left unmarked (see markPattern)
            Pattern.compile("\\s[+-]\\d{4}\\b"),
            Pattern.compile("\\b[A-Z]{2,8}[-_#/]?\\d{2,}\\b"), // queue or ticket code: INC0012, OGX-4471
            Pattern.compile("\\b[A-Za-z]{1,8}[-_#]\\d+\\b"), // prefixed number: ref-17, case#9
            Pattern.compile("#\\d+\\b"), // numbered reference
            Pattern.compile("\\b\\d{4,}\\b")); // long number: order, ticket, account
    /**
     * Mixed code or hex id: a word of letters and digits with at least one of each. RE2 has no
     * look-ahead, so the word must start with letters then a digit or digits then a letter, which
     * every such word does; words shorter than {@link #MIXED_MIN} are skipped after matching.
     */
    private static final Pattern MIXED = Pattern.compile("\\b(?:[A-Za-z]+[0-9]|[0-9]+[A-Za-z])[A-Za-z0-9]*\\b");
    private static final int MIXED_MIN = 6;

    private final byte[] kinds;
    /** For each character, the index in {@link #places} of the place that decided its kind; -1 in content. */
    private final int[] owners;
    private final List<Place> places;

    private Places(byte[] kinds, int[] owners, List<Place> places) {
        this.kinds = kinds;
        this.owners = owners;
        this.places = List.copyOf(places);
    }

    /**
     * One place of a text that is not content: a header field (with its continuation lines), a
     * repeated line, an address or an identifier, and the key that groups it with the same place in
     * other documents ({@link PlaceKeys}).
     *
     * @param span  where it is
     * @param kind  its kind
     * @param key   the grouping key: a field name, a line template, a host or an identifier shape,
     *              normalised so that variants meet
     * @param shown the same, as written in this text (a field name's case, a line as it stands)
     */
    public record Place(Span span, ArtefactKind kind, String key, String shown) {
    }

    /** The places of {@code text}; {@code boilerplate} says whether a trimmed line is repeated across the corpus. */
    public static Places of(String text, Predicate<String> boilerplate) {
        byte[] kinds = new byte[text.length()];
        Arrays.fill(kinds, (byte) ArtefactKind.CONTENT.ordinal());
        int[] owners = new int[text.length()];
        Arrays.fill(owners, -1);
        List<Place> places = new java.util.ArrayList<>();
        List<Span> lines = TextLines.of(text);
        for (Span line : lines) {
            String content = text.substring(line.start(), line.end());
            if (boilerplate.test(content)) {
                String shown = PlaceKeys.lineShown(content);
                add(kinds, owners, places, new Place(line, ArtefactKind.BOILERPLATE, PlaceKeys.lineTemplate(shown), shown));
            }
        }
        List<Span> tokens = tokens(text);
        List<Span> windows = digitWindows(text, tokens);
        List<Span> addressTokens = tokens.stream().filter(token -> mayHoldAddress(text, token)).toList();
        for (Pattern pattern : IDENTIFIER) {
            markPattern(kinds, owners, places, text, windows, pattern, 0, ArtefactKind.IDENTIFIER);
        }
        markPattern(kinds, owners, places, text, windows, MIXED, MIXED_MIN, ArtefactKind.IDENTIFIER);
        for (Pattern pattern : ADDRESS) {
            markPattern(kinds, owners, places, text, addressTokens, pattern, 0, ArtefactKind.ADDRESS);
        }
        for (Place field : headerFields(text, lines)) {
            add(kinds, owners, places, field);
        }
        return new Places(kinds, owners, places);
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
     * The place that decides the kind of an occurrence (the first of its characters in the most
     * specific place), or {@code null} when the occurrence is content.
     */
    public Place placeOf(Span span) {
        int best = ArtefactKind.CONTENT.ordinal();
        int owner = -1;
        for (int i = span.start(); i < span.end() && i < kinds.length; i++) {
            if (kinds[i] < best) {
                best = kinds[i];
                owner = owners[i];
            }
        }
        return owner < 0 ? null : places.get(owner);
    }

    /** Every place found, in the order found (repeated lines, identifiers, addresses, header fields). */
    public List<Place> places() {
        return places;
    }

    /**
     * The header regions of a text: the leading block of field lines (after an optional mbox
     * {@code From } line; folded continuation lines included, RFC 5322 §2.2.3), every run of two
     * or more field lines elsewhere, single field lines whose name is metadata-style, and the
     * name of any other field line.
     */
    static List<Span> headerRegions(String text, List<Span> lines) {
        java.util.ArrayList<Span> regions = new java.util.ArrayList<>();
        scanHeaders(text, lines, regions, new java.util.ArrayList<>());
        return regions;
    }

    /**
     * The header regions of {@link #headerRegions} cut into fields: each field line with its
     * folded continuation lines, keyed by its field name in lower case (RFC 5322 §1.2.2: field
     * names are case-insensitive); the mbox separator line is the field {@code From_}.
     */
    static List<Place> headerFields(String text, List<Span> lines) {
        List<Place> fields = new java.util.ArrayList<>();
        scanHeaders(text, lines, new java.util.ArrayList<>(), fields);
        return fields;
    }

    private static void scanHeaders(String text, List<Span> lines, List<Span> regions, List<Place> fields) {
        int i = 0;
        if (!lines.isEmpty() && isMboxFrom(text, lines.get(0))) {
            regions.add(lines.get(0));
            fields.add(new Place(lines.get(0), ArtefactKind.HEADER, "from_", "From_"));
            i = 1;
        }
        while (i < lines.size()) {
            int runStart = i;
            int count = 0;
            int j = i;
            while (j < lines.size()) {
                String line = slice(text, lines.get(j));
                if (FIELD.matcher(line).lookingAt()) {
                    count++;
                } else if (count > 0 && !line.isBlank() && (line.charAt(0) == ' ' || line.charAt(0) == '\t')) {
                    // folded continuation of the field above
                } else {
                    break;
                }
                j++;
            }
            boolean leading = runStart <= 1 && (j >= lines.size() || slice(text, lines.get(j)).isBlank());
            if (count >= 2 || (count == 1 && leading)) {
                regions.add(new Span(lines.get(runStart).start(), lines.get(j - 1).end()));
                fieldsOf(text, lines, runStart, j, fields);
            } else if (count == 1) {
                String line = slice(text, lines.get(runStart));
                java.util.regex.Matcher m = FIELD.matcher(line);
                m.lookingAt();
                int start = lines.get(runStart).start();
                String name = m.group(1);
                Span region = METADATA_NAME.matcher(name).matches()
                        ? new Span(start, lines.get(j - 1).end())
                        : new Span(start, start + m.end(1));
                regions.add(region);
                fields.add(new Place(region, ArtefactKind.HEADER, PlaceKeys.fieldKey(name), name));
            }
            i = Math.max(j, i + 1);
        }
    }

    /** The fields of the block of lines {@code [from, to)}: each field line with the continuation lines after it. */
    private static void fieldsOf(String text, List<Span> lines, int from, int to, List<Place> fields) {
        int k = from;
        while (k < to) {
            java.util.regex.Matcher m = FIELD.matcher(slice(text, lines.get(k)));
            if (!m.lookingAt()) {
                k++; // a continuation line before any field cannot start a block; kept for safety
                continue;
            }
            int last = k + 1;
            while (last < to && !FIELD.matcher(slice(text, lines.get(last))).lookingAt()) {
                last++;
            }
            String name = m.group(1);
            fields.add(new Place(new Span(lines.get(k).start(), lines.get(last - 1).end()), ArtefactKind.HEADER,
                    PlaceKeys.fieldKey(name), name));
            k = last;
        }
    }

    private static String slice(String text, Span span) {
        return text.substring(span.start(), span.end());
    }

    /** The mbox separator line ("From sender date") that precedes an RFC 5322 message in a mailbox. */
    private static boolean isMboxFrom(String text, Span line) {
        return line.end() - line.start() > 5 && text.startsWith("From ", line.start())
                && !Character.isWhitespace(text.charAt(line.start() + 5));
    }

    /*
     * Prefilter. The patterns above are linear, but each one still reads every character it is
     * given, and ten of them over a 50,000-character run cost more than the rest of the audit of
     * that document. So each pattern reads only the text where it can match:
     *
     * - No address pattern matches across white space (every class in them excludes it), and each
     *   needs an '@', "://" or '.'; so they run on the white-space-free tokens holding one of these.
     * - Every identifier pattern needs a digit and spans at most three tokens (a date such as
     *   "22 Aug 2002" or "Aug 22, 2002"; a time and "PM"; white space and an offset), each within
     *   one token of a token with a digit; so they run on windows reaching one token either side
     *   of every token with a digit, overlapping windows merged.
     *
     * Tokens are split at RE2's \s ([\t\n\f\r ]), the only white space the patterns name, and a
     * window or token edge always sits next to that white space or the text's end, where \b
     * holds as it does in the whole text: the marks are exactly those of a scan of the whole text.
     */

    /** RE2's perl class \s (RE2 syntax: "whitespace (== [\t\n\f\r ])"). */
    private static boolean isPatternSpace(char c) {
        return c == ' ' || c == '\t' || c == '\n' || c == '\f' || c == '\r';
    }

    /** The maximal runs of characters other than {@link #isPatternSpace} white space. */
    private static List<Span> tokens(String text) {
        List<Span> tokens = new ArrayList<>();
        int i = 0;
        while (i < text.length()) {
            while (i < text.length() && isPatternSpace(text.charAt(i))) {
                i++;
            }
            int start = i;
            while (i < text.length() && !isPatternSpace(text.charAt(i))) {
                i++;
            }
            if (i > start) {
                tokens.add(new Span(start, i));
            }
        }
        return tokens;
    }

    private static boolean mayHoldAddress(String text, Span token) {
        for (int i = token.start(); i < token.end(); i++) {
            char c = text.charAt(i);
            if (c == '@' || c == '.' || (c == ':' && text.startsWith("//", i + 1))) {
                return true;
            }
        }
        return false;
    }

    private static boolean hasDigit(String text, Span token) {
        for (int i = token.start(); i < token.end(); i++) {
            char c = text.charAt(i);
            if (c >= '0' && c <= '9') {
                return true;
            }
        }
        return false;
    }

    /**
     * For every token with a digit, the text from the end of the token two before it to the start
     * of the token two after it (the white space around its neighbours included), merged.
     */
    private static List<Span> digitWindows(String text, List<Span> tokens) {
        List<Span> windows = new ArrayList<>();
        for (int k = 0; k < tokens.size(); k++) {
            if (!hasDigit(text, tokens.get(k))) {
                continue;
            }
            int start = k >= 2 ? tokens.get(k - 2).end() : 0;
            int end = k + 2 < tokens.size() ? tokens.get(k + 2).start() : text.length();
            Span last = windows.isEmpty() ? null : windows.get(windows.size() - 1);
            if (last != null && start <= last.end()) {
                windows.set(windows.size() - 1, new Span(last.start(), Math.max(end, last.end())));
            } else {
                windows.add(new Span(start, end));
            }
        }
        return windows;
    }

    /**
     * Marks every match within {@code regions} (in the order of the regions, which is the text's)
     * of at least {@code minLength} characters, leading white space left out.
     */
    private static void markPattern(byte[] kinds, int[] owners, List<Place> places, String text, List<Span> regions,
            Pattern pattern, int minLength, ArtefactKind kind) {
        for (Span region : regions) {
            Matcher m = pattern.matcher(CharBuffer.wrap(text, region.start(), region.end()));
            while (m.find()) {
                int start = region.start() + m.start();
                int end = region.start() + m.end();
                while (start < end && Character.isWhitespace(text.charAt(start))) {
                    start++;
                }
                if (end - start >= minLength) {
                    String match = text.substring(start, end);
                    String key = kind == ArtefactKind.ADDRESS ? PlaceKeys.host(match) : PlaceKeys.shapeKey(match);
                    String shown = kind == ArtefactKind.ADDRESS ? key : PlaceKeys.shape(match);
                    add(kinds, owners, places, new Place(new Span(start, end), kind, key, shown));
                }
            }
        }
    }

    /**
     * Records {@code place} and marks its characters: a more specific kind takes a character over;
     * among places of one kind, the first found keeps it (a ticket code before the number inside it).
     */
    private static void add(byte[] kinds, int[] owners, List<Place> places, Place place) {
        int index = places.size();
        places.add(place);
        byte k = (byte) place.kind().ordinal();
        for (int i = place.span().start(); i < place.span().end(); i++) {
            if (kinds[i] > k) {
                kinds[i] = k;
                owners[i] = index;
            }
        }
    }
}
