package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.fail;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs a small ES module with Node.js inside target/npm, where src/test/npm/fetch.sh puts the npm
 * packages the tests use as references, and returns what it prints. Missing node or package: the
 * calling test is skipped locally with a message and fails under {@code CI}.
 */
final class NodeScript {
    static final Path MODULES = Path.of("target/npm/node_modules");

    private NodeScript() {
    }

    /** Standard output of {@code source} run as an ES module, after checking that {@code packages} are fetched. */
    static String run(String source, String... packages) throws IOException, InterruptedException {
        Path node = Path.of("/usr/bin/node");
        boolean present = Files.isExecutable(node) && List.of(packages).stream().allMatch(p -> Files.isDirectory(MODULES.resolve(p)));
        if (!present && System.getenv("CI") != null) {
            fail("CI is set but node or one of " + List.of(packages) + " is missing under " + MODULES);
        }
        assumeTrue(present, "reference check skipped: node or " + List.of(packages) + " missing under " + MODULES
                + " (install npm, run mvn generate-test-resources)");
        Path script = Files.createTempFile(MODULES.getParent(), ".check", ".mjs");
        try {
            Files.writeString(script, source, StandardCharsets.UTF_8);
            Process p = new ProcessBuilder(node.toString(), script.getFileName().toString())
                    .directory(MODULES.getParent().toFile()).redirectErrorStream(true).start();
            byte[] out = p.getInputStream().readAllBytes();
            if (!p.waitFor(60, TimeUnit.SECONDS) || p.exitValue() != 0) {
                p.destroyForcibly();
                throw new AssertionError("node failed on " + script + ":\n" + new String(out, StandardCharsets.UTF_8));
            }
            return new String(out, StandardCharsets.UTF_8);
        } finally {
            Files.deleteIfExists(script);
        }
    }
}
