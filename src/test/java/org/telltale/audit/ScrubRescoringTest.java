package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Analyzers;
import org.telltale.text.Document;

/**
 * The scrub test as a per-document step and a reducer: a keyword model whose effects are worked
 * out by hand (common practice), and parts — single documents, other batch sizes — that merge into
 * the effects of the whole.
 */
class ScrubRescoringTest {
    private static final List<String> LABELS = List.of("outage", "billing");
    private static final Rewriter.Target CODE = new Rewriter.Target(ArtefactKind.CONTENT, "ivr7", Set.of("ivr7"));

    /** outage 0.9 for a text with the word ivr7, else 0.25. */
    private static final class KeywordModel implements TextClassifier {
        final AtomicInteger calls = new AtomicInteger();

        @Override
        public ScoreMatrix score(List<String> texts) {
            calls.incrementAndGet();
            double[][] rows = new double[texts.size()][];
            for (int i = 0; i < texts.size(); i++) {
                double outage = texts.get(i).matches("(?s).*\\bivr7\\b.*") ? 0.9 : 0.25;
                rows[i] = new double[] {outage, 1 - outage};
            }
            return new ScoreMatrix(LABELS, rows);
        }

        @Override
        public String describe() {
            return "keyword model";
        }
    }

    private static final Document DOWN = new Document("d1", "ivr7 line down", "outage");
    private static final Document BILL = new Document("d2", "ivr7 bill twice", "billing");
    private static final Document METER = new Document("d3", "meter reading late", "billing");

    private static List<ScrubTest.Scored> explained() {
        return List.of(new ScrubTest.Scored(DOWN, "outage", new double[] {0.9, 0.1}),
                new ScrubTest.Scored(BILL, "outage", new double[] {0.9, 0.1}),
                new ScrubTest.Scored(METER, "billing", new double[] {0.25, 0.75}));
    }

    private static ScrubTest test(TextClassifier model, int batch) {
        return ScrubTest.of(model, Analyzers.standard(), LineRepeats.ofCounts(Map.of(), 3), batch);
    }

    private static ScrubPlan plan() {
        ScrubPlan.Builder plan = new ScrubPlan.Builder();
        plan.alone("outage", CODE);
        plan.alone("billing", CODE);
        plan.together(List.of(CODE), false);
        plan.together(List.of(CODE), true);
        return plan.build();
    }

    @Test
    void removingTheCodeFlipsBothDocumentsThatCarryIt() {
        ScrubEffects effects = test(new KeywordModel(), 64).explained(plan(), explained().iterator());
        ScrubTest.Effect alone = effects.of(0);
        // By hand: d1 and d2 lose ivr7 and fall from 0.9 to 0.25 outage; d3 has nothing to remove.
        assertEquals(2, alone.documents());
        assertEquals(2, alone.flips());
        assertEquals(0.65, alone.meanDrop(), 1e-12);
        assertEquals(0.5, alone.accuracyBefore());
        assertEquals(0.5, alone.accuracyAfter());
    }

    @Test
    void anArtefactAloneIsMeasuredOnlyOnDocumentsAssignedItsLabel() {
        ScrubEffects effects = test(new KeywordModel(), 64).explained(plan(), explained().iterator());
        assertEquals(ScrubTest.Effect.NONE, effects.of(1), "no explained document is assigned billing and holds ivr7");
    }

    @Test
    void explainedJobsLeaveTheCorpusJobsAlone() {
        ScrubEffects effects = test(new KeywordModel(), 64).explained(plan(), explained().iterator());
        assertEquals(ScrubTest.Effect.NONE, effects.of(3));
    }

    @Test
    void partsMergeIntoTheWhole() {
        ScrubEffects whole = test(new KeywordModel(), 64).explained(plan(), explained().iterator());
        ScrubEffects parts = ScrubEffects.none(plan());
        for (ScrubTest.Scored s : explained()) {
            parts = parts.merge(test(new KeywordModel(), 1).explained(plan(), List.of(s).iterator()));
        }
        assertEquals(whole, parts);
    }

    @Test
    void theCorpusScrubScoresTheOriginalsItselfAndAgreesWithTheExplainedOne() {
        ScrubEffects corpus = test(new KeywordModel(), 2).corpus(plan(), List.of(DOWN, BILL, METER).iterator());
        ScrubEffects explained = test(new KeywordModel(), 64).explained(plan(), explained().iterator());
        assertEquals(explained.of(2).documents(), corpus.of(3).documents());
        assertEquals(explained.of(2).flips(), corpus.of(3).flips());
        assertEquals(explained.of(2).meanDrop(), corpus.of(3).meanDrop(), 1e-12);
    }

    @Test
    void rewritesOfSeveralJobsShareScoringCalls() {
        KeywordModel model = new KeywordModel();
        test(model, 64).explained(plan(), explained().iterator());
        // d1 for the outage job and for all at once, d2 the same: four rewrites in one call.
        assertEquals(1, model.calls.get());
    }

    @Test
    void aScoredDocumentHoldsItsOwnCopyOfTheScores() {
        double[] scores = {0.9, 0.1};
        ScrubTest.Scored s = new ScrubTest.Scored(DOWN, "outage", scores);
        scores[0] = 0;
        s.scores()[1] = 0;
        assertArrayEquals(new double[] {0.9, 0.1}, s.scores());
    }

    @Test
    void scoredDocumentsAreValues() {
        ScrubTest.Scored a = new ScrubTest.Scored(DOWN, "outage", new double[] {0.9, 0.1});
        assertEquals(a, new ScrubTest.Scored(DOWN, "outage", new double[] {0.9, 0.1}));
        assertNotEquals(a, new ScrubTest.Scored(DOWN, "outage", new double[] {0.8, 0.2}));
        assertTrue(a.toString().contains("[0.9, 0.1]"), a.toString());
    }

    @Test
    void theNeutralPartChangesNothing() {
        ScrubEffects effects = test(new KeywordModel(), 64).explained(plan(), new ArrayList<>(explained()).iterator());
        assertEquals(effects, effects.merge(ScrubEffects.none(plan())));
    }
}
