package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;
import org.openqa.selenium.support.ui.Select;
import org.telltale.audit.AuditResult;
import org.telltale.explain.Explanation;

/** The audit report in a real browser: sorting, filtering, evidence links, the document browser. */
class AuditReportBrowserTest {
    @TempDir
    static Path dir;
    private static HeadlessChromium chromium;
    private static SampleAudit.Audit audit;
    private static Path file;

    @BeforeAll
    static void startBrowser() throws Exception {
        chromium = HeadlessChromium.start(1400, 1100);
        audit = SampleAudit.of(120, 7);
        file = dir.resolve("audit.html");
        HtmlReports.write(HtmlReports.audit(audit.result(), audit.explanations()), file, true);
    }

    @AfterAll
    static void stopBrowser() throws Exception {
        if (chromium != null) {
            chromium.close();
        }
    }

    private List<WebElement> visibleFindingRows() {
        return chromium.driver.findElements(By.cssSelector("#tt-findings tbody tr")).stream()
                .filter(WebElement::isDisplayed).toList();
    }

    @Test
    void opensWithoutConsoleErrorsAndShowsEveryPickMark() throws Exception {
        chromium.open(file);
        long spans = 0;
        for (String id : audit.result().picks()) {
            Explanation e = audit.explanations().stream().filter(x -> x.id().equals(id)).findFirst().orElseThrow();
            spans += e.terms().stream().mapToLong(t -> t.spans().size()).sum();
        }
        assertEquals(spans, chromium.driver.findElements(By.cssSelector("#picks mark.tt-m")).size());
        assertEquals(0, chromium.driver.findElements(By.cssSelector("#documents .tt-doc")).size(), "documents wait");
        assertEquals(List.of(), chromium.consoleErrors());
        chromium.screenshot("audit-report");
    }

    @Test
    void sortingByImportanceOrdersTheRowsBothWays() throws Exception {
        chromium.open(file);
        WebElement button = chromium.driver.findElement(By.cssSelector("#tt-findings th button[data-col='5']"));
        button.click();
        assertEquals(sortedImportances(false), shownImportances());
        assertEquals("ascending", button.findElement(By.xpath("..")).getAttribute("aria-sort"));
        button.click();
        assertEquals(sortedImportances(true), shownImportances());
        assertEquals("descending", button.findElement(By.xpath("..")).getAttribute("aria-sort"));
    }

    private List<Double> shownImportances() {
        return visibleFindingRows().stream().map(r -> Double.parseDouble(
                r.findElements(By.tagName("td")).get(5).getAttribute("data-v"))).toList();
    }

    private static List<Double> sortedImportances(boolean descending) {
        List<Double> values = new ArrayList<>(audit.result().artefacts().stream().map(AuditResult.Artefact::importance).toList());
        values.sort(descending ? java.util.Comparator.reverseOrder() : java.util.Comparator.naturalOrder());
        return values;
    }

    @Test
    void filtersNarrowTheFindings() throws Exception {
        chromium.open(file);
        int all = audit.result().artefacts().size();
        assertEquals(all, visibleFindingRows().size());
        new Select(chromium.driver.findElement(By.id("tt-f-kind"))).selectByValue("header");
        assertEquals(List.of("Queue: bil"), visibleFindingRows().stream().map(r -> r.findElement(By.tagName("a")).getText()).toList());
        assertEquals("1 of " + all + " artefacts shown", chromium.driver.findElement(By.id("tt-f-count")).getText());
        new Select(chromium.driver.findElement(By.id("tt-f-kind"))).selectByValue("");
        chromium.driver.findElement(By.id("tt-f-conf")).click();
        long confirmed = audit.result().artefacts().stream().filter(AuditResult.Artefact::confirmed).count();
        assertEquals(confirmed, visibleFindingRows().size());
        chromium.driver.findElement(By.id("tt-f-conf")).click();
        chromium.driver.findElement(By.id("tt-f-supp")).click();
        long open = audit.result().artefacts().stream().filter(f -> !f.suppressed()).count();
        assertEquals(open, visibleFindingRows().size());
        chromium.driver.findElement(By.id("tt-f-text")).sendKeys("portal");
        assertEquals(1, visibleFindingRows().size());
    }

