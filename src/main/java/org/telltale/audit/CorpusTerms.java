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
    /** Per term, its occurrences in each place by place id ({@link #placeId}): what groups terms into artefacts. */
    private final Map<String, HashMap<String, Long>> placeCounts = new HashMap<>();
    /** Per place id, the smallest way it was written: one spelling whatever order documents come in. */
    private final Map<String, String> shown = new HashMap<>();
    /** Per identifier place id, its smallest distinct values, at most {@link #VALUES_KEPT}: whether its digits vary. */
    private final Map<String, java.util.TreeSet<String>> values = new HashMap<>();
    /** Per term, its identifier occurrences that are a whole identifier (a code such as {@code xr980}). */
    private final Map<String, long[]> wholeCodes = new HashMap<>();

    /** Distinct values kept per identifier shape; enough to tell a shape whose digits vary from a fixed code. */
    static final int VALUES_KEPT = 8;
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
            placeCounts.put(term, new HashMap<>());
            wholeCodes.put(term, new long[1]);
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
        other.placeCounts.forEach((term, counts) -> {
            Map<String, Long> into = placeCounts.get(term);
            counts.forEach((id, n) -> into.merge(id, n, Long::sum));
        });
        other.shown.forEach(this::show);
        other.values.forEach((id, vs) -> vs.forEach(v -> value(id, v)));
        other.wholeCodes.forEach((term, n) -> wholeCodes.get(term)[0] += n[0]);
    }

    private void value(String id, String value) {
        java.util.TreeSet<String> kept = values.computeIfAbsent(id, k -> new java.util.TreeSet<>());
        kept.add(value);
        if (kept.size() > VALUES_KEPT) {
            kept.pollLast();
        }
    }

    private void show(String id, String written) {
        shown.merge(id, written, (a, b) -> a.compareTo(b) <= 0 ? a : b);
    }

    /** The id of a place across documents: its kind and its key. */
    static String placeId(ArtefactKind kind, String key) {
        return kind.key() + "\t" + key;
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
            Map<String, Long> keyed = placeCounts.get(unit.term());
            for (Span span : unit.spans()) {
                Places.Place place = where.placeOf(span);
                p[place == null ? ArtefactKind.CONTENT.ordinal() : place.kind().ordinal()]++;
                if (place != null) {
                    String id = placeId(place.kind(), place.key());
                    keyed.merge(id, 1L, Long::sum);
                    show(id, place.shown());
                    if (place.kind() == ArtefactKind.IDENTIFIER) {
                        value(id, text.substring(place.span().start(), place.span().end()).toLowerCase(java.util.Locale.ROOT));
                        if (place.span().equals(span)) {
                            wholeCodes.get(unit.term())[0]++;
                        }
                    }
                }
            }
        }
    }

    /** A place of one kind in the corpus: its key and how it is shown. */
    record PlaceRef(ArtefactKind kind, String key, String shown) {
    }

    /**
     * The place of {@code kind} that holds most of the term's occurrences of that kind (ties to the
     * smaller key), or {@code null} when none does.
     */
    PlaceRef dominantPlace(String term, ArtefactKind kind) {
        Map<String, Long> counts = placeCounts.get(term);
        if (counts == null) {
            return null;
        }
        String prefix = kind.key() + "\t";
        String best = null;
        long most = 0;
        for (Map.Entry<String, Long> e : counts.entrySet()) {
            if (!e.getKey().startsWith(prefix)) {
                continue;
            }
            if (e.getValue() > most || (e.getValue() == most && best != null && e.getKey().compareTo(best) < 0)) {
                best = e.getKey();
                most = e.getValue();
            }
        }
        return best == null ? null : new PlaceRef(kind, best.substring(prefix.length()), shown.get(best));
    }

    /** The term's occurrences in the place of {@code kind} and {@code key}. */
    long occurrencesIn(String term, ArtefactKind kind, String key) {
        Map<String, Long> counts = placeCounts.get(term);
        return counts == null ? 0 : counts.getOrDefault(placeId(kind, key), 0L);
    }

    /** The term's occurrences in places of {@code kind}. */
    long occurrencesOfKind(String term, ArtefactKind kind) {
        long[] p = places.get(term);
        return p == null ? 0 : p[kind.ordinal()];
    }

    /** How many distinct values the identifier place {@code key} took, counted up to {@link #VALUES_KEPT}. */
    int distinctValues(String key) {
        java.util.TreeSet<String> kept = values.get(placeId(ArtefactKind.IDENTIFIER, key));
        return kept == null ? 0 : kept.size();
    }

    /** Share of the term's identifier occurrences that are a whole identifier by themselves. */
    double wholeCodeShare(String term) {
        long[] p = places.get(term);
        long identifier = p == null ? 0 : p[ArtefactKind.IDENTIFIER.ordinal()];
        return identifier == 0 ? 0 : (double) wholeCodes.get(term)[0] / identifier;
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
