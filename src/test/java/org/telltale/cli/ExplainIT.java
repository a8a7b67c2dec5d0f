package org.telltale.cli;

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
import org.junit.jupiter.api.Test;
import org.telltale.JarRun;
import org.telltale.JarRun.Run;
import org.junit.jupiter.api.io.TempDir;

/** Runs the built jar: explain against a built-in model file and through an {@code exec:} subprocess. */
class ExplainIT {
    @TempDir
    Path dir;

    private Run telltale(String... args) throws IOException, InterruptedException {
        return JarRun.telltale(dir, args);
    }

    private static final String TEXT = "Hello, the garden hose I ordered arrived with a split nozzle. "
            + "Please send a replacement nozzle or refund the hose.";

    private Path model() throws Exception {
        Path corpus = dir.resolve("garden.jsonl");
        List<String> lines = new ArrayList<>();
        String[][] examples = {
            {"refund", "please refund my order, the payment went through twice"},
            {"refund", "I want my money back for the broken rake"},
            {"refund", "refund the hose please, it leaks"},
            {"delivery", "where is my parcel, the seeds have not arrived"},
            {"delivery", "the courier left the box at the wrong address"},
            {"delivery", "my order arrived late and the tracking never updated"},
        };
        for (int i = 0; i < 24; i++) {
            String[] e = examples[i % examples.length];
            lines.add("{\"id\":\"g" + i + "\",\"text\":\"" + e[1] + " (" + i + ")\",\"label\":\"" + e[0] + "\"}");
        }
        Files.write(corpus, lines, StandardCharsets.UTF_8);
        Path model = dir.resolve("garden-model.json");
        Run train = telltale("train", "--corpus", corpus.toString(), "--out", model.toString(), "--holdout", "0");
        assertEquals(0, train.code(), train.err());
        return model;
    }

    private static String withoutTiming(String json) {
        return json.replaceAll("\"(model|total)_ms\" : \\d+", "\"$1_ms\" : 0");
    }

    @Test
    void explainsFromTheShellAndGivesTheSameJsonWhateverTheParallelism() throws Exception {
        Path model = model();
        Run table = telltale("explain", "--model", model.toString(), "--text", TEXT, "--probes", "500");
        assertEquals(0, table.code(), table.err());
        assertTrue(table.out().contains("predicted refund"), table.out());
        assertTrue(table.out().contains("[refund]+"), table.out());

        Run one = telltale("explain", "--model", model.toString(), "--text", TEXT, "--probes", "500", "--json", "-",
                "--parallel", "1", "--batch", "7");
        Run four = telltale("explain", "--model", model.toString(), "--text", TEXT, "--probes", "500", "--json", "-",
                "--parallel", "4", "--batch", "64");
        assertEquals(0, one.code(), one.err());
        assertEquals(0, four.code(), four.err());
        assertEquals(withoutTiming(one.out()), withoutTiming(four.out()));
        JsonNode e = new ObjectMapper().readTree(one.out()).get("explanations").get(0);
        assertEquals("refund", e.get("label").asText());
        assertEquals(500, e.get("probes").asInt());
        assertTrue(e.get("terms").size() == 10);
    }

    @Test
    void explainsAModelBehindASubprocess() throws Exception {
        // A keyword model in Python speaking the scoring protocol line by line on stdin/stdout.
        Path script = dir.resolve("keywords.py");
        Files.writeString(script, String.join("\n",
                "import json, sys",
                "for line in sys.stdin:",
                "    texts = json.loads(line)['texts']",
                "    rows = []",
                "    for t in texts:",
                "        w = t.lower().split()",
                "        a = 1 + 3 * ('refund' in ' '.join(w)) + ('replacement' in w)",
                "        b = 1 + 2 * ('arrived' in w)",
                "        rows.append([a / (a + b), b / (a + b)])",
                "    print(json.dumps({'labels': ['refund', 'delivery'], 'scores': rows}), flush=True)",
                ""), StandardCharsets.UTF_8);
        Run r = telltale("explain", "--model", "exec:python3 " + script, "--text", TEXT, "--probes", "300",
                "--words", "3", "--json", "-");
        assertEquals(0, r.code(), r.err());
        JsonNode terms = new ObjectMapper().readTree(r.out()).get("explanations").get(0).get("terms");
        List<String> top = new ArrayList<>();
        terms.forEach(t -> top.add(t.get("term").asText()));
        assertEquals(List.of("refund", "arrived", "replacement"), top, r.out());
    }
}
