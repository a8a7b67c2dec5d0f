package org.telltale.audit;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.function.Predicate;
import org.apache.lucene.analysis.Analyzer;
import org.telltale.text.Span;
import org.telltale.text.TermIndex;
import org.telltale.text.Unit;
import org.telltale.text.UnitKind;

/**
 * Rewrites a document for the scrub test: without given terms (every occurrence cut out), or
 * without the whole header blocks or repeated lines that hold them. Characters outside the cuts
 * stay exactly as they were.
 *
 * <p>Immutable and thread-safe.
 */
final class Rewriter {
    /** How a kind is scrubbed: its terms alone, or the lines and blocks around them. */
    enum Mode {
        TERMS, LINES;

        String key() {
            return this == TERMS ? "terms" : "lines";
        }
    }

    private final Analyzer analyzer;
    private final Predicate<String> boilerplate;

    Rewriter(Analyzer analyzer, Predicate<String> boilerplate) {
        this.analyzer = analyzer;
        this.boilerplate = boilerplate;
    }

    Analyzer analyzer() {
        return analyzer;
    }

    /** Header blocks and repeated lines go whole; addresses, identifiers and content go term by term. */
    static Mode modeOf(ArtefactKind kind) {
        return kind == ArtefactKind.HEADER || kind == ArtefactKind.BOILERPLATE ? Mode.LINES : Mode.TERMS;
    }

    /** The spans where {@code terms} occur in {@code text}. */
    List<Span> occurrences(String text, Set<String> terms) {
        List<Span> spans = new ArrayList<>();
        for (Unit unit : TermIndex.of(text, analyzer, UnitKind.WORD).units()) {
            if (terms.contains(unit.term())) {
                spans.addAll(unit.spans());
            }
        }
        return spans;
    }

    /** {@code text} scrubbed of {@code terms} as {@code kind} prescribes; the same string when nothing matched. */
    String scrub(String text, ArtefactKind kind, Set<String> terms) {
        List<Span> hits = occurrences(text, terms);
        if (hits.isEmpty()) {
            return text;
        }
        if (modeOf(kind) == Mode.TERMS) {
            return cut(text, hits);
        }
        List<Span> regions = new ArrayList<>();
        if (kind == ArtefactKind.HEADER) {
            regions.addAll(Places.headerRegions(text, TextLines.of(text)));
        } else {
            for (Span line : TextLines.of(text)) {
                if (boilerplate.test(text.substring(line.start(), line.end()))) {
                    regions.add(line);
                }
            }
        }
        List<Span> cuts = new ArrayList<>();
        for (Span region : regions) {
            if (hits.stream().anyMatch(region::overlaps)) {
                cuts.add(TextLines.withTerminator(text, region));
            }
        }
        return cut(text, cuts);
    }

    /** {@code text} without the given spans, which may overlap. */
    static String cut(String text, List<Span> spans) {
        List<Span> sorted = new ArrayList<>(spans);
        sorted.sort(null);
        StringBuilder out = new StringBuilder(text.length());
        int cursor = 0;
        for (Span s : sorted) {
            if (s.end() <= cursor) {
                continue;
            }
            out.append(text, cursor, Math.max(cursor, s.start()));
            cursor = s.end();
        }
        out.append(text, cursor, text.length());
        return out.toString();
    }
}
