package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class EvaluationTest {

    /** Reference values from scikit-learn 1.2.1 by src/test/reference/models/evaluation_reference.py. */
    @Test
    void matchesScikitLearnMetrics() throws IOException {
        JsonNode ref = new ObjectMapper().readTree(Path.of("src/test/reference/models/evaluation-reference.json").toFile());
        ConfusionCounter counter = new ConfusionCounter(List.of("account", "billing", "outage", "spam"));
        for (int i = 0; i < ref.get("gold").size(); i++) {
            counter.add(ref.get("gold").get(i).asText(), ref.get("predicted").get(i).asText());
        }
        Evaluation e = counter.result();
        assertEquals(ref.get("accuracy").asDouble(), e.accuracy(), 1e-15);
        assertEquals(ref.get("macro_f1").asDouble(), e.macroF1(), 1e-15);
        List<String> labels = new ArrayList<>();
        ref.get("labels").forEach(l -> labels.add(l.asText()));
        for (int g = 0; g < labels.size(); g++) {
            int eg = e.labels().indexOf(labels.get(g));
            assertEquals(ref.get("per_label_f1").get(g).asDouble(), e.perLabel().get(eg).f1(), 1e-15, labels.get(g));
            for (int p = 0; p < labels.size(); p++) {
                int ep = e.labels().indexOf(labels.get(p));
                assertEquals(ref.get("confusion").get(g).get(p).asLong(), e.count(eg, ep),
                        labels.get(g) + " -> " + labels.get(p));
            }
        }
        // The model's labels come first, the unknown gold label after them.
        assertEquals(List.of("account", "billing", "outage", "spam", "legal"), e.labels());
    }

    @Test
    void labelsNeitherSeenNorPredictedStayOutOfTheMacroAverage() {
        ConfusionCounter counter = new ConfusionCounter(List.of("a", "b", "unused"));
        counter.add("a", "a");
        counter.add("b", "b");
        counter.add("b", "a");
        Evaluation e = counter.result();
        // Per label F1: a = 2·(1/2·1)/(1/2+1) = 2/3, b = 2·(1·1/2)/(1+1/2) = 2/3 (common practice: F1 definition).
        assertEquals(2.0 / 3, e.macroF1(), 1e-15);
        assertEquals(2.0 / 3, e.accuracy(), 1e-15);
    }

    @Test
    void rendersTheMatrixWithGoldDownAndPredictionsAcross() {
        ConfusionCounter counter = new ConfusionCounter(List.of("billing", "outage"));
        counter.add("billing", "billing");
        counter.add("billing", "outage");
        counter.add("outage", "outage");
        String text = counter.result().render();
        List<String> lines = text.lines().toList();
        assertTrue(lines.get(0).startsWith("accuracy 0.6667 (2 of 3)   macro-F1 0.6667"), text);
        assertTrue(lines.get(1).matches("gold \\\\ predicted\\s+billing\\s+outage\\s+recall"), text);
        assertTrue(lines.get(2).matches("billing\\s+1\\s+1\\s+0\\.500"), text);
        assertTrue(lines.get(3).matches("outage\\s+0\\s+1\\s+1\\.000"), text);
        assertTrue(lines.get(4).matches("precision\\s+1\\.000\\s+0\\.500"), text);
        assertTrue(lines.get(5).matches("F1\\s+0\\.667\\s+0\\.667"), text);
    }

    @Test
    void emptyEvaluationHasNoAccuracy() {
        Evaluation e = new ConfusionCounter(List.of("x")).result();
        assertTrue(Double.isNaN(e.accuracy()));
        assertTrue(Double.isNaN(e.macroF1()));
    }
}
