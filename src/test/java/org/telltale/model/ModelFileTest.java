package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;

class ModelFileTest {
    @TempDir
    Path dir;

    private static final TrainingInfo INFO = new TrainingInfo("tickets.jsonl", "ab".repeat(32), 5, 4, 1,
            Map.of("billing", 3, "outage", 2), 0.2, 42L, "2026-12-01T22:00:00Z");

    private static final List<String> TEXTS = List.of(
            "Invoice INV-2231 was charged twice this month",
            "The portal is down again since the 09:00 deploy",
            "refund please, billing portal shows the old plan",
            "");

    private static NaiveBayesModel bayes() {
        TermCounter counter = new TermCounter("standard", 2);
        TrainingSet data = ModelTesting.trainingSet(counter,
                "Invoice charged twice, please refund", "billing",
                "Wrong plan on my invoice", "billing",
                "Refund for the duplicate charge", "billing",
                "Portal down after deploy", "outage",
                "Login page times out, portal unreachable", "outage");
        return new NaiveBayesTrainer(1.0).fit(data, counter, INFO);
    }

    private static LogisticModel logistic() {
        TermCounter counter = new TermCounter("english", 1);
        return new LogisticModel(List.of("billing", "outage", "other"), counter,
                new Vocabulary(List.of("invoic", "portal", "down")), INFO, null, 0.01,
                new double[] {0.1, -0.25, 0.15}, new double[][] {{1.5, -0.5, 0}, {-1, 2, 1.0 / 3}, {0, 0, -1e-300}},
                new OptimiserReport("L-BFGS", 12, 15, true, 0.3, 1e-9));
    }

    @Test
    void bayesModelSurvivesSaveAndLoadExactly() {
        Path file = dir.resolve("nb.json");
        try (BuiltinModel saved = bayes()) {
            ModelFile.save(saved, file);
            try (BuiltinModel loaded = ModelFile.load(file)) {
                NaiveBayesModel nb = assertInstanceOf(NaiveBayesModel.class, loaded);
                assertEquals(saved.labels(), nb.labels());
                assertEquals(saved.vocabulary().terms(), nb.vocabulary().terms());
                assertEquals("standard", nb.analyzer());
                assertEquals(2, nb.ngrams());
                assertEquals(INFO, nb.training());
                assertEquals(saved.score(TEXTS), nb.score(TEXTS));
                assertTrue(nb.describe().contains(file.toString()), nb.describe());
            }
        }
    }

    @Test
    void logisticModelSurvivesSaveAndLoadExactly() {
        Path file = dir.resolve("lr.json");
        try (LogisticModel saved = logistic()) {
            ModelFile.save(saved, file);
            try (BuiltinModel loaded = ModelFile.load(file)) {
                LogisticModel lr = assertInstanceOf(LogisticModel.class, loaded);
                assertEquals(0.01, lr.l2());
                assertArrayEquals(saved.intercepts(), lr.intercepts());
                for (int c = 0; c < 3; c++) {
                    assertArrayEquals(saved.weightRow(c), lr.weightRow(c));
                }
                assertEquals(saved.optimiser(), lr.optimiser());
                assertEquals(saved.score(TEXTS), lr.score(TEXTS));
            }
        }
    }

    @Test
    void refusesToOverwriteUnlessAsked() throws IOException {
        Path file = dir.resolve("taken.json");
        Files.writeString(file, "keep me", StandardCharsets.UTF_8);
        try (BuiltinModel m = bayes()) {
            TelltaleException e = assertThrows(TelltaleException.class, () -> ModelFile.save(m, file, false));
            assertTrue(e.getMessage().contains("already exists"), e.getMessage());
            assertEquals("keep me", Files.readString(file, StandardCharsets.UTF_8));
            ModelFile.save(m, file, true);
            assertInstanceOf(NaiveBayesModel.class, ModelFile.load(file)).close();
        }
    }

    private String loadError(String content) throws IOException {
        Path file = dir.resolve("m.json");
        Files.writeString(file, content, StandardCharsets.UTF_8);
        TelltaleException e = assertThrows(TelltaleException.class, () -> ModelFile.load(file));
        assertTrue(e.getMessage().startsWith(file + ": "), e.getMessage());
        assertEquals(1, e.getMessage().lines().count(), e.getMessage());
        return e.getMessage();
    }

    private String valid() throws IOException {
        Path file = dir.resolve("valid.json");
        try (BuiltinModel m = bayes()) {
            ModelFile.save(m, file);
        }
        return Files.readString(file, StandardCharsets.UTF_8);
    }

    @Test
    void truncatedFileIsReportedAsTruncated() throws IOException {
        String json = valid();
        for (int cut : new int[] {1, json.length() / 3, json.length() / 2, json.length() - 3}) {
            String message = loadError(json.substring(0, cut));
            assertTrue(message.startsWith(dir.resolve("m.json") + ": not valid JSON: Unexpected end-of-input"), message);
        }
    }

