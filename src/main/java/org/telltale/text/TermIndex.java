package org.telltale.text;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.analysis.tokenattributes.OffsetAttribute;

/**
 * A document cut into explanation units, each with every span where it occurs in the original
 * text. Units are numbered in order of first appearance; that number is the feature index the
 * explainer uses.
 *
 * <p>Spans never overlap, across all units of one index: when a filter emits several tokens
 * over the same text (synonyms, n-grams, word parts kept beside the whole word), the first token
 * to claim the text keeps it and the later overlapping tokens are folded into it (counted in
 * {@link #note()}). So cutting a unit's spans never cuts into another unit's.
 *
 * <p>The number of units can be capped ({@link #of(String, Analyzer, UnitKind, int)},
 * {@link #limit(int)}): a 1 MB e-mail thread may hold 50,000 distinct terms, and an explanation
 * over all of them costs memory and probes for little. Word units keep the most frequent terms
 * (ties: the earlier first); occurrence and line units keep the first ones. Units left out are
 * never masked, so they stay in every probe; {@link #note()} says how many.
 *
 * <p>Immutable and thread-safe once built.
 */
public final class TermIndex {
    private final String text;
    private final UnitKind kind;
    private final List<Unit> units;
    private final int totalUnits;
    private final int foldedTokens;
    /** All spans of all units, sorted by start: the masker walks these with one cursor. */
    private final int[] spanStarts;
    private final int[] spanEnds;
    private final int[] spanUnits;
    private Map<String, Integer> byTerm;

    private TermIndex(String text, UnitKind kind, List<Unit> units, int totalUnits, int foldedTokens) {
        this.text = text;
        this.kind = kind;
        this.units = List.copyOf(units);
        this.totalUnits = totalUnits;
        this.foldedTokens = foldedTokens;
        int spans = 0;
        for (Unit unit : this.units) {
            spans += unit.spans().size();
        }
        long[] order = new long[spans];
        int at = 0;
        for (int u = 0; u < this.units.size(); u++) {
            for (Span span : this.units.get(u).spans()) {
                order[at++] = ((long) span.start() << 32) | u; // sorts by start; starts are distinct
            }
        }
        Arrays.sort(order);
        spanStarts = new int[spans];
        spanEnds = new int[spans];
        spanUnits = new int[spans];
        int[] next = new int[this.units.size()];
        for (int i = 0; i < spans; i++) {
            int u = (int) order[i];
            Span span = this.units.get(u).spans().get(next[u]++);
            spanStarts[i] = span.start();
            spanEnds[i] = span.end();
            spanUnits[i] = u;
        }
    }

    /** Cuts {@code text} into units of {@code kind}; {@code analyzer} is unused for lines. */
    public static TermIndex of(String text, Analyzer analyzer, UnitKind kind) {
        return of(text, analyzer, kind, Integer.MAX_VALUE);
    }

    /**
     * Cuts {@code text} into at most {@code maxUnits} units of {@code kind} (see the class
     * comment for which are kept).
     */
    public static TermIndex of(String text, Analyzer analyzer, UnitKind kind, int maxUnits) {
        if (maxUnits < 1) {
            throw new IllegalArgumentException("maxUnits must be at least 1: " + maxUnits);
        }
        Tokens tokens = kind == UnitKind.LINE ? null : tokens(text, analyzer);
        List<Unit> all = switch (kind) {
            case WORD -> words(tokens);
            case OCCURRENCE -> occurrences(tokens);
            case LINE -> lines(text);
        };
        return new TermIndex(text, kind, keep(all, kind, maxUnits), all.size(), tokens == null ? 0 : tokens.folded);
    }

    /** This index with at most {@code maxUnits} units; itself when it already has no more. */
    public TermIndex limit(int maxUnits) {
        if (maxUnits < 1) {
            throw new IllegalArgumentException("maxUnits must be at least 1: " + maxUnits);
        }
        return units.size() <= maxUnits ? this : new TermIndex(text, kind, keep(units, kind, maxUnits), totalUnits, foldedTokens);
    }

    public String text() {
        return text;
    }

    public UnitKind kind() {
        return kind;
    }

    public List<Unit> units() {
        return units;
    }

    /** The number of units, d, the dimension of the explanation. */
    public int size() {
        return units.size();
    }

    /** The number of units the text has before any cap. */
    public int totalUnits() {
        return totalUnits;
    }

    /** Units left out by the cap; they are never masked. */
    public int leftOut() {
        return totalUnits - units.size();
    }

    /** The number of the unit whose term is {@code term}, or -1; for lines, the first such line. */
    public int indexOf(String term) {
        Map<String, Integer> map = byTerm;
        if (map == null) {
            map = new HashMap<>();
            for (int u = units.size() - 1; u >= 0; u--) {
                map.put(units.get(u).term(), u);
            }
            byTerm = map;
        }
        return map.getOrDefault(term, -1);
    }

