package org.telltale.cli;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.telltale.ExitCodes;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.html.ReportSources;
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
                    + "or from explanations written by explain --json; the kind is read from the file's format field.",
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

    @Option(names = "--out", required = true, paramLabel = "FILE", description = "The HTML file to write.")
    Path out;

    @Option(names = "--force", description = "Replace FILE if it exists.")
    boolean force;

    @Override
    public Integer call() {
        ReportSources.Rendered rendered = ReportSources.render(from);
        HtmlReports.write(rendered.html(), out, force);
        if (rendered.note() != null) {
            spec.commandLine().getErr().println("telltale: " + rendered.note());
        }
        spec.commandLine().getOut().println(out);
        return ExitCodes.OK;
    }
}