    @Test
    void aContextLinkOpensTheDocumentWithItsMarksAndTooltips() throws Exception {
        chromium.open(file);
        WebElement link = chromium.driver.findElement(By.cssSelector("#finding-0 a.tt-ctx-doc"));
        String id = link.getText();
        link.click();
        WebElement view = chromium.await(By.cssSelector("#tt-viewer article.tt-doc"));
        assertEquals(id, view.findElement(By.cssSelector(".tt-docid")).getText());
        Explanation e = audit.explanations().stream().filter(x -> x.id().equals(id)).findFirst().orElseThrow();
        long spans = e.terms().stream().mapToLong(t -> t.spans().size()).sum();
        List<WebElement> marks = view.findElements(By.cssSelector("mark.tt-m"));
        assertEquals(spans, marks.size());
        new Actions(chromium.driver).moveToElement(marks.get(0)).perform();
        WebElement tip = chromium.driver.findElement(By.id("tt-tip"));
        assertTrue(tip.isDisplayed());
        Explanation.TermWeight first = e.terms().get(Integer.parseInt(marks.get(0).getAttribute("data-row")));
        assertTrue(tip.getText().contains("weight " + Numbers.signed(first.weight())), tip.getText());
        chromium.screenshot("audit-report-document");
        assertEquals(List.of(), chromium.consoleErrors());
    }

    @Test
    void theDocumentIndexPagesThroughEveryDocument() throws Exception {
        chromium.open(file);
        assertEquals(AuditViews.PAGE_SIZE, shownIndexRows().size());
        assertEquals("page 1 of 3", chromium.driver.findElement(By.id("tt-d-page")).getText());
        chromium.driver.findElement(By.id("tt-d-next")).click();
        chromium.driver.findElement(By.id("tt-d-next")).click();
        List<WebElement> last = shownIndexRows();
        assertEquals(120 - 2 * AuditViews.PAGE_SIZE, last.size());
        assertEquals(audit.explanations().get(119).id(), last.get(last.size() - 1).findElement(By.tagName("a")).getText());
        chromium.driver.findElement(By.id("tt-d-filter")).sendKeys("HL-2011");
        assertEquals(10, shownIndexRows().size(), "HL-20110 … HL-20119");
    }

    private List<WebElement> shownIndexRows() {
        return chromium.driver.findElements(By.cssSelector("#tt-index tbody tr")).stream()
                .filter(WebElement::isDisplayed).toList();
    }

    @Test
    void hostileDocumentsInTheAuditStayInert() throws Exception {
        Explanation hostile = HostileTexts.explanation();
        List<Explanation> explanations = new ArrayList<>(audit.explanations());
        explanations.add(hostile);
        AuditResult base = audit.result();
        AuditResult withHostile = new AuditResult(base.summary(), base.artefacts(), base.scrub(), List.of(hostile.id()),
                base.terms());
        Path hostileFile = dir.resolve("audit-hostile.html");
        HtmlReports.write(HtmlReports.audit(withHostile, explanations), hostileFile, true);
        chromium.open(hostileFile);
        chromium.driver.navigate().to(hostileFile.toUri() + "#doc-" + (explanations.size() - 1));
        chromium.await(By.cssSelector("#tt-viewer article.tt-doc"));
        assertEquals(2, chromium.driver.findElements(By.cssSelector(".tt-doc .tt-docid")).stream()
                .filter(el -> el.getText().equals(HostileTexts.HOSTILE_ID)).count(), "the pick and the opened view");
        assertNull(chromium.js("return window.telltalePwned === undefined ? null : window.telltalePwned;"));
        assertEquals("Telltale audit", chromium.driver.getTitle());
        assertEquals(1L, chromium.js("return document.scripts.length;"));
        assertEquals(0L, chromium.js("return document.querySelectorAll('img, iframe, textarea, a[href^=javascript]').length;"));
        assertEquals(List.of(), chromium.consoleErrors());
    }
}
