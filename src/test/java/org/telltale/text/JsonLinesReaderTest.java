package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;

class JsonLinesReaderTest {
    @TempDir
    Path dir;

    private static final CorpusSettings SKIP = CorpusSettings.DEFAULTS.withSkipBad(true);

    @Test
    void readsIdTextAndOptionalLabelWithTheirPlaces() {
        Path file = CorpusFiles.write(dir, "tickets.jsonl", """
                {"id": "T-1", "text": "Refund my order", "label": "billing"}
                {"id": 2, "text": "Printer jams", "extra": [1, 2]}
                """);
        List<Document> docs = Corpora.readAll(file, CorpusSettings.DEFAULTS);
        assertEquals(List.of(new Document("T-1", "Refund my order", "billing"), new Document("2", "Printer jams", null)), docs);
        assertEquals(file + ":1", docs.get(0).origin());
        assertEquals(file + ":2", docs.get(1).origin());
    }

    @Test
    void eachDocumentKnowsTheLineOfItsRecordPastBlankLinesAndMixedLineEnds() throws Exception {
        // JSON Lines (jsonlines.org): one record per line; LF, CRLF and CR all end a line, as
        // java.lang.String#lines counts them, so the file is read back independently that way.
        Path file = CorpusFiles.write(dir, "t.jsonl", "\uFEFF{\"id\": \"a\", \"text\": \"x\"}\r\n\n"
                + "{\"id\": \"b\", \"text\": \"y\"}\r  \n{\"id\": \"c\", \"text\": \"z\"}\n");
        List<Document> docs = Corpora.readAll(file, CorpusSettings.DEFAULTS);
        assertEquals(List.of(1L, 3L, 5L), docs.stream().map(Document::line).toList());
        List<String> lines = java.nio.file.Files.readString(file).lines().toList();
        for (Document d : docs) {
            assertTrue(lines.get((int) d.line() - 1).contains("\"id\": \"" + d.id() + "\""), d + " at " + d.line());
        }
    }

    @Test
    void remapsFieldNames() {
        Path file = CorpusFiles.write(dir, "mail.jsonl", "{\"msg\": \"M7\", \"body\": \"Hello\", \"queue\": \"sales\"}\n");
        List<Document> docs = Corpora.readAll(file, CorpusSettings.DEFAULTS.withFields("msg", "body", "queue"));
        assertEquals(List.of(new Document("M7", "Hello", "sales")), docs);
    }

    @Test
    void missingIdsComeFromTheLineNumber() {
        Path file = CorpusFiles.write(dir, "a.jsonl", "{\"text\": \"one\"}\n\n{\"text\": \"three\", \"id\": null}\n");
        List<Document> docs = Corpora.readAll(file, CorpusSettings.DEFAULTS);
        assertEquals(List.of("line-1", "line-3"), docs.stream().map(Document::id).toList());
    }

    @Test
    void integerAndBooleanLabelsAreTakenAsText() {
        Path file = CorpusFiles.write(dir, "a.jsonl", "{\"text\": \"x\", \"label\": 1}\n{\"text\": \"y\", \"label\": true}\n");
        assertEquals(List.of("1", "true"), Corpora.readAll(file, CorpusSettings.DEFAULTS).stream().map(Document::label).toList());
    }

    @Test
    void invalidJsonStopsTheReadNamingFileAndLine() {
        Path file = CorpusFiles.write(dir, "bad.jsonl", "{\"text\": \"fine\"}\n{\"text\": \"unterminated}\n");
        TelltaleException e = assertThrows(TelltaleException.class, () -> Corpora.readAll(file, CorpusSettings.DEFAULTS));
        assertTrue(e.getMessage().startsWith(file + ":2: invalid JSON"), e.getMessage());
        assertTrue(e.getMessage().contains("{skipBad}"), e.getMessage());
    }

    @Test
    void skipBadCountsEachReasonAndKeepsTheGoodLines() {
        Path file = CorpusFiles.write(dir, "mixed.jsonl", String.join("\n",
                "{\"id\": \"a\", \"text\": \"good\"}",
                "{not json",
                "[1, 2]",
                "{\"id\": \"b\"}",
                "{\"id\": \"c\", \"text\": 42}",
                "{\"id\": \"a\", \"text\": \"again\"}",
                "{\"text\": \"x\"} {\"text\": \"y\"}",
                "{\"id\": \"d\", \"text\": \"also good\"}") + "\n");
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            assertEquals(List.of("a", "d"), reader.readAll().stream().map(Document::id).toList());
            SkipReport skipped = reader.skipped();
            assertEquals(2, skipped.count(SkipReason.INVALID_JSON));
            assertEquals(1, skipped.count(SkipReason.NOT_AN_OBJECT));
            assertEquals(1, skipped.count(SkipReason.MISSING_TEXT));
            assertEquals(1, skipped.count(SkipReason.MISTYPED_FIELD));
            assertEquals(1, skipped.count(SkipReason.DUPLICATE_ID));
            assertEquals("skipped 6 bad lines (2 invalid JSON, 1 not a JSON object, 1 missing text, 1 mistyped field, 1 duplicate id)",
                    skipped.summary());
            assertTrue(skipped.examples().contains(file + ":6: duplicate id 'a' (first at " + file + ":1)"), skipped.examples().toString());
            assertTrue(skipped.examples().contains(file + ":5 (id 'c'): field 'text' must be a string, got a number"),
                    skipped.examples().toString());
        }
    }

    @Test
    void duplicateIdsStopTheReadNamingBothPlaces() {
        Path file = CorpusFiles.write(dir, "dup.jsonl", "{\"id\": \"x\", \"text\": \"a\"}\n{\"id\": \"x\", \"text\": \"b\"}\n");
        TelltaleException e = assertThrows(TelltaleException.class, () -> Corpora.readAll(file, CorpusSettings.DEFAULTS));
        assertTrue(e.getMessage().startsWith(file + ":2: duplicate id 'x' (first at " + file + ":1)"), e.getMessage());
    }

    @Test
    void readsLazilyUpToTheFirstBadLine() {
        Path file = CorpusFiles.write(dir, "late.jsonl", "{\"text\": \"first\"}\n{oops\n");
        try (CorpusReader reader = Corpora.open(file, CorpusSettings.DEFAULTS)) {
            assertEquals("first", reader.next().text());
            assertThrows(TelltaleException.class, reader::hasNext);
        }
    }

    @Test
    void labelIsNullWhenAbsent() {
        Path file = CorpusFiles.write(dir, "u.jsonl", "{\"text\": \"t\"}");
        assertNull(Corpora.readAll(file, CorpusSettings.DEFAULTS).get(0).label());
    }
}
