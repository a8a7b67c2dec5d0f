package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class AuditSettingsTest {
    private static AuditSettings with(String setting, int value) {
        return new AuditSettings(
                setting.equals("sample") ? value : 200,
                setting.equals("probes") ? value : 500,
                setting.equals("words") ? value : 10,
                setting.equals("picks") ? value : 5,
                false, FailOn.HIGH, AuditSettings.DEFAULT_ALPHA,
                setting.equals("batch") ? value : 64,
                "standard", null);
    }

    /** Each setting out of range is refused alone, named in the core's words with its bound and value. */
    @ParameterizedTest
    @CsvSource({"sample, 0, 'sample must be at least 1: 0'", "probes, 1, 'probes must be at least 2: 1'",
            "words, 0, 'words must be at least 1: 0'", "picks, -1, 'picks must be at least 0: -1'",
            "batch, 0, 'batch must be at least 1: 0'"})
    void aSettingOutOfRangeIsNamedAlone(String setting, int value, String message) {
        assertEquals(message, assertThrows(IllegalArgumentException.class, () -> with(setting, value)).getMessage());
    }

    @ParameterizedTest
    @CsvSource({"sample, 1", "probes, 2", "words, 1", "picks, 0", "batch, 1"})
    void theBoundItselfIsAccepted(String setting, int value) {
        assertEquals(value, switch (setting) {
            case "sample" -> with(setting, value).sample();
            case "probes" -> with(setting, value).probes();
            case "words" -> with(setting, value).words();
            case "picks" -> with(setting, value).picks();
            default -> with(setting, value).batch();
        });
    }
}
