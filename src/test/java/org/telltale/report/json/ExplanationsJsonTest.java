package org.telltale.report.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.telltale.TelltaleException;
import org.telltale.explain.Explanation;
import org.telltale.json.ContractException;
import org.telltale.text.Span;

class ExplanationsJsonTest {
    static Explanation sample() {
        Map<String, Double> scores = new LinkedHashMap<>();
        scores.put("billing", 0.81);
        scores.put("shipping", 0.19);
        return new Explanation("T-1", "billing", 0.81, "billing", scores, 2000,
                new Explanation.Fit(0.42, 0.93, 0.8), List.of(
                        new Explanation.TermWeight("invoice", 0.21, 0.18, 0.24, List.of(new Span(4, 11), new Span(30, 37))),
                        new Explanation.TermWeight("parcel", -0.05, -0.07, -0.03, List.of(new Span(12, 18)))),
                new Explanation.Timing(120, 180), "Our invoice parcel \"late\" é… invoice", "billing",
                new Explanation.Method("word", "cosine", "forward", 0.25, 1.0, 10, 1L, "standard", "", 0.95, 5, 1480,
                        false, Double.NaN, "sandwich", "log-odds", "logits", 1.45, 0.25, 0, "uniform", List.of("a note")));
    }

    @Test
    void writesTheContractFieldNames() throws IOException {
        // The telltale.explanations contract (v1 names kept; v2 adds interval, target, probes_to_go).
        JsonNode root = new ObjectMapper().readTree(ExplanationsJson.toJson(List.of(sample())));
        assertEquals("telltale.explanations", root.get("format").asText());
        assertEquals(2, root.get("version").asInt());
        JsonNode e = root.get("explanations").get(0);
        for (String f : List.of("id", "label", "score", "probes", "fit", "terms", "timing")) {
            assertTrue(e.has(f), f);
        }
        assertEquals(0.93, e.get("fit").get("r2").asDouble());
        assertEquals(0.8, e.get("fit").get("prediction").asDouble());
        JsonNode t = e.get("terms").get(0);
        assertEquals("invoice", t.get("term").asText());
        assertEquals(30, t.get("spans").get(1).get(0).asInt());
        assertEquals(120, e.get("timing").get("model_ms").asInt());
        assertTrue(e.get("stability").isNull(), "NaN must be written as null");
        assertEquals("sandwich", e.get("interval").asText());
        assertEquals("log-odds", e.get("target").get("kind").asText());
        assertEquals("logits", e.get("target").get("source").asText());
        assertEquals(1.45, e.get("target").get("value").asDouble());
        assertEquals(0.25, e.get("target").get("saturated").asDouble());
        assertEquals(0, e.get("probes_to_go").asInt());
        assertFalse(e.has("resamples"), "bootstrap resamples are gone in version 2");
    }

    @Test
    void readsAVersionOneFileAsAProbabilityExplanationWithBootstrapIntervals() throws IOException {
        String v1 = ExplanationsJson.toJson(List.of(sample())).replace("\"version\" : 2", "\"version\" : 1")
                .replaceAll("\"interval\" : \"sandwich\",", "\"resamples\" : 200,")
                .replaceAll("(?s)\"target\" : \\{[^}]*\\},", "").replaceAll("\"probes_to_go\" : 0,", "");
        assertTrue(v1.contains("\"version\" : 1") && !v1.contains("target"), v1);
        Explanation.Method m = ExplanationsJson.read(new ByteArrayInputStream(v1.getBytes(StandardCharsets.UTF_8)), "v1.json")
                .get(0).method();
        assertEquals("probability", m.target());
        assertEquals("bootstrap", m.interval());
        assertEquals(0.81, m.targetValue());
        assertEquals(-1, m.probesToGo());
    }

    @Test
    void readsBackWhatItWrites() throws IOException {
        String json = ExplanationsJson.toJson(List.of(sample()));
        List<Explanation> back = ExplanationsJson.read(new ByteArrayInputStream(json.getBytes(StandardCharsets.UTF_8)), "x.json");
        assertEquals(1, back.size());
        assertEquals(json, ExplanationsJson.toJson(back));
        Explanation one = ExplanationsJson.fromLine(ExplanationsJson.toLine(sample()), "line 1");
        assertEquals(sample().terms(), one.terms());
        assertEquals(sample().text(), one.text());
    }

    @Test
    void readsOneExplanationPerLine() throws IOException {
        String lines = ExplanationsJson.toLine(sample()) + "\n\n" + ExplanationsJson.toLine(sample()) + "\n";
        assertEquals(2, ExplanationsJson.read(new ByteArrayInputStream(lines.getBytes(StandardCharsets.UTF_8)), "e.jsonl").size());
    }

    @Test
    void anotherFormatIsNamed() {
        String other = "{\"format\":\"telltale.audit\",\"version\":1}";
        assertEquals("a.json: format: expected \"telltale.explanations\", found \"telltale.audit\"", error(other, "a.json"));
    }

    @Test
    void anUnknownVersionIsNamed() {
        String v3 = ExplanationsJson.toJson(List.of(sample())).replace("\"version\" : 2", "\"version\" : 3");
        assertEquals("x.json: version: telltale.explanations version 3 is not supported (this Telltale reads version 1 and 2)",
                error(v3, "x.json"));
    }

    @Test
    void aMissingFieldIsNamedWithItsPath() {
        String line = ExplanationsJson.toLine(sample()).replace("\"words\":10,", "");
        assertEquals("e.jsonl:3: settings.words: missing", lineError(line, "e.jsonl:3"));
    }

    @Test
    void aMistypedFieldIsNamedWithItsPathAndWhatWasFound() {
        String json = ExplanationsJson.toJson(List.of(sample())).replace("\"probes\" : 2000", "\"probes\" : \"2000\"");
        assertEquals("x.json: explanations[0].probes: expected an integer, found the string \"2000\"", error(json, "x.json"));
    }

    @Test
    void aMistypedWeightIsNamedNotReadAsZero() {
        String line = ExplanationsJson.toLine(sample()).replace("\"weight\":-0.05", "\"weight\":\"-0.05\"");
        assertEquals("e.jsonl:1: terms[1].weight: expected a number, found the string \"-0.05\"", lineError(line, "e.jsonl:1"));
    }

    @Test
    void aReversedSpanIsNamedWithItsPath() {
        String bad = ExplanationsJson.toLine(sample()).replace("[4,11]", "[11,4]");
        assertEquals("e.jsonl:3: terms[0].spans[0]: expected a span [start, end] with 0 <= start <= end, found an array",
                lineError(bad, "e.jsonl:3"));
    }

    private static String error(String json, String source) {
        return assertThrows(TelltaleException.class,
                () -> ExplanationsJson.read(new ByteArrayInputStream(json.getBytes(StandardCharsets.UTF_8)), source)).getMessage();
    }

    private static String lineError(String line, String place) {
        return assertThrows(ContractException.class, () -> ExplanationsJson.fromLine(line, place)).getMessage();
    }
}
