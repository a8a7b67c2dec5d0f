package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.connect.SupportQueueModel;
import org.telltale.explain.Explanation;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.json.ExplanationsJson;
import picocli.CommandLine;

/** {@code telltale explain --html}: the document report of a real explanation run. */
class ExplainHtmlTest {
    @TempDir
    Path dir;

    private int run(StringWriter err, String... args) {
        CommandLine cli = Main.commandLine();
        cli.setOut(new PrintWriter(new StringWriter()));
        cli.setErr(new PrintWriter(err));
        return cli.execute(args);
    }

    @Test
    void writesTheDocumentReportOfTheExplanationsItPrints() throws Exception {
        Path model = SupportQueueModel.write(dir);
        Path html = dir.resolve("explained.html");
        Path json = dir.resolve("explained.json");
        StringWriter err = new StringWriter();
        int code = run(err, "explain", "--model", model.toString(), "--text",
                "please refund the duplicate invoice payment <script>window.x=1</script>", "--probes", "300",
                "--no-color", "--html", html.toString(), "--json", json.toString());
        assertEquals(0, code, err.toString());
        List<Explanation> explanations = ExplanationsJson.read(json);
        String page = Files.readString(html, StandardCharsets.UTF_8);
        // The same report `telltale report` would render from the JSON of this run.
        assertEquals(HtmlReports.explanations(explanations), page);
        Document doc = Jsoup.parse(page);
        long spans = explanations.get(0).terms().stream().mapToLong(t -> t.spans().size()).sum();
        assertTrue(spans > 0);
        assertEquals(spans, doc.select("mark.tt-m").size());
        assertEquals(1, doc.select("script").size());

        StringWriter again = new StringWriter();
        assertEquals(1, run(again, "explain", "--model", model.toString(), "--text", "refund", "--probes", "50",
                "--html", html.toString()), "an existing report is kept without --force");
        assertTrue(again.toString().contains("--force"), again.toString());
        assertEquals(page, Files.readString(html, StandardCharsets.UTF_8));
        assertEquals(0, run(new StringWriter(), "explain", "--model", model.toString(), "--text", "refund",
                "--probes", "50", "--html", html.toString(), "--force"));
    }
}
