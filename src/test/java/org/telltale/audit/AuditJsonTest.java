package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;
import org.telltale.audit.AuditResult.Example;
import org.telltale.audit.AuditResult.Finding;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.AuditResult.Summary;
import org.telltale.report.json.AuditJson;
import org.telltale.text.Span;

class AuditJsonTest {

    static AuditResult sample() {
        Map<String, Long> df = new LinkedHashMap<>();
        df.put("outage", 41L);
        df.put("billing", 2L);
        Summary summary = new Summary(400, 60, List.of("billing", "outage"), 0.925, 1, 3, "router.model",
                "queue.jsonl", 7, new AuditSettings(60, 500, 8, 5, false, "high", 0.05, 64, "standard", null),
                "gold", Map.of("billing", 0.5, "outage", 0.5), Map.of("billing", 198L, "outage", 202L),
                4.1, 240, 0.81, 1234);
        Finding finding = new Finding("gx7relay", ArtefactKind.HEADER, Severity.HIGH, "outage", 43, 2.5, 5.9, true,
                5.9, 0.93, 0.953, df, 0.31, 1.0, 28, false, null, null, Map.of("header", 1.0), 12, 0.4,
                List.of(new Example("t-17", List.of(new Span(10, 18)))));
        Finding suppressed = new Finding("meter", ArtefactKind.BOILERPLATE, Severity.LOW, "billing", 80, 1.1, 4.2,
                false, 4.2, 0.5, 0.7, df, 0.1, 0.8, 9, true, "accepted", "meter talk is expected", Map.of(),
                0, Double.NaN, List.of());
        Scrub scrub = new Scrub(ArtefactKind.HEADER, "lines", List.of("gx7relay"), "explained", 60, 21, 0.35, 0.28,
                0.95, null);
        return new AuditResult(summary, List.of(finding, suppressed), List.of(scrub), List.of("t-17", "t-3"));
    }

    @Test
    void roundTripKeepsEveryField(@TempDir Path dir) throws Exception {
        AuditResult result = sample();
        Path file = dir.resolve("audit.json");
        AuditJson.write(result, file);
        assertEquals(result, AuditJson.read(file));
    }

    @Test
    void writesTheContractNamesOfTheIssue() throws Exception {
        // The names of the telltale.audit v1 contract as the issue fixes them (issue 4, item 7).
        JsonNode root = new ObjectMapper().readTree(AuditJson.toJson(sample()));
        assertEquals("telltale.audit", root.get("format").asText());
        assertEquals(1, root.get("version").asInt());
        for (String name : List.of("documents", "explained", "labels", "accuracy")) {
            assertTrue(root.get("summary").has(name), name);
        }
        for (String name : List.of("term", "kind", "severity", "label", "support", "importance", "association",
                "confirmed")) {
            assertTrue(root.get("findings").get(0).has(name), name);
        }
        for (String name : List.of("kind", "documents", "flip_rate", "score_drop", "accuracy_before",
                "accuracy_after")) {
            assertTrue(root.get("scrub").get(0).has(name), name);
        }
        assertEquals("t-17", root.get("picks").get(0).asText());
        assertEquals("header", root.get("findings").get(0).get("kind").asText());
        assertTrue(root.get("findings").get(1).get("scrub_drop").isNull(), "NaN is written as null");
        assertTrue(root.get("scrub").get(0).get("accuracy_after").isNull());
    }

    @Test
    void rejectsAnotherFormatAndNamesMissingFields(@TempDir Path dir) throws Exception {
        TelltaleException wrong = assertThrows(TelltaleException.class,
                () -> AuditJson.fromJson("{\"format\":\"telltale.explanations\",\"version\":1}"));
        assertTrue(wrong.getMessage().contains("telltale.explanations"), wrong.getMessage());

        String json = AuditJson.toJson(sample()).replace("\"selected_in\"", "\"selected\"");
        Path file = dir.resolve("broken.json");
        Files.writeString(file, json);
        TelltaleException missing = assertThrows(TelltaleException.class, () -> AuditJson.read(file));
        assertTrue(missing.getMessage().contains("selected_in") && missing.getMessage().contains("findings[0]")
                && missing.getMessage().contains("broken.json"), missing.getMessage());
    }
}
