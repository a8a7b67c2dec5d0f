package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.telltale.text.CorpusFiles.concat;
import static org.telltale.text.CorpusFiles.utf8;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.TelltaleException;

/** Hostile corpora (issue 8, item 2): each ends in documents, a clear error naming the place, or a counted skip. */
class HostileCorpusTest {
    @TempDir
    Path dir;

    private static final CorpusSettings STOP = CorpusSettings.DEFAULTS;
    private static final CorpusSettings SKIP = CorpusSettings.DEFAULTS.withSkipBad(true);
    /** C0 80 is an overlong encoding of NUL, invalid in UTF-8 (RFC 3629 §3; Unicode Table 3-7). */
    private static final byte[] INVALID_UTF8 = {(byte) 0xC0, (byte) 0x80};
    private static final byte[] BOM = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    private static String message(Runnable read) {
        return assertThrows(TelltaleException.class, read::run).getMessage();
    }

    // --- invalid UTF-8 ---

    @Test
    void invalidUtf8InJsonLinesNamesFileLineAndByteAndCanBeSkipped() {
        Path file = CorpusFiles.write(dir, "u.jsonl", concat(utf8("{\"text\": \"ok\"}\n{\"text\": \"caf"), INVALID_UTF8, utf8("\"}\n{\"text\": \"after\"}\n")));
        assertEquals(file + ":2: invalid UTF-8 at byte 14 (Telltale reads UTF-8 only and never replaces bad bytes) ({skipBad} skips and counts such lines)",
                message(() -> Corpora.readAll(file, STOP)));
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            assertEquals(List.of("ok", "after"), reader.readAll().stream().map(Document::text).toList());
            assertEquals("skipped 1 bad line (1 invalid UTF-8)", reader.skipped().summary());
        }
    }

    @Test
    void invalidUtf8InCsvStopsTheReadNamingTheLineEvenWithSkipBad() {
        Path file = CorpusFiles.write(dir, "u.csv", concat(utf8("id,text\n1,fine\n2,caf"), INVALID_UTF8, utf8("\n3,after\n")));
        String message = message(() -> Corpora.readAll(file, SKIP));
        assertTrue(message.startsWith(file + ":3: invalid UTF-8"), message);
    }

    @Test
    void invalidUtf8InALabelFolderFileIsABadFile() {
        CorpusFiles.write(dir, "spam/bad.txt", concat(utf8("caf"), INVALID_UTF8));
        CorpusFiles.write(dir, "spam/good.txt", "fine");
        assertTrue(message(() -> Corpora.readAll(dir, STOP)).startsWith(dir.resolve("spam/bad.txt") + ": invalid UTF-8 at byte 4"));
        try (CorpusReader reader = Corpora.open(dir, SKIP)) {
            assertEquals(List.of("spam/good.txt"), reader.readAll().stream().map(Document::id).toList());
            assertEquals("skipped 1 bad file (1 invalid UTF-8)", reader.skipped().summary());
        }
    }

    // --- byte-order marks ---

    @Test
    void aUtf8ByteOrderMarkIsDroppedInEveryFormat() {
        Path jsonl = CorpusFiles.write(dir, "b.jsonl", concat(BOM, utf8("{\"id\": \"1\", \"text\": \"hi\"}\n")));
        Path csv = CorpusFiles.write(dir, "b.csv", concat(BOM, utf8("id,text\n1,hi\n")));
        CorpusFiles.write(dir, "folder/x/1.txt", concat(BOM, utf8("hi")));
        assertEquals(List.of(new Document("1", "hi", null)), Corpora.readAll(jsonl, STOP));
        assertEquals(List.of(new Document("1", "hi", null)), Corpora.readAll(csv, STOP));
        assertEquals("hi", Corpora.readAll(dir.resolve("folder"), STOP).get(0).text());
    }

    @Test
    void aByteOrderMarkInsideAValueIsKept() {
        Path file = CorpusFiles.write(dir, "b.jsonl", "{\"text\": \"a\ufeffb\"}\n");
        assertEquals("a\ufeffb", Corpora.readAll(file, STOP).get(0).text());
    }

    @Test
    void aUtf16FileIsRefusedWithAHint() {
        Path file = CorpusFiles.write(dir, "w.jsonl", concat(new byte[] {(byte) 0xFF, (byte) 0xFE}, "{\"text\": \"x\"}".getBytes(java.nio.charset.StandardCharsets.UTF_16LE)));
        String message = message(() -> Corpora.readAll(file, SKIP));
        assertTrue(message.startsWith(file + ": starts with a UTF-16/UTF-32 byte-order mark"), message);
        Path csv = CorpusFiles.write(dir, "w.csv", concat(new byte[] {(byte) 0xFE, (byte) 0xFF}, utf8("text")));
        assertTrue(message(() -> Corpora.readAll(csv, SKIP)).startsWith(csv + ": starts with a UTF-16"));
    }

    // --- NUL bytes ---

    @Test
    void nulInJsonIsKeptWhenEscapedAndInvalidWhenRaw() {
        // RFC 8259 §7: control characters in strings must be escaped; \u0000 is a valid escape.
        Path file = CorpusFiles.write(dir, "n.jsonl", concat(utf8("{\"text\": \"a\\u0000b\"}\n{\"text\": \"a"), new byte[] {0}, utf8("b\"}\n")));
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            assertEquals(List.of("a\u0000b"), reader.readAll().stream().map(Document::text).toList());
            assertEquals(1, reader.skipped().count(SkipReason.INVALID_JSON));
        }
    }

    @Test
    void nulInCsvIsKeptAsText() {
        Path file = CorpusFiles.write(dir, "n.csv", concat(utf8("text\na"), new byte[] {0}, utf8("b\n")));
        assertEquals("a\u0000b", Corpora.readAll(file, STOP).get(0).text());
    }

    @Test
    void binaryFilesInALabelFolderAreAlwaysSkippedAndCounted() {
        CorpusFiles.write(dir, "ham/logo.txt", new byte[] {(byte) 0x89, 'P', 'N', 'G', 0, 0, 0, 13});
        CorpusFiles.write(dir, "ham/note.txt", "Lunch at one?");
        try (CorpusReader reader = Corpora.open(dir, STOP)) {
            assertEquals(List.of("ham/note.txt"), reader.readAll().stream().map(Document::id).toList());
            assertEquals("ignored 1 file (1 binary file)", reader.skipped().summary());
            assertEquals(dir.resolve("ham/logo.txt") + ": a binary file (it holds a NUL byte)", reader.skipped().examples().get(0));
        }
    }

    // --- line ends ---

    @Test
    void crLfAndLoneCrEndJsonLinesAndCountAsLines() {
        Path file = CorpusFiles.write(dir, "e.jsonl", "{\"text\": \"one\"}\r\n{\"text\": \"two\"}\r{\"text\": \"three\"}\n{broken\r\n");
        List<Document> docs;
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            docs = reader.readAll();
            assertEquals(List.of(file + ":4: invalid JSON at column 2: Unexpected character ('b' (code 98)): was expecting double-quote to start field name"),
                    reader.skipped().examples());
        }
        assertEquals(List.of("line-1", "line-2", "line-3"), docs.stream().map(Document::id).toList());
    }

    @Test
    void csvRecordsEndedByCrLfOrCrAndFieldsHoldingLineEndsKeepThemExactly() {
        Path file = CorpusFiles.write(dir, "e.csv", "id,text\r1,\"a\rb\"\r2,\"c\r\nd\"\r\n3,e\n");
        List<Document> docs = Corpora.readAll(file, STOP);
        assertEquals(List.of("a\rb", "c\r\nd", "e"), docs.stream().map(Document::text).toList());
        assertEquals(List.of(file + ":2", file + ":4", file + ":6"), docs.stream().map(Document::origin).toList());
    }

    // --- size ---

    @Test
    void aTenMegabyteSingleLineIsReadWhole() {
        String big = "x".repeat(10 * 1024 * 1024);
        Path file = CorpusFiles.write(dir, "big.jsonl", "{\"id\": \"big\", \"text\": \"" + big + "\"}");
        assertEquals(big.length(), Corpora.readAll(file, STOP).get(0).text().length());
    }

    @Test
    void aLineBeyondTheRecordLimitIsABadLineAndReadingResumesAfterIt() throws IOException {
        Path file = dir.resolve("huge.jsonl");
        try (var out = Files.newOutputStream(file)) {
            out.write(utf8("{\"text\": \""));
            byte[] chunk = utf8("y".repeat(1 << 20));
            for (int i = 0; i <= Corpora.MAX_RECORD_BYTES >> 20; i++) {
                out.write(chunk);
            }
            out.write(utf8("\"}\n{\"text\": \"small\"}\n"));
        }
        assertEquals(file + ":1: line longer than 33554432 bytes ({skipBad} skips and counts such lines)", message(() -> Corpora.readAll(file, STOP)));
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            assertEquals(List.of("small"), reader.readAll().stream().map(Document::text).toList());
            assertEquals(1, reader.skipped().count(SkipReason.TOO_LONG));
        }
    }

    @Test
    void anUnclosedCsvQuoteStopsTheReadOnceTheRecordPassesTheLimit() throws IOException {
        Path file = dir.resolve("open.csv");
        try (var out = Files.newOutputStream(file)) {
            out.write(utf8("id,text\n1,fine\n2,\"never closed\n"));
            byte[] line = utf8("z".repeat(1023) + "\n");
            for (int i = 0; i <= Corpora.MAX_RECORD_BYTES / 1024 + 128; i++) {
                out.write(line);
            }
        }
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            assertEquals("fine", reader.next().text());
            String message = assertThrows(TelltaleException.class, reader::hasNext).getMessage();
            assertEquals(file + ":3: a CSV record longer than 33554432 characters (an unclosed quote?); reading cannot resume after it",
                    message);
        }
    }

    @Test
    void aMegabyteDocumentWithFiftyThousandDistinctTermsReadsAndIndexesUnderACap() {
        StringBuilder text = new StringBuilder();
        for (int i = 0; text.length() < 1_000_000; i++) {
            text.append("w").append(Integer.toString(i % 50_000, 36)).append(' ');
        }
        Path file = CorpusFiles.write(dir, "wide.jsonl", "{\"id\": \"wide\", \"text\": \"" + text + "\"}\n");
        Document doc = Corpora.readAll(file, STOP).get(0);
        TermIndex index = TermIndex.of(doc.text(), Analyzers.standard(), UnitKind.WORD, 2000);
        assertEquals(2000, index.size());
        assertEquals(50_000, index.totalUnits());
        assertEquals("kept 2000 of 50000 word units (the most frequent); the other 48000 stay in every probe", index.note());
    }

    // --- empty texts ---

    @Test
    void emptyAndWhitespaceOnlyTextsAreKeptAndCounted() {
        Path file = CorpusFiles.write(dir, "blank.jsonl", "{\"text\": \"\"}\n{\"text\": \" \\t\\n\"}\n{\"text\": \"real\"}\n");
        try (CorpusReader reader = Corpora.open(file, STOP)) {
            assertEquals(3, reader.readAll().size());
            assertEquals(2, reader.blankTexts());
        }
        assertEquals(0, TermIndex.of(" \t\n", Analyzers.standard(), UnitKind.WORD).size());
        assertEquals(0, TermIndex.of(" \t\n", Analyzers.standard(), UnitKind.LINE).size());
    }

    // --- ids and fields ---

    @Test
    void duplicateIdsInCsvNameBothRows() {
        Path file = CorpusFiles.write(dir, "d.csv", "id,text\nA,x\nB,y\nA,z\n");
        assertTrue(message(() -> Corpora.readAll(file, STOP)).startsWith(file + ":4: duplicate id 'A' (first at " + file + ":2)"));
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            assertEquals(List.of("x", "y"), reader.readAll().stream().map(Document::text).toList());
            assertEquals(1, reader.skipped().count(SkipReason.DUPLICATE_ID));
        }
    }

    @Test
    void aDerivedIdCollidingWithAGivenIdIsADuplicate() {
        Path file = CorpusFiles.write(dir, "c.jsonl", "{\"id\": \"line-2\", \"text\": \"x\"}\n{\"text\": \"y\"}\n");
        assertTrue(message(() -> Corpora.readAll(file, STOP)).contains("duplicate id 'line-2'"));
    }

    @Test
    void mistypedFieldsNameTheFieldAndTheTypeFound() {
        Path file = CorpusFiles.write(dir, "t.jsonl", String.join("\n",
                "{\"id\": \"a\", \"text\": [\"x\"]}",
                "{\"id\": \"b\", \"text\": {\"body\": \"x\"}}",
                "{\"id\": 1.5, \"text\": \"x\"}",
                "{\"id\": true, \"text\": \"x\"}",
                "{\"id\": \"e\", \"text\": \"x\", \"label\": [\"spam\"]}",
                "{\"id\": \"f\", \"text\": null}",
                "{\"id\": \"\", \"text\": \"x\"}"));
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            assertEquals(0, reader.readAll().size());
            assertEquals(List.of(
                    file + ":1 (id 'a'): field 'text' must be a string, got an array",
                    file + ":2 (id 'b'): field 'text' must be a string, got an object",
                    file + ":3: field 'id' must be a string or an integer, got a number",
                    file + ":4: field 'id' must be a string or an integer, got a boolean",
                    file + ":5 (id 'e'): field 'label' must be a string, an integer or a boolean, got an array",
                    file + ":6 (id 'f'): no field 'text' (it is null); choose the text field with {textField}",
                    file + ":7: field 'id' is an empty string"), reader.skipped().examples());
        }
    }

    @Test
    void deeplyNestedJsonIsRefusedWithinTheDepthLimit() {
        String deep = "{\"text\": \"x\", \"meta\": " + "[".repeat(100_000) + "]".repeat(100_000) + "}";
        Path file = CorpusFiles.write(dir, "deep.jsonl", deep + "\n{\"text\": \"fine\"}\n");
        String message = message(() -> Corpora.readAll(file, STOP));
        assertTrue(message.startsWith(file + ":1: Document nesting depth (65) exceeds the maximum allowed (64"), message);
        try (CorpusReader reader = Corpora.open(file, SKIP)) {
            assertEquals(List.of("fine"), reader.readAll().stream().map(Document::text).toList());
            assertEquals("skipped 1 bad line (1 nested too deeply)", reader.skipped().summary());
        }
    }

    // --- label folders: links ---

    @Test
    void linksAreFollowedOnlyToFilesInsideTheCorpus() throws IOException {
        Path root = dir.resolve("corpus");
        Path outside = CorpusFiles.write(dir, "secret/passwords.txt", "do not read");
        Path inside = CorpusFiles.write(root, "spam/a.txt", "offer");
        Files.createDirectories(root.resolve("ham"));
        Files.createSymbolicLink(root.resolve("ham/alias.txt"), inside);
        Files.createSymbolicLink(root.resolve("ham/escape.txt"), outside);
        Files.createSymbolicLink(root.resolve("ham/relative-escape.txt"), Path.of("../../secret/passwords.txt"));
        Files.createSymbolicLink(root.resolve("ham/dangling.txt"), root.resolve("nowhere.txt"));
        Files.createSymbolicLink(root.resolve("ham/loop"), root.resolve("ham"));
        Files.createSymbolicLink(root.resolve("mirror"), dir.resolve("secret"));
        try (CorpusReader reader = Corpora.open(root, STOP)) {
            List<Document> docs = reader.readAll();
            assertEquals(List.of(new Document("ham/alias.txt", "offer", "ham"), new Document("spam/a.txt", "offer", "spam")), docs);
            assertTrue(docs.stream().noneMatch(d -> d.text().contains("do not read")));
            SkipReport skipped = reader.skipped();
            assertEquals(3, skipped.count(SkipReason.LINK_OUTSIDE));
            assertEquals(1, skipped.count(SkipReason.BROKEN_LINK));
            assertEquals(1, skipped.count(SkipReason.LINKED_FOLDER));
            assertEquals("ignored 5 files (3 link leading outside the corpus, 1 broken link, 1 link to a folder)", skipped.summary());
        }
    }
}
