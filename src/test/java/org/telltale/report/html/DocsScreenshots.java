package org.telltale.report.html;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import org.openqa.selenium.By;
import org.openqa.selenium.interactions.Actions;

/**
 * Refreshes the screenshots in docs/img from the sample reports, in the same headless Chromium the
 * browser tests use: {@code DocsScreenshots docs/img}. Run by hand when the look changes.
 */
final class DocsScreenshots {
    private DocsScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path out = Path.of(args[0]);
        Path work = Files.createTempDirectory("telltale-shots");
        Path explanations = work.resolve("explanations.html");
        HtmlReports.write(HtmlReports.explanations(List.of(SampleExplanations.billing(), SampleExplanations.outage())),
                explanations, true);
        SampleAudit.Audit audit = SampleAudit.of(120, 7);
        Path auditFile = work.resolve("audit.html");
        HtmlReports.write(HtmlReports.audit(audit.result(), audit.explanations()), auditFile, true);
        try (HeadlessChromium chromium = HeadlessChromium.start(1360, 900)) {
            chromium.open(explanations);
            new Actions(chromium.driver).moveToElement(
                    chromium.driver.findElement(By.cssSelector("mark.tt-m[data-row='2']"))).perform();
            copy(chromium.screenshot("docs-document"), out.resolve("document-report.png"));
            chromium.open(auditFile);
            copy(chromium.screenshot("docs-audit"), out.resolve("audit-summary.png"));
            chromium.js("document.getElementById('findings').scrollIntoView();");
            copy(chromium.screenshot("docs-audit-findings"), out.resolve("audit-findings.png"));
            chromium.js("document.getElementById('evidence').scrollIntoView();");
            copy(chromium.screenshot("docs-audit-evidence"), out.resolve("audit-evidence.png"));
        }
    }

    private static void copy(Path from, Path to) throws Exception {
        Files.createDirectories(to.getParent());
        Files.copy(from, to, StandardCopyOption.REPLACE_EXISTING);
    }
}
