package org.telltale.report.json;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;
import org.telltale.audit.ArtefactIdentity;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AssociationBasis;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.audit.AuditResult.ArtefactTerm;
import org.telltale.audit.AuditResult.Effect;
import org.telltale.audit.AuditResult.Example;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.AuditResult.Summary;
import org.telltale.audit.AuditResult.TermStat;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.FailOn;
import org.telltale.audit.Policy;
import org.telltale.audit.ScrubGroup;
import org.telltale.audit.ScrubMode;
import org.telltale.audit.ScrubScope;
import org.telltale.audit.Severity;
import org.telltale.text.Span;

class AuditJsonTest {

    static AuditResult sample() {
        Summary summary = new Summary(400, 60, List.of("billing", "outage"), 0.925, 1, 3, "router.model",
                "queue.jsonl", 7, new AuditSettings(60, 500, 8, 5, false, FailOn.HIGH, 0.05, 64, "standard", null),
                AssociationBasis.GOLD, Map.of("billing", 0.5, "outage", 0.5), Map.of("billing", 198L, "outage", 202L),
                4.1, 240, 0.81, 1234);
        ArtefactIdentity route = ArtefactIdentity.of(ArtefactKind.HEADER, "outage", "X-Relay: gx7relay");
        Artefact header = new Artefact(route.id(), ArtefactKind.HEADER, Severity.HIGH, "outage",
                "X-Relay: gx7relay", 43, 2.5, 5.9, 0.953, true, false, null, null,
                List.of(new ArtefactTerm("gx7relay", 2.5, 5.9, 0.31)), new Effect(28, 12, 12 / 28.0, 0.4, 0.96, 0.6),
                List.of(new Example("t-17", List.of(new Span(10, 18)))));
        ArtefactIdentity footer = ArtefactIdentity.of(ArtefactKind.BOILERPLATE, "billing", "Read by the meter desk");
        Artefact suppressed = new Artefact(footer.id(), ArtefactKind.BOILERPLATE, Severity.LOW, "billing",
                "Read by the meter desk", 80, 1.1, 4.2, 0.7, false, true, Policy.Status.ACCEPTED, "meter talk is expected",
                List.of(new ArtefactTerm("meter", 1.0, 4.2, 0.1), new ArtefactTerm("desk", 0.45, Double.NaN, 0.02)),
                Effect.NONE, List.of());
        Scrub kind = new Scrub(ScrubGroup.of(ArtefactKind.HEADER), ScrubMode.LINES, List.of(header.id()), ScrubScope.EXPLAINED, 60, 21, 0.35, 0.28, 0.95, null);
        Scrub all = new Scrub(ScrubGroup.ALL, ScrubMode.LINES, List.of(header.id()), ScrubScope.EXPLAINED, 60, 21, 0.35, 0.28, 0.95, null);
        List<TermStat> terms = List.of(new TermStat("gx7relay", "outage", ArtefactKind.HEADER, 43, 2.5, 5.9, 0.93, 0.31, 28,
                header.id()), new TermStat("power", "outage", ArtefactKind.CONTENT, 120, 0.9, 2.2, 0.4, 0.05, 11, null));
        return new AuditResult(summary, List.of(header, suppressed), List.of(kind, all), List.of("t-17", "t-3"), terms);
    }

    @Test
    void roundTripKeepsEveryField(@TempDir Path dir) throws Exception {
        AuditResult result = sample();
        Path file = dir.resolve("audit.json");
        AuditJson.write(result, file);
        assertEquals(result, AuditJson.read(file));
    }

    @Test
    void writesTheContractNamesOfVersion2() throws Exception {
        // The names of the telltale.audit v2 contract as the artefact design fixes them.
        JsonNode root = new ObjectMapper().readTree(AuditJson.toJson(sample()));
        assertEquals("telltale.audit", root.get("format").asText());
        assertEquals(2, root.get("version").asInt());
        for (String name : List.of("documents", "explained", "labels", "accuracy")) {
            assertTrue(root.get("summary").has(name), name);
        }
        JsonNode artefact = root.get("artefacts").get(0);
        for (String name : List.of("id", "kind", "severity", "label", "pattern", "support", "importance", "association",
                "confirmed", "terms", "scrub", "examples")) {
            assertTrue(artefact.has(name), name);
        }
        for (String name : List.of("term", "importance", "association", "weight")) {
            assertTrue(artefact.get("terms").get(0).has(name), name);
        }
        for (String name : List.of("documents", "flips", "flip_rate", "score_drop", "accuracy_before", "accuracy_after")) {
            assertTrue(artefact.get("scrub").has(name), name);
            assertTrue(root.get("scrub").get(0).has(name), name);
        }
        assertTrue(artefact.get("id").asText().matches("header-[0-9a-f]{12}"), artefact.get("id").asText());
        assertEquals("all", root.get("scrub").get(1).get("kind").asText());
        assertEquals("t-17", root.get("picks").get(0).asText());
        assertEquals(2, root.get("terms").size(), "every tested term, flagged or not");
        assertTrue(root.get("terms").get(1).get("artefact").isNull());
        assertTrue(root.get("artefacts").get(1).get("scrub").get("score_drop").isNull(), "NaN is written as null");
        assertTrue(root.get("artefacts").get(1).get("terms").get(1).get("association").isNull());
        assertTrue(root.get("scrub").get(0).get("accuracy_after").isNull());
    }

