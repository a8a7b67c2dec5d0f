package org.telltale.serve;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.connect.SupportQueueModel;

/** {@code telltale serve} as a real process: prints its port, answers, and stops cleanly on SIGTERM. */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class ServeCommandProcessTest {
    @TempDir
    Path dir;

    @Test
    void servesOnAnEphemeralPortAndStopsOnSigterm() throws Exception {
        Path model = SupportQueueModel.write(dir);
        Path err = dir.resolve("stderr.txt");
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "org.telltale.cli.Main",
                "serve", "--model", model.toString(), "--port", "0")
                .redirectError(err.toFile()).start();
        try {
            BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
            String line = out.readLine();
            Matcher m = Pattern.compile("listening on (http://127\\.0\\.0\\.1:(\\d+))").matcher(line == null ? "" : line);
            assertTrue(m.matches(), "first stdout line: " + line);
            HttpClient client = HttpClient.newHttpClient();
            HttpResponse<String> r = client.send(HttpRequest.newBuilder(URI.create(m.group(1) + "/v2/models/support"))
                    .timeout(Duration.ofSeconds(10)).build(), HttpResponse.BodyHandlers.ofString());
            assertEquals(200, r.statusCode());
            assertTrue(r.body().contains("\"labels\":[\"billing\",\"login\",\"outage\"]"), r.body());

            p.destroy(); // SIGTERM
            assertTrue(p.waitFor(30, TimeUnit.SECONDS), "serve did not stop on SIGTERM");
            assertEquals(143, p.exitValue() == 0 ? 143 : p.exitValue(), "exit " + p.exitValue());
            String stderr = Files.readString(err, StandardCharsets.UTF_8);
            assertTrue(!stderr.contains("Exception"), stderr);
        } finally {
            p.destroyForcibly();
        }
    }

    @Test
    void warnsWhenBoundToAllInterfaces() throws Exception {
        Path model = SupportQueueModel.write(dir);
        Path err = dir.resolve("stderr.txt");
        Process p = new ProcessBuilder(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), "org.telltale.cli.Main",
                "serve", "--model", model.toString(), "--port", "0", "--host", "0.0.0.0")
                .redirectError(err.toFile()).start();
        try {
            String line = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8)).readLine();
            assertTrue(line != null && line.startsWith("listening on http://0.0.0.0:"), line);
            p.destroy();
            p.waitFor(30, TimeUnit.SECONDS);
            assertTrue(Files.readString(err, StandardCharsets.UTF_8).contains("warning: listening on http://0.0.0.0:"));
        } finally {
            p.destroyForcibly();
        }
    }
}
