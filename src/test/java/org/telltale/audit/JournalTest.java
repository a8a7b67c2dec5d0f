package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;

class JournalTest {
    private static final RunFingerprint RUN_A = RunFingerprint.builder().with("corpus_sha256", "c0ffee")
            .with("model", "sha256:ab12").with("seed", 7).with("words", 8).build();

    @Test
    void resumeKeepsFinishedWorkAndCutsATornLastLine(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("journal.jsonl");
        try (Journal journal = Journal.create(file, RUN_A)) {
            journal.appendScored(0, List.of("t1", "t2"), List.of("billing", "outage"), List.of("billing", "outage"), 2);
            journal.appendExplained("t2", "{\"id\":\"t2\",\"label\":\"outage\"}", 1);
        }
        // A kill in the middle of a write leaves part of a line behind.
        Files.writeString(file, "{\"type\":\"explained\",\"id\":\"t1\",\"expl", StandardCharsets.UTF_8,
                StandardOpenOption.APPEND);
        try (Journal journal = Journal.resume(file, RUN_A)) {
            Journal.ScoredBatch batch = journal.takeScored(0);
            assertEquals(List.of("billing", "outage"), batch.predicted());
            assertEquals(Journal.idsHash(List.of("t1", "t2")), batch.idsHash());
            assertNull(journal.takeScored(0), "handed out once");
            assertNull(journal.takeScored(1));
            assertEquals("{\"id\":\"t2\",\"label\":\"outage\"}", journal.explained("t2"));
            assertNull(journal.explained("t1"), "the torn line is not finished work");
            assertEquals(3, journal.retries());
            journal.appendExplained("t1", "{\"id\":\"t1\"}", 0);
        }
        List<String> lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        assertEquals(4, lines.size());
        assertTrue(lines.get(3).startsWith("{\"type\":\"explained\",\"id\":\"t1\""), lines.get(3));
        try (Journal again = Journal.resume(file, RUN_A)) {
            assertEquals(2, again.explainedCount());
        }
    }

    @Test
    void refusesTheJournalOfAnotherRunOrADamagedOne(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("journal.jsonl");
        Journal.create(file, RUN_A).close();
        String header = Files.readAllLines(file, StandardCharsets.UTF_8).get(0);
        Files.writeString(file, header + "\n{oops\n{\"type\":\"scored\"}\n");
        TelltaleException damaged = assertThrows(TelltaleException.class, () -> Journal.resume(file, RUN_A));
        assertTrue(damaged.getMessage().contains("journal.jsonl:2"), damaged.getMessage());

        assertThrows(TelltaleException.class, () -> Journal.resume(dir.resolve("none.jsonl"), RUN_A));
    }

    @Test
    void aResumeWithOtherResultSettingsNamesTheOneFieldWithBothValues(@TempDir Path dir) {
        Path file = dir.resolve("journal.jsonl");
        Journal.create(file, RUN_A).close();
        RunFingerprint otherSeed = RunFingerprint.builder().with("corpus_sha256", "c0ffee").with("model", "sha256:ab12")
                .with("seed", 8).with("words", 8).build();
        TelltaleException e = assertThrows(TelltaleException.class, () -> Journal.resume(file, otherSeed));
        assertEquals(file + ": cannot resume an audit whose seed was '7' and is now '8'; rerun without {resume} and "
                + "with {force} to start over", e.getMessage());
    }

    @Test
    void aJournalOfTheFirstVersionIsRefusedByItsFormat(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("journal.jsonl");
        Files.writeString(file, "{\"type\":\"start\",\"fingerprint\":\"telltale.audit/1|seed=1\"}\n");
        TelltaleException e = assertThrows(TelltaleException.class, () -> Journal.resume(file, RUN_A));
        assertEquals(file + ": not a telltale.journal version 2 journal (found an older journal without a format); "
                + "rerun without {resume} and with {force} to start over", e.getMessage());
    }

    private static String resumeError(Path dir, String... lines) throws Exception {
        Path file = dir.resolve("journal.jsonl");
        Journal.create(file, RUN_A).close();
        String header = Files.readAllLines(file, StandardCharsets.UTF_8).get(0);
        Files.writeString(file, String.join("\n", lines).replace("HEADER", header) + "\n", StandardCharsets.UTF_8);
        return assertThrows(TelltaleException.class, () -> Journal.resume(file, RUN_A)).getMessage();
    }

    @Test
    void aScoredLineWithoutItsPredictionsIsNamed(@TempDir Path dir) throws Exception {
        assertEquals(dir.resolve("journal.jsonl") + ":2: predicted: missing", resumeError(dir, "HEADER",
                "{\"type\":\"scored\",\"start\":0,\"ids_hash\":\"1f\",\"labels\":[\"a\"],\"retries\":0}"));
    }

    @Test
    void aMistypedStartIsNamedWithWhatWasFound(@TempDir Path dir) throws Exception {
        assertEquals(dir.resolve("journal.jsonl") + ":2: start: expected an integer, found the string \"0\"", resumeError(dir,
                "HEADER", "{\"type\":\"scored\",\"start\":\"0\",\"ids_hash\":\"1f\",\"labels\":[\"a\"],"
                        + "\"predicted\":[\"a\"],\"retries\":0}"));
    }

    @Test
    void aJournalOfAnotherVersionIsRefusedByTheVersionCheck(@TempDir Path dir) throws Exception {
        assertEquals(dir.resolve("journal.jsonl") + ":1: version: telltale.journal version 3 is not supported (this "
                + "Telltale reads version 2)", resumeError(dir, "{\"type\":\"start\",\"format\":\"telltale.journal\","
                        + "\"version\":3,\"fingerprint\":{}}"));
    }
}
