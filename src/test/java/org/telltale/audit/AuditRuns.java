package org.telltale.audit;

import java.nio.file.Path;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Target;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.model.TextClassifier;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.text.Analyzers;
import org.telltale.text.Corpora;

/** Runs real audits in the tests: the real explainer, the real corpus reader, a journal on disk. */
final class AuditRuns {
    private AuditRuns() {
    }

    static final Auditor.ExplanationCodec CODEC = new Auditor.ExplanationCodec() {
        @Override
        public String toLine(Explanation explanation) {
            return ExplanationsJson.toLine(explanation);
        }

        @Override
        public Explanation fromLine(String line, String place) {
            return ExplanationsJson.fromLine(line, place);
        }
    };

    static AuditSettings settings(int sample, int probes, int words) {
        return new AuditSettings(sample, probes, words, 5, false, FailOn.HIGH, AuditSettings.DEFAULT_ALPHA, 64,
                "standard", null);
    }

    static Auditor.Outcome run(TextClassifier model, Path corpus, AuditSettings settings, long seed, Policy policy,
            Path dir) {
        ExplainSettings explain = ExplainSettings.defaults().withWords(settings.words()).withProbes(settings.probes())
                .withSeed(seed).withAnalyzer(settings.analyzer()).withTarget(Target.PROBABILITY);
        Explainer explainer = new Explainer(model, explain);
        Auditor auditor = new Auditor(model, d -> explainer.explain(d, null), CODEC, Analyzers.byName(settings.analyzer()),
                settings, seed, policy, Auditor.Progress.SILENT);
        RunFingerprint fingerprint = RunFingerprint.of(RunFingerprint.corpus(corpus),
                java.util.Map.of("model_kind", "in-process", "model", model.describe()), seed, settings, null, explain);
        try (Journal journal = Journal.create(dir.resolve("journal.jsonl"), fingerprint)) {
            return auditor.run(() -> Corpora.open(corpus), journal, model.describe(), corpus.getFileName().toString());
        }
    }
}
