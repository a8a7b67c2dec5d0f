package org.telltale.audit;

import java.io.Serializable;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.analysis.Analyzer;
import org.telltale.text.Span;
import org.telltale.text.TermIndex;
import org.telltale.text.Unit;
import org.telltale.text.UnitKind;

/**
 * Corpus-wide counts for the terms an audit tests, gathered in one streaming pass: documents
 * containing each term per label, and where the term's occurrences sit (the {@link Places} of
 * each document). Memory grows with the tested terms, never with the corpus.
 *
 * <p>Counts made over disjoint parts of a corpus {@link #merge} into the counts of the whole, and
 * travel between machines (the analyzer and the line counts stay behind: a received count only
 * merges and answers). Not thread-safe.
 */
public final class CorpusTerms implements Serializable {
    private static final long serialVersionUID = 1L;

    private final List<String> labels;
    private final transient Analyzer analyzer;
    private final transient LineRepeats repeats;
    private final Map<String, long[]> df = new HashMap<>();
    private final Map<String, long[]> places = new HashMap<>();
    private final long[] labelTotals;
    private long documents;

    /**
     * @param terms    the terms to count (those the explanations selected)
     * @param labels   the labels of the association basis, in the model's order
     * @param analyzer the analyzer the explanations used, so terms match
     * @param repeats  line repetition counts from an earlier pass over the same corpus
     */
    CorpusTerms(Set<String> terms, List<String> labels, Analyzer analyzer, LineRepeats repeats) {
        this.labels = List.copyOf(labels);
        this.analyzer = analyzer;
        this.repeats = repeats;
        this.labelTotals = new long[labels.size()];
        for (String term : terms) {
            df.put(term, new long[labels.size()]);
            places.put(term, new long[ArtefactKind.values().length]);
        }
    }

    /** An empty count of {@code terms} under {@code labels}, for one stream or for one part of a corpus. */
    public static CorpusTerms of(Set<String> terms, List<String> labels, Analyzer analyzer, LineRepeats repeats) {
        return new CorpusTerms(terms, labels, analyzer, repeats);
    }

    /** Adds the counts of {@code other}, made over other documents for the same terms and labels. */
    public void merge(CorpusTerms other) {
        if (!other.labels.equals(labels) || !other.df.keySet().equals(df.keySet())) {
            throw new IllegalArgumentException("term counts for other terms or labels do not merge");
        }
        documents += other.documents;
        for (int i = 0; i < labelTotals.length; i++) {
            labelTotals[i] += other.labelTotals[i];
        }
        other.df.forEach((term, counts) -> add(df.get(term), counts));
        other.places.forEach((term, counts) -> add(places.get(term), counts));
    }

    private static void add(long[] into, long[] counts) {
        for (int i = 0; i < into.length; i++) {
            into[i] += counts[i];
        }
    }

    /** Counts one document under {@code basisLabel} (its gold label, or the model's prediction). */
    public void add(String text, String basisLabel) {
        int l = labels.indexOf(basisLabel);
        if (l < 0) {
            return; // a gold label the model does not know: no prior to test it against
        }
        documents++;
        labelTotals[l]++;
        TermIndex index = TermIndex.of(text, analyzer, UnitKind.WORD);
        Places where = null;
        for (Unit unit : index.units()) {
            long[] counts = df.get(unit.term());
            if (counts == null) {
                continue;
            }
            counts[l]++;
            if (where == null) {
                where = Places.of(text, repeats::isBoilerplate);
            }
            long[] p = places.get(unit.term());
            for (Span span : unit.spans()) {
                p[where.kindOf(span).ordinal()]++;
            }
        }
    }

    long documents() {
        return documents;
    }

    /** Documents per label of the basis. */
    Map<String, Long> labelTotals() {
        Map<String, Long> out = new LinkedHashMap<>();
        for (int i = 0; i < labels.size(); i++) {
            out.put(labels.get(i), labelTotals[i]);
        }
        return out;
    }

    /** Documents containing {@code term}, per label. */
    Map<String, Long> df(String term) {
        long[] counts = df.get(term);
        Map<String, Long> out = new LinkedHashMap<>();
        for (int i = 0; i < labels.size(); i++) {
            out.put(labels.get(i), counts == null ? 0 : counts[i]);
        }
        return out;
    }

    /** Share of the term's occurrences in each place, in {@link ArtefactKind} order. */
    Map<ArtefactKind, Double> kindShares(String term) {
        long[] p = places.get(term);
        Map<ArtefactKind, Double> out = new EnumMap<>(ArtefactKind.class);
        long total = 0;
        for (long c : p == null ? new long[0] : p) {
            total += c;
        }
        for (ArtefactKind kind : ArtefactKind.values()) {
            out.put(kind, total == 0 ? 0 : (double) p[kind.ordinal()] / total);
        }
        return out;
    }

    /**
     * The term's kind: the non-content place that holds most of its occurrences, when places other
     * than content hold at least half of them; otherwise {@code content}.
     */
    ArtefactKind kind(String term) {
        Map<ArtefactKind, Double> shares = kindShares(term);
        double nonContent = 1 - shares.get(ArtefactKind.CONTENT);
        if (nonContent < 0.5 || shares.values().stream().allMatch(v -> v == 0)) {
            return ArtefactKind.CONTENT;
        }
        ArtefactKind best = ArtefactKind.HEADER;
        for (ArtefactKind kind : ArtefactKind.values()) {
            if (kind != ArtefactKind.CONTENT && shares.get(kind) > shares.get(best)) {
                best = kind;
            }
        }
        return best;
    }
}
