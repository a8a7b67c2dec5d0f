package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.telltale.overlap.DocumentSource;
import org.telltale.overlap.OverlapFinder;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.OverlapSettings;

class OverlapReportTest {
    private static final String TICKET = "The ramp to deck four was blocked by crates on the evening sailing. "
            + "Nobody from the crew came to help my father with his wheelchair. "
            + "We waited twenty minutes before a passenger moved the crates for us.";

    @TempDir
    Path dir;

    static OverlapResult sample() {
        String hostile = HostileTexts.TITLE_PAYLOAD + " " + HostileTexts.IMG_PAYLOAD + " " + HostileTexts.BIDI_PAYLOAD
                + ". Please refund the cabin upgrade we never received on the night crossing to the islands.";
        List<org.telltale.text.Document> train = List.of(
                new org.telltale.text.Document("tr-1", TICKET, "accessibility"),
                new org.telltale.text.Document(HostileTexts.HOSTILE_ID, hostile, HostileTexts.HOSTILE_LABEL),
                new org.telltale.text.Document("tr-3", "A question about bicycles on the early boat to the harbour.", "booking"));
        List<org.telltale.text.Document> test = List.of(
                new org.telltale.text.Document("te-1", "On Monday the passenger wrote:\n> " + TICKET.replace(". ", ".\n> "), "complaint"),
                new org.telltale.text.Document("te-2", hostile.toUpperCase(java.util.Locale.ROOT), "billing"),
                new org.telltale.text.Document("te-3", "Lost a green scarf somewhere near the cafe on deck two.", "lost-property"));
        return new OverlapFinder(new OverlapSettings(0.8, 5, 128, null, 1L, 1, true), s -> { })
                .find(DocumentSource.of("train.jsonl", train), DocumentSource.of("test.jsonl", test));
    }

    @Test
    void showsEachPairSideBySideWithTheSharedPassagesMarked() {
        OverlapResult result = sample();
        Document page = Jsoup.parse(OverlapReport.render(result));
        List<Element> pairs = page.select("#pairs article.tt-doc");
        assertEquals(2, pairs.size());
        Element quoted = pairs.stream().filter(p -> p.text().contains("te-1")).findFirst().orElseThrow();
        assertEquals(2, quoted.select(".tt-ov-grid > section").size());
        // Every sentence of the original is shared with the quoted copy (MMDS §3.2: they share all
        // their shingles), so the train side is marked from its first word to its last.
        List<String> trainMarks = new ArrayList<>();
        quoted.select(".tt-ov-grid > section").get(0).select("mark.tt-shared").forEach(m -> trainMarks.add(m.text()));
        assertEquals(List.of("The ramp to deck four was blocked by crates on the evening sailing",
                "Nobody from the crew came to help my father with his wheelchair",
                "We waited twenty minutes before a passenger moved the crates for us"), trainMarks);
        assertFalse(quoted.select(".tt-ov-grid > section").get(1).text().isEmpty());
        assertTrue(quoted.text().contains("labels differ"), quoted.text());
        assertTrue(page.select(".tt-ov-head").text().startsWith("2 of 3 test documents (66.7%) already appear in train"),
                page.select(".tt-ov-head").text());
        assertTrue(page.text().contains("r = 7 rows × b = 17 bands"), page.text());
        assertEquals("None found.", page.select("#within-train .tt-note").text());
    }

    @Test
    void passesTheChecksEveryReportPasses() throws Exception {
        ReportChecks.safe(Jsoup.parse(OverlapReport.render(sample())));
    }

    @Test
    void escapesDocumentTextIdsAndLabels() {
        Document page = Jsoup.parse(OverlapReport.render(sample()));
        assertTrue(page.text().contains(HostileTexts.TITLE_PAYLOAD), "payload shown as text");
        assertFalse(page.select(".tt-ctl").isEmpty(), "bidi controls shown as badges");
    }

    @Test
    void overlapStylesAreInsideTheHashedSheet() {
        assertTrue(Jsoup.parse(OverlapReport.render(sample())).select("style").first().data().contains("mark.tt-shared"));
    }

    @Test
    void rendersInABrowserWithoutRunningDocumentText() throws Exception {
        HeadlessChromium chromium = HeadlessChromium.start(1300, 900);
        try {
            Path file = dir.resolve("overlap.html");
            HtmlReports.write(OverlapReport.render(sample()), file, true);
            chromium.open(file);
            assertEquals(List.of(), chromium.consoleErrors());
            assertNull(chromium.js("return window.telltalePwned === undefined ? null : window.telltalePwned;"));
            assertFalse(chromium.driver.findElements(By.cssSelector("mark.tt-shared")).isEmpty());
            // The two texts of a pair sit side by side: same top, the test text to the right.
            var sides = chromium.driver.findElements(By.cssSelector("#pairs-1 .tt-ov-grid > section"));
            assertEquals(sides.get(0).getLocation().getY(), sides.get(1).getLocation().getY());
            assertTrue(sides.get(1).getLocation().getX() > sides.get(0).getLocation().getX());
            chromium.screenshot("overlap-report");
        } finally {
            chromium.close();
        }
    }
}
