package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;

class CsvReaderTest {
    @TempDir
    Path dir;

    @Test
    void readsQuotedFieldsWithCommasNewlinesAndDoubledQuotes() {
        // RFC 4180 §2 rules 5-7: fields with commas, line breaks or quotes are enclosed in
        // double quotes, and a quote inside is escaped by doubling it.
        Path file = CorpusFiles.write(dir, "t.csv", "id,text,label\r\n"
                + "1,\"Hello, world\",greeting\r\n"
                + "2,\"two\r\nlines\",misc\r\n"
                + "3,\"she said \"\"no\"\"\",misc\r\n");
        List<Document> docs = Corpora.readAll(file, CorpusSettings.DEFAULTS);
        assertEquals(List.of(new Document("1", "Hello, world", "greeting"),
                new Document("2", "two\r\nlines", "misc"),
                new Document("3", "she said \"no\"", "misc")), docs);
        assertEquals(List.of(file + ":2", file + ":3", file + ":5"), docs.stream().map(Document::origin).toList());
    }

    @Test
    void eachDocumentKnowsTheFirstLineOfItsRecord() throws Exception {
        // RFC 4180 §2: a quoted field may hold line breaks, so a record can span several lines;
        // the file is read back independently with java.lang.String#lines (LF, CRLF, CR).
        Path file = CorpusFiles.write(dir, "t.csv", "id,text\r\n"
                + "r1,\"one\r\ntwo\r\nthree\"\r\n"
                + "\r\n"
                + "r2,plain\r"
                + "r3,\"a\nb\"\n"
                + "r4,last\n");
        List<Document> docs = Corpora.readAll(file, CorpusSettings.DEFAULTS);
        assertEquals(List.of(2L, 6L, 7L, 9L), docs.stream().map(Document::line).toList());
        List<String> lines = java.nio.file.Files.readString(file).lines().toList();
        for (Document d : docs) {
            assertTrue(lines.get((int) d.line() - 1).startsWith(d.id() + ","), d + " at " + d.line());
        }
    }

    @Test
    void idAndLabelColumnsAreOptional() {
        Path file = CorpusFiles.write(dir, "t.csv", "body\nfirst\nsecond\n");
        List<Document> docs = Corpora.readAll(file, CorpusSettings.DEFAULTS.withFields("id", "body", "label"));
        assertEquals(List.of(new Document("row-1", "first", null), new Document("row-2", "second", null)), docs);
    }

    @Test
    void aHeaderWithoutTheTextColumnNamesTheColumnsThatExist() {
        Path file = CorpusFiles.write(dir, "t.csv", "id,body\n1,x\n");
        TelltaleException e = assertThrows(TelltaleException.class, () -> Corpora.open(file, CorpusSettings.DEFAULTS));
        assertEquals(file + ": the header has no column 'text' (columns: id, body); choose one with {textField}", e.getMessage());
    }

    @Test
    void aShortRowIsABadRowAndCanBeSkipped() {
        Path file = CorpusFiles.write(dir, "t.csv", "id,label,text\n1,a\n2,b,fine\n");
        TelltaleException e = assertThrows(TelltaleException.class, () -> Corpora.readAll(file, CorpusSettings.DEFAULTS));
        assertTrue(e.getMessage().startsWith(file + ":2 (id '1'): the row has 2 fields"), e.getMessage());
        try (CorpusReader reader = Corpora.open(file, CorpusSettings.DEFAULTS.withSkipBad(true))) {
            assertEquals(List.of("2"), reader.readAll().stream().map(Document::id).toList());
            assertEquals("skipped 1 bad row (1 missing text)", reader.skipped().summary());
        }
    }

    @Test
    void brokenQuotingStopsTheReadEvenWithSkipBad() {
        Path file = CorpusFiles.write(dir, "t.csv", "id,text\n1,\"ok\"\n2,\"bad\"x\n3,later\n");
        TelltaleException e = assertThrows(TelltaleException.class,
                () -> Corpora.readAll(file, CorpusSettings.DEFAULTS.withSkipBad(true)));
        assertTrue(e.getMessage().startsWith(file + ":3: broken CSV quoting"), e.getMessage());
    }

    @Test
    void anEmptyFileIsRefusedAsHavingNoHeader() {
        Path file = CorpusFiles.write(dir, "empty.csv", "");
        TelltaleException e = assertThrows(TelltaleException.class, () -> Corpora.open(file, CorpusSettings.DEFAULTS));
        assertEquals(file + ": empty; a CSV corpus starts with a header row naming its columns", e.getMessage());
    }
}
