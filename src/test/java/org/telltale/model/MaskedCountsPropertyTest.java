package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.BitSet;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.Combinators;
import net.jqwik.api.statistics.Statistics;
import net.jqwik.api.statistics.StatisticsReport;
import org.telltale.text.Analyzers;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;
import org.telltale.text.UnitKind;

/**
 * Whenever a built-in model offers to score masks from term counts, its scores equal its scores
 * of the masked texts (the reference) for any mask: texts built from words, contractions,
 * hyphenated and dotted tokens, numbers, CJK and mixed separators, with units of either analyzer
 * and of every kind (common practice: a property check of an optimisation against its
 * definition).
 */
class MaskedCountsPropertyTest {
    private static final String[] PIECES = {"refund", "order", "late", "o'neil", "e-mail", "3.5", "x", "-", "'s",
        "日本", "語", "a.b", "U.S.", "can't", "1,000", "@", "#tag", "ß", "İ"};
    private static final String[] GLUE = {" ", "", "-", ".", "\n", ", ", "'", "  "};
    private static final NaiveBayesModel STANDARD = ModelTesting.bayes("standard",
            "refund order late o'neil e-mail 3.5 x 日本 語 can't", "one", "a.b U.S. 1,000 #tag ß order", "two");
    private static final NaiveBayesModel WHITESPACE = ModelTesting.bayes("whitespace",
            "refund order late o'neil e-mail 3.5 x 日本 語 can't", "one", "a.b U.S. 1,000 #tag ß order -", "two");

    @Property(tries = 400)
    @StatisticsReport(format = net.jqwik.api.statistics.Histogram.class)
    void countsScoreEveryMaskAsTheTextWould(@ForAll("texts") String text, @ForAll("kinds") UnitKind kind,
            @ForAll boolean whitespaceModel, @ForAll boolean whitespaceUnits, @ForAll("fillers") String filler,
            @ForAll long seed) {
        NaiveBayesModel model = whitespaceModel ? WHITESPACE : STANDARD;
        TermIndex index = TermIndex.of(text, Analyzers.byName(whitespaceUnits ? "whitespace" : "standard"), kind);
        Masker masker = new Masker(filler);
        MaskScorer scorer = model.prepare(index, masker);
        Statistics.collect(scorer != null ? "offered" : "declined");
        // Not a vacuous check: most generated texts are offered (and then checked mask by mask).
        Statistics.coverage(c -> c.check("offered").percentage(p -> p > 30));
        if (scorer == null) {
            return; // declined: the probes go through the text
        }
        java.util.SplittableRandom random = new java.util.SplittableRandom(seed);
        for (int m = 0; m < 30; m++) {
            BitSet removed = MaskedCountsTest.randomMask(index.size(), random);
            ScoreMatrix fromText = model.score(List.of(masker.mask(index, removed)));
            assertArrayEquals(fromText.logits()[0], scorer.score(List.of(removed)).logits()[0], 0.0,
                    "mask " + removed + " of " + index.units());
        }
    }

    @Provide
    Arbitrary<String> texts() {
        Arbitrary<String> piece = Arbitraries.of(PIECES);
        Arbitrary<String> glue = Arbitraries.of(GLUE);
        return Combinators.combine(piece, glue).as((p, g) -> p + g).list().ofMinSize(1).ofMaxSize(30)
                .map(parts -> String.join("", parts));
    }

    @Provide
    Arbitrary<UnitKind> kinds() {
        return Arbitraries.of(UnitKind.values());
    }

    @Provide
    Arbitrary<String> fillers() {
        return Arbitraries.of("", " ", "\n", "-");
    }
}
