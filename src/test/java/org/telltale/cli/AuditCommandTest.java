package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.audit.AuditResult;
import org.telltale.audit.Policy;
import org.telltale.audit.Severity;
import org.telltale.audit.TrainedModels;
import org.telltale.audit.UtilityQueues;
import org.telltale.model.ModelFile;
import org.telltale.report.json.AuditJson;
import org.telltale.report.json.ExplanationsJson;

/** {@code telltale audit} from the command line, in process, on the invented utility mailbox. */
class AuditCommandTest {

    private static String[] audit(Path model, Path corpus, Path out, String... more) {
        List<String> args = new java.util.ArrayList<>(List.of("audit", "--model", model.toString(), "--corpus",
                corpus.toString(), "--out", out.toString(), "--sample", "30", "--probes", "250", "--words", "8",
                "--quiet", "--seed", "3"));
        args.addAll(List.of(more));
        return args.toArray(String[]::new);
    }

    /** The exit code and the standard error of one run. */
    private static String[] run(String... args) {
        picocli.CommandLine cli = Main.commandLine();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(new StringWriter()));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        return new String[] {Integer.toString(code), err.toString()};
    }

    @Test
    void leakyMailboxFailsTheHighGateAndWritesEveryOutput(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("router.model");
        ModelFile.save(TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true)), model);
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 100, true), dir.resolve("mailbox.jsonl"));
        Path out = dir.resolve("audit");

        int code = Main.run(audit(model, corpus, out, "--fail-on", "high"));
        AuditResult result = AuditJson.read(out.resolve("audit.json"));
        assertEquals(ExitCodes.GATE, code);
        assertEquals(300, result.summary().documents());
        assertTrue(!result.open(Severity.HIGH).isEmpty());
        assertEquals(30, ExplanationsJson.read(out.resolve("explanations.jsonl")).size());
        String report = Files.readString(out.resolve("report.html"), StandardCharsets.UTF_8);
        assertTrue(report.contains("Telltale audit") && report.contains("ledgerline.example"), "the HTML report names the artefacts");
        assertEquals(31, Files.readAllLines(out.resolve("journal.jsonl"), StandardCharsets.UTF_8).stream()
                .filter(l -> !l.contains("\"scored\"")).count(), "a start line and one line per explained document");

        // An earlier audit is not overwritten without --force; with it, and --fail-on never, exit 0.
        assertEquals(ExitCodes.USAGE, Main.run(audit(model, corpus, out)));
        assertEquals(ExitCodes.OK, Main.run(audit(model, corpus, out, "--force", "--fail-on", "never")));
        // Resuming a finished audit redoes nothing and gives the same artefacts.
        assertEquals(ExitCodes.GATE, Main.run(audit(model, corpus, out, "--resume")));
        assertEquals(result.artefacts(), AuditJson.read(out.resolve("audit.json")).artefacts());
    }

    @Test
    void acceptedArtefactsAreSuppressedNotDropped(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("router.model");
        ModelFile.save(TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true)), model);
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 100, true), dir.resolve("mailbox.jsonl"));
        Path policy = dir.resolve("policy.json");
        Files.writeString(policy, """
                {"rules": [
                  {"term": "blq", "status": "accepted", "note": "billing case codes are known to the router team"},
                  {"pattern": "ledgerline\\\\..*", "status": "accepted", "note": "billing contractor"},
                  {"term": "accounts", "status": "accepted", "note": "billing contractor mailbox"},
                  {"pattern": "ivr\\\\d+", "status": "artefact", "note": "phone gateway stamp"}]}
                """);
        Path out = dir.resolve("audit");
        Main.run(audit(model, corpus, out, "--policy", policy.toString(), "--fail-on", "never"));
        AuditResult result = AuditJson.read(out.resolve("audit.json"));
        AuditResult.Artefact blq = result.artefacts().stream().filter(f -> f.termNames().equals(List.of("blq")))
                .findFirst().orElseThrow(() -> new AssertionError(result.artefacts()));
        assertTrue(blq.suppressed());
        assertEquals("BLQ-####", blq.pattern());
        assertEquals(Policy.Status.ACCEPTED, blq.policy());
        assertEquals("billing case codes are known to the router team", blq.policyNote());
        assertTrue(result.open(Severity.LOW).stream().noneMatch(f -> f.termNames().contains("blq")));
        assertTrue(result.scrub().stream().noneMatch(s -> s.artefacts().contains(blq.id())),
                "suppressed artefacts are not scrubbed");
        assertEquals(0, blq.scrub().documents());
        AuditResult.Artefact ivr = result.artefacts().stream().filter(f -> f.termNames().contains("ivr7")).findFirst()
                .orElseThrow();
        assertEquals(Policy.Status.ARTEFACT, ivr.policy());
        assertTrue(ivr.severity().atLeast(Severity.MEDIUM));
    }

    @Test
    void badOptionsAreUsageErrors(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("router.model");
        ModelFile.save(TrainedModels.naiveBayes(UtilityQueues.generate(1, 20, true)), model);
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 10, true), dir.resolve("mailbox.jsonl"));
        String[] gate = run(audit(model, corpus, dir.resolve("a"), "--fail-on", "sometimes"));
        assertEquals(Integer.toString(ExitCodes.USAGE), gate[0]);
        // The core's words (FailOn), the option named once at the edge (OptionWords.value).
        assertEquals("telltale: --fail-on: unknown gate 'sometimes'; one of: high, medium, low, never",
                gate[1].lines().findFirst().orElse(""));
        assertEquals(ExitCodes.USAGE, Main.run(audit(model, corpus, dir.resolve("b"), "--resume", "--force")));
        assertEquals(ExitCodes.USAGE, Main.run(audit(model, corpus, dir.resolve("c"), "--picks", "-1")));
        assertEquals(ExitCodes.ERROR, Main.run(audit(model, corpus, dir.resolve("d"), "--resume")),
                "nothing to resume");
    }
}
