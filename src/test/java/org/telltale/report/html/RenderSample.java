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
    }
}
