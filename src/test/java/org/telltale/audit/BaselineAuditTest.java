package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.Set;
import java.util.stream.Collectors;
import org.jsoup.Jsoup;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.cli.Main;
import org.telltale.model.ModelFile;
import org.telltale.report.json.AuditJson;
import org.telltale.report.json.BaselineJson;
import org.telltale.report.sarif.SarifMultitool;
import org.telltale.text.Document;

/**
 * {@code telltale audit --baseline} on the invented utility mailbox. The router was trained on
 * mail where a dispatch header ({@code X-Dispatch: nightcrew}) marks outage tickets as well as the
 * usual planted artefacts; the first audit's corpus has no dispatch header. A copy that adds the
 * header and drops the billing contractor's reply address is audited against the first audit.json:
 * the header is new and alone fails the gate, the old artefacts are unchanged, the address is
 * resolved; a copy that only drops the address brings nothing new and passes.
 */
class BaselineAuditTest {
    private static final String NEW_VALUE = "nightcrew";
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path dir;

    /** Adds {@code X-Dispatch: nightcrew} to the header block of 90 % of outage mail and 3 % of the rest. */
    static List<Document> withDispatchHeader(List<Document> docs, long seed) {
        Random random = new Random(seed);
        List<Document> out = new ArrayList<>();
        for (Document d : docs) {
            boolean planted = d.label().equals("outage") ? random.nextDouble() < 0.9 : random.nextDouble() < 0.03;
            int at = d.text().indexOf("\n\n");
            out.add(planted ? new Document(d.id(), d.text().substring(0, at + 1) + "X-Dispatch: " + NEW_VALUE + "\n"
                    + d.text().substring(at + 1), d.label()) : d);
        }
        return out;
    }

    /** Replaces the billing contractor's reply address with the reply line every queue has. */
    static List<Document> withoutReplyAddress(List<Document> docs) {
        return docs.stream().map(d -> new Document(d.id(), d.text().replace(
                "Reply to accounts@ledgerline.example with questions.", "Reply to this message with questions."), d.label())).toList();
    }

    /**
     * The reviewers accepted the desk signature, which every queue's mail carries: at the term level
     * its words drift from one label to another between corpora, which is noise for this test.
     */
    private static final String POLICY = """
            {"rules": [{"pattern": "kestrel|valley|utilities|customer|desk", "status": "accepted",
              "note": "the desk signature is on every queue's mail"}]}
            """;

    private Path policy;

    private String[] audit(Path model, Path corpus, Path out, String... more) throws java.io.IOException {
        if (policy == null) {
            policy = Files.writeString(dir.resolve("policy.json"), POLICY, StandardCharsets.UTF_8);
        }
        List<String> args = new ArrayList<>(List.of("audit", "--model", model.toString(), "--corpus",
                corpus.toString(), "--out", out.toString(), "--policy", policy.toString(), "--sample", "30", "--probes", "250", "--words", "8",
                "--quiet", "--seed", "3", "--fail-on", "medium"));
        args.addAll(List.of(more));
        return args.toArray(String[]::new);
    }

    private static Set<String> patterns(List<Baseline.Entry> entries) {
        return entries.stream().map(e -> e.identity().pattern()).collect(Collectors.toSet());
    }

