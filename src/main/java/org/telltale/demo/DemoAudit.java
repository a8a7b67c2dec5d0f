package org.telltale.demo;

import java.nio.file.Path;
import java.util.Locale;
import java.util.stream.Collectors;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.FailOn;
import org.telltale.audit.Auditor;
import org.telltale.audit.Journal;
import org.telltale.audit.OutputFolder;
import org.telltale.audit.Policy;
import org.telltale.audit.RunFingerprint;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Target;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.model.TextClassifier;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.json.AuditJson;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.text.Analyzers;
import org.telltale.text.Corpora;
import org.telltale.text.CorpusSettings;

/**
 * The audit the demo runs on a served model: the same pieces and files as {@code telltale audit
 * --scrub-all --fail-on never}, with settings sized to finish in a minute or two on two cores.
 */
final class DemoAudit {
    static final String ANALYZER = "standard";
    static final int PICKS = 5;
    static final int BATCH = 64;

    private final DemoSettings settings;
    private final DemoProgress progress;

    DemoAudit(DemoSettings settings, DemoProgress progress) {
        this.settings = settings;
        this.progress = progress;
    }

    /** Audits {@code classifier} on {@code corpus}; writes audit.json, explanations.jsonl and report.html into {@code dir}. */
    AuditResult run(TextClassifier classifier, Path corpus, Path dir) {
        AuditSettings audit = new AuditSettings(settings.sample(), settings.probes(), settings.words(), PICKS, true,
                FailOn.NEVER, AuditSettings.DEFAULT_ALPHA, BATCH, ANALYZER, null);
        ExplainSettings explain = ExplainSettings.defaults().withWords(settings.words()).withProbes(settings.probes())
                .withSeed(settings.seed()).withAnalyzer(ANALYZER).withTarget(Target.PROBABILITY);
        OutputFolder folder = OutputFolder.open(dir, true, false);
        String corpusName = corpus.getFileName().toString();
        // The demo never resumes; its fingerprint still says what decided the result.
        RunFingerprint fingerprint = RunFingerprint.of(RunFingerprint.corpus(corpus),
                java.util.Map.of("model_kind", "in-process", "model", classifier.describe()), settings.seed(), audit, null,
                explain);
        Explainer explainer = new Explainer(classifier, explain);
        Auditor auditor = new Auditor(classifier, d -> explainer.explain(d, null), new Codec(),
                Analyzers.byName(ANALYZER), audit, settings.seed(), Policy.empty(), new Steps(progress));
        Auditor.Outcome outcome;
        try (Journal journal = Journal.create(folder.file(OutputFolder.JOURNAL), fingerprint)) {
            outcome = auditor.run(() -> Corpora.open(corpus, CorpusSettings.DEFAULTS), journal, classifier.describe(),
                    corpusName);
        }
        folder.write(OutputFolder.EXPLANATIONS, outcome.explanations().stream().map(ExplanationsJson::toLine)
                .collect(Collectors.joining("\n", "", "\n")));
        folder.write(OutputFolder.AUDIT, AuditJson.toJson(outcome.result()) + "\n");
        HtmlReports.write(HtmlReports.audit(outcome.result(), outcome.explanations()), folder.file(OutputFolder.REPORT), true);
        return outcome.result();
    }

    /** The audit's phases as progress lines, with a count every quarter of a long phase. */
    private static final class Steps implements Auditor.Progress {
        private final DemoProgress progress;
        private String phase;
        private long total;
        private long done;
        private long nextReport;

        Steps(DemoProgress progress) {
            this.progress = progress;
        }

        @Override
        public void phase(String name, long total) {
            this.phase = name;
            this.total = total;
            this.done = 0;
            this.nextReport = Math.max(1, total / 4);
            progress.step(total > 0 ? String.format(Locale.ROOT, "  %s (%d)", name, total) : "  " + name);
        }

        @Override
        public void advance(long steps) {
            done += steps;
            if (total > 20 && done >= nextReport && done < total) {
                progress.step(String.format(Locale.ROOT, "  %s %d/%d", phase, done, total));
                nextReport += Math.max(1, total / 4);
            }
        }
    }

    /** The explanation line form of the telltale.explanations contract, for the journal. */
    private static final class Codec implements Auditor.ExplanationCodec {
        @Override
        public String toLine(Explanation explanation) {
            return ExplanationsJson.toLine(explanation);
        }

        @Override
        public Explanation fromLine(String line, String place) {
            return ExplanationsJson.fromLine(line, place);
        }
    }
}
