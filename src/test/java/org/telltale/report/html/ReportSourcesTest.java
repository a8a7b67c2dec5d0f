package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.jsoup.Jsoup;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;
import org.telltale.explain.Explanation;
import org.telltale.report.json.AuditJson;
import org.telltale.report.json.ExplanationsJson;

/** Re-rendering from the files a run leaves behind gives the report of the values themselves. */
class ReportSourcesTest {
    @TempDir
    Path dir;

    private void writeAuditFiles(SampleAudit.Audit audit) throws Exception {
        AuditJson.write(audit.result(), dir.resolve("audit.json"));
        StringBuilder lines = new StringBuilder();
        for (Explanation e : audit.explanations()) {
            lines.append(ExplanationsJson.toLine(e)).append('\n');
        }
        Files.writeString(dir.resolve("explanations.jsonl"), lines, StandardCharsets.UTF_8);
    }

    @Test
    void auditJsonWithItsExplanationsRendersTheAuditReport() throws Exception {
        SampleAudit.Audit audit = SampleAudit.of(30, 11);
        writeAuditFiles(audit);
        ReportSources.Rendered r = ReportSources.render(dir.resolve("audit.json"));
        assertEquals("audit", r.kind());
        assertNull(r.note());
        String expected = HtmlReports.audit(AuditJson.read(dir.resolve("audit.json")),
                ExplanationsJson.read(dir.resolve("explanations.jsonl")));
        assertEquals(expected, r.html());
        var page = Jsoup.parse(r.html());
        assertEquals(30, page.select("#documents template").size());
        assertEquals(audit.result().artefacts().size(), page.select("#tt-findings tbody tr").size());
    }

    @Test
    void anAuditWithoutExplanationsBesideItRendersAndSaysWhatIsMissing() throws Exception {
        writeAuditFiles(SampleAudit.of(10, 3));
        Files.delete(dir.resolve("explanations.jsonl"));
        ReportSources.Rendered r = ReportSources.render(dir.resolve("audit.json"));
        assertTrue(r.note().contains("explanations.jsonl"), r.note());
        assertTrue(Jsoup.parse(r.html()).select("#documents template").isEmpty());
    }

    @Test
    void formatIsReadFromTheFirstObjectWhereverTheFieldSits() throws Exception {
        Path file = dir.resolve("late.json");
        Files.writeString(file, "{\"version\":1,\"nested\":{\"format\":\"decoy\"},\"format\":\"telltale.audit\"}",
                StandardCharsets.UTF_8);
        assertEquals("telltale.audit", ReportSources.formatOf(file));
        Path line = dir.resolve("one.jsonl");
        Files.writeString(line, "{\"id\":\"a\",\"label\":\"b\"}\n", StandardCharsets.UTF_8);
        assertNull(ReportSources.formatOf(line));
    }

    @Test
    void badInputIsAnErrorNamingTheFile() throws Exception {
        Path notJson = dir.resolve("bad.json");
        Files.writeString(notJson, "[1, 2]", StandardCharsets.UTF_8);
        TelltaleException e = assertThrows(TelltaleException.class, () -> ReportSources.render(notJson));
        assertTrue(e.getMessage().startsWith(notJson.toString()), e.getMessage());
        TelltaleException missing = assertThrows(TelltaleException.class,
                () -> ReportSources.render(dir.resolve("absent.json")));
        assertTrue(missing.getMessage().contains("absent.json"), missing.getMessage());
    }

    @Test
    void explanationsWithoutTextStillRenderTheirLedger() throws Exception {
        Explanation e = SampleExplanations.billing();
        Explanation noText = new Explanation(e.id(), e.label(), e.score(), e.predicted(), e.scores(), e.probes(),
                e.fit(), e.terms(), e.timing(), null, e.gold());
        Path file = dir.resolve("e.json");
        ExplanationsJson.write(file, List.of(noText));
        var page = Jsoup.parse(ReportSources.render(file).html());
        assertTrue(page.select("mark.tt-m").isEmpty());
        assertEquals(e.terms().size(), page.select(".tt-ledger tbody tr").size());
        assertTrue(page.text().contains("carried no text"));
    }
}
