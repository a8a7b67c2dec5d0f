package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.ClassifierException;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * The fault matrix for {@code exec:} models, against a real python3 subprocess
 * ({@code fault_model.py}): crashes and hangs are retried on a fresh process, garbage and invalid
 * answers are clear errors carrying the process's stderr, and nothing hangs.
 *
 * <p>Deterministic on a busy machine: a process's first answer includes its start-up, so the
 * timeout is generous wherever a timeout is not what a case checks, and the hang cases take theirs
 * relative to how long a fresh process takes to answer right now. Cases that count retries or
 * restarts, or need one process to serve several batches, pin {@code --parallel 1}; the rest run
 * at the default {@code auto}.
 */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class SubprocessFaultTest {
    private static final List<String> TEXTS = List.of("a", "bb", "ccc", "dddd", "eeeee");
    @TempDir
    Path dir;
    private Path script;

    @BeforeEach
    void copyScript() throws Exception {
        script = Python.script("/org/telltale/connect/fault_model.py", dir);
    }

    /** Far above any start-up on a loaded machine: only a real hang reaches it. */
    private static final Duration NO_HANG_EXPECTED = Duration.ofSeconds(30);

    private ConnectorSettings settings(String mode) {
        String spec = "exec:" + Python.python3() + " " + JavaProcess.quote(script.toString()) + " " + mode + " "
                + JavaProcess.quote(dir.resolve("state").toString());
        return ConnectorSettings.of(spec).withBatch(2).withRetries(2).withTimeout(NO_HANG_EXPECTED)
                .withBackoff(Duration.ofMillis(5)).withMaxRestarts(3);
    }

    /**
     * A timeout for the hang cases: ten times what a fresh process takes to start and answer now
     * (whole seconds, 2 s to 10 s), so that the replacement of a hung process answers in time
     * however busy the machine is, while the hung one (asleep for 120 s) never does.
     */
    private Duration hangTimeout() {
        long start = System.nanoTime();
        try (TextClassifier c = Connectors.open(settings("ok").withParallel(1))) {
            assertCorrect(c.score(TEXTS));
        }
        long tenfold = 10 * (System.nanoTime() - start);
        return Duration.ofSeconds(Math.max(2, Math.min(10, (tenfold + 999_999_999L) / 1_000_000_000L)));
    }

    private static void assertCorrect(ScoreMatrix m) {
        assertEquals(LengthModel.LABELS, m.labels());
        for (int i = 0; i < TEXTS.size(); i++) {
            assertArrayEquals(LengthModel.expected(TEXTS.get(i)), m.row(i), 1e-15, "row " + i);
        }
    }

    private String fails(String mode) {
        return fails(settings(mode));
    }

    private String fails(ConnectorSettings settings) {
        try (TextClassifier c = Connectors.open(settings)) {
            return assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
        }
    }

    @Test
    void aHealthyProcessServesManyBatches() {
        try (TextClassifier c = Connectors.open(settings("ok").withParallel(2))) {
            assertCorrect(c.score(TEXTS));
            assertCorrect(c.score(TEXTS));
            assertEquals(0, c.retries());
        }
    }

    @Test
    void theDefaultAutoServesManyBatchesCorrectly() {
        try (TextClassifier c = Connectors.open(settings("ok"))) {
            for (int i = 0; i < 10; i++) {
                assertCorrect(c.score(TEXTS));
            }
            assertEquals(0, c.retries());
            assertTrue(c.concurrency().startsWith("processes in flight: auto"), c.concurrency());
        }
    }

    @Test
    void aCrashIsRetriedOnARestartedProcess() {
        try (TextClassifier c = Connectors.open(settings("crash-once").withParallel(1))) {
            assertCorrect(c.score(TEXTS));
            assertEquals(1, c.retries());
        }
    }

    @Test
    void aProcessThatKeepsCrashingIsAClearErrorWithItsStderr() {
        String m = fails(settings("crash-always").withParallel(1));
        assertTrue(m.contains("exited with code 2") && m.contains("tokenizer missing"), m);
        assertTrue(m.endsWith("(after 2 retries)"), m);
    }

    @Test
    void aProcessThatDiesAtStartShowsWhy() {
        String m = fails(settings("exit-at-start").withParallel(1));
        assertTrue(m.contains("exited with code 4") && m.contains("cannot load weights.bin"), m);
    }

    @Test
    void aHungProcessIsKilledAtTheTimeoutAndReplaced() {
        try (TextClassifier c = Connectors.open(settings("hang-once").withParallel(1).withTimeout(hangTimeout()))) {
            assertCorrect(c.score(TEXTS));
            assertEquals(1, c.retries());
        }
    }

    @Test
    void aProcessThatAlwaysHangsIsAClearError() {
        Duration timeout = hangTimeout();
        String m = fails(settings("hang-always").withParallel(1).withRetries(1).withTimeout(timeout));
        assertTrue(m.contains("did not answer within " + Durations.format(timeout) + " and was killed"), m);
        assertTrue(m.endsWith("(after 1 retry)"), m);
    }

    @Test
    void garbageOnStdoutIsAClearError() {
        String m = fails("garbage");
        assertTrue(m.contains("wrote a line that is not an answer") && m.contains("Loading model... done"), m);
    }

    @Test
    void nanIsAClearErrorNamingTheDocument() {
        try (TextClassifier c = Connectors.open(settings("nan"))) {
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS, List.of("t1", "t2", "t3", "t4", "t5"))).getMessage();
            assertTrue(m.contains("non-finite score, NaN, for document 't2' (index 1)")
                    || m.contains("non-finite score, NaN, for document 't4' (index 3)")
                    || m.contains("non-finite score, NaN, for document 't5' (index 4)"), m);
        }
    }

    @Test
    void aWrongRowCountIsAClearError() {
        // The model drops the last row of whatever batch it gets; how the texts are split into
        // batches depends on how many processes the adaptive limit runs, so the count is read back.
        String m = fails("wrong-rows");
        java.util.regex.Matcher rows = java.util.regex.Pattern.compile("answered (\\d+) rows for (\\d+) texts").matcher(m);
        assertTrue(rows.find(), m);
        assertEquals(Integer.parseInt(rows.group(1)) + 1, Integer.parseInt(rows.group(2)), m);
    }

    @Test
    void labelsChangingBetweenCallsAreAClearError() {
        // Two calls of one batch each on one process: the first answer fixes the labels, the
        // process's second answer changes them. (Within one call, batches are validated in the
        // order their answers are decoded, which thread scheduling decides.)
        try (TextClassifier c = Connectors.open(settings("labels-change").withParallel(1))) {
            assertEquals(List.of("short", "long"), c.score(TEXTS.subList(0, 2)).labels());
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS.subList(2, 4))).getMessage();
            assertTrue(m.contains("labels [tiny, huge] but earlier answers had [short, long]"), m);
        }
    }

    @Test
    void anErrorAnswerIsShown() {
        assertTrue(fails("error").contains("the model answered an error: model says no"));
    }

    @Test
    void aMissingProgramIsAClearError() {
        try (TextClassifier c = Connectors.open(ConnectorSettings.of("exec:/nonexistent/model-binary --x"))) {
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
            assertTrue(m.contains("cannot start the subprocess '/nonexistent/model-binary --x'"), m);
        }
    }

    @Test
    void theRestartBudgetIsBoundedOverTheConnectorsLife() {
        try (TextClassifier c = Connectors.open(settings("crash-always").withParallel(1).withRetries(10).withMaxRestarts(2))) {
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
            assertTrue(m.contains("restarted 2 times, which is the limit") && m.contains("tokenizer missing"), m);
        }
    }
}
