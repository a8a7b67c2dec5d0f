package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

class AccuracyInflationTest {

    /** Says "billing" when the text mentions money, else "booking". */
    private static final class KeywordModel implements TextClassifier {
        int calls;

        @Override
        public ScoreMatrix score(List<String> texts) {
            calls++;
            double[][] rows = new double[texts.size()][];
            for (int i = 0; i < texts.size(); i++) {
                boolean money = texts.get(i).contains("refund") || texts.get(i).contains("charge");
                rows[i] = money ? new double[] {0.9, 0.1} : new double[] {0.2, 0.8};
            }
            return new ScoreMatrix(List.of("billing", "booking"), rows);
        }

        @Override
        public String describe() {
            return "keyword rule";
        }
    }

    @Test
    void splitsAccuracyBetweenSeenAndUnseenTestDocuments() {
        // Worked example (accuracy = correct / labelled, common practice): 5 labelled documents,
        // 2 seen and both right; of 3 unseen, 1 right. Accuracy 3/5, unseen 1/3, seen 2/2.
        List<Document> test = List.of(
                new Document("s1", "please refund the ticket", "billing"),
                new Document("s2", "move my sailing to friday", "booking"),
                new Document("u1", "a double charge on my card", "billing"),
                new Document("u2", "refund not needed, change the date", "booking"),
                new Document("u3", "wheelchair space on deck", "accessibility"),
                new Document("x", "no label here", null));
        Inflation figures = AccuracyInflation.measure(new KeywordModel(), DocumentSource.of("test", test), Set.of("s1", "s2"));
        assertEquals(5, figures.labelled());
        assertEquals(3, figures.correct());
        assertEquals(3, figures.labelledUnseen());
        assertEquals(1, figures.correctUnseen());
        assertEquals(0.6, figures.accuracy(), 1e-12);
        assertEquals(1.0 / 3.0, figures.accuracyUnseen(), 1e-12);
        assertEquals(1.0, figures.accuracySeen(), 1e-12);
        assertEquals(0.6 - 1.0 / 3.0, figures.inflation(), 1e-12);
        assertEquals("keyword rule", figures.model());
    }

    @Test
    void scoresLargeTestSetsInChunks() {
        List<Document> test = new ArrayList<>();
        for (int i = 0; i < AccuracyInflation.CHUNK * 2 + 5; i++) {
            test.add(new Document("d" + i, i % 2 == 0 ? "refund" : "date", i % 3 == 0 ? "billing" : "booking"));
        }
        KeywordModel model = new KeywordModel();
        Inflation figures = AccuracyInflation.measure(model, DocumentSource.of("test", test), Set.of());
        assertEquals(3, model.calls);
        long expected = 0;
        for (int i = 0; i < test.size(); i++) {
            expected += (i % 2 == 0) == (i % 3 == 0) ? 1 : 0;
        }
        assertEquals(expected, figures.correct());
        assertEquals(figures.accuracy(), figures.accuracyUnseen());
        assertTrue(Double.isNaN(figures.accuracySeen()));
    }
}
