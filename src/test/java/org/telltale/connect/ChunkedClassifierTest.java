package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.telltale.model.ClassifierException;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

class ChunkedClassifierTest {

    private static List<String> texts(int n) {
        List<String> t = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            t.add("x".repeat(i % 37) + "#" + i);
        }
        return t;
    }

    @Test
    void splitsIntoBatchesAndReassemblesInOrder() {
        LengthModel model = new LengthModel();
        try (TextClassifier c = Connectors.inProcess(model, ConnectorSettings.of("mem").withBatch(7).withParallel(3))) {
            List<String> in = texts(100);
            ScoreMatrix m = c.score(in);
            assertEquals(100, m.size());
            assertEquals(LengthModel.LABELS, m.labels());
            for (int i = 0; i < in.size(); i++) {
                assertArrayEquals(LengthModel.expected(in.get(i)), m.row(i), "row " + i);
            }
            assertEquals(15, model.calls.get()); // ceil(100 / 7)
        }
    }

    @Test
    void keepsTheParallelLimitOfCallsInFlight() {
        LengthModel model = new LengthModel(30);
        try (TextClassifier c = Connectors.inProcess(model, ConnectorSettings.of("mem").withBatch(1).withParallel(3))) {
            c.score(texts(24));
            assertEquals(3, model.maxInFlight.get());
        }
    }

    @Test
    void emptyInputAsksNothing() {
        LengthModel model = new LengthModel();
        try (TextClassifier c = Connectors.inProcess(model, ConnectorSettings.of("mem"))) {
            assertEquals(0, c.score(List.of()).size());
            assertEquals(0, model.calls.get());
        }
    }

    /** A scorer that fails transiently a fixed number of times, then answers. */
    private static final class Flaky implements BatchScorer {
        final AtomicInteger failuresLeft;

        Flaky(int failures) {
            failuresLeft = new AtomicInteger(failures);
        }

        @Override
        public RawScores score(List<String> texts) {
            if (failuresLeft.getAndDecrement() > 0) {
                throw new TransientFailure("HTTP 503 from test");
            }
            double[][] rows = new double[texts.size()][];
            for (int i = 0; i < rows.length; i++) {
                rows[i] = LengthModel.expected(texts.get(i));
            }
            return new RawScores(LengthModel.LABELS, rows, "{}");
        }

        @Override
        public String describe() {
            return "flaky";
        }
    }

    private static ConnectorSettings fast(int retries) {
        return ConnectorSettings.of("test").withRetries(retries).withBackoff(Duration.ofMillis(1)).withParallel(1);
    }

    @Test
    void retriesTransientFailuresAndCountsThem() {
        try (var c = new ChunkedClassifier(new Flaky(2), fast(3), Redactor.none(), "flaky")) {
            ScoreMatrix m = c.score(List.of("a", "bb"));
            assertArrayEquals(LengthModel.expected("bb"), m.row(1));
            assertEquals(2, c.retries());
        }
    }

    @Test
    void givesUpAfterTheRetryBudgetNamingTheBatch() {
        try (var c = new ChunkedClassifier(new Flaky(10), fast(2), Redactor.none(), "flaky")) {
            var e = assertThrows(ClassifierException.class, () -> c.score(List.of("a", "b")));
            assertEquals("batch 1 (documents 0–1): HTTP 503 from test (after 2 retries)", e.getMessage());
            assertEquals(2, c.retries());
        }
    }

    @Test
    void encodesOnlyAFewBatchesAheadOfTheLimitNotTheWholeCall() {
        // A limit of 2 that could grow to 32: 32 + 4 workers, but only 2 + PREPARED_AHEAD bodies may exist at once.
        InFlightGate.Policy two = new InFlightGate.Policy() {
            @Override
            public int limit() {
                return 2;
            }

            @Override
            public int max() {
                return 32;
            }

            @Override
            public boolean adaptive() {
                return true;
            }
        };
        AtomicInteger prepared = new AtomicInteger();
        AtomicInteger mostPrepared = new AtomicInteger();
        BatchScorer counting = new BatchScorer() {
            @Override
            public RawScores score(List<String> texts) {
                throw new AssertionError("prepare is used");
            }

            @Override
            public Exchange prepare(List<String> texts) {
                mostPrepared.accumulateAndGet(prepared.incrementAndGet(), Math::max);
                return () -> {
                    sleepMillis(2);
                    prepared.decrementAndGet();
                    double[][] rows = new double[texts.size()][];
                    for (int i = 0; i < rows.length; i++) {
                        rows[i] = LengthModel.expected(texts.get(i));
                    }
                    return Reply.of(new RawScores(LengthModel.LABELS, rows, "{}"), true);
                };
            }

            @Override
            public String describe() {
                return "counting";
            }
        };
        try (var c = new ChunkedClassifier(counting, fast(0).withBatch(1), two, Redactor.none(), "counting")) {
            List<String> in = texts(60);
            ScoreMatrix m = c.score(in);
            assertArrayEquals(LengthModel.expected(in.get(59)), m.row(59));
            assertTrue(mostPrepared.get() <= 2 + InFlightGate.PREPARED_AHEAD, "at most " + mostPrepared.get());
            assertTrue(mostPrepared.get() > 2, "nothing prepared ahead: " + mostPrepared.get());
        }
    }

    private static void sleepMillis(long ms) {
        try {
            Thread.sleep(ms);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    @Test
    void theErrorShownIsTheFirstThatHappenedNotTheLowestBatchs() {
        // Batch 1 fails only after batch 2 has failed: the call must report batch 2's error. Batch 1
        // waits until it is cancelled (the call stops at the first failure), or 10 s at most, so its
        // failure can only come second however the threads are scheduled.
        CountDownLatch untilCancelled = new CountDownLatch(1); // never counted down
        BatchScorer laterFirst = new BatchScorer() {
            @Override
            public RawScores score(List<String> texts) {
                if (texts.get(0).equals("late")) {
                    try {
                        untilCancelled.await(10, TimeUnit.SECONDS);
                    } catch (InterruptedException e) {
                        Thread.currentThread().interrupt();
                    }
                    throw new ClassifierException("late failure");
                }
                throw new ClassifierException("early failure");
            }

            @Override
            public String describe() {
                return "ordered";
            }
        };
        try (var c = new ChunkedClassifier(laterFirst, fast(0).withBatch(1).withParallel(2), Redactor.none(), "ordered")) {
            var e = assertThrows(ClassifierException.class, () -> c.score(List.of("late", "early")));
            assertEquals("batch 2 (documents 1–1): early failure", e.getMessage());
        }
    }

    @Test
    void aValidationErrorNamesTheDocumentIdTheCallerGave() {
        BatchScorer nan = new BatchScorer() {
            @Override
            public RawScores score(List<String> texts) {
                double[][] rows = new double[texts.size()][];
                for (int i = 0; i < rows.length; i++) {
                    rows[i] = texts.get(i).equals("bad") ? new double[] {Double.NaN, 0.5} : new double[] {0.5, 0.5};
                }
                return new RawScores(LengthModel.LABELS, rows, "{\"scores\":[…]}");
            }

            @Override
            public String describe() {
                return "nan";
            }
        };
        try (var c = new ChunkedClassifier(nan, fast(0).withBatch(2), Redactor.none(), "nan")) {
            var e = assertThrows(ClassifierException.class,
                    () -> c.score(List.of("a", "b", "c", "bad"), List.of("d1", "d2", "d3", "d4")));
            assertTrue(e.getMessage().startsWith("batch 2 (documents 2–3): the model answered a non-finite score, NaN, for document 'd4' (index 3) and label 'short'"),
                    e.getMessage());
        }
    }

    @Test
    void anAdaptiveLimitGrowsWhileLatencyStaysFlatAndNeverPassesItsMaximum() {
        // A model whose latency does not grow with load: every call takes 20 ms, however many run.
        LengthModel model = new LengthModel(20);
        ConnectorSettings settings = ConnectorSettings.of("mem").withBatch(1);
        try (ChunkedClassifier c = new ChunkedClassifier(new InProcessScorer(model, false), settings, new AdaptiveLimit(1, 8),
                Redactor.none(), "mem")) {
            List<String> texts = new ArrayList<>();
            for (int i = 0; i < 200; i++) {
                texts.add("t".repeat(1 + i % 17));
            }
            ScoreMatrix m = c.score(texts);
            for (int i = 0; i < texts.size(); i++) {
                assertArrayEquals(LengthModel.expected(texts.get(i)), m.row(i), 1e-12);
            }
            assertTrue(model.maxInFlight.get() >= 4 && model.maxInFlight.get() <= 8, "at most " + model.maxInFlight.get());
            assertTrue(c.concurrency().matches("requests in flight: auto, settled at [1-8] \\(peak [4-8], at most 8\\)"),
                    c.concurrency());
        }
    }

    @Test
    void aFixedLimitSaysSo() {
        try (TextClassifier c = Connectors.inProcess(new LengthModel(), ConnectorSettings.of("mem").withParallel(3))) {
            assertEquals("requests in flight: 3 (fixed)", c.concurrency());
        }
    }

    @Test
    void startsTheWorkersItsFirstLimitCanUseBeforeTheFirstCall() {
        // Started at construction, before the first call (in a fresh JVM, a thread started per batch
        // submitted spread the first requests of a run over 30 ms), and only as many as the limit
        // and the bodies prepared ahead of it can use, not 64 + 32 at the first call.
        ConnectorSettings settings = ConnectorSettings.of("mem").withBatch(1);
        AdaptiveLimit limit = new AdaptiveLimit(4, 64);
        try (ChunkedClassifier c = new ChunkedClassifier(new InProcessScorer(new LengthModel(5), false), settings, limit,
                Redactor.none(), "mem")) {
            assertEquals(4 + InFlightGate.ahead(4), c.workers());
            assertEquals(40, c.score(texts(40)).size());
            assertTrue(c.workers() >= 4 + InFlightGate.ahead(4), c.workers() + " workers at limit " + c.limit());
        }
    }
}
