package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.jsoup.Jsoup;
import org.jsoup.nodes.Document;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.explain.Explanation;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.text.Span;
import picocli.CommandLine;

/** {@code telltale report} re-renders either kind of report from the JSON files alone. */
class ReportCommandTest {
    @TempDir
    Path dir;

    private static String[] run(String... args) {
        CommandLine cli = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    static Explanation ticket(String id, String text, String word, double weight) {
        int at = text.indexOf(word);
        return new Explanation(id, "billing", 0.8, "billing", Map.of("billing", 0.8, "outage", 0.2), 500,
                new Explanation.Fit(0.1, 0.7, 0.78),
                List.of(new Explanation.TermWeight(word, weight, weight - 0.05, weight + 0.05,
                        List.of(new Span(at, at + word.length())))),
                new Explanation.Timing(10, 20), text, "billing");
    }

    @Test
    void rendersExplanationsJsonExactlyAsTheValuesWouldRender() throws Exception {
        List<Explanation> list = List.of(ticket("HL-1", "Refund my invoice please", "invoice", 0.3),
                ticket("HL-2", "Second invoice was wrong", "wrong", -0.1));
        Path json = dir.resolve("explanations.json");
        ExplanationsJson.write(json, list);
        Path out = dir.resolve("out/report.html");
        String[] r = run("report", "--from", json.toString(), "--out", out.toString());
        assertEquals("0", r[0], r[2]);
        assertEquals(out.toString(), r[1].strip());
        String html = Files.readString(out, StandardCharsets.UTF_8);
        // Rendered from the JSON, never recomputed: the same page as from the values themselves.
        assertEquals(HtmlReports.explanations(ExplanationsJson.read(json)), html);
        Document page = Jsoup.parse(html);
        assertEquals(2, page.select("mark.tt-m").size());
        assertEquals(List.of("invoice", "wrong"), page.select("mark.tt-m").eachText());
    }

    @Test
    void rendersOneExplanationPerLineFiles() throws Exception {
        Path jsonl = dir.resolve("explanations.jsonl");
        Files.writeString(jsonl, ExplanationsJson.toLine(ticket("HL-3", "Invoice twice", "twice", 0.2)) + "\n"
                + ExplanationsJson.toLine(ticket("HL-4", "Meter is broken", "broken", -0.2)) + "\n", StandardCharsets.UTF_8);
        Path out = dir.resolve("lines.html");
        assertEquals("0", run("report", "--from", jsonl.toString(), "--out", out.toString())[0]);
        assertEquals(2, Jsoup.parse(out.toFile(), "UTF-8").select("article.tt-doc").size());
    }

    @Test
    void refusesToOverwriteWithoutForce() throws Exception {
        Path json = dir.resolve("e.json");
        ExplanationsJson.write(json, List.of(ticket("HL-5", "Refund now", "now", 0.1)));
        Path out = dir.resolve("r.html");
        Files.writeString(out, "keep me", StandardCharsets.UTF_8);
        String[] r = run("report", "--from", json.toString(), "--out", out.toString());
        assertEquals(Integer.toString(ExitCodes.ERROR), r[0]);
        assertTrue(r[2].contains("--force") && r[2].contains(out.toString()), r[2]);
        assertEquals("keep me", Files.readString(out, StandardCharsets.UTF_8));
        assertEquals("0", run("report", "--from", json.toString(), "--out", out.toString(), "--force")[0]);
        assertTrue(Files.readString(out, StandardCharsets.UTF_8).startsWith("<!DOCTYPE html>"));
    }

    @Test
    void anUnknownFormatIsAnErrorNamingTheFile() throws Exception {
        Path json = dir.resolve("other.json");
        Files.writeString(json, "{\"format\":\"something.else\",\"version\":1}", StandardCharsets.UTF_8);
        String[] r = run("report", "--from", json.toString(), "--out", dir.resolve("x.html").toString());
        assertEquals(Integer.toString(ExitCodes.ERROR), r[0]);
        assertTrue(r[2].contains(json.toString()) && r[2].contains("something.else"), r[2]);
        assertEquals(1, r[2].strip().split("\n").length, r[2]);
    }

    @Test
    void missingOptionsAreUsageErrors() {
        assertEquals(Integer.toString(ExitCodes.USAGE), run("report", "--out", "x.html")[0]);
    }
}