    @Test
    void foreignFilesAreNamedAsNotModelFiles() throws IOException {
        Path m = dir.resolve("m.json");
        assertEquals(m + ": format: missing", loadError("{\"name\": \"quarterly report\", \"rows\": [1, 2, 3]}"));
        assertEquals(m + ": expected an object, found an array", loadError("[1, 2, 3]"));
        assertEquals(m + ": format: expected \"telltale.model\", found \"telltale.explanations\"",
                loadError("{\"format\": \"telltale.explanations\", \"version\": 1}"));
        assertTrue(loadError("id,text,label\n1,hello,spam\n").startsWith(m + ": not valid JSON: "));
        assertEquals(m + ": empty, expected JSON", loadError(""));
    }

    @Test
    void binaryFileIsNotJson() throws IOException {
        Path file = dir.resolve("bin.json");
        Files.write(file, new byte[] {0x1f, (byte) 0x8b, 8, 0, 0, 0, 0, 0, 0, 3});
        TelltaleException e = assertThrows(TelltaleException.class, () -> ModelFile.load(file));
        assertTrue(e.getMessage().contains("not valid JSON"), e.getMessage());
    }

    @Test
    void contentAfterTheModelIsRejected() throws IOException {
        String message = loadError(valid().strip() + " {\"format\":\"telltale.model\"}");
        assertTrue(message.startsWith(dir.resolve("m.json") + ": not valid JSON: Trailing token"), message);
    }

    // The three cases every contract's test feeds (DEVELOPERS.md, "Reading a contract"): a wrong
    // version, a missing field and a mistyped one, each named with its path and what was found.
    @Test
    void aWrongVersionIsNamedWithTheVersionsThisTelltaleReads() throws IOException {
        String json = valid().replace("\"version\":1", "\"version\":2");
        assertEquals(dir.resolve("m.json") + ": version: telltale.model version 2 is not supported (this Telltale reads version 1)",
                loadError(json));
    }

    @Test
    void aMissingFieldIsNamedWithItsPath() throws IOException {
        String json = valid().replace("\"analyzer\":\"standard\",", "");
        assertEquals(dir.resolve("m.json") + ": analyzer: missing", loadError(json));
        String noSmoothing = valid().replace("\"smoothing\":1.0,", "");
        assertEquals(dir.resolve("m.json") + ": parameters.smoothing: missing", loadError(noSmoothing));
    }

    @Test
    void aMistypedFieldIsNamedWithItsPathAndWhatWasFound() throws IOException {
        String json = valid().replace("\"labels\":[\"billing\",\"outage\"]", "\"labels\":[\"billing\",3]");
        assertEquals(dir.resolve("m.json") + ": labels[1]: expected a string, found the number 3", loadError(json));
        String row = valid().replaceFirst("\"log_likelihood\":\\[\\[", "\"log_likelihood\":[[\"x\",");
        assertTrue(loadError(row).startsWith(dir.resolve("m.json") + ": parameters.log_likelihood[0]: expected "), loadError(row));
    }

    @Test
    void wrongShapesNameTheField() throws IOException {
        String json = valid();
        assertTrue(loadError(json.replace("\"algorithm\":\"bayes\"", "\"algorithm\":\"forest\""))
                .contains("unknown algorithm 'forest'"));
        assertTrue(loadError(json.replace("\"analyzer\":\"standard\"", "\"analyzer\":\"klingon\""))
                .contains("klingon"));
        assertTrue(loadError(json.replace("\"labels\":[\"billing\",\"outage\"]", "\"labels\":[\"billing\"]"))
                .contains("log_prior"));
        assertTrue(loadError(json.replace("\"labels\":[\"billing\",\"outage\"]", "\"labels\":{\"a\":1}"))
                .contains("labels: expected an array, found an object"));
        assertTrue(loadError(json.replace("\"smoothing\":1.0", "\"smoothing\":\"one\""))
                .contains("parameters.smoothing: expected a number, found the string \"one\""));
        assertTrue(loadError(json.replace("\"labels\":[\"billing\",\"outage\"]", "\"labels\":[\"outage\",\"outage\"]"))
                .contains("labels[1]: expected each value once, listed again, found the string \"outage\""));
        assertTrue(loadError(json.replace("\"ngrams\":2", "\"ngrams\":5")).contains("ngrams"));
        assertTrue(loadError(json.replace("\"vocabulary\":[", "\"vocabulary\":[null,")).contains("vocabulary[0]: expected a string, found null"));
    }

    @Test
    void missingAndUnreadableFilesAreNamed() {
        TelltaleException e = assertThrows(TelltaleException.class, () -> ModelFile.load(dir.resolve("none.json")));
        assertTrue(e.getMessage().contains("does not exist"), e.getMessage());
        e = assertThrows(TelltaleException.class, () -> ModelFile.load(dir));
        assertTrue(e.getMessage().contains("is a directory"), e.getMessage());
    }
}
