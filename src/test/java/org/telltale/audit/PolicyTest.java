package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;

class PolicyTest {

    @Test
    void firstMatchingRuleWinsAndPatternsMatchWholeTerms(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("policy.json");
        Files.writeString(file, """
                {"format": "telltale.policy", "version": 1, "rules": [
                  {"term": "meter", "status": "accepted", "note": "meter talk is billing evidence"},
                  {"pattern": "ogx\\\\d*", "status": "artefact", "note": "outage ticket prefix"},
                  {"pattern": "m.*", "status": "artefact", "note": "never reached for meter"}]}
                """);
        Policy policy = Policy.read(file);
        assertEquals(Policy.Status.ACCEPTED, policy.match("meter").orElseThrow().status());
        assertEquals("outage ticket prefix", policy.match("ogx4471").orElseThrow().note());
        assertTrue(policy.match("xogx").isEmpty(), "a pattern must match the whole term");
        assertEquals(Policy.Status.ARTEFACT, policy.match("mains").orElseThrow().status());
        assertTrue(Policy.empty().match("meter").isEmpty());
    }

    @Test
    void badRulesAreNamedByTheirPlace() {
        TelltaleException noNote = assertThrows(TelltaleException.class, () -> Policy.parse(
                "{\"rules\":[{\"term\":\"a\",\"status\":\"accepted\",\"note\":\"ok\"},{\"term\":\"b\",\"status\":\"accepted\"}]}",
                "p.json"));
        assertEquals("p.json: rules[1].note: every rule needs a note saying why", noNote.getMessage());
        TelltaleException both = assertThrows(TelltaleException.class, () -> Policy.parse(
                "{\"rules\":[{\"term\":\"a\",\"pattern\":\"a\",\"status\":\"artefact\",\"note\":\"x\"}]}", "p.json"));
        assertTrue(both.getMessage().contains("exactly one"), both.getMessage());
        TelltaleException status = assertThrows(TelltaleException.class, () -> Policy.parse(
                "{\"rules\":[{\"term\":\"a\",\"status\":\"fine\",\"note\":\"x\"}]}", "p.json"));
        assertEquals("p.json: rules[0].status: unknown status 'fine'; one of: accepted, artefact", status.getMessage());
        TelltaleException unknown = assertThrows(TelltaleException.class, () -> Policy.parse(
                "{\"rules\":[{\"term\":\"a\",\"status\":\"artefact\",\"note\":\"x\",\"colour\":\"red\"}]}", "p.json"));
        assertTrue(unknown.getMessage().contains("colour"), unknown.getMessage());
        TelltaleException regex = assertThrows(TelltaleException.class, () -> Policy.parse(
                "{\"rules\":[{\"pattern\":\"(\",\"status\":\"artefact\",\"note\":\"x\"}]}", "p.json"));
        assertTrue(regex.getMessage().startsWith("p.json: rules[0].pattern: bad pattern '('"), regex.getMessage());
        assertThrows(TelltaleException.class, () -> Policy.read(Path.of("no-such-policy.json")));
    }

    @Test
    void aMissingFieldIsNamedWithItsPath() {
        TelltaleException e = assertThrows(TelltaleException.class,
                () -> Policy.parse("{\"rules\":[{\"term\":\"a\",\"note\":\"x\"}]}", "p.json"));
        assertEquals("p.json: rules[0].status: missing", e.getMessage());
    }

    @Test
    void aMistypedFieldIsNamedWithWhatWasFound() {
        TelltaleException e = assertThrows(TelltaleException.class,
                () -> Policy.parse("{\"rules\":[{\"term\":7,\"status\":\"accepted\",\"note\":\"x\"}]}", "p.json"));
        assertEquals("p.json: rules[0].term: expected a string, found the number 7", e.getMessage());
    }

    @Test
    void anotherVersionIsRefusedByTheOneVersionCheck() {
        TelltaleException e = assertThrows(TelltaleException.class, () -> Policy.parse(
                "{\"format\":\"telltale.policy\",\"version\":2,\"rules\":[]}", "p.json"));
        assertEquals("p.json: version: telltale.policy version 2 is not supported (this Telltale reads version 1)",
                e.getMessage());
    }

    @Test
    void aDuplicateKeyIsRefused() {
        // RFC 8259 §4 leaves duplicate names' meaning open; the strict reader refuses them.
        TelltaleException e = assertThrows(TelltaleException.class, () -> Policy.parse(
                "{\"rules\":[{\"term\":\"a\",\"status\":\"accepted\",\"status\":\"artefact\",\"note\":\"x\"}]}",
                "p.json"));
        assertTrue(e.getMessage().startsWith("p.json: not valid JSON: Duplicate field 'status'"), e.getMessage());
    }

    @Test
    void artefactRulesMatchAKindAndAGlobOverThePattern() {
        Policy policy = Policy.parse("""
                {"rules": [
                  {"boilerplate": "[Exported by Casefile*", "status": "accepted", "note": "archive footer"},
                  {"header": "X-Intake-*", "status": "artefact", "note": "gateway stamps"},
                  {"identifier": "HR-#####", "status": "artefact", "note": "returns case tag"},
                  {"term": "meter", "status": "accepted", "note": "billing evidence"}]}
                """, "p.json");
        assertEquals("archive footer", policy.matchArtefact(ArtefactKind.BOILERPLATE,
                "[exported by casefile   Archive 3.2 · retention class B]").orElseThrow().note());
        assertTrue(policy.matchArtefact(ArtefactKind.HEADER, "[Exported by Casefile Archive]").isEmpty(),
                "a rule is for one kind");
        assertEquals("gateway stamps", policy.matchArtefact(ArtefactKind.HEADER, "X-Intake-Route: acc7").orElseThrow().note());
        assertTrue(policy.matchArtefact(ArtefactKind.HEADER, "X-Route: acc7").isEmpty());
        assertEquals(Policy.Status.ARTEFACT, policy.matchArtefact(ArtefactKind.IDENTIFIER, "hr-#####").orElseThrow().status());
        assertTrue(policy.matchArtefact(ArtefactKind.IDENTIFIER, "HR-####").isEmpty(), "# is literal in a glob");
        assertTrue(policy.match("meter").isPresent() && policy.match("casefile").isEmpty(),
                "term rules and artefact rules do not mix");
        TelltaleException two = assertThrows(TelltaleException.class, () -> Policy.parse(
                "{\"rules\":[{\"header\":\"a\",\"term\":\"b\",\"status\":\"accepted\",\"note\":\"x\"}]}", "p.json"));
        assertTrue(two.getMessage().contains("exactly one"), two.getMessage());
    }

    @Test
    void globsMatchWholeTextsWithStarsAndQuestionMarks() {
        // Wildcard semantics as in POSIX fnmatch without brackets (from memory).
        assertTrue(Policy.globMatches("a*b?d", "axxxbcd"));
        assertTrue(Policy.globMatches("*", ""));
        assertTrue(Policy.globMatches("**a", "ba"));
        assertTrue(!Policy.globMatches("a*b", "ab c"));
        assertTrue(!Policy.globMatches("abc", "abcd"));
        assertTrue(Policy.globMatches("*x*y*", "aaxbbbyc"));
    }
}
