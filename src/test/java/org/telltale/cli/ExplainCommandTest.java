package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.connect.SupportQueueModel;
import org.telltale.explain.Explanation;
import org.telltale.report.json.ExplanationsJson;
import picocli.CommandLine;

class ExplainCommandTest {
    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private Run run(String... args) {
        CommandLine cli = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void explainsATextWithATableAndTheMarkedText() {
        Path model = SupportQueueModel.write(dir);
        Run r = run("explain", "--model", model.toString(), "--text", "please refund the duplicate invoice payment",
                "--probes", "300", "--no-color");
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().contains("predicted billing"), r.out());
        assertTrue(r.out().contains("fit quality"), r.out());
        assertTrue(r.out().contains("[refund]+"), r.out());
        assertTrue(r.out().contains("not a cause"), r.out());
        assertFalse(r.out().contains("\u001b["), "no colour when asked for none");
    }

    @Test
    void writesTheJsonContractToStdoutAlone() throws IOException {
        Path model = SupportQueueModel.write(dir);
        Run r = run("explain", "--model", model.toString(), "--text", "my website is down, error 502 again",
                "--json", "-", "--label", "outage", "--words", "3", "--probes", "auto");
        assertEquals(0, r.code(), r.err());
        List<Explanation> back = ExplanationsJson.read(
                new ByteArrayInputStream(r.out().getBytes(StandardCharsets.UTF_8)), "stdout");
        assertEquals(1, back.size());
        Explanation e = back.get(0);
        assertEquals("outage", e.label());
        assertEquals("kernel", e.method().sampling());
        assertTrue(e.terms().size() <= 3);
        assertTrue(e.method().calls() <= e.probes());
    }

    @Test
    void choosesCorpusDocumentsByIdAndByPosition() throws IOException {
        Path model = SupportQueueModel.write(dir);
        Path corpus = dir.resolve("tickets.jsonl");
        Files.writeString(corpus, String.join("\n",
                "{\"id\":\"a\",\"text\":\"refund my card payment\",\"label\":\"billing\"}",
                "{\"id\":\"b\",\"text\":\"server unreachable, pages time out\",\"label\":\"outage\"}",
                "{\"id\":\"c\",\"text\":\"password reset link expired\",\"label\":\"login\"}") + "\n", StandardCharsets.UTF_8);
        Path json = dir.resolve("out.json");
        Run r = run("explain", "--model", model.toString(), "--corpus", corpus.toString(), "--first", "1", "--doc", "c",
                "--probes", "200", "--json", json.toString());
        assertEquals(0, r.code(), r.err());
        Run uniform = run("explain", "--model", model.toString(), "--corpus", corpus.toString(), "--first", "1",
                "--probes", "200", "--sampling", "uniform", "--json", "-");
        assertEquals(0, uniform.code(), uniform.err());
        assertEquals("uniform", ExplanationsJson.read(new ByteArrayInputStream(uniform.out().getBytes(
                StandardCharsets.UTF_8)), "stdout").get(0).method().sampling());
        List<Explanation> back = ExplanationsJson.read(json);
        assertEquals(List.of("a", "c"), back.stream().map(Explanation::id).toList());
        assertEquals("login", back.get(1).gold());

        Run missing = run("explain", "--model", model.toString(), "--corpus", corpus.toString(), "--doc", "zz");
        assertEquals(1, missing.code());
        assertTrue(missing.err().contains("zz") && missing.err().contains("tickets.jsonl"), missing.err());
    }

    @Test
    void aSettingExplainSettingsRefusesIsNamedByItsOption() {
        // ExplainSettings checks each setting once, in its words; OptionWords names the option.
        Path model = SupportQueueModel.write(dir);
        Run words = run("explain", "--model", model.toString(), "--text", "x", "--words", "0");
        assertEquals("2 telltale: --words must be at least 1: 0", words.code() + " " + words.err().lines().findFirst().orElse(""));
        Run probes = run("explain", "--model", model.toString(), "--text", "x", "--probes", "1");
        assertEquals("2 telltale: --probes must be auto or at least 2: 1",
                probes.code() + " " + probes.err().lines().findFirst().orElse(""));
    }

    @Test
    void refusesConflictingOrBadOptionsAsUsageErrors() {
        Path model = SupportQueueModel.write(dir);
        assertEquals(2, run("explain", "--model", model.toString()).code());
        assertEquals(2, run("explain", "--model", model.toString(), "--text", "x", "--corpus", "c.jsonl").code());
        assertEquals(2, run("explain", "--model", model.toString(), "--text", "x", "--probes", "many").code());
        assertEquals(2, run("explain", "--model", model.toString(), "--text", "x", "--select", "best").code());
        assertEquals(2, run("explain", "--model", model.toString(), "--text", "x", "--words", "0").code());
        Run sampling = run("explain", "--model", model.toString(), "--text", "x", "--sampling", "stratified");
        assertEquals(2, sampling.code());
        assertTrue(sampling.err().contains("unknown sampling 'stratified'; one of: uniform, kernel"), sampling.err());
        Run help = run("explain", "--help");
        assertEquals(0, help.code());
        assertTrue(help.out().contains("--weighting"), help.out());
    }
}
