package org.telltale.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.JarRun;
import org.telltale.JarRun.Run;
import org.telltale.audit.UtilityQueues;

/**
 * SparkAudit in local mode against {@code telltale audit}: the same audit.json but for the
 * timing and the model's description, the same explanations.jsonl but for timings, and the same exit code, on the
 * demo corpus and on a generated mailbox with planted header, address, identifier and boilerplate
 * artefacts — the second while the first attempt of a partition fails in every stage — and with
 * --scrub-all while the first attempts of both scrub rescorings fail; bad option values and
 * --resume are refused as one machine refuses them.
 */
class SparkAuditIT {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    @Test
    void demoCorpusGivesTheSameAuditAsOneMachine() throws Exception {
        Path corpus = Path.of("corpora-demo/support-leaky.jsonl").toAbsolutePath();
        Path model = dir.resolve("leaky-model.json");
        Run trained = JarRun.telltale(dir, "train", "--corpus", corpus.toString(), "--out", model.toString());
        assertEquals(0, trained.code(), trained.err());
        // Splits of 256 kB: the demo corpus is read in several partitions.
        Path sarif = dir.resolve("spark.sarif");
        JsonNode single = compare(corpus, model, "-Dspark.sql.files.maxPartitionBytes=262144", "local[2]",
                "--sample", "40", "--probes", "300");
        assertEquals(2, single.path("version").asInt(), "the artefact contract");
        assertTrue(single.path("artefacts").size() > 0, "the leaky demo corpus has artefacts: " + single);
        Run withSarif = SparkRun.front(dir, "", "SparkAudit", "--master", "local[1]", "--corpus", corpus.toString(),
                "--model", model.toString(), "--out", dir.resolve("spark-sarif").toString(), "--quiet", "--sample", "20",
                "--probes", "200", "--fail-on", "never", "--sarif", sarif.toString());
        assertEquals(0, withSarif.code(), withSarif.err());
        JsonNode log = JSON.readTree(sarif.toFile());
        assertEquals("2.1.0", log.path("version").asText(), log.toString());
        assertTrue(log.path("runs").path(0).path("results").size() > 0, log.toString());
    }

