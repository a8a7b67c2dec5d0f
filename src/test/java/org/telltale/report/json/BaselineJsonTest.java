package org.telltale.report.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.audit.ArtefactIdentity;
import org.telltale.audit.Baseline;
import org.telltale.audit.Severity;
import org.telltale.json.ContractException;

class BaselineJsonTest {
    @TempDir
    Path dir;

    private Path file(String name, String json) throws Exception {
        return Files.writeString(dir.resolve(name), json, StandardCharsets.UTF_8);
    }

    private String error(String json) throws Exception {
        Path f = file("bad.json", json);
        return assertThrows(ContractException.class, () -> BaselineJson.read(f)).getMessage();
    }

    @Test
    void readsTheFindingsOfVersionOneAndTheArtefactsOfVersionTwo() throws Exception {
        Baseline v1 = BaselineJson.read(file("v1.json", """
                {"format": "telltale.audit", "version": 1, "findings": [
                  {"term": "IVR7", "kind": "header", "label": "outage", "severity": "high", "suppressed": false},
                  {"term": "blq", "kind": "identifier", "label": "billing", "severity": "low", "suppressed": true}]}
                """));
        assertEquals(List.of(new Baseline.Entry(new ArtefactIdentity("header", "outage", "ivr7"), Severity.HIGH, false),
                new Baseline.Entry(new ArtefactIdentity("identifier", "billing", "blq"), Severity.LOW, true)), v1.entries());
        Baseline v2 = BaselineJson.read(file("v2.json", """
                {"format": "telltale.audit", "version": 2, "artefacts": [
                  {"id": "a1", "pattern": "Sent via the  Fernhill app", "kind": "boilerplate", "label": "meter",
                   "severity": "medium", "suppressed": false}]}
                """));
        assertEquals(new ArtefactIdentity("boilerplate", "meter", "sent via the fernhill app"), v2.entries().get(0).identity());
        assertTrue(v2.source().endsWith("v2.json"));
    }

    @Test
    void aMissingAMistypedFieldAndAnUnknownVersionAreNamedErrors() throws Exception {
        String missing = error("""
                {"format": "telltale.audit", "version": 1, "findings": [{"term": "x", "kind": "header", "severity": "high", "suppressed": false}]}
                """);
        assertTrue(missing.contains("findings[0].label") && missing.contains("missing"), missing);
        String mistyped = error("""
                {"format": "telltale.audit", "version": 1, "findings": [{"term": "x", "kind": "header", "label": "a", "severity": "high", "suppressed": "no"}]}
                """);
        assertTrue(mistyped.contains("findings[0].suppressed"), mistyped);
        String severity = error("""
                {"format": "telltale.audit", "version": 1, "findings": [{"term": "x", "kind": "header", "label": "a", "severity": "urgent", "suppressed": false}]}
                """);
        assertTrue(severity.contains("findings[0].severity") && severity.contains("urgent"), severity);
        String version = error("""
                {"format": "telltale.audit", "version": 9, "findings": []}
                """);
        assertTrue(version.contains("version 9 is not supported"), version);
        String format = error("""
                {"format": "telltale.overlap", "version": 1, "pairs": []}
                """);
        assertTrue(format.contains("telltale.audit"), format);
    }

    @Test
    void theSectionOfAComparedAuditReadsBackAndChecksItsIdentities() throws Exception {
        Baseline.Entry header = new Baseline.Entry(new ArtefactIdentity("header", "outage", "ivr7"), Severity.HIGH, false);
        Baseline.Entry code = new Baseline.Entry(new ArtefactIdentity("identifier", "billing", "blq"), Severity.MEDIUM, true);
        Baseline.Comparison c = new Baseline.Comparison("old/audit.json", List.of(code), List.of(header), List.of());
        String json = "{\"format\": \"telltale.audit\", \"version\": " + AuditJson.VERSION + ", \"baseline\": "
                + BaselineJson.tree(c) + "}";
        assertEquals(c, BaselineJson.section(file("compared.json", json)).orElseThrow());
        assertTrue(BaselineJson.section(file("plain.json", "{\"format\": \"telltale.audit\", \"version\": "
                + AuditJson.VERSION + "}")).isEmpty());
        Path tampered = file("tampered.json", json.replace("\"ivr7\"", "\"ivr8\""));
        String message = assertThrows(ContractException.class, () -> BaselineJson.section(tampered)).getMessage();
        assertTrue(message.contains("baseline.unchanged[0].identity"), message);
    }
}
