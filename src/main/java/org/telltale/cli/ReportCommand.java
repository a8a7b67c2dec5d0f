package org.telltale.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.telltale.ExitCodes;
import org.telltale.UsageException;
import org.telltale.audit.AuditResult;
import org.telltale.audit.Baseline;
import org.telltale.report.json.BaselineJson;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.html.ReportSources;
import org.telltale.report.sarif.SarifWriter;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code telltale report}: re-renders an HTML report from the JSON an explain or audit run wrote. */
@Command(
        name = "report",
        mixinStandardHelpOptions = false,
        versionProvider = VersionProvider.class,
        description = {
            "Renders a self-contained HTML report from audit.json (with the explanations.jsonl beside it) "
                    + "or from explanations written by explain --json; the kind is read from the file's format field. "
                    + "From audit.json (version 1 or 2) it also writes the artefacts as a SARIF 2.1.0 log (--sarif).",
            "The report contains document text and may contain personal data: handle it under your "
                    + "organisation's data-protection rules."})
final class ReportCommand implements Callable<Integer> {
    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--from", required = true, paramLabel = "FILE",
            description = "audit.json, an explanations JSON document, or explanations.jsonl.")
    Path from;

    @Option(names = "--out", paramLabel = "FILE", description = "The HTML file to write.")
    Path out;

    @Option(names = "--sarif", paramLabel = "FILE",
            description = "Write the audit's artefacts as a SARIF 2.1.0 log (from audit.json only; docs/ci.md).")
    Path sarif;

    /** With --sarif: the corpus the audit read, so that locations point at its records' lines. */
    @Mixin
    CorpusOptions corpus;

    @Option(names = "--baseline", paramLabel = "FILE",
            description = "An earlier audit.json: the report and the SARIF log show each finding of --from as new, "
                    + "unchanged or resolved against it (docs/ci.md). Without it, a comparison stored in --from is shown.")
    Path baseline;

    @Option(names = "--force", description = "Replace existing output files.")
    boolean force;

    @Override
    public Integer call() {
        if (out == null && sarif == null) {
            throw new UsageException("nothing to write: give --out FILE, --sarif FILE or both");
        }
        if (corpus.given() && sarif == null) {
            throw new UsageException("--corpus is read only with --sarif (it locates the artefacts' documents)");
        }
        if (out != null) {
            HtmlReports.refuseToReplace(out, force);
        }
        Baseline.Comparison since = null;
        if (baseline != null) {
            since = BaselineJson.read(baseline).compare(Baseline.entriesOf(ReportSources.readAudit(from)));
        }
        if (sarif != null) {
            SarifWriter.refuseToReplace(sarif, force);
            AuditResult audit = ReportSources.readAudit(from);
            Path corpusPath = corpus.given() ? corpus.path() : Path.of(audit.summary().corpus());
            Baseline.Comparison stored = since != null ? since : BaselineJson.section(from).orElse(null);
            SarifOutput.write(audit, sarif, force, corpusPath, corpus.given() ? corpus::open : null, stored);
        }
        if (out != null) {
            ReportSources.Rendered rendered = ReportSources.render(from, since);
            HtmlReports.write(rendered.html(), out, force);
            if (rendered.note() != null) {
                spec.commandLine().getErr().println("telltale: " + rendered.note());
            }
            spec.commandLine().getOut().println(out);
        }
        if (sarif != null) {
            spec.commandLine().getOut().println(sarif);
        }
        return ExitCodes.OK;
    }
}
