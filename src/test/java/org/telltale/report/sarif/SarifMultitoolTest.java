package org.telltale.report.sarif;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The validation helper itself: it passes a valid log and reports, or refuses, broken ones. */
class SarifMultitoolTest {
    @TempDir
    Path dir;

    private static final String RUN = "{\"$schema\":\"" + SarifWriter.SCHEMA + "\",\"version\":\"2.1.0\",\"runs\":[{"
            + "\"tool\":{\"driver\":{\"name\":\"Probe\",\"version\":\"1.0\",\"rules\":[{\"id\":\"P1\",\"name\":\"Probe\","
            + "\"shortDescription\":{\"text\":\"A probe.\"},\"fullDescription\":{\"text\":\"A probe rule.\"},"
            + "\"help\":{\"text\":\"Nothing to fix.\"}}]}},\"results\":[RESULT]}]}";

    private Path log(String result) throws Exception {
        Path file = Files.createTempFile(dir, "log", ".sarif");
        Files.writeString(file, RUN.replace("RESULT", result), StandardCharsets.UTF_8);
        return file;
    }

    @Test
    void aValidLogHasNoErrors() throws Exception {
        List<String> errors = SarifMultitool.errors(log("{\"ruleId\":\"P1\",\"ruleIndex\":0,\"level\":\"note\","
                + "\"message\":{\"text\":\"Probe result.\"},\"locations\":[{\"physicalLocation\":{\"artifactLocation\":"
                + "{\"uri\":\"corpus.jsonl\"},\"region\":{\"startLine\":3}}}]}"));
        assertEquals(List.of(), errors);
    }

    @Test
    void aSchemaViolationIsAnError() throws Exception {
        // SARIF 2.1.0 schema: region.startLine has minimum 1, and a result requires a message.
        List<String> zeroLine = SarifMultitool.errors(log("{\"ruleId\":\"P1\",\"message\":{\"text\":\"x\"},"
                + "\"locations\":[{\"physicalLocation\":{\"artifactLocation\":{\"uri\":\"a\"},\"region\":{\"startLine\":0}}}]}"));
        assertTrue(zeroLine.stream().anyMatch(e -> e.startsWith("JSON1008")), zeroLine.toString());
        List<String> noMessage = SarifMultitool.errors(log("{\"ruleId\":\"P1\"}"));
        assertTrue(noMessage.stream().anyMatch(e -> e.startsWith("JSON1002") && e.contains("message")), noMessage.toString());
    }

    @Test
    void aLogTheValidatorCannotReadFailsTheCheckInsteadOfPassing() throws Exception {
        // An unknown level makes validate analyse nothing and report nothing; the canary notices.
        Path broken = log("{\"ruleId\":\"P1\",\"level\":\"severe\",\"message\":{\"text\":\"x\"}}");
        AssertionError e = assertThrows(AssertionError.class, () -> SarifMultitool.errors(broken));
        assertTrue(e.getMessage().contains("did not analyse"), e.getMessage());
    }
}
