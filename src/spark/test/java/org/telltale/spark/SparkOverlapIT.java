package org.telltale.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.JarRun;
import org.telltale.JarRun.Run;
import org.telltale.overlap.SupportTickets;

/**
 * SparkOverlap in local mode against {@code telltale overlap} on one machine: the same
 * telltale.overlap JSON (pairs, summary, texts) on the demo corpora and on generated corpora with
 * planted exact copies, near duplicates, empty documents and a label conflict, read as JSON Lines,
 * CSV and Parquet; and the same again when the first attempt of a partition fails in every stage.
 */
class SparkOverlapIT {
    private static final ObjectMapper JSON = new ObjectMapper();
    /** Splits of 32 kB, so that every corpus here is read in several partitions (CSV with multiLine stays one). */
    private static final String SMALL_SPLITS = "-Dspark.sql.files.maxPartitionBytes=32768";

    @TempDir
    static Path dir;

    static Path train;
    static Path trainCsv;
    static Path test;

    /** 300 train tickets (10 exact copies within train), 120 test tickets: 40 drifted copies, 5 exact, 2 empty. */
    @BeforeAll
    static void corpora() throws IOException {
        SupportTickets tickets = new SupportTickets(2026);
        List<String[]> trainRows = new ArrayList<>();
        for (int i = 0; i < 300; i++) {
            trainRows.add(new String[] {"tr-" + i, tickets.ticket(), SupportTickets.LABELS[i % 4]});
        }
        for (int i = 0; i < 10; i++) {
            trainRows.add(new String[] {"tr-copy-" + i, trainRows.get(7 * i)[1], trainRows.get(7 * i)[2]});
        }
        List<String[]> testRows = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            String[] source = trainRows.get(3 * i);
            // One copy changes label: a near duplicate with conflicting gold labels.
            String label = i == 5 ? "billing-dispute" : source[2];
            testRows.add(new String[] {"te-drift-" + i, tickets.drift(source[1])[1], label});
        }
        for (int i = 0; i < 5; i++) {
            testRows.add(new String[] {"te-exact-" + i, trainRows.get(200 + i)[1], trainRows.get(200 + i)[2]});
        }
        testRows.add(new String[] {"te-empty-0", "!!! ???", "booking"});
        testRows.add(new String[] {"te-empty-1", "...", "billing"});
        for (int i = 0; i < 73; i++) {
            testRows.add(new String[] {"te-new-" + i, tickets.ticket(), SupportTickets.LABELS[i % 4]});
        }
        train = dir.resolve("train.jsonl");
        trainCsv = dir.resolve("train.csv");
        test = dir.resolve("test.jsonl");
        writeJsonLines(train, trainRows);
        writeCsv(trainCsv, trainRows);
        writeJsonLines(test, testRows);
    }

    @Test
    void demoCorporaGiveTheSameOverlapJsonAsOneMachine() throws Exception {
        Path work = dir.resolve("demo");
        Files.createDirectories(work);
        String demoTrain = Path.of("corpora-demo/support-leaky.jsonl").toAbsolutePath().toString();
        String demoTest = Path.of("corpora-demo/support-clean.jsonl").toAbsolutePath().toString();
        Path single = work.resolve("single.json");
        Run one = JarRun.telltale(work, "overlap", "--train", demoTrain, "--test", demoTest, "--json", single.toString(), "--quiet");
        assertEquals(0, one.code(), one.err());
        Path spark = work.resolve("spark.json");
        Run distributed = SparkRun.front(work, SMALL_SPLITS, "SparkOverlap", "--master", "local[2]", "--train", demoTrain,
                "--test", demoTest, "--json", spark.toString(), "--quiet");
        assertEquals(0, distributed.code(), distributed.err());
        assertTrue(JSON.readTree(single.toFile()).path("summary").path("train_test_pairs").asLong() > 1000,
                "the demo corpora share many documents: " + Files.readString(single));
        assertEquals(Files.readString(single), Files.readString(spark));
        assertEquals(one.out(), distributed.out(), "the printed summary");
    }

    @Test
    void csvTrainAndJsonLinesTestGiveTheSamePairsAndTextsAsOneMachine() throws Exception {
        Path work = dir.resolve("csv");
        Files.createDirectories(work);
        Path single = work.resolve("single.json");
        Run one = JarRun.telltale(work, "overlap", "--train", trainCsv.toString(), "--test", test.toString(),
                "--texts", "--json", single.toString(), "--quiet");
        assertEquals(0, one.code(), one.err());
        Path spark = work.resolve("spark.json");
        Run distributed = SparkRun.front(work, SMALL_SPLITS, "SparkOverlap", "--master", "local[2]", "--train", trainCsv.toString(),
                "--test", test.toString(), "--texts", "--json", spark.toString(), "--quiet");
        assertEquals(0, distributed.code(), distributed.err());
        ObjectNode expected = (ObjectNode) JSON.readTree(single.toFile());
        // The planted overlap is found at all (else identical empty results would prove nothing).
        assertTrue(expected.path("pairs").size() >= 40, expected.toString());
        assertTrue(expected.path("within_train").size() >= 10, expected.toString());
        assertEquals(2, expected.path("summary").path("test_empty").asLong(), expected.toString());
        assertEquals(Files.readString(single), Files.readString(spark));
    }

    @Test
    void aFailedFirstAttemptInEveryStageLeavesTheParquetResultUnchanged() throws Exception {
        Path work = dir.resolve("retry");
        Files.createDirectories(work);
        Path parquet = work.resolve("train.parquet");
        Run converted = SparkRun.front(work, "", ParquetCorpus.class.getName(), train.toString(), parquet.toString());
        assertEquals(0, converted.code(), converted.err());
        Path single = work.resolve("single.json");
        Run one = JarRun.telltale(work, "overlap", "--train", train.toString(), "--test", test.toString(),
                "--json", single.toString(), "--quiet");
        assertEquals(0, one.code(), one.err());
        Path failures = work.resolve("failures");
        Path spark = work.resolve("spark.json");
        Run distributed = SparkRun.front(work, "-Dspark.plugins=" + FirstAttemptFailure.class.getName()
                        + " -Dtelltale.test.failures=" + failures + " " + SMALL_SPLITS,
                "SparkOverlap", "--master", "local[2,4]", "--train", parquet.toString(), "--test", test.toString(),
                "--json", spark.toString(), "--quiet");
        assertEquals(0, distributed.code(), distributed.err());
        try (Stream<Path> failed = Files.list(failures)) {
            assertTrue(failed.count() >= 3, "planned failures happened in several stages");
        }
        ObjectNode expected = (ObjectNode) JSON.readTree(single.toFile());
        ObjectNode actual = (ObjectNode) JSON.readTree(spark.toFile());
        assertEquals(parquet.toString(), actual.path("train").asText());
        expected.remove("train");
        actual.remove("train");
        assertFalse(expected.path("pairs").isEmpty());
        assertEquals(expected, actual);
    }

    @Test
    void badInputNamesThePlaceAndUsageErrorsExitWithTwo() throws Exception {
        Path work = dir.resolve("errors");
        Run unknown = SparkRun.front(work, "", "SparkOverlap", "--train", train.toString(), "--test", test.toString(), "--nonsense");
        assertEquals(2, unknown.code(), unknown.err());
        assertTrue(unknown.err().contains("unknown option '--nonsense'"), unknown.err());
        Run threshold = SparkRun.front(work, "", "SparkOverlap", "--train", train.toString(), "--test", test.toString(),
                "--threshold", "1.5");
        assertEquals(2, threshold.code(), threshold.err());
        assertTrue(threshold.err().contains("--threshold must be in (0, 1]: 1.5"), threshold.err());
        Run field = SparkRun.front(work, "", "SparkOverlap", "--master", "local[1]", "--train", train.toString(),
                "--test", test.toString(), "--text-field", "body");
        assertEquals(1, field.code(), field.err());
        assertTrue(field.err().contains(train + ": no column 'body'; choose the text field with --text-field"), field.err());
    }

    private static void writeJsonLines(Path file, List<String[]> rows) throws IOException {
        StringBuilder lines = new StringBuilder();
        for (String[] r : rows) {
            Map<String, String> record = new LinkedHashMap<>();
            record.put("id", r[0]);
            record.put("text", r[1]);
            record.put("label", r[2]);
            lines.append(JSON.writeValueAsString(record)).append('\n');
        }
        Files.writeString(file, lines, StandardCharsets.UTF_8);
    }

    /** RFC 4180: every field quoted, quotes doubled; texts keep their newlines. */
    private static void writeCsv(Path file, List<String[]> rows) throws IOException {
        StringBuilder csv = new StringBuilder("id,text,label\r\n");
        for (String[] r : rows) {
            csv.append(quote(r[0])).append(',').append(quote(r[1])).append(',').append(quote(r[2])).append("\r\n");
        }
        Files.writeString(file, csv, StandardCharsets.UTF_8);
    }

    private static String quote(String field) {
        return '"' + field.replace("\"", "\"\"") + '"';
    }
}
