package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.cli.Main;
import org.telltale.model.ModelFile;
import org.telltale.text.Document;
import org.telltale.text.LongRuns;

/**
 * Audits of corpora whose documents carry runs tens of thousands of characters long: the audit
 * finishes, and when the JVM does run out of stack on a document, the run ends with one line
 * naming it and a journal that {@code --resume} finishes from. How the CPU time compares with the
 * same corpus without the runs is measured by {@code ScanningBenchmark}.
 */
@Tag("slow")
class HostileCorpusAuditTest {
    /** The runs of issue 13: letters, digits, "a." and "b-", 40,000 characters and more. */
    static final List<String> RUN_UNITS = List.of("q", "7", "a.", "b-");

    /** 200 utility-desk messages; with {@code hostile}, every 25th carries a run of 40,000 to 60,000 characters. */
    static List<Document> corpus(boolean hostile) {
        List<Document> docs = new ArrayList<>(UtilityQueues.generate(2, 67, true).subList(0, 200));
        if (hostile) {
            for (int i = 0; i < docs.size(); i += 25) {
                Document d = docs.get(i);
                String run = LongRuns.repeat(RUN_UNITS.get((i / 25) % RUN_UNITS.size()), 40_000 + 2_500 * i / 25);
                docs.set(i, new Document(d.id(), d.text() + "\n" + run + "\n", d.label()));
            }
        }
        return docs;
    }

    static String[] audit(Path model, Path corpus, Path out, String... more) {
        List<String> args = new ArrayList<>(List.of("audit", "--model", model.toString(), "--corpus", corpus.toString(),
                "--out", out.toString(), "--sample", "20", "--probes", "200", "--words", "8", "--quiet", "--seed", "5",
                "--fail-on", "never"));
        args.addAll(List.of(more));
        return args.toArray(String[]::new);
    }

    @Test
    void anAuditOfLongRunsOfLettersDigitsAndPunctuationFinishes(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("desk.model");
        ModelFile.save(TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true)), model);
        Path corpus = UtilityQueues.write(corpus(true), dir.resolve("hostile.jsonl"));
        Path out = dir.resolve("audit");

        assertEquals(ExitCodes.OK, Main.run(audit(model, corpus, out)));
        assertEquals(200, org.telltale.report.json.AuditJson.read(out.resolve("audit.json")).summary().documents());
    }

    /**
     * A custom analyzer whose java.util.regex pattern recurses once per repetition of its group
     * overflows a small stack on a run of "a."; the run must end with one line naming that
     * document, and a resume on a large enough stack must give what an uninterrupted audit gives.
     */
    @Test
    void runningOutOfStackNamesTheDocumentAndTheJournalResumes(@TempDir Path dir) throws Exception {
        Path model = dir.resolve("desk.model");
        ModelFile.save(TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true)), model);
        List<Document> docs = corpus(false);
        Document victim = docs.get(137);
        docs.set(137, new Document(victim.id(), victim.text() + "\n" + LongRuns.repeat("a.", 60_000) + "\n", victim.label()));
        Path corpus = UtilityQueues.write(docs, dir.resolve("desk.jsonl"));
        String[] analyzer = {"--analyzer", "custom:tokenizer=pattern(pattern=\"(?:a\\.?)+|\\s+\");filters=lowercase"};

        Run failed = onStack(512 * 1024, audit(model, corpus, dir.resolve("audit"), analyzer));
        assertEquals(List.of(ExitCodes.ERROR, 1, true), List.of(failed.code, (int) failed.stderr.strip().lines().count(),
                failed.stderr.startsWith("telltale: document '" + victim.id() + "' while ")), failed.stderr);

        Run resumed = onStack(256L * 1024 * 1024, audit(model, corpus, dir.resolve("audit"), concat(analyzer, "--resume")));
        Run whole = onStack(256L * 1024 * 1024, audit(model, corpus, dir.resolve("whole"), analyzer));
        assertEquals(List.of(ExitCodes.OK, ExitCodes.OK), List.of(resumed.code, whole.code), resumed.stderr + whole.stderr);
        assertEquals(withoutElapsed(dir.resolve("whole/audit.json")), withoutElapsed(dir.resolve("audit/audit.json")));
    }

    private record Run(int code, String stderr) {
    }

    /** Runs the command line on a thread with the given stack size, capturing stderr. */
    private static Run onStack(long stackBytes, String[] args) throws InterruptedException {
        PrintStream saved = System.err;
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        AtomicInteger code = new AtomicInteger(-1);
        System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
        try {
            Thread thread = new Thread(null, () -> code.set(Main.run(args)), "audit", stackBytes);
            thread.start();
            thread.join();
        } finally {
            System.setErr(saved);
        }
        return new Run(code.get(), err.toString(StandardCharsets.UTF_8));
    }

    private static String[] concat(String[] a, String... b) {
        List<String> out = new ArrayList<>(List.of(a));
        out.addAll(List.of(b));
        return out.toArray(String[]::new);
    }

    private static JsonNode withoutElapsed(Path auditJson) throws Exception {
        JsonNode root = new ObjectMapper().readTree(auditJson.toFile());
        ((ObjectNode) root.get("summary")).remove("elapsed_ms");
        return root;
    }
}
