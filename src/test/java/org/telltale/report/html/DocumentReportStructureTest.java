package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.jsoup.nodes.Element;
import org.jsoup.nodes.Node;
import org.jsoup.nodes.TextNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;
import org.telltale.explain.Explanation;
import org.telltale.text.Span;

/** Structure of the document report, parsed with jsoup as a browser's HTML parser would. */
class DocumentReportStructureTest {
    private static final Explanation HOSTILE = HostileTexts.explanation();
    private static final String HOSTILE_HTML = HtmlReports.explanations(List.of(HOSTILE, SampleExplanations.billing()));

    @Test
    void everySpanOfEveryTermIsOneMark() {
        Explanation e = SampleExplanations.billing();
        Document page = Jsoup.parse(HtmlReports.explanations(List.of(e)));
        int spans = e.terms().stream().mapToInt(t -> t.spans().size()).sum();
        assertEquals(spans, page.select("mark.tt-m").size());
        for (int row = 0; row < e.terms().size(); row++) {
            Explanation.TermWeight t = e.terms().get(row);
            var marks = page.select("mark.tt-m[data-row=" + row + "]");
            assertEquals(t.spans().size(), marks.size(), t.term());
            for (int k = 0; k < marks.size(); k++) {
                Span s = t.spans().get(k);
                assertEquals(e.text().substring(s.start(), s.end()), marks.get(k).text(), t.term());
                assertEquals("doc-0-t" + row, marks.get(k).attr("aria-describedby"));
                assertEquals("0", marks.get(k).attr("tabindex"));
                assertTrue(marks.get(k).hasClass(t.weight() >= 0 ? "tt-to" : "tt-aw"));
            }
            Element desc = page.getElementById("doc-0-t" + row);
            assertNotNull(desc, "description of row " + row);
            assertTrue(desc.text().contains(Numbers.signed(t.weight())), desc.text());
        }
    }

    @Test
    void theTextReadsBackExactlyWithHiddenCharactersShownAsBadges() {
        Document page = Jsoup.parse(HOSTILE_HTML);
        Element text = page.selectFirst("#doc-0 .tt-text");
        StringBuilder read = new StringBuilder();
        collect(text, read);
        assertEquals(HOSTILE.text(), read.toString());
        assertEquals(List.of("RLO U+202E", "PDF U+202C", "LRI U+2066", "PDI U+2069", "ZWSP U+200B"),
                text.select(".tt-ctl").eachText());
    }

    @Test
    void noHiddenDirectionCharacterReachesTheFile() {
        for (char c : "\u202a\u202b\u202c\u202d\u202e\u2066\u2067\u2068\u2069\u200e\u200f".toCharArray()) {
            assertEquals(-1, HOSTILE_HTML.indexOf(c), String.format("U+%04X in the report", (int) c));
        }
    }

    @Test
    void hostileMarkupStaysText() {
        Document page = Jsoup.parse(HOSTILE_HTML);
        assertEquals(1, page.select("script").size(), "only the report's own script");
        assertTrue(page.select("img, iframe, object, embed, textarea, form, a[href^=javascript], base").isEmpty());
        assertTrue(page.select("svg[onload], b[onmouseover]").isEmpty());
        String shown = page.selectFirst("#doc-0 .tt-text").text();
        assertTrue(shown.contains(HostileTexts.TITLE_PAYLOAD), "payload readable as text");
        assertTrue(shown.contains(HostileTexts.IMG_PAYLOAD));
        assertTrue(page.selectFirst("#doc-0 .tt-docid").text().equals(HostileTexts.HOSTILE_ID));
        Document single = Jsoup.parse(HtmlReports.explanations(List.of(HOSTILE)));
        assertEquals("Telltale explanation of " + HostileTexts.HOSTILE_ID, single.title());
        assertTrue(page.select(".tt-term").eachText().contains("<img src=x onerror=alert(1)>"));
    }

    @Test
    void passesTheChecksEveryReportPasses() throws Exception {
        ReportChecks.safe(Jsoup.parse(HOSTILE_HTML));
    }

    @Test
    void declaresItsCharsetFirstSoTheParserNeverGuesses() {
        assertTrue(Jsoup.parse(HOSTILE_HTML).head().child(0).is("meta[charset]"));
    }

    @Test
    void cautionsComeBeforeTheFirstDocument() {
        Document page = Jsoup.parse(HOSTILE_HTML);
        Element cautions = page.selectFirst(".tt-cautions");
        assertNotNull(cautions);
        String words = cautions.text();
        assertTrue(words.contains("local surrogate") && words.contains("not what causes"), words);
        assertTrue(words.contains("does not certify a model as correct or fair"), words);
        assertTrue(words.contains("personal data") && words.contains("data-protection rules"), words);
        assertTrue(cautions.siblingIndex() < page.selectFirst("main").siblingIndex());
    }

    @Test
    void manyExplanationsGoIntoTheDocumentBrowser() {
        SampleAudit.Audit audit = SampleAudit.of(HtmlReports.INLINE_DOCUMENTS + 5, 2);
        Document page = Jsoup.parse(HtmlReports.explanations(audit.explanations()));
        assertEquals(HtmlReports.INLINE_DOCUMENTS + 5, page.select("#documents template").size());
        assertEquals(HtmlReports.INLINE_DOCUMENTS + 5, page.select("#tt-index tbody tr").size());
        assertTrue(page.select("main > article.tt-doc").isEmpty());
        Document few = Jsoup.parse(HtmlReports.explanations(audit.explanations().subList(0, HtmlReports.INLINE_DOCUMENTS)));
        assertEquals(HtmlReports.INLINE_DOCUMENTS, few.select("main > article.tt-doc").size());
        assertTrue(few.select("template").isEmpty());
    }

    @Test
    void aSpanBeyondTheTextIsAnErrorNamingTheDocument() {
        Explanation e = SampleExplanations.explanation("HL-1", "short text", "billing", "billing",
                SampleExplanations.scores(0.9, 0.05, 0.05), 10, 0.5,
                List.of(new Explanation.TermWeight("text", 0.1, 0.0, 0.2, List.of(new Span(6, 40)))), null);
        TelltaleException ex = assertThrows(TelltaleException.class, () -> HtmlReports.explanations(List.of(e)));
        assertTrue(ex.getMessage().contains("HL-1") && ex.getMessage().contains("[6, 40)"), ex.getMessage());
    }

    @Test
    void writeRefusesToReplaceAReportWithoutForce(@TempDir Path dir) throws Exception {
        Path out = dir.resolve("r.html");
        HtmlReports.write("<p>one</p>", out, false);
        TelltaleException ex = assertThrows(TelltaleException.class, () -> HtmlReports.write("<p>two</p>", out, false));
        assertTrue(ex.getMessage().contains("{force}"), ex.getMessage());
        assertEquals("<p>one</p>", Files.readString(out, StandardCharsets.UTF_8));
        HtmlReports.write("<p>two</p>", out, true);
        assertEquals("<p>two</p>", Files.readString(out, StandardCharsets.UTF_8));
    }

    /** The text a reader sees, with each badge turned back into the character it stands for. */
    private static void collect(Node node, StringBuilder out) {
        for (Node child : node.childNodes()) {
            if (child instanceof TextNode t) {
                out.append(t.getWholeText());
            } else if (child instanceof Element el && el.hasClass("tt-ctl")) {
                String hex = el.text().substring(el.text().indexOf("U+") + 2);
                out.append((char) Integer.parseInt(hex, 16));
            } else {
                collect(child, out);
            }
        }
    }
}
