package org.telltale.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.UsageException;
import org.telltale.text.CorpusFormat;
import org.telltale.text.CorpusReader;
import org.telltale.text.CorpusSettings;
import org.telltale.text.Document;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

class CorpusAndAnalyzerOptionsTest {
    @TempDir
    Path dir;

    @Command(name = "probe")
    static final class Holder {
        @Mixin
        CorpusOptions corpus;
        @Mixin
        AnalyzerOptions analyzer;
    }

    private static Holder parse(String... args) {
        Holder holder = new Holder();
        new CommandLine(holder).parseArgs(args);
        return holder;
    }

    @Test
    void defaultsAreDetectedFormatStandardFieldsAndStandardAnalyzer() {
        Holder h = parse();
        assertFalse(h.corpus.given());
        assertEquals(CorpusSettings.DEFAULTS, h.corpus.settings());
        assertEquals("standard", h.analyzer.spec());
        assertThrows(UsageException.class, h.corpus::open);
    }

    @Test
    void optionsMapOntoReaderSettingsAndOpenTheCorpus() throws IOException {
        Path file = dir.resolve("queue.txt");
        Files.writeString(file, "{\"key\": \"Q1\", \"body\": \"Reset my password\", \"team\": \"it\"}\n{oops\n", StandardCharsets.UTF_8);
        Holder h = parse("--corpus", file.toString(), "--format", "JSONL", "--id-field", "key",
                "--text-field", "body", "--label-field", "team", "--skip-bad");
        assertEquals(new CorpusSettings(CorpusFormat.JSONL, "key", "body", "team", true), h.corpus.settings());
        try (CorpusReader reader = h.corpus.open()) {
            assertEquals(List.of(new Document("Q1", "Reset my password", "it")), reader.readAll());
            assertEquals(1, reader.skipped().bad());
        }
    }

    @Test
    void anUnknownFormatNamesTheOptionAndListsTheFormats() {
        UsageException e = assertThrows(UsageException.class, () -> parse("--format", "xml").corpus.settings());
        assertEquals("--format: unknown corpus format 'xml'; one of: jsonl, csv, folder", e.getMessage());
    }

    @Test
    void anUnknownFormatOrAnalyzerIsAUsageError() {
        assertThrows(UsageException.class, () -> parse("--format", "xml").corpus.settings());
        assertThrows(UsageException.class, () -> parse("--analyzer", "klingon").analyzer.analyzer());
    }
}
