package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class TrainingRequestTest {
    private static TrainingRequest with(String setting, double value) {
        TrainingRequest d = TrainingRequest.defaults(Algorithm.LOGISTIC);
        return new TrainingRequest(d.algorithm(), d.analyzer(), setting.equals("ngrams") ? (int) value : d.ngrams(),
                setting.equals("holdout") ? value : d.holdout(), d.seed(), setting.equals("smoothing") ? value : d.smoothing(),
                setting.equals("l2") ? value : d.l2(), setting.equals("maxIterations") ? (int) value : d.maxIterations());
    }

    /** Each setting out of range is refused alone, in the core's words with its rule and value. */
    @ParameterizedTest
    @CsvSource({"ngrams, 3, 'ngrams must be 1 or 2: 3'", "holdout, 1, 'holdout must be at least 0 and below 1: 1.0'",
            "holdout, -0.1, 'holdout must be at least 0 and below 1: -0.1'",
            "smoothing, 0, 'smoothing must be a positive number: 0.0'", "l2, -1, 'l2 must be a positive number: -1.0'",
            "maxIterations, 0, 'maxIterations must be at least 1: 0'"})
    void aSettingOutOfRangeIsNamedAlone(String setting, double value, String message) {
        assertEquals(message, assertThrows(IllegalArgumentException.class, () -> with(setting, value)).getMessage());
    }

    @ParameterizedTest
    @CsvSource({"ngrams, 2", "holdout, 0", "maxIterations, 1"})
    void theBoundItselfIsAccepted(String setting, double value) {
        TrainingRequest r = with(setting, value);
        assertEquals(value, switch (setting) {
            case "ngrams" -> r.ngrams();
            case "holdout" -> r.holdout();
            default -> r.maxIterations();
        });
    }
}
