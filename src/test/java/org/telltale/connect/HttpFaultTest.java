package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;
import org.telltale.connect.FaultServer.Fault;
import org.telltale.model.ClassifierException;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * The fault matrix for every HTTP protocol: each fault ends in a correct retry-and-success or a
 * clear error, never a hang (each test is bounded) and never a silently wrong result.
 */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class HttpFaultTest {
    private static final List<String> TEXTS = List.of("a", "bb", "ccc", "dddd", "eeeee");

    /** Default in-flight settings (--parallel auto), so the whole matrix runs under the adaptive limit. */
    private static ConnectorSettings settings(String url, Protocol p) {
        return ConnectorSettings.of(url).withProtocol(p).withBatch(5).withRetries(3)
                .withTimeout(Duration.ofMillis(1500)).withBackoff(Duration.ofMillis(5));
    }

    private static void assertCorrect(ScoreMatrix m) {
        assertEquals(LengthModel.LABELS, m.labels());
        for (int i = 0; i < TEXTS.size(); i++) {
            assertArrayEquals(LengthModel.expected(TEXTS.get(i)), m.row(i), 1e-12, "row " + i);
        }
    }

    /** Scripted faults, then success: the answer is right and every fault was one counted retry. */
    private static void recovers(Protocol p, Fault... faults) throws Exception {
        try (FaultServer server = new FaultServer(p).then(faults);
                TextClassifier c = Connectors.open(settings(server.url(), p))) {
            assertCorrect(c.score(TEXTS));
            assertEquals(faults.length, c.retries());
            assertEquals(faults.length + 1, server.posts.get());
        }
    }

    /** Scripted faults: the call fails with a message holding {@code expected}. */
    private static String fails(Protocol p, ConnectorSettings tweak, Fault... faults) throws Exception {
        try (FaultServer server = new FaultServer(p).then(faults);
                TextClassifier c = Connectors.open(tweak == null ? settings(server.url(), p)
                        : tweak.withProtocol(p).withHeaders(Map.of()).withLabels(List.of()).withSpecOf(server.url()))) {
            return assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
        }
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void connectionRefusedIsRetriedThenAClearError(Protocol p) throws Exception {
        String url = "http://127.0.0.1:" + FaultServer.closedPort() + (p == Protocol.OPEN_INFERENCE ? "/v2/models/m" : "/score");
        try (TextClassifier c = Connectors.open(settings(url, p))) {
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
            assertTrue(m.startsWith("batch 1 (documents 0–4): cannot connect to " + url.replace("/infer", "")), m);
            assertTrue(m.endsWith("(after 3 retries)"), m);
            assertEquals(3, c.retries());
        }
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aResetMidResponseIsRetried(Protocol p) throws Exception {
        recovers(p, Fault.RESET);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aBodyCutShortIsRetried(Protocol p) throws Exception {
        recovers(p, Fault.CUT_BODY);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aSlowAnswerBeyondTheTimeoutIsRetried(Protocol p) throws Exception {
        recovers(p, Fault.SLOW);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aServiceThatStaysSlowIsAClearError(Protocol p) throws Exception {
        String m = fails(p, null, Fault.SLOW, Fault.SLOW, Fault.SLOW, Fault.SLOW);
        assertTrue(m.contains("no answer from http://127.0.0.1:") && m.contains("within 1.5s (after 3 retries)"), m);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void bursts500And503AreRetried(Protocol p) throws Exception {
        recovers(p, Fault.STATUS_500, Fault.STATUS_503, Fault.STATUS_503);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aBurstLongerThanTheRetriesIsAClearError(Protocol p) throws Exception {
        String m = fails(p, null, Fault.STATUS_503, Fault.STATUS_503, Fault.STATUS_503, Fault.STATUS_503);
        assertTrue(m.contains("HTTP 503 from") && m.contains("warming up") && m.endsWith("(after 3 retries)"), m);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void a429IsRetriedNoSoonerThanRetryAfter(Protocol p) throws Exception {
        try (FaultServer server = new FaultServer(p).then(Fault.STATUS_429);
                TextClassifier c = Connectors.open(settings(server.url(), p))) {
            assertCorrect(c.score(TEXTS));
            assertEquals(1, c.retries());
            long gapMillis = (server.postTimesNanos.get(1) - server.postTimesNanos.get(0)) / 1_000_000;
            // Retry-After: 1 (seconds); the backoff alone would be ~5 ms.
            assertTrue(gapMillis >= 950, "retried after " + gapMillis + " ms");
        }
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aRetryAfterBeyondTheCapStopsAtOnce(Protocol p) throws Exception {
        try (FaultServer server = new FaultServer(p).then(Fault.STATUS_429);
                TextClassifier c = Connectors.open(settings(server.url(), p))) {
            server.retryAfter = "86400";
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
            assertTrue(m.contains("asks to retry after 86400 s"), m);
        }
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aClientErrorIsNotRetried(Protocol p) throws Exception {
        try (FaultServer server = new FaultServer(p).then(Fault.STATUS_400);
                TextClassifier c = Connectors.open(settings(server.url(), p))) {
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
            assertTrue(m.contains("HTTP 400 from") && m.contains("bad input"), m);
            assertEquals(0, c.retries());
            assertEquals(1, server.posts.get());
        }
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void truncatedJsonIsAClearError(Protocol p) throws Exception {
        assertTrue(fails(p, null, Fault.TRUNCATED_JSON).contains("the response: not valid JSON: "));
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void garbageIsAClearError(Protocol p) throws Exception {
        String m = fails(p, null, Fault.GARBAGE_BYTES);
        assertTrue(m.startsWith("batch 1 (documents 0–4): the response: not valid JSON: "), m);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aWrongShapeIsAClearError(Protocol p) throws Exception {
        String m = fails(p, null, Fault.WRONG_SHAPE);
        assertTrue(m.startsWith("batch 1 (documents 0–4): ") && m.contains("{\"unexpected\":true}"), m);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aWrongRowCountIsAClearError(Protocol p) throws Exception {
        String m = fails(p, null, Fault.WRONG_ROWS);
        assertTrue(m.startsWith("batch 1 (documents 0–4): the model answered 4 rows for 5 texts"), m);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void nanIsAClearErrorNamingTheDocument(Protocol p) throws Exception {
        String m = fails(p, null, Fault.NAN);
        assertTrue(m.contains("non-finite score, NaN, for document index 4"), m);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void infinityIsAClearErrorNamingTheDocument(Protocol p) throws Exception {
        String m = fails(p, null, Fault.INFINITY);
        assertTrue(m.contains("non-finite score, Infinity, for document index 0"), m);
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void labelsThatChangeBetweenCallsAreAClearError(Protocol p) throws Exception {
        try (FaultServer server = new FaultServer(p).then(Fault.OK, Fault.OTHER_LABELS);
                TextClassifier c = Connectors.open(settings(server.url(), p))) {
            assertCorrect(c.score(TEXTS));
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
            // Open Inference names its labels in the model's metadata, read once, so other labels in an
            // answer show as a tensor that does not fit them; the other protocols name labels per answer.
            String expected = p == Protocol.OPEN_INFERENCE
                    ? "batch 1 (documents 0–4): the output tensor has 3 columns but the model names 2 labels [short, long]"
                    : "batch 1 (documents 0–4): the model answered labels [tiny, huge] but earlier answers had [short, long]";
            assertTrue(m.startsWith(expected), m);
        }
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void keepsParallelRequestsInFlightAtTheServer(Protocol p) throws Exception {
        try (FaultServer server = new FaultServer(p);
                TextClassifier c = Connectors.open(settings(server.url(), p).withBatch(1).withParallel(4)
                        .withTimeout(Duration.ofSeconds(10)))) {
            server.pauseMillis = 100;
            List<String> many = java.util.Collections.nCopies(16, "text");
            assertEquals(16, c.score(many).size());
            assertEquals(4, server.maxOpen.get());
            assertEquals(16 + c.retries(), server.posts.get());
        }
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aReusedConnectionClosedBeforeAnyAnswerIsResentOnceWithoutCountingARetry(Protocol p) throws Exception {
        try (FaultServer server = new FaultServer(p).then(Fault.OK, Fault.CLOSE_UNANSWERED);
                TextClassifier c = Connectors.open(settings(server.url(), p).withRetries(0))) {
            server.keepAlive = true;
            assertCorrect(c.score(TEXTS));
            assertCorrect(c.score(TEXTS)); // its connection is closed under it, as by an idle timeout
            assertEquals(0, c.retries());
            assertEquals(3, server.posts.get());
            assertEquals(2, server.connections.get());
        }
    }

    @ParameterizedTest
    @EnumSource(Protocol.class)
    void aFreshConnectionClosedBeforeAnyAnswerIsARetry(Protocol p) throws Exception {
        recovers(p, Fault.CLOSE_UNANSWERED);
    }
}
