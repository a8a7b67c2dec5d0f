package org.telltale;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Runs the shaded jar that Failsafe names in {@code telltale.jar} as a separate process, the way a
 * user would, and keeps stdout, stderr and the exit code apart. Used by the {@code *IT} tests.
 */
public final class JarRun {
    private static final long LIMIT_SECONDS = 120;

    /** What one run of {@code telltale} left behind. */
    public record Run(int code, String out, String err) {
    }

    private JarRun() {
    }

    /** Runs {@code telltale ARGS…}, capturing its output in files under {@code dir}. */
    public static Run telltale(Path dir, String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of("java", "-jar", System.getProperty("telltale.jar")));
        command.addAll(List.of(args));
        Path out = dir.resolve("stdout.txt");
        Path err = dir.resolve("stderr.txt");
        Process p = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!p.waitFor(LIMIT_SECONDS, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError("telltale " + String.join(" ", args) + " did not finish in " + LIMIT_SECONDS + " s");
        }
        return new Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8));
    }
}
