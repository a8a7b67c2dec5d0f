package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.telltale.model.TextClassifier;

class ColdStartWarmUpTest {

    @Test
    void aRoundReadsItsMadeUpAnswerAsTheNativeCodecDoes() {
        // The answer is made up here (common practice: a typical server's head and a 64-row body);
        // the check is that the codec reads back exactly the rows written, so the warm-up runs the
        // whole parse rather than failing early on a broken sample.
        RawScores raw = ColdStartWarmUp.once();
        assertEquals(List.of("delay", "refund", "other"), raw.labels());
        assertEquals(64, raw.rows().length);
        for (int i = 0; i < 64; i++) {
            double a = (i % 7 + 1) / 10.0;
            assertArrayEquals(new double[] {a, 1 - a, 0.0}, raw.rows()[i], 0.0, "row " + i);
        }
    }

    @Test
    void runsTheRoundsItIsAllowed() {
        assertEquals(3, ColdStartWarmUp.notStarted().run(Long.MAX_VALUE / 2, 3));
    }

    @Test
    void theConnectorsFirstCallStopsIt() {
        ColdStartWarmUp warmUp = ColdStartWarmUp.notStarted();
        ConnectorSettings settings = ConnectorSettings.of("mem").withBatch(4);
        try (TextClassifier c = new ChunkedClassifier(new InProcessScorer(new LengthModel(), false), settings, Redactor.none(),
                "mem", warmUp)) {
            assertEquals(1, warmUp.run(Long.MAX_VALUE / 2, 1)); // running until the first call
            c.score(List.of("one", "two"));
            assertEquals(0, warmUp.run(Long.MAX_VALUE / 2, 1_000_000));
        }
    }
}
