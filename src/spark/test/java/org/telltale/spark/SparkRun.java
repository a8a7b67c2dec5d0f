package org.telltale.spark;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.telltale.JarRun;

/**
 * Runs a Spark front in local mode as a separate process through bench/spark-local.sh, the way a
 * user would without a Spark installation: target/telltale-spark.jar on Spark's own jars
 * (target/spark-classpath.txt), with the test classes added for test-only Spark plugins.
 */
final class SparkRun {
    private static final long LIMIT_SECONDS = 600;

    private SparkRun() {
    }

    /** Runs {@code spark-local.sh MAIN ARGS…} with {@code javaOpts} as extra JVM options. */
    static JarRun.Run front(Path dir, String javaOpts, String main, String... args) throws IOException, InterruptedException {
        List<String> command = new ArrayList<>(List.of("bash", Path.of("bench/spark-local.sh").toAbsolutePath().toString(), main));
        command.addAll(List.of(args));
        Files.createDirectories(dir);
        Path out = dir.resolve("spark-stdout.txt");
        Path err = dir.resolve("spark-stderr.txt");
        ProcessBuilder builder = new ProcessBuilder(command).redirectOutput(out.toFile()).redirectError(err.toFile());
        builder.environment().put("JAVA_OPTS", "-Xmx1g " + javaOpts);
        builder.environment().put("EXTRA_CLASSPATH", Path.of("target/test-classes").toAbsolutePath().toString());
        Process p = builder.start();
        if (!p.waitFor(LIMIT_SECONDS, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            throw new AssertionError(main + " " + String.join(" ", args) + " did not finish in " + LIMIT_SECONDS + " s");
        }
        return new JarRun.Run(p.exitValue(), Files.readString(out, StandardCharsets.UTF_8), Files.readString(err, StandardCharsets.UTF_8));
    }
}
