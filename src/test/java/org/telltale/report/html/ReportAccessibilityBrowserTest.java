package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;

/**
 * Every report kind against the WCAG 2 A and AA rules of axe-core (Deque's open rule engine, the
 * reference outside this code) in Debian's Chromium: any violation fails and is printed.
 */
class ReportAccessibilityBrowserTest {
    @TempDir
    static Path dir;
    private static HeadlessChromium chromium;

    @BeforeAll
    static void startBrowser() throws Exception {
        chromium = HeadlessChromium.start(1400, 1000);
    }

    @AfterAll
    static void stopBrowser() throws Exception {
        if (chromium != null) {
            chromium.close();
        }
    }

    private static void assertNoViolations(String what) throws Exception {
        List<String> violations = AxeCore.violations(chromium);
        assertTrue(violations.isEmpty(), what + " breaks WCAG 2 A/AA rules of axe-core:\n" + String.join("\n", violations));
    }

    @Test
    void theDocumentReportPassesEveryWcagRule() throws Exception {
        Path file = dir.resolve("explanations.html");
        HtmlReports.write(HtmlReports.explanations(List.of(SampleExplanations.billing(), SampleExplanations.outage())), file, true);
        chromium.open(file);
        assertNoViolations("the document report");
    }

    @Test
    void theAuditReportPassesEveryWcagRuleWithADocumentOpen() throws Exception {
        SampleAudit.Audit audit = SampleAudit.of(120, 7);
        Path file = dir.resolve("audit.html");
        HtmlReports.write(HtmlReports.audit(audit.result(), audit.explanations()), file, true);
        chromium.open(file);
        assertNoViolations("the audit report");
        // The document browser builds its view on demand; its markup is checked as well.
        chromium.driver.findElement(By.cssSelector("#finding-0 a.tt-ctx-doc")).click();
        chromium.await(By.cssSelector("#tt-viewer article.tt-doc"));
        assertNoViolations("the audit report's document view");
    }

    @Test
    void theAuditReportComparedWithABaselinePassesEveryWcagRule() throws Exception {
        SampleAudit.Audit audit = SampleAudit.of(120, 7);
        List<org.telltale.audit.Baseline.Entry> entries = org.telltale.audit.Baseline.entriesOf(audit.result());
        org.telltale.audit.Baseline.Comparison since = new org.telltale.audit.Baseline("old/audit.json",
                entries.subList(1, entries.size())).compare(entries.subList(0, entries.size() - 1));
        Path file = dir.resolve("audit-baseline.html");
        HtmlReports.write(HtmlReports.audit(audit.result(), audit.explanations(), since), file, true);
        chromium.open(file);
        assertTrue(chromium.driver.findElement(By.id("baseline-h")).isDisplayed());
        assertNoViolations("the audit report's baseline section");
    }

    @Test
    void theOverlapReportPassesEveryWcagRule() throws Exception {
        Path file = dir.resolve("overlap.html");
        HtmlReports.write(OverlapReport.render(OverlapReportTest.sample()), file, true);
        chromium.open(file);
        assertNoViolations("the overlap report");
    }

    @Test
    void theRulesRunAndCatchANestedControlAndFaintText() throws Exception {
        // A canary: a link inside a button is axe-core's nested-interactive violation, and text at
        // #999 on white (2.85:1) its color-contrast one, so a run that silently checks nothing fails here.
        Path file = dir.resolve("canary.html");
        java.nio.file.Files.writeString(file, "<!DOCTYPE html><html lang=\"en\"><head><title>canary</title></head><body><main>"
                + "<h1>canary</h1><button type=\"button\">open <a href=\"#x\">this</a></button>"
                + "<p style=\"color:#999;background:#fff\">faint text</p></main></body></html>");
        chromium.open(file);
        List<String> violations = AxeCore.violations(chromium);
        List<String> rules = violations.stream().filter(l -> !l.startsWith(" ")).map(l -> l.substring(0, l.indexOf(' '))).toList();
        assertTrue(rules.containsAll(List.of("color-contrast", "nested-interactive")), String.join("\n", violations));
    }
}
