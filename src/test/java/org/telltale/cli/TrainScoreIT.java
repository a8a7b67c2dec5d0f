package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.telltale.JarRun;
import org.telltale.JarRun.Run;
import org.junit.jupiter.api.io.TempDir;

/** Runs the built jar: train, then score in process and through an {@code exec:} subprocess model. */
class TrainScoreIT {
    @TempDir
    Path dir;

    private Run telltale(String... args) throws IOException, InterruptedException {
        return JarRun.telltale(dir, args);
    }

    @Test
    void trainThenScoreFromTheShell() throws Exception {
        Path corpus = LibraryDeskCorpus.write(dir, 15, 8, true);
        Path model = dir.resolve("desk.json");
        Run train = telltale("train", "--corpus", corpus.toString(), "--out", model.toString(),
                "--algorithm", "logistic", "--ngrams", "2");
        assertEquals(0, train.code(), train.err());
        assertTrue(train.out().contains("holdout: 9 documents"), train.out());
        assertTrue(train.err().contains("wrote " + model), train.err());

        Run score = telltale("score", "--model", model.toString(), "--corpus", corpus.toString());
        assertEquals(0, score.code(), score.err());
        List<String> lines = score.out().lines().toList();
        assertEquals(45, lines.size(), score.out());
        JsonNode first = new ObjectMapper().readTree(lines.get(0));
        assertEquals("hv-001", first.get("id").asText());
        assertEquals(3, first.get("scores").size());
        assertTrue(score.err().contains("accuracy "), score.err());
    }

    @Test
    void scoreWorksThroughASubprocessModel() throws Exception {
        // A keyword model in Python speaking the native protocol line by line on stdin/stdout.
        Path script = dir.resolve("keywords.py");
        Files.writeString(script, String.join("\n",
                "import json, sys",
                "labels = ['events', 'loans', 'membership']",
                "words = [['evening', 'talk', 'film', 'club', 'storytime'],",
                "         ['loan', 'renew', 'reserved', 'return', 'borrow'],",
                "         ['card', 'membership', 'address']]",
                "for line in sys.stdin:",
                "    texts = json.loads(line)['texts']",
                "    rows = []",
                "    for t in texts:",
                "        hits = [1 + sum(t.count(w) for w in ws) for ws in words]",
                "        rows.append([h / sum(hits) for h in hits])",
                "    print(json.dumps({'labels': labels, 'scores': rows}), flush=True)",
                ""), StandardCharsets.UTF_8);
        Path corpus = LibraryDeskCorpus.write(dir, 10, 4, true);
        Path out = dir.resolve("scores.jsonl");
        Run score = telltale("score", "--model", "exec:python3 " + script, "--corpus", corpus.toString(),
                "--out", out.toString(), "--batch", "7");
        assertEquals(0, score.code(), score.err());
        assertEquals(30, Files.readAllLines(out, StandardCharsets.UTF_8).size());
        assertTrue(score.out().startsWith("accuracy "), score.out());
        assertTrue(score.err().contains("wrote 30 scored documents"), score.err());
    }

    @Test
    void aForeignModelFileIsOneClearLineAndExitOne() throws Exception {
        Path corpus = LibraryDeskCorpus.write(dir, 2, 4, true);
        Path foreign = dir.resolve("report.json");
        Files.writeString(foreign, "{\"title\": \"quarterly\"}", StandardCharsets.UTF_8);
        Run score = telltale("score", "--model", foreign.toString(), "--corpus", corpus.toString());
        assertEquals(1, score.code());
        assertEquals("", score.out());
        assertEquals(1, score.err().strip().lines().count(), score.err());
        assertEquals("telltale: " + foreign + ": format: missing", score.err().strip());
    }
}
