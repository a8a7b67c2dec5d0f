package org.telltale.report.sarif;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.audit.ArtefactIdentity;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AuditResult;
import org.telltale.audit.TrainedModels;
import org.telltale.audit.UtilityQueues;
import org.telltale.cli.Main;
import org.telltale.model.ModelFile;
import org.telltale.report.json.AuditJson;
import org.telltale.text.Document;

/**
 * {@code telltale audit --sarif} and {@code telltale report --sarif} on the invented utility
 * mailbox, with a policy that adds a marked content term and an accepted finding, so the log holds
 * every artefact kind and a suppression. The log must pass the SARIF Multitool's validate, and its
 * locations must lead back to the example documents' records in the corpus file.
 */
class AuditSarifTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    private static final String POLICY = """
            {"rules": [
              {"pattern": "invoice|refund|payment|charged|tariff", "status": "artefact", "note": "billing words marked for the test"},
              {"term": "blq", "status": "accepted", "note": "billing case codes are known to the router team"}]}
            """;

    /** The mailbox as CSV: its texts span several lines, so records and lines differ. */
    static Path csv(List<Document> docs, Path file) throws Exception {
        StringWriter out = new StringWriter();
        try (CSVPrinter printer = new CSVPrinter(out, CSVFormat.RFC4180.builder().setHeader("id", "text", "label").get())) {
            for (Document d : docs) {
                printer.printRecord(d.id(), d.text(), d.label());
            }
        }
        Files.writeString(file, out.toString(), StandardCharsets.UTF_8);
        return file;
    }

    @Test
    void theAuditsSarifLogIsValidHoldsEveryKindAndPointsAtTheExampleRecords() throws Exception {
        Path model = dir.resolve("router.model");
        ModelFile.save(TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true)), model);
        Path corpus = csv(UtilityQueues.generate(2, 100, true), dir.resolve("mailbox.csv"));
        Path policy = Files.writeString(dir.resolve("policy.json"), POLICY, StandardCharsets.UTF_8);
        Path out = dir.resolve("audit");
        Path sarif = dir.resolve("audit.sarif");

        int code = Main.run("audit", "--model", model.toString(), "--corpus", corpus.toString(), "--out", out.toString(),
                "--sample", "30", "--probes", "250", "--words", "8", "--quiet", "--seed", "3", "--policy",
                policy.toString(), "--fail-on", "high", "--sarif", sarif.toString());
        assertEquals(ExitCodes.GATE, code);
        AuditResult audit = AuditJson.read(out.resolve("audit.json"));

        assertEquals(List.of(), SarifMultitool.errors(sarif), "SARIF Multitool validate");

        JsonNode run = JSON.readTree(sarif.toFile()).get("runs").get(0);
        assertEquals(audit.artefacts().size(), run.get("results").size());
        Set<ArtefactKind> kinds = EnumSet.noneOf(ArtefactKind.class);
        audit.artefacts().forEach(f -> kinds.add(f.kind()));
        assertEquals(EnumSet.allOf(ArtefactKind.class), kinds, "the policy and the planted artefacts give every kind");
        Set<String> ruleIds = new HashSet<>();
        run.at("/tool/driver/rules").forEach(r -> ruleIds.add(r.get("id").asText()));
        assertEquals(kinds.stream().map(SarifRules::id).collect(Collectors.toSet()), ruleIds);
        assertEquals(3, run.at("/properties/telltale/seed").asInt(), "the run's settings travel with the log");
        assertEquals(30, run.at("/properties/telltale/settings/sample").asInt());

        List<String> lines = Files.readString(corpus, StandardCharsets.UTF_8).lines().toList();
        int located = 0;
        boolean suppressed = false;
        for (int i = 0; i < audit.artefacts().size(); i++) {
            AuditResult.Artefact f = audit.artefacts().get(i);
            JsonNode r = run.get("results").get(i);
            assertEquals(SarifRules.id(f.kind()), r.get("ruleId").asText());
            assertEquals(Map.of("high", "error", "medium", "warning", "low", "note").get(f.severity().key()),
                    r.get("level").asText());
            assertEquals(ArtefactIdentity.of(f).fingerprint(), r.get("partialFingerprints").get(SarifWriter.IDENTITY_KEY).asText());
            String message = r.at("/message/text").asText();
            assertTrue(message.contains("'" + f.pattern() + "'") && message.contains("'" + f.label() + "'")
                    && message.contains(f.support() + " corpus documents"), message);
            suppressed |= f.suppressed() && r.at("/suppressions/0/justification").asText().equals(f.policyNote());
            List<String> exampleIds = f.examples().stream().limit(3).map(AuditResult.Example::id).toList();
            List<String> logical = new ArrayList<>();
            for (JsonNode location : r.get("locations")) {
                assertEquals(SarifWriter.uri(corpus), location.at("/physicalLocation/artifactLocation/uri").asText());
                String id = location.at("/logicalLocations/0/name").asText(null);
                if (id == null) {
                    continue;
                }
                logical.add(id);
                // Read back: the line the log names is where that document's CSV record begins.
                int line = location.at("/physicalLocation/region/startLine").asInt();
                assertTrue(lines.get(line - 1).startsWith(id + ","), id + " at line " + line + ": " + lines.get(line - 1));
                located++;
            }
            assertEquals(exampleIds, logical, f.pattern());
        }
        assertTrue(located >= audit.artefacts().size(), "most artefacts have example documents: " + located);
        assertTrue(suppressed, "the accepted artefact is suppressed with the reviewer's note");

        // report --sarif writes the same results from audit.json and the corpus.
        Path again = dir.resolve("again.sarif");
        assertEquals(ExitCodes.OK, Main.run("report", "--from", out.resolve("audit.json").toString(), "--sarif",
                again.toString(), "--corpus", corpus.toString()));
        assertEquals(run.get("results"), JSON.readTree(again.toFile()).get("runs").get(0).get("results"));
        assertEquals(List.of(), SarifMultitool.errors(again), "SARIF Multitool validate");
        // Without the corpus the locations name the file alone, and the log is still valid.
        Path bare = dir.resolve("bare.sarif");
        assertEquals(ExitCodes.OK, Main.run("report", "--from", out.resolve("audit.json").toString(), "--sarif", bare.toString()));
        JsonNode bareRun = JSON.readTree(bare.toFile()).get("runs").get(0);
        assertFalse(bareRun.toString().contains("startLine"));
        assertEquals(List.of(), SarifMultitool.errors(bare), "SARIF Multitool validate");
        // An existing log is kept unless --force.
        assertEquals(ExitCodes.ERROR, Main.run("report", "--from", out.resolve("audit.json").toString(), "--sarif", bare.toString()));
    }
}