    @Test
    void onlyTheNewArtefactFailsTheGateAndTheRemovedOneIsResolved() throws Exception {
        Path model = dir.resolve("router.model");
        ModelFile.save(TrainedModels.naiveBayes(withDispatchHeader(UtilityQueues.generate(1, 150, true), 11)), model);
        List<Document> first = UtilityQueues.generate(2, 100, true);
        Path firstCorpus = UtilityQueues.write(first, dir.resolve("mailbox.jsonl"));
        Path firstOut = dir.resolve("first");
        assertEquals(ExitCodes.GATE, Main.run(audit(model, firstCorpus, firstOut)), "the planted artefacts fail the gate");
        Path baseline = firstOut.resolve("audit.json");
        AuditResult before = AuditJson.read(baseline);
        assertFalse(before.artefacts().stream().anyMatch(f -> f.termNames().contains(NEW_VALUE)), "no dispatch header yet");
        assertTrue(before.artefacts().stream().anyMatch(f -> f.pattern().equals("ledgerline.example")), "the reply address is found");

        // A copy with one new planted artefact and without the reply address.
        Path secondCorpus = UtilityQueues.write(withDispatchHeader(withoutReplyAddress(first), 12), dir.resolve("mailbox-2.jsonl"));
        Path secondOut = dir.resolve("second");
        Path sarif = dir.resolve("second.sarif");
        ByteArrayOutputStream stdout = new ByteArrayOutputStream();
        PrintStream was = System.out;
        int code;
        try {
            System.setOut(new PrintStream(stdout, true, StandardCharsets.UTF_8));
            code = Main.run(audit(model, secondCorpus, secondOut, "--baseline", baseline.toString(), "--sarif", sarif.toString()));
        } finally {
            System.setOut(was);
        }
        String printed = stdout.toString(StandardCharsets.UTF_8);
        assertEquals(ExitCodes.GATE, code, printed);
        Baseline.Comparison since = BaselineJson.section(secondOut.resolve("audit.json")).orElseThrow();
        // The new header field alone fails the gate: one artefact, the field with its value.
        assertEquals(1, since.gate(Severity.MEDIUM).size(), "gate: " + since.added());
        String gated = since.gate(Severity.MEDIUM).get(0).identity().pattern();
        assertTrue(gated.startsWith("x-dispatch: ") && gated.contains(NEW_VALUE), "gate: " + since.added());
        assertTrue(since.added().stream().anyMatch(e -> e.identity().kind().equals("header")
                && e.identity().label().equals("outage") && e.identity().pattern().equals(gated)));
        // The old planted artefacts are unchanged; the reply address is resolved.
        for (String old : List.of("ivr7", "blq", "fernhill")) {
            assertTrue(patterns(since.unchanged()).stream().anyMatch(p -> p.contains(old)),
                    old + " unchanged: " + patterns(since.unchanged()));
        }
        assertTrue(patterns(since.resolved()).stream().anyMatch(p -> p.contains("ledgerline.example")), "resolved: " + patterns(since.resolved()));
        assertFalse(patterns(since.unchanged()).stream().anyMatch(p -> p.contains("ledgerline.example")));
        Set<String> shown = new java.util.HashSet<>(patterns(since.added()));
        shown.addAll(patterns(since.unchanged()));
        assertEquals(AuditJson.read(secondOut.resolve("audit.json")).artefacts().stream()
                .map(f -> ArtefactIdentity.normalise(f.pattern())).collect(Collectors.toSet()), shown, "every artefact has a state");

        // The terminal, the report and the SARIF log say the same.
        assertTrue(printed.contains("since the baseline " + baseline + ": " + since.added().size() + " new, "
                + since.unchanged().size() + " unchanged, " + since.resolved().size() + " resolved"), printed);
        assertTrue(printed.lines().anyMatch(l -> l.trim().startsWith("new") && l.contains(NEW_VALUE)), printed);
        assertTrue(printed.lines().anyMatch(l -> l.trim().startsWith("resolved") && l.contains("ledgerline.example")), printed);
        var page = Jsoup.parse(secondOut.resolve("report.html").toFile(), "UTF-8");
        assertEquals("Since the baseline", page.select("#baseline-h").text());
        assertEquals(since.added().size(), page.select("#baseline tr.tt-bl-new").size());
        assertEquals(since.resolved().size(), page.select("#baseline tr.tt-bl-resolved").size());
        assertEquals(since.unchanged().size(), page.select("#baseline tr.tt-bl-unchanged").size());
        JsonNode results = JSON.readTree(sarif.toFile()).at("/runs/0/results");
        for (JsonNode r : results) {
            ArtefactIdentity identity = new ArtefactIdentity(r.at("/properties/kind").asText(),
                    r.at("/properties/label").asText(), r.at("/properties/pattern").asText());
            assertEquals(since.stateOf(identity).key(), r.get("baselineState").asText(), identity.canonical());
        }
        assertEquals(since.resolved().size(), JSON.readTree(sarif.toFile()).at("/runs/0/properties/telltale/baseline/resolved").size());
        assertEquals(List.of(), SarifMultitool.errors(sarif), "SARIF Multitool validate");

        // telltale report renders the same comparison from the two audit.json files.
        Path again = dir.resolve("again.html");
        assertEquals(ExitCodes.OK, Main.run("report", "--from", secondOut.resolve("audit.json").toString(),
                "--baseline", baseline.toString(), "--out", again.toString()));
        var rendered = Jsoup.parse(again.toFile(), "UTF-8");
        assertEquals(page.select("#baseline tbody").text(), rendered.select("#baseline tbody").text());

        // Nothing new: a copy that only drops the address passes the gate against the baseline,
        // fails it without one and with --fail-on-all (the old artefacts are still there).
        Path thirdCorpus = UtilityQueues.write(withoutReplyAddress(first), dir.resolve("mailbox-3.jsonl"));
        assertEquals(ExitCodes.OK, Main.run(audit(model, thirdCorpus, dir.resolve("third"), "--baseline", baseline.toString())));
        Baseline.Comparison quiet = BaselineJson.section(dir.resolve("third/audit.json")).orElseThrow();
        assertEquals(Set.of(), patterns(quiet.gate(Severity.MEDIUM)), "nothing new: " + quiet.added());
        assertTrue(patterns(quiet.resolved()).stream().anyMatch(p -> p.contains("ledgerline.example")));
        assertEquals(ExitCodes.GATE, Main.run(audit(model, thirdCorpus, dir.resolve("third"), "--baseline", baseline.toString(),
                "--fail-on-all", "--force")));
        assertEquals(ExitCodes.GATE, Main.run(audit(model, thirdCorpus, dir.resolve("third"), "--force")));
    }
}
