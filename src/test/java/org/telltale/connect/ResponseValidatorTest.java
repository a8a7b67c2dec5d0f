package org.telltale.connect;

import org.telltale.model.Softmax;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.telltale.model.ClassifierException;

class ResponseValidatorTest {
    private static final ResponseValidator.BatchPlace FIRST =
            new ResponseValidator.BatchPlace(1, 0, 2, List.of("a-1", "a-2"), Redactor.none());

    private static RawScores raw(List<String> labels, double[]... rows) {
        return new RawScores(labels, rows, "{…}");
    }

    private static String error(ResponseValidator v, RawScores r, int expected) {
        return assertThrows(ClassifierException.class, () -> v.validate(r, expected, FIRST)).getMessage();
    }

    @Test
    void acceptsProbabilityRowsWithinTheTolerance() {
        var v = new ResponseValidator(ScoreKind.PROBABILITIES);
        double[][] out = v.validate(raw(List.of("a", "b"), new double[] {0.3, 0.7}, new double[] {0.5, 0.5004}), 2, FIRST);
        assertArrayEquals(new double[] {0.3, 0.7}, out[0]);
    }

    @Test
    void rejectsAWrongRowCount() {
        var v = new ResponseValidator(ScoreKind.PROBABILITIES);
        assertEquals("batch 1 (documents 0–1): the model answered 1 rows for 2 texts; response: {…}",
                error(v, raw(List.of("a", "b"), new double[] {0.3, 0.7}), 2));
    }

    @Test
    void rejectsRowsThatDoNotSumToOne() {
        var v = new ResponseValidator(ScoreKind.PROBABILITIES);
        String m = error(v, raw(List.of("a", "b"), new double[] {0.3, 0.7}, new double[] {0.5, 0.6}), 2);
        assertTrue(m.contains("document 'a-2' (index 1) summing to 1.100000"), m);
    }

    @Test
    void rejectsValuesOutsideTheUnitInterval() {
        var v = new ResponseValidator(ScoreKind.PROBABILITIES);
        String m = error(v, raw(List.of("a", "b"), new double[] {-0.5, 1.5}, new double[] {0.5, 0.5}), 2);
        assertTrue(m.contains("score -0.5 for document 'a-1' (index 0) and label 'a'"), m);
    }

    @Test
    void rejectsInfinityEvenForLogits() {
        var v = new ResponseValidator(ScoreKind.LOGITS);
        String m = error(v, raw(List.of("a", "b"), new double[] {1, 2}, new double[] {Double.POSITIVE_INFINITY, 0}), 2);
        assertTrue(m.contains("non-finite score, Infinity, for document 'a-2'"), m);
    }

    @Test
    void rejectsLabelsThatChangeBetweenCalls() {
        var v = new ResponseValidator(ScoreKind.PROBABILITIES);
        v.validate(raw(List.of("a", "b"), new double[] {0.3, 0.7}, new double[] {0.5, 0.5}), 2, FIRST);
        String m = error(v, raw(List.of("a", "c"), new double[] {0.3, 0.7}, new double[] {0.5, 0.5}), 2);
        assertTrue(m.contains("labels [a, c] but earlier answers had [a, b]"), m);
    }

    @Test
    void putsTheSameLabelsInAnotherOrderBackInTheFirstOrder() {
        var v = new ResponseValidator(ScoreKind.PROBABILITIES);
        v.validate(raw(List.of("a", "b"), new double[] {0.3, 0.7}, new double[] {0.5, 0.5}), 2, FIRST);
        double[][] out = v.validate(raw(List.of("b", "a"), new double[] {0.9, 0.1}, new double[] {0.4, 0.6}), 2, FIRST);
        assertArrayEquals(new double[] {0.1, 0.9}, out[0]);
        assertArrayEquals(new double[] {0.6, 0.4}, out[1]);
    }

    @Test
    void logitsPassThroughTheSoftmax() {
        var v = new ResponseValidator(ScoreKind.LOGITS);
        double[][] out = v.validate(raw(List.of("a", "b"), new double[] {0, 0}, new double[] {Math.log(3), 0}), 2, FIRST);
        assertArrayEquals(new double[] {0.5, 0.5}, out[0], 1e-15);
        assertArrayEquals(new double[] {0.75, 0.25}, out[1], 1e-15); // e^ln3 / (e^ln3 + 1) = 3/4
    }

    @Test
    void softmaxMatchesAPublishedExample() {
        // Wikipedia, "Softmax function", example (from memory): softmax of [1, 2, 3, 4, 1, 2, 3]
        // is approximately [0.024, 0.064, 0.175, 0.475, 0.024, 0.064, 0.175].
        double[] p = Softmax.of(new double[] {1, 2, 3, 4, 1, 2, 3});
        assertArrayEquals(new double[] {0.024, 0.064, 0.175, 0.475, 0.024, 0.064, 0.175}, p, 0.0006);
        // Large logits do not overflow: the maximum is subtracted first.
        assertArrayEquals(new double[] {0.5, 0.5}, Softmax.of(new double[] {1000, 1000}), 0);
    }

    @Test
    void errorsNeverShowASecret() {
        var place = new ResponseValidator.BatchPlace(1, 0, 1, null, new Redactor(List.of("s3cr3t")));
        var v = new ResponseValidator(ScoreKind.PROBABILITIES);
        var e = assertThrows(ClassifierException.class,
                () -> v.validate(new RawScores(List.of("a"), new double[0][], "{\"echo\":\"s3cr3t\"}"), 1, place));
        assertTrue(e.getMessage().contains("{\"echo\":\"[redacted]\"}"), e.getMessage());
    }
}
