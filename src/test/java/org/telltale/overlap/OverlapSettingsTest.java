package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class OverlapSettingsTest {
    private static OverlapSettings with(String setting, double value) {
        return OverlapSettings.of(setting.equals("threshold") ? value : 0.8, setting.equals("shingle") ? (int) value : 5,
                setting.equals("signature") ? (int) value : 128, null, null, 1L, 1, false);
    }

    /** Each setting out of range is refused alone, in the core's words with its rule and value. */
    @ParameterizedTest
    @CsvSource({"threshold, 0, 'threshold must be in (0, 1]: 0.0'", "threshold, 1.5, 'threshold must be in (0, 1]: 1.5'",
            "shingle, 0, 'shingle must be at least 1: 0'", "signature, 0, 'signature must be at least 1: 0'"})
    void aSettingOutOfRangeIsNamedAlone(String setting, double value, String message) {
        assertEquals(message, assertThrows(IllegalArgumentException.class, () -> with(setting, value)).getMessage());
    }

    @Test
    void rowsWithoutBandsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> OverlapSettings.of(0.8, 5, 128, 4, null, 1L, 1, false));
        assertEquals("banding needs both rows and bands, or neither: rows 4, bands absent", e.getMessage());
    }

    @Test
    void aBandingLongerThanTheSignatureIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> OverlapSettings.of(0.8, 5, 128, 20, 20, 1L, 1, false));
        assertEquals("banding of rows × bands = 400 components exceeds signature 128", e.getMessage());
    }

    @Test
    void givenRowsAndBandsAreKept() {
        assertEquals(new Banding(4, 8), OverlapSettings.of(0.8, 5, 128, 4, 8, 1L, 1, false).banding());
    }

    @Test
    void zeroThreadsMeansOnePerCore() {
        assertEquals(Runtime.getRuntime().availableProcessors(), OverlapSettings.workers(0));
    }

    @Test
    void negativeThreadsAreRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> OverlapSettings.workers(-1));
        assertEquals("threads must be 0 (one per core) or more: -1", e.getMessage());
    }
}
