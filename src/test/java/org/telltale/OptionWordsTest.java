package org.telltale;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class OptionWordsTest {
    @Test
    void aLeadingSettingNameBecomesItsOption() {
        assertEquals("--parallel-max must be at least 1: 0", OptionWords.of("parallelMax must be at least 1: 0"));
    }

    @Test
    void aSettingNameInsideAMessageStays() {
        assertEquals("the batch of parallel requests", OptionWords.of("the batch of parallel requests"));
    }

    @Test
    void aValueTheCoreCannotReadNamesTheOptionFirst() {
        UsageException e = OptionWords.value("--protocol", new IllegalArgumentException("unknown protocol 'grpc'"));
        assertEquals("--protocol: unknown protocol 'grpc'", e.getMessage());
    }

    @Test
    void aRefusedSettingIsAUsageError() {
        assertEquals(ExitCodes.USAGE, OptionWords.usage(new IllegalArgumentException("words must be at least 1: 0")).exitCode());
    }
}
