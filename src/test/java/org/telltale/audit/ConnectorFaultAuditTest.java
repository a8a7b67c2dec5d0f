package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.audit.AuditResult.Summary;
import org.telltale.cli.Main;
import org.telltale.model.NaiveBayesModel;
import org.telltale.report.json.AuditJson;

/** An audit against a real loopback model service that stumbles, then goes down, then comes back. */
class ConnectorFaultAuditTest {

    static String[] audit(String url, Path corpus, Path out, String... more) {
        List<String> args = new java.util.ArrayList<>(List.of("audit", "--model", url, "--corpus", corpus.toString(),
                "--out", out.toString(), "--sample", "24", "--probes", "200", "--words", "8", "--quiet",
                "--retries", "2", "--timeout", "10s", "--fail-on", "never"));
        args.addAll(List.of(more));
        return args.toArray(String[]::new);
    }

    /** The result with the two fields a fault may change, elapsed time and retries, set aside. */
    static AuditResult withoutRunFacts(AuditResult r) {
        Summary s = r.summary();
        Summary same = new Summary(s.documents(), s.explained(), s.labels(), s.accuracy(), s.skipped(), 0, s.model(),
                s.corpus(), s.seed(), s.settings(), s.associationBasis(), s.prior(), s.predictedCounts(), s.zThreshold(),
                s.termsTested(), s.pickCoverage(), 0);
        return new AuditResult(same, r.artefacts(), r.scrub(), r.picks(), r.terms());
    }

    @Test
    void finishedDocumentsSurviveAnOutageAndResumeCompletesTheSameAudit(@TempDir Path dir) throws Exception {
        NaiveBayesModel model = TrainedModels.naiveBayes(UtilityQueues.generate(1, 100, true));
        Path corpus = UtilityQueues.write(UtilityQueues.generate(2, 60, true), dir.resolve("mailbox.jsonl"));
        try (ScoringService service = new ScoringService(model)) {
            assertEquals(ExitCodes.OK, Main.run(audit(service.url(), corpus, dir.resolve("reference"))));
            AuditResult reference = AuditJson.read(dir.resolve("reference/audit.json"));
            assertEquals(0, reference.summary().retries());

            int start = service.posts.get();
            Path out = dir.resolve("faulty");
            // Documents are explained several at a time, so the request count does not say which
            // are finished: the service goes down once six are in the journal. The 503 falls on
            // one of the first documents in flight, so its retry is among the finished work.
            service.fail(start + 4, () -> explainedLines(out.resolve("journal.jsonl")) >= 6);
            assertEquals(ExitCodes.ERROR, Main.run(audit(service.url(), corpus, out)), "the service went down");
            long explained = explainedLines(out.resolve("journal.jsonl"));
            assertTrue(explained > 0 && explained < 24, "documents finished before the outage are kept: " + explained);
            assertTrue(Files.notExists(out.resolve("audit.json")));

            service.heal();
            int before = service.posts.get();
            assertEquals(ExitCodes.OK, Main.run(audit(service.url(), corpus, out, "--resume")));
            AuditResult resumed = AuditJson.read(out.resolve("audit.json"));
            assertEquals(withoutRunFacts(reference), withoutRunFacts(resumed));
            assertTrue(resumed.summary().retries() >= 1, "the 503 was retried and counted");
            int referencePosts = start;
            assertTrue(service.posts.get() - before < referencePosts, "resume did not redo the finished work");
        }
    }

    /** How many documents the journal holds as explained; 0 before it exists. */
    private static long explainedLines(Path journal) {
        try {
            return Files.notExists(journal) ? 0 : Files.readAllLines(journal, StandardCharsets.UTF_8).stream()
                    .filter(l -> l.startsWith("{\"type\":\"explained\"")).count();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