    @Test
    void plantedArtefactsGiveTheSameAuditWhenTheFirstAttemptOfAPartitionFailsInEveryStage() throws Exception {
        Path model = dir.resolve("mailbox-model.json");
        Path training = UtilityQueues.write(UtilityQueues.generate(1, 150, true), dir.resolve("training.jsonl"));
        Run trained = JarRun.telltale(dir, "train", "--corpus", training.toString(), "--out", model.toString());
        assertEquals(0, trained.code(), trained.err());
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 120, true), dir.resolve("mailbox.jsonl"));
        Path failures = dir.resolve("failures");
        JsonNode single = compare(corpus, model, "-Dspark.plugins=" + FirstAttemptFailure.class.getName()
                + " -Dtelltale.test.failures=" + failures + " -Dspark.sql.files.maxPartitionBytes=16384", "local[2,4]",
                "--sample", "45", "--probes", "300", "--words", "8");
        try (Stream<Path> failed = Files.list(failures)) {
            assertTrue(failed.count() >= 3, "planned failures happened in several stages");
        }
        String found = single.path("artefacts").toString();
        // The planted artefacts of UtilityQueues are found (the single-machine tests check their kinds).
        assertTrue(found.contains("ivr7") && found.contains("ledgerline.example"), found);
        assertEquals(360, single.path("summary").path("documents").asLong());
    }

    @Test
    void scrubAllGivesTheSameAuditWhenTheFirstAttemptOfAPartitionFailsInEveryStage() throws Exception {
        Path model = dir.resolve("mailbox-model.json");
        Path training = UtilityQueues.write(UtilityQueues.generate(3, 150, true), dir.resolve("training.jsonl"));
        Run trained = JarRun.telltale(dir, "train", "--corpus", training.toString(), "--out", model.toString());
        assertEquals(0, trained.code(), trained.err());
        Path corpus = UtilityQueues.write(UtilityQueues.generate(4, 120, true), dir.resolve("scrub-all.jsonl"));
        Path failures = dir.resolve("scrub-failures");
        JsonNode single = compare(corpus, model, "-Dspark.plugins=" + FirstAttemptFailure.class.getName()
                + " -Dtelltale.test.failures=" + failures + " -Dspark.sql.files.maxPartitionBytes=16384", "local[2,4]",
                "--sample", "40", "--probes", "300", "--words", "8", "--scrub-all");
        List<String> failedJobs = new ArrayList<>();
        try (Stream<Path> failed = Files.list(failures)) {
            for (Path f : failed.toList()) {
                failedJobs.add(Files.readString(f).strip());
            }
        }
        assertTrue(failedJobs.contains(DistributedAudit.SCRUB_EXPLAINED), "a rescoring of the explained documents failed: "
                + failedJobs);
        assertTrue(failedJobs.contains(DistributedAudit.SCRUB_CORPUS), "a rescoring of the corpus failed: " + failedJobs);
        JsonNode rows = single.path("scrub");
        assertTrue(rows.size() > 0, single.toString());
        for (JsonNode row : rows) {
            assertEquals("corpus", row.path("scope").asText(), row.toString());
        }
        // The corpus scrub rewrote more documents than the sample holds.
        JsonNode all = rows.get(rows.size() - 1);
        assertEquals("all", all.path("kind").asText(), all.toString());
        assertTrue(all.path("documents").asInt() > 40, all.toString());
    }

    @Test
    void aBadModelOptionReadsAsInTelltaleAudit() throws Exception {
        // The connector settings are checked in one place and mapped to option names at both fronts.
        for (String[] bad : new String[][] {{"--parallel", "0"}, {"--parallel", "lots"}, {"--parallel-max", "0"},
            {"--timeout", "0s"}, {"--fail-on", "sometimes"}}) {
            String[] options = {"--corpus", "c.jsonl", "--model", "m.json", "--out", dir.resolve("bad").toString(), bad[0], bad[1]};
            Run one = JarRun.telltale(dir, concat(new String[] {"audit"}, options));
            Run distributed = SparkRun.front(dir, "", "SparkAudit", options);
            assertEquals(2, one.code(), one.err());
            assertEquals(2, distributed.code(), distributed.err());
            assertEquals(errorLine(one.err()), errorLine(distributed.err()), String.join(" ", bad));
        }
    }

    @Test
    void resumeIsRefusedBecauseSparkRecomputesFailedTasks() throws Exception {
        Run refused = SparkRun.front(dir, "", "SparkAudit", "--corpus", "c.jsonl", "--model", "m.json", "--resume");
        assertEquals(2, refused.code(), refused.err());
        assertEquals("telltale: " + SparkAudit.RESUME_REFUSED, errorLine(refused.err()));
    }

    /** Runs both audits with the same options and checks they agree; returns the single-machine audit.json. */
    private JsonNode compare(Path corpus, Path model, String javaOpts, String master, String... options) throws Exception {
        Path oneOut = dir.resolve("single-" + corpus.getFileName());
        Path sparkOut = dir.resolve("spark-" + corpus.getFileName());
        Run one = JarRun.telltale(dir, concat(new String[] {"audit", "--corpus", corpus.toString(), "--model",
                model.toString(), "--out", oneOut.toString(), "--quiet"}, options));
        assertTrue(one.code() == 0 || one.code() == 3, one.err());
        Run distributed = SparkRun.front(dir, javaOpts, "SparkAudit", concat(new String[] {"--master", master,
                "--corpus", corpus.toString(), "--model", model.toString(), "--out", sparkOut.toString(), "--quiet"}, options));
        assertEquals(one.code(), distributed.code(), distributed.err());
        ObjectNode expected = (ObjectNode) JSON.readTree(oneOut.resolve("audit.json").toFile());
        ObjectNode actual = (ObjectNode) JSON.readTree(sparkOut.resolve("audit.json").toFile());
        for (ObjectNode audit : new ObjectNode[] {expected, actual}) {
            ObjectNode summary = (ObjectNode) audit.path("summary");
            assertTrue(summary.has("elapsed_ms") && summary.has("model"), summary.toString());
            summary.remove("elapsed_ms");
            summary.remove("model");
        }
        assertEquals(expected, actual);
        assertNotEquals(0, expected.path("summary").path("explained").asInt());
        assertEquals(withoutTimings(oneOut.resolve("explanations.jsonl")), withoutTimings(sparkOut.resolve("explanations.jsonl")));
        assertTrue(Files.readString(sparkOut.resolve("report.html")).contains("<html"), "report.html");
        return expected;
    }

    /** The explanation lines without their "timing" objects (milliseconds spent, which differ between runs). */
    private static List<JsonNode> withoutTimings(Path file) throws Exception {
        List<JsonNode> lines = new ArrayList<>();
        for (String line : Files.readAllLines(file)) {
            ObjectNode node = (ObjectNode) JSON.readTree(line);
            assertTrue(node.has("timing"), line);
            node.remove("timing");
            lines.add(node);
        }
        assertTrue(lines.size() > 0);
        return lines;
    }

    /** The one error line of a run's stderr (the JVM may warn before it, e.g. of incubator modules). */
    private static String errorLine(String err) {
        List<String> lines = err.lines().filter(l -> l.startsWith("telltale: ")).toList();
        assertEquals(1, lines.size(), err);
        return lines.get(0);
    }

    private static String[] concat(String[] a, String[] b) {
        String[] out = new String[a.length + b.length];
        System.arraycopy(a, 0, out, 0, a.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }
}
