package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.openqa.selenium.Keys;
import org.openqa.selenium.WebElement;
import org.openqa.selenium.interactions.Actions;
import org.telltale.explain.Explanation;

/** The document report in a real browser: it renders, reacts to hover and keyboard, and runs no document text. */
class DocumentReportBrowserTest {
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

    private static Path write(String name, List<Explanation> explanations) throws Exception {
        Path file = dir.resolve(name);
        HtmlReports.write(HtmlReports.explanations(explanations), file, true);
        return file;
    }

    @Test
    void rendersEveryMarkWithoutConsoleErrors() throws Exception {
        List<Explanation> all = List.of(SampleExplanations.billing(), SampleExplanations.outage());
        chromium.open(write("sample.html", all));
        long spans = all.stream().flatMap(e -> e.terms().stream()).mapToLong(t -> t.spans().size()).sum();
        assertEquals(spans, chromium.driver.findElements(By.cssSelector("mark.tt-m")).size());
        assertEquals(List.of(), chromium.consoleErrors());
        assertTrue(Files.size(chromium.screenshot("document-report")) > 10_000);
    }

    @Test
    void hoveringAMarkShowsItsWeightAndInterval() throws Exception {
        chromium.open(write("hover.html", List.of(SampleExplanations.billing())));
        WebElement tip = chromium.driver.findElement(By.id("tt-tip"));
        assertFalse(tip.isDisplayed());
        WebElement refund = chromium.driver.findElement(By.cssSelector("mark.tt-m[data-row='3']"));
        new Actions(chromium.driver).moveToElement(refund).perform();
        assertTrue(tip.isDisplayed());
        assertTrue(tip.getText().contains("weight +0.097"), tip.getText());
        assertTrue(tip.getText().contains("+0.051 to +0.142"), tip.getText());
        chromium.screenshot("document-report-hover");
        new Actions(chromium.driver).moveToElement(chromium.driver.findElement(By.cssSelector(".tt-brand"))).perform();
        assertFalse(tip.isDisplayed());
    }

    @Test
    void tabbingToAMarkShowsItsWeightAndNamesItForScreenReaders() throws Exception {
        chromium.open(write("focus.html", List.of(SampleExplanations.billing())));
        new Actions(chromium.driver).sendKeys(Keys.TAB).perform();
        WebElement focused = chromium.driver.switchTo().activeElement();
        assertEquals("mark", focused.getTagName());
        assertEquals("charge", focused.getText());
        WebElement tip = chromium.driver.findElement(By.id("tt-tip"));
        assertTrue(tip.isDisplayed());
        assertTrue(tip.getText().contains("weight +0.162"), tip.getText());
        // The accessible description a screen reader announces, as Chromium computes it.
        String description = (String) chromium.js(
                "var id = arguments[0].getAttribute('aria-describedby'); return document.getElementById(id).textContent;",
                focused);
        assertTrue(description.contains("weight +0.162, interval +0.118 to +0.205, toward billing"), description);
        new Actions(chromium.driver).sendKeys(Keys.TAB).perform();
        assertEquals("invoice", chromium.driver.switchTo().activeElement().getText());
    }

    @Test
    void hostilePayloadsStayInertText() throws Exception {
        Explanation hostile = HostileTexts.explanation();
        chromium.open(write("hostile.html", List.of(hostile)));
        assertNull(chromium.js("return window.telltalePwned === undefined ? null : window.telltalePwned;"));
        assertEquals("Telltale explanation of " + HostileTexts.HOSTILE_ID, chromium.driver.getTitle());
        assertEquals(0L, chromium.js("return document.querySelectorAll('img, iframe, textarea, a[href]').length;"));
        assertEquals(1L, chromium.js("return document.scripts.length;"));
        long spans = hostile.terms().stream().mapToLong(t -> t.spans().size()).sum();
        assertEquals(spans, chromium.driver.findElements(By.cssSelector("mark.tt-m")).size());
        // Hovering and focusing the payload marks runs nothing either.
        for (WebElement mark : chromium.driver.findElements(By.cssSelector("mark.tt-m[data-row='2'], mark.tt-m[data-row='5']"))) {
            new Actions(chromium.driver).moveToElement(mark).perform();
        }
        assertNull(chromium.js("return window.telltalePwned === undefined ? null : window.telltalePwned;"));
        String text = chromium.driver.findElement(By.cssSelector(".tt-text")).getText();
        assertTrue(text.contains(HostileTexts.TITLE_PAYLOAD), "payload is shown as text");
        // The 200,000-character line wraps inside the sheet: nothing scrolls sideways.
        assertTrue((Boolean) chromium.js("var t = document.querySelector('.tt-text');"
                + "return t.scrollWidth <= t.clientWidth && document.documentElement.scrollWidth <= window.innerWidth;"));
        assertEquals(List.of(), chromium.consoleErrors());
        chromium.screenshot("document-report-hostile");
    }

    @Test
    void thePolicyRefusesScriptThatIsNotTheReportsOwn() throws Exception {
        // A control for the checks above: the same report with a script slipped in must not run it,
        // and the browser must say so on the console (CSP Level 3, hash-source matching).
        String html = HtmlReports.explanations(List.of(SampleExplanations.billing()))
                .replace("</main>", "</main><script>window.telltalePwned=7</script>");
        Path file = dir.resolve("tampered.html");
        Files.writeString(file, html, StandardCharsets.UTF_8);
        chromium.open(file);
        assertNull(chromium.js("return window.telltalePwned === undefined ? null : window.telltalePwned;"));
        List<String> errors = chromium.consoleErrors();
        assertTrue(errors.stream().anyMatch(m -> m.contains("Content Security Policy")), errors.toString());
    }
}
