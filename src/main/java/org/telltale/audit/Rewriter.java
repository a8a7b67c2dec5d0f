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
    private final Analyzer analyzer;
    private final Predicate<String> boilerplate;

    Rewriter(Analyzer analyzer, Predicate<String> boilerplate) {
        this.analyzer = analyzer;
        this.boilerplate = boilerplate;
    }

    Analyzer analyzer() {
        return analyzer;
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

    /** What one artefact's scrub removes: its place (kind and key) wherever it holds one of its terms. */
    record Target(ArtefactKind kind, String key, Set<String> terms) implements java.io.Serializable {
        private static final long serialVersionUID = 1L;

        Target {
            java.util.Objects.requireNonNull(kind, "kind");
            terms = java.util.Collections.unmodifiableSet(new java.util.LinkedHashSet<>(terms));
        }
    }

    /**
     * {@code text} without the given artefacts (docs/audit.md, "Scrub test"): a header artefact
     * loses its field lines, a boilerplate artefact its repeated lines (each with its line end),
     * an address every address at its host, an identifier every identifier of its shape — each
     * only where the place holds one of the artefact's terms — and a content artefact its terms.
     * The same string when nothing matched.
     */
    String scrub(String text, List<Target> targets) {
        Set<String> all = new java.util.HashSet<>();
        targets.forEach(t -> all.addAll(t.terms()));
        List<Unit> units = new ArrayList<>();
        for (Unit unit : TermIndex.of(text, analyzer, UnitKind.WORD).units()) {
            if (all.contains(unit.term())) {
                units.add(unit);
            }
        }
        if (units.isEmpty()) {
            return text;
        }
        Places places = null;
        List<Span> cuts = new ArrayList<>();
        for (Target target : targets) {
            List<Span> hits = new ArrayList<>();
            for (Unit unit : units) {
                if (target.terms().contains(unit.term())) {
                    hits.addAll(unit.spans());
                }
            }
            if (hits.isEmpty()) {
                continue;
            }
            if (target.kind() == ArtefactKind.CONTENT) {
                cuts.addAll(hits);
                continue;
            }
            if (places == null) {
                places = Places.of(text, boilerplate);
            }
            for (Places.Place place : places.places()) {
                if (place.kind() == target.kind() && place.key().equals(target.key())
                        && hits.stream().anyMatch(place.span()::overlaps)) {
                    cuts.add(ScrubMode.of(target.kind()) == ScrubMode.LINES ? TextLines.withTerminator(text, place.span())
                            : place.span());
                }
            }
        }
        return cuts.isEmpty() ? text : cut(text, cuts);
    }

    /**
     * The occurrences of {@code target}'s terms in {@code text} that sit in its place (a field of
     * its name, a line of its template, …; anywhere for a content artefact): what a report marks.
     */
    List<Span> marks(String text, Target target) {
        List<Span> hits = occurrences(text, target.terms());
        if (hits.isEmpty() || target.kind() == ArtefactKind.CONTENT) {
            return hits;
        }
        Places places = Places.of(text, boilerplate);
        List<Span> out = new ArrayList<>();
        for (Span hit : hits) {
            Places.Place place = places.placeOf(hit);
            if (place != null && place.kind() == target.kind() && place.key().equals(target.key())) {
                out.add(hit);
            }
        }
        out.sort(null);
        return out;
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