    /**
     * What an explanation of this index should tell its reader about units it does not cover,
     * e.g. {@code kept 2000 of 50000 word units (the most frequent); the other 48000 stay in every
     * probe}; empty when every token is a unit of its own.
     */
    public String note() {
        List<String> parts = new ArrayList<>();
        if (leftOut() > 0) {
            parts.add(String.format(Locale.ROOT, "kept %d of %d %s units (%s); the other %d stay in every probe",
                    units.size(), totalUnits, kind.key(), kind == UnitKind.WORD ? "the most frequent" : "the first", leftOut()));
        }
        if (foldedTokens > 0) {
            parts.add(foldedTokens + " overlapping " + (foldedTokens == 1 ? "token was" : "tokens were") + " folded into earlier ones");
        }
        return String.join("; ", parts);
    }

    /** The number of spans over all units. */
    public int spanCount() {
        return spanStarts.length;
    }

    int spanStart(int i) {
        return spanStarts[i];
    }

    int spanEnd(int i) {
        return spanEnds[i];
    }

    int spanUnit(int i) {
        return spanUnits[i];
    }

    private static List<Unit> keep(List<Unit> all, UnitKind kind, int maxUnits) {
        if (all.size() <= maxUnits) {
            return all;
        }
        if (kind != UnitKind.WORD) {
            return all.subList(0, maxUnits);
        }
        Integer[] order = new Integer[all.size()];
        for (int i = 0; i < order.length; i++) {
            order[i] = i;
        }
        // Most spans first; a stable sort keeps earlier units first among equals.
        Arrays.sort(order, (a, b) -> Integer.compare(all.get(b).spans().size(), all.get(a).spans().size()));
        Integer[] kept = Arrays.copyOf(order, maxUnits);
        Arrays.sort(kept);
        List<Unit> out = new ArrayList<>(maxUnits);
        for (Integer u : kept) {
            out.add(all.get(u));
        }
        return out;
    }

    private static List<Unit> words(Tokens tokens) {
        Map<String, List<Span>> byTerm = new LinkedHashMap<>();
        for (int i = 0; i < tokens.terms.size(); i++) {
            byTerm.computeIfAbsent(tokens.terms.get(i), t -> new ArrayList<>()).add(tokens.spans.get(i));
        }
        List<Unit> units = new ArrayList<>(byTerm.size());
        byTerm.forEach((term, spans) -> units.add(new Unit(term, spans)));
        return units;
    }

    private static List<Unit> occurrences(Tokens tokens) {
        List<Unit> units = new ArrayList<>(tokens.terms.size());
        for (int i = 0; i < tokens.terms.size(); i++) {
            units.add(new Unit(tokens.terms.get(i), Collections.singletonList(tokens.spans.get(i))));
        }
        return units;
    }

    /** Non-blank lines; the span covers the line without its terminator (LF, CRLF or CR). */
    private static List<Unit> lines(String text) {
        List<Unit> units = new ArrayList<>();
        int start = 0;
        int n = text.length();
        while (start <= n) {
            int end = start;
            while (end < n && text.charAt(end) != '\n' && text.charAt(end) != '\r') {
                end++;
            }
            String line = text.substring(start, end);
            if (!line.isBlank()) {
                units.add(new Unit(line.strip(), List.of(new Span(start, end))));
            }
            if (end >= n) {
                break;
            }
            start = end + (text.charAt(end) == '\r' && end + 1 < n && text.charAt(end + 1) == '\n' ? 2 : 1);
        }
        return units;
    }

    /** The tokens of a text in order, none overlapping another. */
    private static final class Tokens {
        final List<String> terms = new ArrayList<>();
        final List<Span> spans = new ArrayList<>();
        int folded;
    }

    private static Tokens tokens(String text, Analyzer analyzer) {
        Tokens tokens = new Tokens();
        int[] claimedUpTo = {0};
        forEachToken(text, analyzer, (term, span) -> {
            if (span.start() < claimedUpTo[0]) {
                tokens.folded++;
                return;
            }
            tokens.terms.add(term);
            tokens.spans.add(span);
            claimedUpTo[0] = span.end();
        });
        return tokens;
    }

    interface TokenSink {
        void accept(String term, Span span);
    }

    /** Every token with a non-empty span inside the text, as the analyzer emits them. */
    static void forEachToken(String text, Analyzer analyzer, TokenSink sink) {
        try (TokenStream stream = analyzer.tokenStream("text", text)) {
            CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
            OffsetAttribute offset = stream.addAttribute(OffsetAttribute.class);
            stream.reset();
            while (stream.incrementToken()) {
                int start = offset.startOffset();
                int end = offset.endOffset();
                // Filters such as word-delimiter may report offsets past the text; drop those.
                if (start >= 0 && end <= text.length() && start < end) {
                    sink.accept(term.toString(), new Span(start, end));
                }
            }
            stream.end();
        } catch (IOException e) {
            throw new UncheckedIOException("analyzer failed on an in-memory string", e);
        } catch (IllegalArgumentException | IllegalStateException | IndexOutOfBoundsException e) {
            // A custom chain whose parameters only fail on some texts (a replacement naming a
            // group the pattern lacks, say): a clear error rather than a stack trace.
            throw new org.telltale.TelltaleException("the analyzer failed on a text of " + text.length() + " characters: " + e, e);
        }
    }
}
