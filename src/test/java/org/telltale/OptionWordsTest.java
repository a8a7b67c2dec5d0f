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
    void aPlaceholderOfASettingBecomesItsOption() {
        assertEquals("out.html: file exists; pass --force to replace it, or --out to write elsewhere",
                OptionWords.render("out.html: file exists; pass {force} to replace it, or {out} to write elsewhere"));
        assertEquals("a.jsonl:2: broken (--skip-bad skips and counts such lines)",
                OptionWords.render("a.jsonl:2: broken ({skipBad} skips and counts such lines)"));
    }

    @Test
    void bracesAroundAnythingButASettingStay() {
        String snippet = "response: {\"labels\": [\"a\"]} {colour} {{force} {";
        assertEquals("response: {\"labels\": [\"a\"]} {colour} {--force {", OptionWords.render(snippet));
    }

    @Test
    void aRefusedSettingRendersItsPlaceholdersToo() {
        assertEquals("--model exec: names no command",
                OptionWords.usage(new IllegalArgumentException("{model} exec: names no command")).getMessage());
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
