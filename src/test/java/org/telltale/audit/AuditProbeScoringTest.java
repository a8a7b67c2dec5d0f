package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.connect.ConnectorSettings;
import org.telltale.connect.Connectors;
import org.telltale.explain.ConcurrentExplanations;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Explainer;
import org.telltale.explain.Target;
import org.telltale.model.NaiveBayesModel;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.report.json.AuditJson;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.text.Analyzers;
import org.telltale.text.Corpora;
import org.telltale.text.CorpusReader;
import org.telltale.text.CorpusSettings;
import org.telltale.text.Document;

/**
 * An audit whose built-in model scores the explanations' probes from term counts, several
 * documents at once (as {@code telltale audit} runs it), ends with the same result and the same
 * explanations as one that sends every probe's text, one document after another: the demo corpus,
 * compared as the JSON the audit writes, timings left out.
 */
class AuditProbeScoringTest {
    private static final Path CORPUS = Path.of("corpora-demo/support-leaky.jsonl");

    @Test
    void theFastPathAndTheTextPathGiveTheSameAudit(@TempDir Path dir) throws Exception {
        List<Document> training = new ArrayList<>();
        try (CorpusReader reader = Corpora.open(CORPUS, CorpusSettings.DEFAULTS)) {
            while (reader.hasNext() && training.size() < 600) {
                training.add(reader.next());
            }
        }
        AuditSettings settings = AuditRuns.settings(40, 400, 10);
        // A model each: closing a connector closes its model.
        Run throughTexts = run(TrainedModels.naiveBayes(training), false, null, settings, dir.resolve("texts"));
        Run throughCounts = run(TrainedModels.naiveBayes(training), true, ConcurrentExplanations.inProcess(), settings,
                dir.resolve("counts"));

        assertEquals(throughTexts.explanations(), throughCounts.explanations());
        assertEquals(throughTexts.audit(), throughCounts.audit());
        assertEquals(40, throughCounts.explanations().size());
        // Not vacuous: the probes of the fast path never reached the connector as texts.
        assertTrue(throughTexts.texts() - throughCounts.texts() >= 40 * 400 / 2,
                throughTexts.texts() + " texts against " + throughCounts.texts());
    }

    /** What one audit wrote, timings removed, and how many texts its connector scored. */
    private record Run(List<String> explanations, String audit, long texts) {
    }

    /** One audit; {@code concurrently} null: the step as the audit ran it before, one document after another. */
    private static Run run(NaiveBayesModel model, boolean fromCounts, ConcurrentExplanations concurrently,
            AuditSettings settings, Path dir) throws Exception {
        java.nio.file.Files.createDirectories(dir);
        long seed = 7;
        AtomicLong texts = new AtomicLong();
        try (TextClassifier connector = Connectors.inProcess(model, ConnectorSettings.of("model.json"))) {
            TextClassifier counted = new TextClassifier() {
                @Override
                public ScoreMatrix score(List<String> batch) {
                    texts.addAndGet(batch.size());
                    return connector.score(batch);
                }

                @Override
                public ScoreMatrix score(List<String> batch, List<String> ids) {
                    texts.addAndGet(batch.size());
                    return connector.score(batch, ids);
                }

                @Override
                public String describe() {
                    return connector.describe();
                }
            };
            ExplainSettings explain = ExplainSettings.defaults().withWords(settings.words())
                    .withProbes(settings.probes()).withSeed(seed).withAnalyzer(settings.analyzer())
                    .withTarget(Target.PROBABILITY);
            Explainer explainer = new Explainer(concurrently == null ? counted : concurrently.waitingOn(counted),
                    explain, fromCounts ? model : null);
            Auditor.ExplainStep step = concurrently == null ? d -> explainer.explain(d, null)
                    : Auditor.ExplainStep.concurrently(explainer, concurrently);
            Auditor auditor = new Auditor(counted, step,
                    AuditRuns.CODEC, Analyzers.byName(settings.analyzer()), settings, seed, null, Auditor.Progress.SILENT);
            RunFingerprint fingerprint = RunFingerprint.of(RunFingerprint.corpus(CORPUS),
                    Map.of("model_kind", "in-process", "model", counted.describe()), seed, settings, null, explain);
            Auditor.Outcome outcome;
            try (Journal journal = Journal.create(dir.resolve("journal.jsonl"), fingerprint)) {
                outcome = auditor.run(() -> Corpora.open(CORPUS), journal, counted.describe(), "support-leaky.jsonl");
            }
            List<String> lines = outcome.explanations().stream()
                    .map(e -> ExplanationsJson.toLine(e).replaceAll("\"timing\":\\{[^}]*\\},?", "")).toList();
            String audit = AuditJson.toJson(outcome.result(), null).replaceAll("\"elapsed_ms\"\\s*:\\s*\\d+", "");
            return new Run(lines, audit, texts.get());
        }
    }
}
