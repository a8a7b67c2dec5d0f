package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.ModelFile;

/**
 * The shaded jar, run as a real process: an audit killed with SIGKILL part-way through and then
 * resumed ends with the same audit.json (elapsed time aside) as an audit that was never killed.
 */
@Tag("slow")
class AuditResumeIT {
    private static final Path JAR = Path.of(System.getProperty("telltale.jar", "target/telltale.jar"));

    private static ProcessBuilder audit(Path model, Path corpus, Path out, Path log, String... more) {
        List<String> command = new ArrayList<>(List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-jar", JAR.toString(), "audit",
                "--model", model.toString(), "--corpus", corpus.toString(), "--out", out.toString(),
                "--sample", "50", "--probes", "1000", "--words", "8", "--seed", "11", "--fail-on", "high"));
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
    void anAuditKilledPartWayAndResumedEqualsAnUninterruptedOne(@TempDir Path dir) throws Exception {
        assertTrue(Files.isRegularFile(JAR), JAR + " is missing: run mvn package first");
        Path model = dir.resolve("router.model");
        ModelFile.save(TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true)), model);
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 100, true), dir.resolve("mailbox.jsonl"));

        Path reference = dir.resolve("reference");
        int referenceCode = run(audit(model, corpus, reference, dir.resolve("reference.log")));
        assertEquals(3, referenceCode, Files.readString(dir.resolve("reference.log")));

        Path killed = dir.resolve("killed");
        Process process = audit(model, corpus, killed, dir.resolve("killed.log")).start();
        Path journal = killed.resolve("journal.jsonl");
        long deadline = System.nanoTime() + TimeUnit.MINUTES.toNanos(2);
        while (explainedLines(journal) < 5 && process.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(10);
        }
        assertTrue(process.isAlive(), "the audit finished before it could be killed: " + Files.readString(dir.resolve("killed.log")));
        process.destroyForcibly(); // SIGKILL on Linux: no shutdown hooks, no flushing
        assertTrue(process.waitFor(30, TimeUnit.SECONDS));
        assertNotEquals(0, process.exitValue());
        long kept = explainedLines(journal);
        assertTrue(kept >= 5 && kept < 50, "explained documents in the journal after the kill: " + kept);
        assertTrue(Files.notExists(killed.resolve("audit.json")));

        int resumedCode = run(audit(model, corpus, killed, dir.resolve("resumed.log"), "--resume"));
        assertEquals(referenceCode, resumedCode, Files.readString(dir.resolve("resumed.log")));
        assertEquals(withoutElapsed(reference.resolve("audit.json")), withoutElapsed(killed.resolve("audit.json")));
        assertEquals(50, explainedLines(journal), "the resumed run appended only what was missing");
        assertEquals(Files.readAllLines(reference.resolve("explanations.jsonl")).size(),
                Files.readAllLines(killed.resolve("explanations.jsonl")).size());
    }
}
