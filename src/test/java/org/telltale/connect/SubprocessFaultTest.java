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

    private ConnectorSettings settings(String mode) {
        String spec = "exec:" + Python.python3() + " " + JavaProcess.quote(script.toString()) + " " + mode + " "
                + JavaProcess.quote(dir.resolve("state").toString());
        return ConnectorSettings.of(spec).withBatch(2).withRetries(2).withTimeout(Duration.ofSeconds(2))
                .withBackoff(Duration.ofMillis(5)).withMaxRestarts(3);
    }

    private static void assertCorrect(ScoreMatrix m) {
        assertEquals(LengthModel.LABELS, m.labels());
        for (int i = 0; i < TEXTS.size(); i++) {
            assertArrayEquals(LengthModel.expected(TEXTS.get(i)), m.row(i), 1e-15, "row " + i);
        }
    }

    private String fails(String mode) {
        try (TextClassifier c = Connectors.open(settings(mode))) {
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
    void aCrashIsRetriedOnARestartedProcess() {
        try (TextClassifier c = Connectors.open(settings("crash-once"))) {
            assertCorrect(c.score(TEXTS));
            assertEquals(1, c.retries());
        }
    }

    @Test
    void aProcessThatKeepsCrashingIsAClearErrorWithItsStderr() {
        String m = fails("crash-always");
        assertTrue(m.contains("exited with code 2") && m.contains("tokenizer missing"), m);
        assertTrue(m.endsWith("(after 2 retries)"), m);
    }

    @Test
    void aProcessThatDiesAtStartShowsWhy() {
        String m = fails("exit-at-start");
        assertTrue(m.contains("exited with code 4") && m.contains("cannot load weights.bin"), m);
    }

    @Test
    void aHungProcessIsKilledAtTheTimeoutAndReplaced() {
        try (TextClassifier c = Connectors.open(settings("hang-once"))) {
            assertCorrect(c.score(TEXTS));
            assertEquals(1, c.retries());
        }
    }

    @Test
    void aProcessThatAlwaysHangsIsAClearError() {
        String m = fails("hang-always");
        assertTrue(m.contains("did not answer within 2s and was killed"), m);
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
        assertTrue(fails("wrong-rows").contains("answered 1 rows for 2 texts"));
    }

    @Test
    void labelsChangingBetweenCallsAreAClearError() {
        assertTrue(fails("labels-change").contains("labels [tiny, huge] but earlier answers had [short, long]"));
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
        try (TextClassifier c = Connectors.open(settings("crash-always").withRetries(10).withMaxRestarts(2))) {
            String m = assertThrows(ClassifierException.class, () -> c.score(TEXTS)).getMessage();
            assertTrue(m.contains("restarted 2 times, which is the limit") && m.contains("tokenizer missing"), m);
        }
    }
}
