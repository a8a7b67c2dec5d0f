package org.telltale.demo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.cli.Main;
import org.telltale.report.sarif.SarifMultitool;

/**
 * The demo's audit as CI would run it: the model trained on the leaky Quillmoor corpus, audited
 * with {@code --sarif}. The log passes the SARIF Multitool's validate and its lines are the JSON
 * Lines records of the documents it names.
 */
class DemoSarifTest {
    @TempDir
    Path dir;

    @Test
    void theDemoAuditsSarifLogIsValidAndItsLinesAreTheNamedRecords() throws Exception {
        Path corpus = Path.of("corpora-demo/support-leaky.jsonl");
        Path model = dir.resolve("leaky.model");
        assertEquals(ExitCodes.OK, Main.run("train", "--corpus", corpus.toString(), "--out", model.toString()));
        Path sarif = dir.resolve("audit.sarif");
        int code = Main.run("audit", "--model", model.toString(), "--corpus", corpus.toString(), "--out",
                dir.resolve("audit").toString(), "--sample", "60", "--probes", "300", "--quiet", "--fail-on", "never",
                "--sarif", sarif.toString());
        assertEquals(ExitCodes.OK, code);

        assertEquals(List.of(), SarifMultitool.errors(sarif), "SARIF Multitool validate");

        ObjectMapper json = new ObjectMapper();
        JsonNode results = json.readTree(sarif.toFile()).at("/runs/0/results");
        assertTrue(results.size() > 0, "the leaky demo corpus has findings");
        List<String> lines = Files.readString(corpus, StandardCharsets.UTF_8).lines().toList();
        int checked = 0;
        for (JsonNode result : results) {
            for (JsonNode location : result.get("locations")) {
                assertEquals("corpora-demo/support-leaky.jsonl", location.at("/physicalLocation/artifactLocation/uri").asText());
                String id = location.at("/logicalLocations/0/name").asText();
                String line = lines.get(location.at("/physicalLocation/region/startLine").asInt() - 1);
                // corpora-demo/README.md: one JSON object per line, with the document's id.
                assertEquals(id, json.readTree(line).get("id").asText(), line.substring(0, 40));
                checked++;
            }
        }
        assertTrue(checked >= results.size(), "every finding has example documents: " + checked);
    }
}
