package org.telltale.report.html;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.telltale.overlap.Banding;
import org.telltale.overlap.Inflation;
import org.telltale.overlap.OverlapPair;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.OverlapSettings;
import org.telltale.overlap.OverlapSummary;
import org.telltale.overlap.PairKind;
import org.telltale.overlap.SharedPassages;
import org.telltale.text.Span;

/**
 * What the overlap report shows, with every number already formatted: the headline, the figures,
 * the settings, and for each kind of pair the first {@link #MAX_PAIRS} pairs side by side with the
 * passages the two texts share marked.
 *
 * @param headline the one-sentence answer: how many test documents were already seen
 * @param figures  counts, as name and value
 * @param accuracy accuracy figures with a model, or an empty list
 * @param settings threshold, shingle, r, b and the candidate probability at the threshold
 * @param sections train–test pairs, then within train, then within test
 */
public record OverlapView(String headline, List<Figure> figures, List<Figure> accuracy, List<Figure> settings,
                          List<Section> sections) {
    /** Pairs shown per section; the JSON has them all. */
    public static final int MAX_PAIRS = 200;

    public record Figure(String name, String value) {
    }

    /**
     * @param shown pairs shown; {@code total} minus their number are only in the JSON
     */
    public record Section(String anchor, String title, String firstRole, String secondRole, List<PairView> shown,
                          long total) {
        public long hidden() {
            return total - shown.size();
        }
    }

    /** One pair; {@code first}/{@code second} are {@code null} when the result carries no texts. */
    public record PairView(String anchor, String firstId, String secondId, String similarity, boolean exact,
                           String firstLabel, String secondLabel, Boolean sameLabel, List<Piece> first,
                           List<Piece> second) {
    }

    /** A run of a document's text, shared with the other document of the pair or not. */
    public record Piece(List<VisibleText.Chunk> chunks, boolean shared) {
    }

    public static OverlapView of(OverlapResult result) {
        OverlapSummary s = result.summary();
        String headline = String.format(Locale.ROOT, "%,d of %,d test documents (%s) already appear in train; %,d with a different label.",
                s.testSeen(), s.testDocuments(), Numbers.percent(s.testSeenShare()), s.testSeenConflicting());
        List<Figure> figures = List.of(
                new Figure("test documents seen in train", count(s.testSeen())),
                new Figure("… as exact copies", count(s.testSeenExact())),
                new Figure("… only as near duplicates", count(s.testSeen() - s.testSeenExact())),
                new Figure("… with a different label", count(s.testSeenConflicting())),
                new Figure("train documents seen in test", count(s.trainSeen())),
                new Figure("train-test pairs (exact)", count(s.trainTestPairs()) + " (" + count(s.exactTrainTestPairs()) + ")"),
                new Figure("pairs within train", count(s.withinTrainPairs())),
                new Figure("pairs within test", count(s.withinTestPairs())),
                new Figure("documents read (train, test)", count(s.trainDocuments()) + ", " + count(s.testDocuments())),
                new Figure("documents without words (train, test)", count(s.trainEmpty()) + ", " + count(s.testEmpty())));
        List<Figure> accuracy = new ArrayList<>();
        Inflation a = result.inflation();
        if (a != null) {
            accuracy.add(new Figure("model", VisibleText.inline(a.model())));
            accuracy.add(new Figure("accuracy, all labelled test documents (" + count(a.labelled()) + ")", Numbers.plain(a.accuracy(), 3)));
            accuracy.add(new Figure("accuracy, not seen in train (" + count(a.labelledUnseen()) + ")", Numbers.plain(a.accuracyUnseen(), 3)));
            accuracy.add(new Figure("accuracy, seen in train (" + count(a.labelled() - a.labelledUnseen()) + ")", Numbers.plain(a.accuracySeen(), 3)));
            accuracy.add(new Figure("what the overlap adds", Double.isNaN(a.inflation()) ? "n/a"
                    : String.format(Locale.ROOT, "%+.1f", 100 * a.inflation()).replace('-', '\u2212') + " points"));
        }
        OverlapSettings settings = result.settings();
        Banding b = settings.banding();
        List<Figure> settingFigures = List.of(
                new Figure("near duplicate", "Jaccard similarity ≥ " + Numbers.plain(settings.threshold(), 2)
                        + " of " + settings.shingle() + "-word shingles"),
                new Figure("MinHash banding", "r = " + b.rows() + " rows × b = " + b.bands() + " bands ("
                        + b.hashes() + " of " + settings.signature() + " hashes)"),
                new Figure("candidate probability at the threshold", Numbers.plain(b.candidateProbability(settings.threshold()), 3)),
                new Figure("candidates verified", count(s.candidates())),
                new Figure("seed", Long.toString(settings.seed())));
        List<Section> sections = List.of(
                section(result, PairKind.TRAIN_TEST, "pairs", "Train-test pairs", "train", "test"),
                section(result, PairKind.WITHIN_TRAIN, "within-train", "Pairs within train", "train", "train"),
                section(result, PairKind.WITHIN_TEST, "within-test", "Pairs within test", "test", "test"));
        return new OverlapView(headline, figures, accuracy, settingFigures, sections);
    }

    private static Section section(OverlapResult result, PairKind kind, String anchor, String title, String firstRole,
                                   String secondRole) {
        List<OverlapPair> pairs = result.pairs(kind);
        Map<String, String> firstTexts = kind == PairKind.WITHIN_TEST ? result.testTexts() : result.trainTexts();
        Map<String, String> secondTexts = kind == PairKind.WITHIN_TRAIN ? result.trainTexts() : result.testTexts();
        int shingle = result.settings().shingle();
        List<PairView> shown = new ArrayList<>();
        for (int i = 0; i < Math.min(MAX_PAIRS, pairs.size()); i++) {
            OverlapPair p = pairs.get(i);
            String a = firstTexts.get(p.first());
            String b = secondTexts.get(p.second());
            shown.add(new PairView(anchor + "-" + (i + 1), VisibleText.inline(p.first()), VisibleText.inline(p.second()),
                    Numbers.plain(p.similarity(), 3), p.exact(), VisibleText.inline(p.firstLabel()),
                    VisibleText.inline(p.secondLabel()), p.sameLabel(),
                    a == null || b == null ? null : pieces(a, SharedPassages.in(a, b, shingle)),
                    a == null || b == null ? null : pieces(b, SharedPassages.in(b, a, shingle))));
        }
        return new Section(anchor, title, firstRole, secondRole, shown, pairs.size());
    }

    static List<Piece> pieces(String text, List<Span> shared) {
        List<Piece> pieces = new ArrayList<>(shared.size() * 2 + 1);
        int at = 0;
        for (Span span : shared) {
            if (span.start() > at) {
                pieces.add(new Piece(VisibleText.chunks(text, at, span.start()), false));
            }
            pieces.add(new Piece(VisibleText.chunks(text, span.start(), span.end()), true));
            at = span.end();
        }
        if (at < text.length()) {
            pieces.add(new Piece(VisibleText.chunks(text, at, text.length()), false));
        }
        return pieces;
    }

    private static String count(long n) {
        return String.format(Locale.ROOT, "%,d", n);
    }
}
