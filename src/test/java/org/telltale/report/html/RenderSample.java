package org.telltale.report.html;

import java.nio.file.Path;
import java.util.List;

/** Writes sample reports for looking at while designing: {@code RenderSample OUT_DIR}. */
final class RenderSample {
    private RenderSample() {
    }

    public static void main(String[] args) {
        Path dir = Path.of(args[0]);
        HtmlReports.write(HtmlReports.explanations(List.of(SampleExplanations.billing(), SampleExplanations.outage())),
                dir.resolve("explanations.html"), true);
        SampleAudit.Audit audit = SampleAudit.of(args.length > 1 ? Integer.parseInt(args[1]) : 60, 7);
        HtmlReports.write(HtmlReports.audit(audit.result(), audit.explanations()), dir.resolve("audit.html"), true);
    }
}
