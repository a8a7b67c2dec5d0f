package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.ExitCodes;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelFile;
import org.telltale.model.NaiveBayesTrainer;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TermCounter;
import org.telltale.model.TrainingSet;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.PairKind;
import org.telltale.report.json.OverlapJson;

class OverlapCommandTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String[] LABELS = {"billing", "booking"};

    @TempDir
    Path dir;

    private static String[] run(String... args) {
        picocli.CommandLine cli = Main.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cli.setOut(new PrintWriter(out));
        cli.setErr(new PrintWriter(err));
        int code = cli.execute(args);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    /** Invented ferry tickets: each from its own made-up words, so unrelated tickets share no shingle. */
    private static String ticket(Random random, int n) {
        StringBuilder text = new StringBuilder();
        for (int s = 0; s < 4; s++) {
            for (int w = 0; w < 9; w++) {
                text.append(w == 0 ? "" : " ").append("w").append(n).append('x').append(random.nextInt(1000));
            }
            text.append(s % 2 == 0 ? " refund. " : " sailing. ");
        }
        return text.toString().strip();
    }

    private void write(Path file, List<String[]> rows) throws IOException {
        StringBuilder lines = new StringBuilder();
        for (String[] r : rows) {
            ObjectNode node = JSON.createObjectNode().put("id", r[0]).put("text", r[1]);
            if (r[2] != null) {
                node.put("label", r[2]);
            }
            lines.append(JSON.writeValueAsString(node)).append('\n');
        }
        Files.writeString(file, lines, StandardCharsets.UTF_8);
    }

    @Test
    void reportsSeenTestDocumentsAndTheAccuracyTheyAreWorth() throws IOException {
        Random random = new Random(12);
        List<String[]> train = new ArrayList<>();
        List<String[]> test = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            String text = ticket(random, i);
            train.add(new String[] {"tr" + i, text, LABELS[i % 2]});
            if (i < 10) {
                // A re-cased copy: seen, and a model trained on train has memorised its words.
                test.add(new String[] {"copy" + i, text.toUpperCase(java.util.Locale.ROOT), i == 0 ? "booking" : LABELS[i % 2]});
            }
        }
        for (int i = 40; i < 60; i++) {
            test.add(new String[] {"new" + i, ticket(random, i), LABELS[i % 2]});
        }
        Path trainFile = dir.resolve("train.jsonl");
        Path testFile = dir.resolve("test.jsonl");
        write(trainFile, train);
        write(testFile, test);
        Path modelFile = dir.resolve("model.json");
        BuiltinModel model = trainBayes(train);
        ModelFile.save(model, modelFile);
        Path json = dir.resolve("overlap.json");

        String[] r = run("overlap", "--train", trainFile.toString(), "--test", testFile.toString(),
                "--model", modelFile.toString(), "--json", json.toString(), "--quiet");
        assertEquals("0", r[0], r[2]);
        assertTrue(r[1].startsWith("10 of 30 test documents (33%) already appear in train (10 exact, 0 near duplicates); "
                + "1 with a different label."), r[1]);
        assertTrue(r[1].contains("r = 7 rows x b = 17 bands"), r[1]);
        assertEquals("", r[2]);

        OverlapResult result = OverlapJson.read(json);
        assertEquals(10, result.pairs(PairKind.TRAIN_TEST).size());
        // Accuracy recomputed here from the model itself (definition: correct / labelled).
        int correct = 0;
        int correctUnseen = 0;
        List<String> texts = new ArrayList<>();
        test.forEach(t -> texts.add(t[1]));
        ScoreMatrix scores = model.score(texts);
        for (int i = 0; i < test.size(); i++) {
            boolean right = test.get(i)[2].equals(scores.predicted(i));
            correct += right ? 1 : 0;
            correctUnseen += right && i >= 10 ? 1 : 0;
        }
        assertEquals(correct / 30.0, result.inflation().accuracy(), 1e-12);
        assertEquals(correctUnseen / 20.0, result.inflation().accuracyUnseen(), 1e-12);
        assertTrue(result.inflation().accuracySeen() > result.inflation().accuracyUnseen(), result.inflation().toString());
        assertTrue(r[1].contains("the overlap adds"), r[1]);
    }

    private static BuiltinModel trainBayes(List<String[]> rows) {
        TermCounter counter = new TermCounter("standard", 1);
        List<Map<String, Integer>> counts = new ArrayList<>();
        List<String> gold = new ArrayList<>();
        for (String[] row : rows) {
            counts.add(counter.count(row[1]));
            gold.add(row[2]);
        }
        return new NaiveBayesTrainer(1.0).fit(TrainingSet.of(counts, gold), counter, null);
    }

    @Test
    void badSettingsAreUsageErrors() throws IOException {
        Path file = dir.resolve("c.jsonl");
        write(file, List.<String[]>of(new String[] {"a", "one two three", null}));
        String[][] cases = {
            {"--threshold", "1.5"}, {"--threshold", "0"}, {"--rows", "4"}, {"--rows", "20", "--bands", "20"},
            {"--shingle", "0"}, {"--batch", "8"},
        };
        for (String[] extra : cases) {
            List<String> args = new ArrayList<>(List.of("overlap", "--train", file.toString(), "--test", file.toString()));
            args.addAll(List.of(extra));
            String[] r = run(args.toArray(String[]::new));
            assertEquals(Integer.toString(ExitCodes.USAGE), r[0], String.join(" ", extra) + ": " + r[2]);
            assertTrue(r[2].startsWith("telltale: "), r[2]);
        }
    }

    @Test
    void aRefusedSettingIsNamedByItsOption() throws IOException {
        // OverlapSettings says it in the core's words, OptionWords names the option once.
        Path file = dir.resolve("c.jsonl");
        write(file, List.<String[]>of(new String[] {"a", "one two three", null}));
        String[] r = run("overlap", "--train", file.toString(), "--test", file.toString(), "--shingle", "0");
        assertEquals("telltale: --shingle must be at least 1: 0", r[2].lines().findFirst().orElse(""));
        String[] threads = run("overlap", "--train", file.toString(), "--test", file.toString(), "--threads", "-2");
        assertEquals("telltale: --threads must be 0 (one per core) or more: -2", threads[2].lines().findFirst().orElse(""));
    }

    @Test
    void aMissingCorpusIsAnErrorNamingTheFile() {
        String[] r = run("overlap", "--train", dir.resolve("nope.jsonl").toString(), "--test", dir.resolve("nope.jsonl").toString());
        assertEquals(Integer.toString(ExitCodes.ERROR), r[0]);
        assertTrue(r[2].contains("nope.jsonl"), r[2]);
    }
}
