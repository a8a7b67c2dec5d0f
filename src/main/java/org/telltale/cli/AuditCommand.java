package org.telltale.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import org.telltale.UsageException;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.Baseline;
import org.telltale.audit.FailOn;
import org.telltale.audit.Auditor;
import org.telltale.audit.Journal;
import org.telltale.audit.OutputFolder;
import org.telltale.audit.Policy;
import org.telltale.audit.RunFingerprint;
import org.telltale.audit.Severity;
import org.telltale.explain.ConcurrentExplanations;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.connect.ModelIdentity;
import org.telltale.model.TextClassifier;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.json.AuditJson;
import org.telltale.report.json.BaselineJson;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.report.sarif.SarifWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code telltale audit}: corpus-wide evidence and the leakage detector (docs/audit.md). */
@Command(name = "audit", mixinStandardHelpOptions = false, versionProvider = VersionProvider.class,
        description = {"Scores a whole corpus, explains a stratified sample, and reports terms the model leans on "
                + "that sit in headers, addresses, identifiers or boilerplate; proves the dependence by scrubbing.",
            "Exit codes: 0 clean, 3 artefacts at or above --fail-on remain (with --baseline: new ones), 1 error, 2 usage."})
final class AuditCommand implements Callable<Integer> {
    @Mixin CommonOptions common;
    @Mixin ModelOptions model;
    @Mixin CorpusOptions corpus;
    @Mixin AnalyzerOptions analyzer;
    @Spec CommandSpec spec;

    @Option(names = "--sample", paramLabel = "N", defaultValue = "200", description = "Documents to explain, stratified. Default: ${DEFAULT-VALUE}.")
    int sample;
    @Option(names = "--probes", paramLabel = "N", defaultValue = "1000", description = "Probe budget per explanation. Default: ${DEFAULT-VALUE}.")
    int probes;
    @Option(names = "--words", paramLabel = "K", defaultValue = "10", description = "Terms per explanation. Default: ${DEFAULT-VALUE}.")
    int words;
    @Option(names = "--out", paramLabel = "DIR", defaultValue = "telltale-audit", description = "Output folder. Default: ${DEFAULT-VALUE}.")
    Path out;
    @Option(names = "--policy", paramLabel = "FILE", description = "Reviewer decisions: terms, term patterns or whole artefacts (kind and glob) marked accepted or artefact (docs/audit.md).")
    Path policy;
    @Option(names = "--fail-on", paramLabel = "LEVEL", defaultValue = "high", description = "Exit 3 when artefacts at or above high, medium or low remain; never to always exit 0. Default: ${DEFAULT-VALUE}.")
    String failOn;
    @Option(names = "--resume", description = "Continue the audit whose journal is in --out, redoing nothing it finished.")
    boolean resume;
    @Option(names = "--force", description = "Overwrite an earlier audit in --out, or start an unfinished one over.")
    boolean force;
    @Option(names = "--scrub-all", description = "Scrub and rescore the whole corpus, not only the explained documents.")
    boolean scrubAll;
    @Option(names = "--picks", paramLabel = "B", defaultValue = "5", description = "Documents the submodular pick chooses for the reviewer. Default: ${DEFAULT-VALUE}.")
    int picks;
    @Option(names = "--quiet", description = "No progress bar.")
    boolean quiet;
    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed of every random choice. Default: ${DEFAULT-VALUE}.")
    long seed;
    @Option(names = "--sarif", paramLabel = "FILE", description = "Also write the artefacts as a SARIF 2.1.0 log for code-scanning views (docs/ci.md); replaced only with --force.")
    Path sarif;
    @Option(names = "--baseline", paramLabel = "FILE", description = "An earlier audit.json: each finding is reported new, unchanged or resolved against it, and --fail-on counts new findings only (docs/ci.md).")
    Path baseline;
    @Option(names = "--fail-on-all", description = "With --baseline, let --fail-on count every open finding, not only new ones.")
    boolean failOnAll;