    @Test
    void aMissingFieldIsNamedWithItsFileAndPath(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("broken.json");
        Files.writeString(file, AuditJson.toJson(sample()).replace("\"pattern\"", "\"shape\""));
        TelltaleException missing = assertThrows(TelltaleException.class, () -> AuditJson.read(file));
        assertEquals(file + ": artefacts[0].pattern: missing", missing.getMessage());
        // A number that may be null must still be there.
        Files.writeString(file, AuditJson.toJson(sample()).replace("\"score_drop\"", "\"drop\""));
        TelltaleException drop = assertThrows(TelltaleException.class, () -> AuditJson.read(file));
        assertEquals(file + ": artefacts[0].scrub.score_drop: missing", drop.getMessage());
    }

    @Test
    void aMistypedFieldIsNamedWithWhatWasFound(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("mistyped.json");
        Files.writeString(file, AuditJson.toJson(sample()).replace("\"support\" : 43", "\"support\" : \"43\""));
        TelltaleException mistyped = assertThrows(TelltaleException.class, () -> AuditJson.read(file));
        assertEquals(file + ": artefacts[0].support: expected an integer, found the string \"43\"", mistyped.getMessage());
        Files.writeString(file, AuditJson.toJson(sample()).replace("\"support\" : 43", "\"support\" : 43.5"));
        TelltaleException fraction = assertThrows(TelltaleException.class, () -> AuditJson.read(file));
        assertEquals(file + ": artefacts[0].support: expected an integer, found the number 43.5", fraction.getMessage());
        Files.writeString(file, AuditJson.toJson(sample()).replace("\"kind\" : \"header\"", "\"kind\" : \"headline\""));
        TelltaleException kind = assertThrows(TelltaleException.class, () -> AuditJson.read(file));
        assertTrue(kind.getMessage().startsWith(file + ": artefacts[0].kind: unknown kind 'headline'"), kind.getMessage());
    }

    @Test
    void aValueOutsideAClosedSetIsNamedWithItsFieldAndTheAcceptedValues() {
        // The closed sets of the contract and the error as docs/audit.md ("Outputs") gives them.
        String json = AuditJson.toJson(sample());
        TelltaleException scope = assertThrows(TelltaleException.class,
                () -> AuditJson.fromJson(json.replace("\"scope\" : \"explained\"", "\"scope\" : \"everything\""), "a.json"));
        assertEquals("a.json: scrub[0].scope: unknown scrub scope 'everything'; one of: explained, corpus", scope.getMessage());
        TelltaleException mode = assertThrows(TelltaleException.class,
                () -> AuditJson.fromJson(json.replace("\"mode\" : \"lines\"", "\"mode\" : \"words\""), "a.json"));
        assertEquals("a.json: scrub[0].mode: unknown scrub mode 'words'; one of: lines, matches, terms, mixed",
                mode.getMessage());
        TelltaleException group = assertThrows(TelltaleException.class,
                () -> AuditJson.fromJson(json.replace("\"kind\" : \"all\"", "\"kind\" : \"every\""), "a.json"));
        assertEquals("a.json: scrub[1].kind: unknown scrub group 'every'; one of: header, address, identifier, boilerplate, "
                + "content, all", group.getMessage());
        TelltaleException gate = assertThrows(TelltaleException.class,
                () -> AuditJson.fromJson(json.replace("\"fail_on\" : \"high\"", "\"fail_on\" : \"sometimes\""), "a.json"));
        assertEquals("a.json: summary.settings.fail_on: unknown gate 'sometimes'; one of: high, medium, low, never",
                gate.getMessage());
        TelltaleException basis = assertThrows(TelltaleException.class, () -> AuditJson.fromJson(
                json.replace("\"association_basis\" : \"gold\"", "\"association_basis\" : \"both\""), "a.json"));
        assertEquals("a.json: summary.association_basis: unknown association basis 'both'; one of: gold, predicted",
                basis.getMessage());
        TelltaleException policy = assertThrows(TelltaleException.class, () -> AuditJson.fromJson(
                json.replace("\"policy\" : \"accepted\"", "\"policy\" : \"fine\""), "a.json"));
        assertEquals("a.json: artefacts[1].policy: unknown status 'fine'; one of: accepted, artefact", policy.getMessage());
    }

