package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.NaiveBayesModel;
import org.telltale.serve.ModelServer;
import org.telltale.serve.ServerSettings;

/**
 * The shaded jar auditing a model behind a real HTTP server: killed with SIGKILL part-way, then
 * resumed with other connector tuning (batch, requests in flight, time-out, retries). Tuning
 * decides how answers arrive, never what they are, so the resume is accepted and ends with the
 * audit.json (elapsed time aside) of an audit run uninterrupted with the resumed run's tuning.
 */
@Tag("slow")
class HttpAuditResumeIT {
    private static final Path JAR = Path.of(System.getProperty("telltale.jar", "target/telltale.jar"));
    private static final List<String> FIRST = List.of("--batch", "64", "--parallel", "4", "--timeout", "30s", "--retries", "3");
    private static final List<String> SECOND = List.of("--batch", "16", "--parallel", "2", "--timeout", "60s", "--retries", "5");

    private static ProcessBuilder audit(String model, Path corpus, Path out, Path log, List<String> tuning, String... more) {
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-jar", JAR.toString(), "audit",
                "--model", model, "--corpus", corpus.toString(), "--out", out.toString(), "--quiet",
                "--sample", "40", "--probes", "1000", "--words", "8", "--seed", "11", "--fail-on", "never"));
        command.addAll(tuning);
        command.addAll(List.of(more));
        return new ProcessBuilder(command).redirectErrorStream(true).redirectOutput(log.toFile());
    }

    private static int run(ProcessBuilder builder) throws Exception {
        Process process = builder.start();
        assertTrue(process.waitFor(5, TimeUnit.MINUTES), "audit did not finish in 5 minutes");
        return process.exitValue();
    }

    private static long explainedLines(Path journal) throws Exception {
        if (!Files.exists(journal)) {
            return 0;
        }
        return Files.readAllLines(journal, StandardCharsets.UTF_8).stream()
                .filter(l -> l.startsWith("{\"type\":\"explained\"") && l.endsWith("}")).count();
    }

    private static JsonNode withoutElapsed(Path auditJson) throws Exception {
        JsonNode root = new ObjectMapper().readTree(auditJson.toFile());
        ((ObjectNode) root.get("summary")).remove("elapsed_ms");
        return root;
    }

    @Test
    void anHttpAuditKilledAndResumedWithOtherTuningEqualsAnUninterruptedOne(@TempDir Path dir) throws Exception {
        assertTrue(Files.isRegularFile(JAR), JAR + " is missing: run mvn package first");
        NaiveBayesModel trained = TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true));
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 100, true), dir.resolve("mailbox.jsonl"));
        try (ModelServer server = ModelServer.start(trained, trained.labels(), ServerSettings.defaults("desk").withPort(0),
                new PrintStream(OutputStream.nullOutputStream()))) {
            String model = server.url() + "/score";

            Path reference = dir.resolve("reference");
            assertEquals(0, run(audit(model, corpus, reference, dir.resolve("reference.log"), SECOND)),
                    Files.readString(dir.resolve("reference.log")));

            Path killed = dir.resolve("killed");
            Process process = audit(model, corpus, killed, dir.resolve("killed.log"), FIRST).start();
            Path journal = killed.resolve("journal.jsonl");
            long deadline = System.nanoTime() + TimeUnit.MINUTES.toNanos(2);
            while (explainedLines(journal) < 5 && process.isAlive() && System.nanoTime() < deadline) {
                Thread.sleep(10);
            }
            assertTrue(process.isAlive(), "the audit finished before it could be killed: " + Files.readString(dir.resolve("killed.log")));
            process.destroyForcibly(); // SIGKILL on Linux: no shutdown hooks, no flushing
            assertTrue(process.waitFor(30, TimeUnit.SECONDS));

            assertEquals(0, run(audit(model, corpus, killed, dir.resolve("resumed.log"), SECOND, "--resume")),
                    Files.readString(dir.resolve("resumed.log")));
            assertEquals(withoutElapsed(reference.resolve("audit.json")), withoutElapsed(killed.resolve("audit.json")));
        }
    }
}
