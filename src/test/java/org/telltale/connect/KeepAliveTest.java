package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * Keep-alive against a real Node.js {@code http} server that closes idle connections: requests
 * that go out just before, at and just after the moment the server closes the pooled connection
 * all succeed with no retry allowed, none is counted as a retry, and the server saw connections
 * closed under the client (so the case was really exercised).
 */
@Timeout(value = 120, unit = TimeUnit.SECONDS)
class KeepAliveTest {
    private static final List<String> TEXTS = List.of("a", "bb", "ccc", "dddd", "eeeee");

    @TempDir
    Path dir;

    /** Scores with gaps from {@code fromMillis} to {@code toMillis}, then checks nothing failed or counted as a retry. */
    private static void straddle(NodeServer server, long fromMillis, long toMillis, long step, int rounds) throws Exception {
        try (TextClassifier c = Connectors.open(ConnectorSettings.of(server.url()).withBatch(5).withParallel(1)
                .withRetries(0).withTimeout(Duration.ofSeconds(5)))) {
            int calls = 0;
            for (int round = 0; round < rounds; round++) {
                for (long gap = fromMillis; gap <= toMillis; gap += step) {
                    ScoreMatrix m = c.score(TEXTS);
                    calls++;
                    for (int i = 0; i < TEXTS.size(); i++) {
                        assertArrayEquals(LengthModel.expected(TEXTS.get(i)), m.row(i), 1e-12);
                    }
                    Thread.sleep(gap);
                }
            }
            assertEquals(0, c.retries());
            JsonNode stats = server.stats();
            assertEquals(calls, stats.get("requests").asInt(), "requests the server answered");
            // About half the gaps outlast the idle time, so the server closed connections under the client.
            assertTrue(stats.get("connections").asInt() >= calls / 3, stats.toString());
        }
    }

    @Test
    void requestsAroundTheServersIdleCloseNeverFailAndAreNotRetries() throws Exception {
        try (NodeServer server = NodeServer.start(1000, false, dir)) {
            // Gaps straddling the 1 s idle close, where the server closes a pooled connection about
            // when the next request goes out on it.
            straddle(server, 980, 1020, 4, 2);
        }
    }

    @Test
    @Tag("slow")
    void nodesOwnKeepAliveTimerNeverFailsARequest() throws Exception {
        try (NodeServer server = NodeServer.start(500, true, dir)) {
            straddle(server, 1480, 1520, 4, 1);
        }
    }
}
