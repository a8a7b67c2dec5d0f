package org.telltale.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.connect.SupportQueueModel;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelFile;

/**
 * {@code telltale serve} under a bounded load from another process: 6 clients for 8 seconds on
 * loopback, with oversized bodies, malformed JSON, huge batches and a slow-header client mixed in.
 * No good request may fail or get another request's answer; every hostile one is refused with the
 * right status; the slow client is cut off.
 */
@Tag("slow")
@Timeout(value = 120, unit = TimeUnit.SECONDS)
class ServeLoadTest {
    @TempDir
    Path dir;

    /** Starts {@code telltale serve} in its own JVM; a request must arrive whole within 3 s. */
    static Process serve(Path model, String... extra) throws Exception {
        java.util.List<String> cmd = new java.util.ArrayList<>(java.util.List.of(
                Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Dsun.net.httpserver.maxReqTime=3",
                "-cp", System.getProperty("java.class.path"), "org.telltale.cli.Main", "serve", "--model", model.toString(),
                "--port", "0"));
        cmd.addAll(java.util.List.of(extra));
        return new ProcessBuilder(cmd).redirectError(ProcessBuilder.Redirect.DISCARD).start();
    }

    static URI listening(Process p) throws Exception {
        String line = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8)).readLine();
        assertTrue(line != null && line.startsWith("listening on "), "serve printed: " + line);
        return URI.create(line.substring("listening on ".length()));
    }

    @Test
    void manyClientsNoErrorsNoMixUpsHostileRequestsRefused() throws Exception {
        Path file = SupportQueueModel.write(dir);
        BuiltinModel reference = ModelFile.load(file);
        Process p = serve(file, "--threads", "2", "--max-batch", "64", "--max-body", "65536");
        try {
            URI base = listening(p);
            LoadRun.Result r = LoadRun.run(base, reference, 6, 16, Duration.ofSeconds(8), true);
            assertTrue(r.requests() > 50, "only " + r.requests() + " requests");
            assertEquals(0, r.errors(), String.join("\n", r.problems()));
            assertEquals(0, r.mismatches(), String.join("\n", r.problems()));
            assertEquals(0, r.hostileUnexpected(), String.join("\n", r.problems()));
            assertTrue(r.hostileStatuses().getOrDefault("malformed 400", 0) > 0, r.hostileStatuses().toString());
            assertTrue(r.hostileStatuses().getOrDefault("huge batch 400", 0) > 0, r.hostileStatuses().toString());
            assertTrue(r.hostileStatuses().getOrDefault("oversized 413", 0) + r.hostileStatuses().getOrDefault("oversized closed", 0) > 0,
                    r.hostileStatuses().toString());
            assertTrue(r.slowClientCutAfterMillis() > 0, "the slow-header client was never cut off");
        } finally {
            p.destroy();
            p.waitFor(20, TimeUnit.SECONDS);
            p.destroyForcibly();
        }
    }
}
