package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/**
 * A real Node.js {@code http} server ({@code idle_close_server.js}) that closes idle keep-alive
 * connections after a given time, as Node does by default after 5 s. Skips the calling test when
 * {@code node} is missing, except under CI (where .ci/run installs it with npm), where it fails.
 */
final class NodeServer implements AutoCloseable {
    private final Process process;
    private final String base;

    private NodeServer(Process process, String base) {
        this.process = process;
        this.base = base;
    }

    /**
     * Starts the server; an idle connection is destroyed {@code idleMillis} after its last answer,
     * by Node's own keep-alive timer when {@code builtin} (Node 20 enforces it about 1 s late),
     * else by the script's timer.
     */
    static NodeServer start(long idleMillis, boolean builtin, Path dir) throws IOException {
        String node = node();
        Path script = Python.script("/org/telltale/connect/idle_close_server.js", dir);
        Process p = new ProcessBuilder(node, script.toString(), Long.toString(idleMillis), builtin ? "builtin" : "exact")
                .redirectError(ProcessBuilder.Redirect.DISCARD).start();
        BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
        String line = out.readLine();
        if (line == null || !line.startsWith("listening on ")) {
            p.destroyForcibly();
            throw new IOException("node did not start: " + line);
        }
        return new NodeServer(p, line.substring("listening on ".length()).strip());
    }

    private static String node() {
        for (String candidate : new String[] {"/usr/bin/node", "/usr/bin/nodejs", "/usr/local/bin/node"}) {
            if (Files.isExecutable(Path.of(candidate))) {
                return candidate;
            }
        }
        if (System.getenv("CI") != null) {
            fail("CI is set but node is missing; .ci/run installs it with npm");
        }
        assumeTrue(false, "node is not installed; skipping the test against a Node.js server");
        return null;
    }

    String url() {
        return base + "/score";
    }

    /** The server's own count of accepted TCP connections and of scoring requests. */
    JsonNode stats() throws IOException, InterruptedException {
        var client = java.net.http.HttpClient.newHttpClient();
        var response = client.send(java.net.http.HttpRequest.newBuilder(URI.create(base + "/stats")).build(),
                java.net.http.HttpResponse.BodyHandlers.ofByteArray());
        return new ObjectMapper().readTree(response.body());
    }

    @Override
    public void close() throws InterruptedException {
        process.destroy();
        if (!process.waitFor(5, TimeUnit.SECONDS)) {
            process.destroyForcibly();
        }
    }
}
