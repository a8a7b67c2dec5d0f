package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class ScoreMatrixTest {
    @Test
    void theArraysGivenAreCopied() {
        double[][] rows = {{0.25, 0.75}};
        double[][] logits = {{-1.0, 0.1}};
        ScoreMatrix m = new ScoreMatrix(List.of("billing", "outage"), rows, logits);
        rows[0][0] = 9;
        logits[0][0] = 9;
        assertEquals(0.25, m.score(0, 0));
        assertEquals(-1.0, m.logitRow(0)[0]);
    }

    @Test
    void theRowsHandedOutAreCopies() {
        ScoreMatrix m = new ScoreMatrix(List.of("billing", "outage"), new double[][] {{0.25, 0.75}},
                new double[][] {{-1.0, 0.1}});
        m.rows()[0][0] = 9;
        m.logits()[0][0] = 9;
        assertEquals(0.25, m.rows()[0][0]);
        assertEquals(-1.0, m.logits()[0][0]);
    }

    @Test
    void twoMatricesOfTheSameScoresAreEqual() {
        assertEquals(new ScoreMatrix(List.of("a", "b"), new double[][] {{0.5, 0.5}}),
                new ScoreMatrix(List.of("a", "b"), new double[][] {{0.5, 0.5}}));
    }

    @Test
    void toStringNamesTheShapeNotAnArrayIdentity() {
        assertEquals("ScoreMatrix[labels=[a, b], rows=1]",
                new ScoreMatrix(List.of("a", "b"), new double[][] {{0.5, 0.5}}).toString());
    }
}
