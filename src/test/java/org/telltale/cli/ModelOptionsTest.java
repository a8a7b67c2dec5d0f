package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.UsageException;
import org.telltale.connect.ConnectorSettings;
import org.telltale.connect.Protocol;
import org.telltale.connect.ScoreKind;
import org.telltale.connect.SupportQueueModel;
import org.telltale.model.TextClassifier;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

class ModelOptionsTest {
    @Command(name = "probe")
    static final class Holder {
        @Mixin
        ModelOptions model;
    }

    private static ModelOptions parse(String... args) {
        Holder h = new Holder();
        new CommandLine(h).parseArgs(args);
        return h.model;
    }

    @Test
    void defaultsSuitMostServices() {
        ConnectorSettings s = parse("--model", "http://127.0.0.1:1/score").settings();
        assertEquals(Protocol.NATIVE, s.protocol());
        assertEquals(64, s.batch());
        assertTrue(s.adaptive(), "--parallel auto is the default for URLs");
        assertEquals(64, s.effectiveParallel());
        assertEquals(Duration.ofSeconds(30), s.timeout());
        assertEquals(3, s.retries());
        assertEquals(ScoreKind.PROBABILITIES, s.scores());
    }

    @Test
    void everyOptionReachesTheSettings() {
        ConnectorSettings s = parse("--model", "http://h/v2/models/m", "--protocol", "open-inference", "--batch", "8",
                "--parallel", "2", "--timeout", "500ms", "--retries", "0", "--header", "Authorization=MODEL_TOKEN",
                "--header", "X-Team=TEAM", "--scores", "logits", "--labels", "a,b").settings();
        assertEquals(Protocol.OPEN_INFERENCE, s.protocol());
        assertEquals(8, s.batch());
        assertEquals(2, s.parallel());
        assertFalse(s.adaptive());
        assertEquals(Duration.ofMillis(500), s.timeout());
        assertEquals(0, s.retries());
        assertEquals(Map.of("Authorization", "MODEL_TOKEN", "X-Team", "TEAM"), s.headers());
        assertEquals(ScoreKind.LOGITS, s.scores());
        assertEquals(List.of("a", "b"), s.labels());
    }

    @Test
    void badValuesAreUsageErrors() {
        assertThrows(CommandLine.ParameterException.class, () -> parse("--model", "m", "--protocol", "grpc"));
        assertThrows(CommandLine.ParameterException.class, () -> parse("--model", "m", "--timeout", "soon"));
        assertThrows(UsageException.class, () -> parse("--model", "m", "--batch", "0").settings());
        assertThrows(CommandLine.ParameterException.class, () -> parse("--batch", "3"));
        assertEquals("--parallel must be at least 1: 0",
                assertThrows(UsageException.class, () -> parse("--model", "m", "--parallel", "0").settings()).getMessage());
        assertEquals("--parallel must be at least 1: -3",
                assertThrows(UsageException.class, () -> parse("--model", "m", "--parallel=-3").settings()).getMessage());
        assertEquals("--parallel-max must be at least 1: 0",
                assertThrows(UsageException.class, () -> parse("--model", "m", "--parallel-max", "0").settings()).getMessage());
        assertTrue(assertThrows(UsageException.class, () -> parse("--model", "m", "--parallel", "lots").settings())
                .getMessage().contains("--parallel must be a number or auto: lots"));
    }

    @Test
    void parallelAutoHasAMaximumAndExecStopsAtTheCores() {
        ConnectorSettings url = parse("--model", "http://127.0.0.1:1/score", "--parallel", "auto", "--parallel-max", "12").settings();
        assertTrue(url.adaptive());
        assertEquals(12, url.effectiveParallel());
        ConnectorSettings exec = parse("--model", "exec:python3 m.py").settings();
        assertTrue(exec.adaptive());
        assertEquals(Math.min(64, Runtime.getRuntime().availableProcessors()), exec.effectiveParallel());
        ConnectorSettings file = parse("--model", "m.json").settings();
        assertFalse(file.adaptive(), "model files run on a fixed number of threads");
    }

    @Test
    void opensAModelFile(@TempDir Path dir) {
        Path file = SupportQueueModel.write(dir);
        try (TextClassifier c = parse("--model", file.toString()).open()) {
            assertEquals(List.of("billing", "login", "outage"), c.score(List.of("refund my invoice")).labels());
        }
    }
}