    @Test
    void theClosedSetsAreWrittenInTheirContractSpelling() throws Exception {
        // docs/audit.md, "Outputs": lower-case keys, as version 1 wrote them.
        JsonNode root = new ObjectMapper().readTree(AuditJson.toJson(sample()));
        assertEquals("high", root.get("summary").get("settings").get("fail_on").asText());
        assertEquals("gold", root.get("summary").get("association_basis").asText());
        assertEquals("lines", root.get("scrub").get(0).get("mode").asText());
        assertEquals("explained", root.get("scrub").get(0).get("scope").asText());
        assertEquals("accepted", root.get("artefacts").get(1).get("policy").asText());
    }

    @Test
    void aVersionThisTelltaleDoesNotReadIsNamed(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("future.json");
        Files.writeString(file, AuditJson.toJson(sample()).replace("\"version\" : 2", "\"version\" : 3"));
        TelltaleException version = assertThrows(TelltaleException.class, () -> AuditJson.read(file));
        assertEquals(file + ": version: telltale.audit version 3 is not supported (this Telltale reads version 1 and 2)",
                version.getMessage());
        TelltaleException format = assertThrows(TelltaleException.class,
                () -> AuditJson.fromJson("{\"format\":\"telltale.explanations\",\"version\":1}", "x.json"));
        assertTrue(format.getMessage().contains("telltale.explanations"), format.getMessage());
    }

    @Test
    void version1ReadsAsOneArtefactPerFinding() {
        // A version 1 file as Telltale wrote it before artefacts (docs/audit.md, "Reading version 1").
        String v1 = """
                {"format": "telltale.audit", "version": 1,
                 "summary": {"documents": 400, "explained": 60, "labels": ["billing", "outage"], "accuracy": 0.925,
                   "skipped": 1, "retries": 3, "model": "router.model", "corpus": "queue.jsonl", "seed": 7,
                   "settings": {"sample": 60, "probes": 500, "words": 8, "picks": 5, "scrub_all": false,
                     "fail_on": "high", "alpha": 0.05, "batch": 64, "analyzer": "standard", "policy": null},
                   "association_basis": "gold", "prior": {"billing": 0.5, "outage": 0.5},
                   "predicted_counts": {"billing": 198, "outage": 202}, "z_threshold": 4.1, "terms_tested": 240,
                   "pick_coverage": 0.81, "elapsed_ms": 1234},
                 "findings": [{"term": "gx7relay", "kind": "header", "severity": "high", "label": "outage",
                   "support": 43, "importance": 2.5, "association": 5.9, "confirmed": true, "z": 5.9, "pmi": 0.93,
                   "p_label_given_term": 0.953, "df": {"billing": 2, "outage": 41}, "mean_weight": 0.31,
                   "sign_consistency": 1.0, "selected_in": 28, "suppressed": false, "policy": null,
                   "policy_note": null, "kind_shares": {"header": 1.0}, "scrub_flips": 12, "scrub_drop": 0.4,
                   "examples": [{"id": "t-17", "spans": [{"start": 10, "end": 18}]}]}],
                 "scrub": [{"kind": "header", "mode": "lines", "terms": ["gx7relay"], "scope": "explained",
                   "documents": 60, "flips": 21, "flip_rate": 0.35, "score_drop": 0.28, "accuracy_before": 0.95,
                   "accuracy_after": null}],
                 "picks": ["t-17", "t-3"]}
                """;
        AuditResult result = AuditJson.fromJson(v1, "old.json");
        assertEquals(1, result.artefacts().size());
        Artefact a = result.artefacts().get(0);
        assertEquals("gx7relay", a.pattern());
        assertEquals(List.of("gx7relay"), a.termNames());
        assertEquals(ArtefactIdentity.of(ArtefactKind.HEADER, "outage", "gx7relay").id(), a.id());
        assertEquals(12, a.scrub().flips());
        assertEquals(List.of(a.id()), result.scrub().get(0).artefacts());
        assertEquals(List.of("t-17", "t-3"), result.picks());
        assertEquals(a.id(), result.terms().get(0).artefact());
        TelltaleException missing = assertThrows(TelltaleException.class,
                () -> AuditJson.fromJson(v1.replace("\"selected_in\"", "\"selected\""), "old.json"));
        assertEquals("old.json: findings[0].selected_in: missing", missing.getMessage());
    }
}
