package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.model.BuiltinModel;
import org.telltale.model.LogisticModel;
import org.telltale.model.ModelFile;
import org.telltale.model.ModelTraining;

class TrainAndScoreCommandTest {
    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private static Run run(String... args) {
        var cli = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void trainPrintsHoldoutFiguresAndWritesALoadableModel() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 20, 3, true);
        Path model = dir.resolve("desk.json");
        Run r = run("train", "--corpus", corpus.toString(), "--out", model.toString(), "--algorithm", "logistic",
                "--holdout", "0.25", "--seed", "9");
        assertEquals(0, r.code(), r.err());
        // 20 per label, 25% held out: 5 per label (common practice: stratified split).
        assertTrue(r.out().contains("trained on 45 of 60 documents"), r.out());
        assertTrue(r.out().contains("holdout: 15 documents"), r.out());
        assertTrue(r.out().lines().anyMatch(l -> l.matches("accuracy \\d\\.\\d{4} \\(\\d+ of 15\\)   macro-F1 \\d\\.\\d{4}")), r.out());
        assertTrue(r.out().contains("gold \\ predicted"), r.out());
        try (BuiltinModel m = ModelFile.load(model)) {
            LogisticModel lr = assertInstanceOf(LogisticModel.class, m);
            assertEquals(LibraryDeskCorpus.LABELS, lr.labels());
            assertEquals(60, lr.training().documents());
            assertEquals(15, lr.training().holdoutDocuments());
            assertEquals(9L, lr.training().seed());
            assertEquals(ModelTraining.sha256(corpus), lr.training().corpusSha256());
            assertTrue(lr.optimiser().converged(), lr.optimiser().toString());
        }
    }

    @Test
    void trainRefusesToOverwriteWithoutForce() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 5, 1, true);
        Path model = dir.resolve("m.json");
        Files.writeString(model, "precious", StandardCharsets.UTF_8);
        Run r = run("train", "--corpus", corpus.toString(), "--out", model.toString());
        assertEquals(ExitCodes.ERROR, r.code());
        // The core's hint names the setting ({force}); the command line prints the option.
        assertEquals("telltale: model file " + model + " already exists (use --force to replace it)",
                r.err().lines().findFirst().orElse(""));
        assertEquals("precious", Files.readString(model, StandardCharsets.UTF_8));
        assertEquals(0, run("train", "--corpus", corpus.toString(), "--out", model.toString(), "--force").code());
    }

    @Test
    void aModelSpecTheConnectorCannotOpenIsAUsageErrorNamingTheOption() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 5, 1, true);
        Run r = run("score", "--corpus", corpus.toString(), "--model", "exec:");
        assertEquals("2 telltale: --model exec: names no command (expected exec:COMMAND ARGS…)",
                r.code() + " " + r.err().lines().findFirst().orElse(""));
    }

    @Test
    void trainRejectsBadOptionsAsUsageErrors() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 5, 1, true);
        String out = dir.resolve("m.json").toString();
        assertEquals(ExitCodes.USAGE, run("train", "--corpus", corpus.toString(), "--out", out, "--ngrams", "3").code());
        assertEquals(ExitCodes.USAGE, run("train", "--corpus", corpus.toString(), "--out", out, "--holdout", "1").code());
        assertEquals(ExitCodes.USAGE, run("train", "--corpus", corpus.toString(), "--out", out, "--algorithm", "tree").code());
    }

    @Test
    void aSettingTrainingRequestRefusesIsNamedByItsOption() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 5, 1, true);
        Run r = run("train", "--corpus", corpus.toString(), "--out", dir.resolve("m.json").toString(), "--max-iterations", "0");
        assertEquals("2 telltale: --max-iterations must be at least 1: 0", r.code() + " " + r.err().lines().findFirst().orElse(""));
    }

    @Test
    void anUnknownAlgorithmIsAUsageErrorListingTheAlgorithms() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 5, 1, true);
        Run r = run("train", "--corpus", corpus.toString(), "--out", dir.resolve("m.json").toString(), "--algorithm", "tree");
        assertEquals(ExitCodes.USAGE, r.code());
        assertTrue(r.err().contains("--algorithm: unknown algorithm 'tree'; one of: bayes, logistic"), r.err());
    }

    @Test
    void trainNeedsAGoldLabelOnEveryDocument() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 5, 1, false);
        Run r = run("train", "--corpus", corpus.toString(), "--out", dir.resolve("m.json").toString());
        assertEquals(ExitCodes.ERROR, r.code());
        assertTrue(r.err().contains("hv-001") && r.err().contains("no gold label"), r.err());
    }

    @Test
    void scoreWritesOneLinePerDocumentAndEvaluatesOnStderr() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 12, 5, true);
        Path model = dir.resolve("nb.json");
        assertEquals(0, run("train", "--corpus", corpus.toString(), "--out", model.toString(), "--holdout", "0").code());
        Run r = run("score", "--model", model.toString(), "--corpus", corpus.toString());
        assertEquals(0, r.code(), r.err());
        List<String> lines = r.out().lines().toList();
        assertEquals(36, lines.size(), r.out());
        ObjectMapper mapper = new ObjectMapper();
        Set<String> ids = new HashSet<>();
        long agree = 0;
        for (String line : lines) {
            JsonNode row = mapper.readTree(line);
            ids.add(row.get("id").asText());
            double sum = 0;
            String best = null;
            for (String label : LibraryDeskCorpus.LABELS) {
                double p = row.get("scores").get(label).asDouble();
                sum += p;
                if (best == null || p > row.get("scores").get(best).asDouble()) {
                    best = label;
                }
            }
            assertEquals(1.0, sum, 1e-9, line);
            assertEquals(best, row.get("label").asText(), line);
            agree += row.get("label").asText().equals(row.get("gold").asText()) ? 1 : 0;
        }
        assertEquals(36, ids.size());
        String expectedAccuracy = String.format(java.util.Locale.ROOT, "accuracy %.4f (%d of 36)", agree / 36.0, agree);
        assertTrue(r.err().contains(expectedAccuracy), r.err());
    }

    @Test
    void scoreToAFilePrintsTheEvaluationOnStdout() throws IOException {
        Path corpus = LibraryDeskCorpus.write(dir, 6, 2, true);
        Path model = dir.resolve("nb.json");
        assertEquals(0, run("train", "--corpus", corpus.toString(), "--out", model.toString()).code());
        Path out = dir.resolve("scores.jsonl");
        Run r = run("score", "--model", model.toString(), "--corpus", corpus.toString(), "--out", out.toString());
        assertEquals(0, r.code(), r.err());
        assertTrue(r.out().startsWith("accuracy "), r.out());
        assertEquals(18, Files.readAllLines(out, StandardCharsets.UTF_8).size());
        assertEquals(ExitCodes.ERROR, run("score", "--model", model.toString(), "--corpus", corpus.toString(),
                "--out", out.toString()).code());
    }

    @Test
    void scoreWithoutGoldLabelsSaysThereIsNothingToEvaluate() throws IOException {
        Path labelled = LibraryDeskCorpus.write(dir, 6, 2, true);
        Path unlabelled = LibraryDeskCorpus.write(dir, 4, 2, false);
        Path model = dir.resolve("nb.json");
        assertEquals(0, run("train", "--corpus", labelled.toString(), "--out", model.toString()).code());
        Run r = run("score", "--model", model.toString(), "--corpus", unlabelled.toString());
        assertEquals(0, r.code(), r.err());
        assertEquals(12, r.out().lines().count());
        assertTrue(r.err().contains("no gold labels"), r.err());
    }
}
