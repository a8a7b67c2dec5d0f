package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.telltale.JarRun;
import org.telltale.JarRun.Run;
import org.junit.jupiter.api.io.TempDir;

/** Runs the built jar: train a model, then `telltale overlap` with the model, JSON and HTML. */
class OverlapIT {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private Run telltale(String... args) throws IOException, InterruptedException {
        return JarRun.telltale(dir, args);
    }

    private static void write(Path file, List<String[]> rows) throws IOException {
        StringBuilder lines = new StringBuilder();
        for (String[] r : rows) {
            lines.append(JSON.writeValueAsString(Map.of("id", r[0], "text", r[1], "label", r[2]))).append('\n');
        }
        Files.writeString(file, lines, StandardCharsets.UTF_8);
    }

    @Test
    void tellsHowManyTestDocumentsWereSeenAndWhatTheyAreWorth() throws Exception {
        SupportTickets tickets = new SupportTickets(31);
        List<String[]> train = new ArrayList<>();
        List<String[]> test = new ArrayList<>();
        for (int i = 0; i < 120; i++) {
            train.add(new String[] {"tr-" + i, tickets.ticket(), SupportTickets.LABELS[i % 4]});
        }
        for (int i = 0; i < 30; i++) {
            test.add(new String[] {"copy-" + i, tickets.drift(train.get(i)[1])[1], train.get(i)[2]});
        }
        for (int i = 0; i < 30; i++) {
            test.add(new String[] {"new-" + i, tickets.ticket(), SupportTickets.LABELS[i % 4]});
        }
        Path trainFile = dir.resolve("train.jsonl");
        Path testFile = dir.resolve("test.jsonl");
        write(trainFile, train);
        write(testFile, test);
        Path model = dir.resolve("model.json");
        Run trained = telltale("train", "--corpus", trainFile.toString(), "--out", model.toString());
        assertEquals(0, trained.code(), trained.err());

        Path json = dir.resolve("overlap.json");
        Path html = dir.resolve("overlap.html");
        Run run = telltale("overlap", "--train", trainFile.toString(), "--test", testFile.toString(), "--model",
                model.toString(), "--json", json.toString(), "--html", html.toString());
        assertEquals(0, run.code(), run.err());
        String first = run.out().lines().findFirst().orElse("");
        JsonNode root = JSON.readTree(json.toFile());
        long seen = root.get("summary").get("test_seen").asLong();
        assertTrue(seen >= 27 && seen <= 30, first);
        assertTrue(first.startsWith(seen + " of 60 test documents"), first);
        assertTrue(run.out().contains("the overlap adds"), run.out());
        assertTrue(run.err().contains("wrote " + json) && run.err().contains("wrote " + html), run.err());
        assertEquals("telltale.overlap", root.get("format").asText());
        assertTrue(root.get("accuracy").get("accuracy_seen").asDouble() > root.get("accuracy").get("accuracy_unseen").asDouble(),
                root.get("accuracy").toString());
        assertTrue(!root.has("documents"), "texts only with --texts");
        assertTrue(Files.readString(html, StandardCharsets.UTF_8).contains("mark class=\"tt-shared\""));
    }

    @Test
    void aBadThresholdIsAUsageError() throws Exception {
        Path file = dir.resolve("one.jsonl");
        write(file, List.<String[]>of(new String[] {"a", "one ticket", "billing"}));
        Run run = telltale("overlap", "--train", file.toString(), "--test", file.toString(), "--threshold", "2");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertTrue(run.err().startsWith("telltale: --threshold must be in (0, 1]"), run.err());
    }
}
