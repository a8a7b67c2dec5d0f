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

    @Test
    void resumeKeepsFinishedWorkAndCutsATornLastLine(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("journal.jsonl");
        try (Journal journal = Journal.create(file, "run-a")) {
            journal.appendScored(0, List.of("t1", "t2"), List.of("billing", "outage"), List.of("billing", "outage"), 2);
            journal.appendExplained("t2", "{\"id\":\"t2\",\"label\":\"outage\"}", 1);
        }
        // A kill in the middle of a write leaves part of a line behind.
        Files.writeString(file, "{\"type\":\"explained\",\"id\":\"t1\",\"expl", StandardCharsets.UTF_8,
                StandardOpenOption.APPEND);
        try (Journal journal = Journal.resume(file, "run-a")) {
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
        try (Journal again = Journal.resume(file, "run-a")) {
            assertEquals(2, again.explainedCount());
        }
    }

    @Test
    void refusesTheJournalOfAnotherRunOrADamagedOne(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("journal.jsonl");
        Journal.create(file, "run-a").close();
        TelltaleException other = assertThrows(TelltaleException.class, () -> Journal.resume(file, "run-b"));
        assertTrue(other.getMessage().contains("--force"), other.getMessage());

        Files.writeString(file, "{\"type\":\"start\",\"fingerprint\":\"run-a\"}\n{oops\n{\"type\":\"scored\"}\n");
        TelltaleException damaged = assertThrows(TelltaleException.class, () -> Journal.resume(file, "run-a"));
        assertTrue(damaged.getMessage().contains("journal.jsonl:2"), damaged.getMessage());

        assertThrows(TelltaleException.class, () -> Journal.resume(dir.resolve("none.jsonl"), "run-a"));
    }
}
