package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.ScoreMatrix;

/**
 * {@code exec:} with {@code --parallel auto} against real python3 subprocesses whose every call
 * takes 30 ms ({@code fixed_time_model.py}): the process count grows while throughput grows with
 * it, and stays low when the calls are serialised behind one lock, so more processes deliver
 * nothing more. The limit may reach 6 here (the connector caps {@code auto} at the cores, which a
 * test cannot choose; the policy is the same). Assertions are on the counts reached, not on time.
 */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class SubprocessAutoTest {
    private static final int MAX = 6;
    @TempDir
    Path dir;

    private ChunkedClassifier connector(boolean serialised) {
        List<String> command = new ArrayList<>(List.of(Python.python3(), script().toString(), "30",
                dir.resolve("started").toString()));
        if (serialised) {
            command.add(dir.resolve("lock").toString());
        }
        ConnectorSettings settings = ConnectorSettings.of("exec:fixed_time_model.py").withBatch(2)
                .withTimeout(Duration.ofSeconds(30));
        var scorer = new SubprocessScorer(command, "fixed_time_model.py", settings.timeout(), MAX, 0);
        // As ConnectorSettings.gatePolicy() builds it for exec:, one process to start with.
        return new ChunkedClassifier(scorer, settings, new AdaptiveLimit(1, MAX), Redactor.none(), "fixed_time_model.py");
    }

    private Path script() {
        try {
            return Python.script("/org/telltale/connect/fixed_time_model.py", dir);
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    private static List<String> texts(int n) {
        List<String> texts = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            texts.add("text " + i);
        }
        return texts;
    }

    private long started() throws Exception {
        return Files.readAllLines(dir.resolve("started")).stream().filter(l -> !l.isBlank()).count();
    }

    @Test
    void growsTheProcessCountWhileThroughputGrows() throws Exception {
        try (ChunkedClassifier c = connector(false)) {
            ScoreMatrix m = c.score(texts(400)); // 200 calls of 30 ms
            assertEquals(400, m.size());
            assertEquals(MAX, c.limit(), c.concurrency()); // 6 processes deliver 6 times what 1 does
            assertEquals(MAX, started(), c.concurrency());
        }
    }

    @Test
    void keepsFewProcessesWhenMoreDeliverNothingMore() throws Exception {
        try (ChunkedClassifier c = connector(true)) {
            c.score(texts(400));
            // One call at a time whatever the count: the pipe is one process; the limit one and a half of it.
            assertTrue(c.limit() <= 2, c.concurrency() + ", limit " + c.limit());
        }
    }
}