    @Override
    public Integer call() throws IOException {
        FailOn gate;
        try {
            gate = FailOn.fromKey(failOn);
        } catch (IllegalArgumentException e) {
            throw OptionWords.value("--fail-on", e);
        }
        if (resume && force) {
            throw new UsageException("--resume and --force exclude each other");
        }
        if (!corpus.given()) {
            throw new UsageException("missing --corpus FILE");
        }
        AuditSettings settings;
        try {
            settings = new AuditSettings(sample, probes, words, picks, scrubAll, gate, AuditSettings.DEFAULT_ALPHA,
                    model.settings().batch(), analyzer.spec(), policy == null ? null : policy.getFileName().toString());
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
        if (failOnAll && baseline == null) {
            throw new UsageException("--fail-on-all is read only with --baseline");
        }
        Baseline earlier = baseline == null ? null : BaselineJson.read(baseline);
        Policy rules = policy == null ? Policy.empty() : Policy.read(policy);
        if (sarif != null) {
            SarifWriter.refuseToReplace(sarif, force || resume);
        }
        OutputFolder folder = OutputFolder.open(out, force, resume);
        ExplainSettings explain = settings.explainSettings(seed);
        Auditor.Progress progress = AuditProgressBar.forTerminal(quiet);
        Auditor.Outcome outcome;
        String concurrency;
        ModelOptions.ForExplaining opened = model.openForExplaining();
        try (TextClassifier classifier = opened.classifier()) {
            RunFingerprint fingerprint = RunFingerprint.of(RunFingerprint.corpus(corpus.path()),
                    ModelIdentity.of(model.settings()), seed, settings, policy == null ? null : RunFingerprint.sha256(policy),
                    explain);
            Path journalFile = folder.file(OutputFolder.JOURNAL);
            ConcurrentExplanations concurrently = opened.concurrently();
            Explainer explainer = new Explainer(concurrently.waitingOn(classifier), explain, opened.probeScoring());
            Auditor auditor = new Auditor(classifier, Auditor.ExplainStep.concurrently(explainer, concurrently), new Codec(),
                    analyzer.analyzer(), settings, seed, rules, progress);
            try (Journal journal = resume ? Journal.resume(journalFile, fingerprint) : Journal.create(journalFile, fingerprint)) {
                outcome = auditor.run(corpus::open, journal, classifier.describe(), corpus.path().getFileName().toString());
            } finally {
                progress.done();
            }
            concurrency = classifier.concurrency();
            ModelOptions.reportConcurrency(classifier, common.verbose, spec.commandLine().getErr());
        }
        List<String> files = new ArrayList<>();
        files.add(folder.write(OutputFolder.EXPLANATIONS, outcome.explanations().stream()
                .map(ExplanationsJson::toLine).collect(Collectors.joining("\n", "", "\n"))).toString());
        AuditResult result = outcome.result();
        Baseline.Comparison since = earlier == null ? null : earlier.compare(Baseline.entriesOf(result));
        files.add(folder.write(OutputFolder.AUDIT, AuditJson.toJson(result, since) + "\n").toString());
        files.add(folder.write(OutputFolder.REPORT, HtmlReports.audit(result, outcome.explanations(), since)).toString());
        files.add(folder.file(OutputFolder.JOURNAL).toString());
        if (sarif != null) {
            files.add(SarifOutput.write(result, sarif, true, corpus.path(), corpus::open, since).toString());
        }
        AuditPrinter.print(spec.commandLine().getOut(), result, files, concurrency, since);
        Severity least = gate.least();
        if (least == null) {
            return ExitCodes.OK;
        }
        boolean failing = since == null || failOnAll ? !result.open(least).isEmpty() : !since.gate(least).isEmpty();
        return failing ? ExitCodes.GATE : ExitCodes.OK;
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
