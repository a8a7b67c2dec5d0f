package org.telltale.report.sarif;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;
import org.telltale.report.sarif.SarifLog.BaselineState;
import org.telltale.report.sarif.SarifLog.Level;
import org.telltale.report.sarif.SarifLog.Location;
import org.telltale.report.sarif.SarifLog.Result;
import org.telltale.report.sarif.SarifLog.Rule;

class SarifWriterTest {
    @TempDir
    Path dir;

    private static final Rule RULE = new Rule("TT-X", "ProbeRule", "One sentence.", "What it finds.", "How to fix.",
            "**How** to fix.", Level.WARNING);

    static SarifLog log(BaselineState state) {
        Map<String, Object> props = new LinkedHashMap<>();
        props.put("score", Double.NaN);
        props.put("support", 12L);
        props.put("labels", List.of("a", "b"));
        Result result = new Result("TT-X", Level.ERROR, "Probe 'x' found.", Map.of(SarifWriter.IDENTITY_KEY, "ab12"),
                List.of(new Location(SarifWriter.uri(Path.of("data/corpus file.csv")), 7, "doc-7"),
                        new Location(SarifWriter.uri(Path.of("data/corpus file.csv")), 0, null)),
                new SarifLog.Suppression("known"), state, props);
        return new SarifLog(new SarifLog.Tool("Telltale", "9.9", null), List.of(RULE), List.of(result),
                Map.of("seed", 3L), "telltale-audit/corpus/");
    }

    @Test
    void writesTheStandardShapeOfRulesResultsAndLocations() throws Exception {
        // OASIS SARIF 2.1.0 §3.13-§3.28, the property names as the standard spells them.
        JsonNode root = new ObjectMapper().readTree(SarifWriter.toJson(log(BaselineState.NEW)));
        assertEquals("2.1.0", root.get("version").asText());
        JsonNode run = root.get("runs").get(0);
        assertEquals("TT-X", run.at("/tool/driver/rules/0/id").asText());
        assertEquals("warning", run.at("/tool/driver/rules/0/defaultConfiguration/level").asText());
        assertEquals("**How** to fix.", run.at("/tool/driver/rules/0/help/markdown").asText());
        JsonNode r = run.at("/results/0");
        assertEquals(0, r.get("ruleIndex").asInt());
        assertEquals("error", r.get("level").asText());
        assertEquals("ab12", r.at("/partialFingerprints/" + SarifWriter.IDENTITY_KEY.replace("/", "~1")).asText());
        assertEquals("data/corpus%20file.csv", r.at("/locations/0/physicalLocation/artifactLocation/uri").asText());
        assertEquals(7, r.at("/locations/0/physicalLocation/region/startLine").asInt());
        assertEquals("doc-7", r.at("/locations/0/logicalLocations/0/name").asText());
        assertTrue(r.at("/locations/1/physicalLocation/region").isMissingNode(), "line 0 is the whole file");
        assertEquals("external", r.at("/suppressions/0/kind").asText());
        assertEquals("new", r.get("baselineState").asText());
        assertTrue(r.at("/properties/score").isNull(), "NaN has no JSON form");
        assertEquals(12, r.at("/properties/support").asInt());
        assertEquals(3, run.at("/properties/telltale/seed").asInt());
    }

    @Test
    void everyBaselineStateWritesALogTheValidatorAccepts() throws Exception {
        for (BaselineState state : BaselineState.values()) {
            Path file = dir.resolve(state.key() + ".sarif");
            SarifWriter.write(log(state), file, false);
            assertEquals(List.of(), SarifMultitool.errors(file), state.toString());
        }
    }

    @Test
    void pathsBecomeUriReferences() {
        // RFC 3986: relative references stay relative with '/' and percent-encoded spaces; absolute paths are file: URIs.
        assertEquals("corpora/support%20mail.jsonl", SarifWriter.uri(Path.of("corpora/./support mail.jsonl")));
        assertEquals("file:///tmp/a%20b.csv", SarifWriter.uri(Path.of("/tmp/a b.csv")));
    }

    @Test
    void anExistingLogIsReplacedOnlyWithForceAndAResultNeedsItsRule() throws Exception {
        Path file = dir.resolve("audit.sarif");
        Files.writeString(file, "keep", StandardCharsets.UTF_8);
        assertThrows(TelltaleException.class, () -> SarifWriter.write(log(null), file, false));
        assertEquals("keep", Files.readString(file, StandardCharsets.UTF_8));
        SarifWriter.write(log(null), file, true);
        assertTrue(Files.readString(file, StandardCharsets.UTF_8).contains("\"2.1.0\""));
        assertThrows(IllegalArgumentException.class, () -> new Location("data/corpus file.csv", 1, null),
                "a location holds a URI reference, not a path");
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new SarifLog(
                new SarifLog.Tool("Telltale", "1", null), List.of(), log(null).results(), null, null));
        assertTrue(e.getMessage().contains("TT-X"), e.getMessage());
    }
}
