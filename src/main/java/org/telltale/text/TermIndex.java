package org.telltale.text;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
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
 * <p>Immutable and thread-safe once built.
 */
public final class TermIndex {
    private final String text;
    private final UnitKind kind;
    private final List<Unit> units;

    private TermIndex(String text, UnitKind kind, List<Unit> units) {
        this.text = text;
        this.kind = kind;
        this.units = List.copyOf(units);
    }

    /** Cuts {@code text} into units of {@code kind}; {@code analyzer} is unused for lines. */
    public static TermIndex of(String text, Analyzer analyzer, UnitKind kind) {
        return switch (kind) {
            case WORD -> new TermIndex(text, kind, words(text, analyzer));
            case OCCURRENCE -> new TermIndex(text, kind, occurrences(text, analyzer));
            case LINE -> new TermIndex(text, kind, lines(text));
        };
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

    private static List<Unit> words(String text, Analyzer analyzer) {
        Map<String, List<Span>> byTerm = new LinkedHashMap<>();
        forEachToken(text, analyzer, (term, span) -> byTerm.computeIfAbsent(term, t -> new ArrayList<>()).add(span));
        List<Unit> units = new ArrayList<>(byTerm.size());
        byTerm.forEach((term, spans) -> units.add(new Unit(term, spans)));
        return units;
    }

    private static List<Unit> occurrences(String text, Analyzer analyzer) {
        List<Unit> units = new ArrayList<>();
        forEachToken(text, analyzer, (term, span) -> units.add(new Unit(term, List.of(span))));
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

    interface TokenSink {
        void accept(String term, Span span);
    }

    static void forEachToken(String text, Analyzer analyzer, TokenSink sink) {
        try (TokenStream stream = analyzer.tokenStream("text", text)) {
            CharTermAttribute term = stream.addAttribute(CharTermAttribute.class);
            OffsetAttribute offset = stream.addAttribute(OffsetAttribute.class);
            stream.reset();
            while (stream.incrementToken()) {
                int start = offset.startOffset();
                int end = offset.endOffset();
                // Filters such as word-delimiter may report offsets past the text; clamp them.
                if (start >= 0 && end <= text.length() && start < end) {
                    sink.accept(term.toString(), new Span(start, end));
                }
            }
            stream.end();
        } catch (IOException e) {
            throw new UncheckedIOException("analyzer failed on an in-memory string", e);
        }
    }
}
