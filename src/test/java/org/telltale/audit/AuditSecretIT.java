package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shaded jar auditing a loopback model service that needs a token: the token passed with
 * {@code --header Authorization=VAR} reaches the service, and appears in none of the audit's
 * outputs, its journal, or what the process printed.
 */
class AuditSecretIT {
    private static final Path JAR = Path.of(System.getProperty("telltale.jar", "target/telltale.jar"));
    private static final String TOKEN = "Bearer kv-7f3a-secret-91c2";

    @Test
    void theTokenReachesTheServiceAndNoOutput(@TempDir Path dir) throws Exception {
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 30, true), dir.resolve("mailbox.jsonl"));
        Path out = dir.resolve("audit");
        Path log = dir.resolve("audit.log");
        try (ScoringService service = new ScoringService(TrainedModels.naiveBayes(UtilityQueues.generate(1, 60, true)))) {
            ProcessBuilder builder = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                    "-jar", JAR.toString(), "audit", "--model", service.url(), "--header", "Authorization=KV_TOKEN",
                    "--corpus", corpus.toString(), "--out", out.toString(), "--sample", "10", "--probes", "150",
                    "--words", "6", "--fail-on", "never", "--verbose")
                    .redirectErrorStream(true).redirectOutput(log.toFile());
            builder.environment().put("KV_TOKEN", TOKEN);
            Process process = builder.start();
            assertTrue(process.waitFor(3, TimeUnit.MINUTES), "audit did not finish");
            assertEquals(0, process.exitValue(), Files.readString(log));
            assertFalse(service.authorizations.isEmpty());
            assertTrue(service.authorizations.stream().allMatch(TOKEN::equals));
        }
        List<Path> outputs;
        try (Stream<Path> files = Files.list(out)) {
            outputs = Stream.concat(files, Stream.of(log)).toList();
        }
        assertTrue(outputs.size() >= 5, outputs.toString());
        for (Path file : outputs) {
            String content = new String(Files.readAllBytes(file), StandardCharsets.UTF_8);
            assertFalse(content.contains("7f3a-secret"), file + " contains the token");
        }
    }
}
