package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Multinomial logistic regression against scikit-learn 1.2.1 (Debian's python3-sklearn): the
 * reference values in src/test/reference/models/logistic-reference.json were made by
 * fit_logistic.py beside it, on the invented counts of support-counts.csv.
 */
class LogisticReferenceTest {
    private static final Path DIR = Path.of("src/test/reference/models");

    @ParameterizedTest
    @ValueSource(ints = {0, 1})
    void coefficientsAndProbabilitiesMatchScikitLearn(int fitIndex) throws IOException {
        JsonNode reference = new ObjectMapper().readTree(DIR.resolve("logistic-reference.json").toFile());
        JsonNode fit = reference.get("fits").get(fitIndex);
        List<String> lines = Files.readAllLines(DIR.resolve("support-counts.csv"), StandardCharsets.UTF_8);
        List<String> terms = Arrays.asList(lines.get(0).split(",")).subList(1, lines.get(0).split(",").length);
        List<String> labels = new ArrayList<>();
        fit.get("classes").forEach(c -> labels.add(c.asText()));

        List<SparseCounts> rows = new ArrayList<>();
        int[] labelOf = new int[lines.size() - 1];
        for (int i = 1; i < lines.size(); i++) {
            String[] cells = lines.get(i).split(",");
            labelOf[i - 1] = labels.indexOf(cells[0]);
            List<Integer> cols = new ArrayList<>();
            List<Double> vals = new ArrayList<>();
            for (int t = 1; t < cells.length; t++) {
                if (!cells[t].equals("0")) {
                    cols.add(t - 1);
                    vals.add(Double.parseDouble(cells[t]));
                }
            }
            rows.add(new SparseCounts(cols.stream().mapToInt(Integer::intValue).toArray(),
                    vals.stream().mapToDouble(Double::doubleValue).toArray()));
        }
        assertEquals(reference.get("documents").asInt(), rows.size());
        TrainingSet data = new TrainingSet(labels, new Vocabulary(terms), rows, labelOf);
        // l2 = 1 / (C n): scikit-learn's (1/2)||W||^2 + C sum loss, divided by C n.
        double l2 = 1.0 / (fit.get("C").asDouble() * rows.size());
        assertEquals(fit.get("l2").asDouble(), l2, 1e-15);

        try (LogisticModel model = new LogisticTrainer(l2, 1000, 1e-10)
                .fit(data, new TermCounter("whitespace", 1), null)) {
            assertTrue(model.optimiser().converged(), model.optimiser().toString());
            for (int c = 0; c < labels.size(); c++) {
                assertEquals(fit.get("intercepts").get(c).asDouble(), model.intercept(c), 1e-6, "intercept " + c);
                for (int t = 0; t < terms.size(); t++) {
                    assertEquals(fit.get("weights").get(c).get(t).asDouble(), model.weight(c, t), 1e-6,
                            "weight of " + terms.get(t) + " for " + labels.get(c));
                }
            }
            for (int i = 0; i < rows.size(); i++) {
                double[] p = Softmax.of(model.linearScores(rows.get(i)));
                for (int c = 0; c < labels.size(); c++) {
                    assertEquals(fit.get("probabilities").get(i).get(c).asDouble(), p[c], 1e-7,
                            "probability of " + labels.get(c) + " for row " + (i + 1));
                }
            }
        }
    }
}
