package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.lifecycle.AfterContainer;
import net.jqwik.api.lifecycle.BeforeContainer;
import org.telltale.TelltaleException;

/**
 * Arbitrary bytes never crash the readers: each read ends with documents or a
 * {@link TelltaleException} naming the file, never another exception. Inputs mix JSON, CSV
 * punctuation, line ends, BOMs and invalid UTF-8 so that the parsers' error paths are reached.
 */
class CorpusReaderPropertyTest {
    private static Path dir;

    @BeforeContainer
    static void makeDir() throws IOException {
        dir = Files.createTempDirectory("telltale-fuzz");
    }

    @AfterContainer
    static void removeDir() throws IOException {
        try (var walk = Files.walk(dir)) {
            walk.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        }
    }

    @Provide
    Arbitrary<byte[]> corpusBytes() {
        Arbitrary<String> pieces = Arbitraries.oneOf(
                Arbitraries.of("{", "}", "[", "]", "\"", ":", ",", "\"id\"", "\"text\"", "\"label\"", "null", "1", "-0.5e9", "true",
                        "\"a\"", "\\", "\\u0000", "\\ud800", "\n", "\r\n", "\r", " ", "id,text,label", "\"\"", "\ufeff", "\u00e9"),
                Arbitraries.strings().ofMaxLength(4));
        Arbitrary<byte[]> text = pieces.list().ofMaxSize(60).map(list -> CorpusFiles.utf8(String.join("", list)));
        Arbitrary<byte[]> raw = Arbitraries.bytes().array(byte[].class).ofMaxSize(200);
        return Arbitraries.oneOf(text, raw, Arbitraries.of(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}, new byte[] {(byte) 0xFF, (byte) 0xFE}))
                .list().ofMinSize(1).ofMaxSize(4).map(parts -> CorpusFiles.concat(parts.toArray(new byte[0][])));
    }

    @Property(tries = 400)
    void jsonLinesNeverCrash(@ForAll("corpusBytes") byte[] bytes, @ForAll boolean skipBad) {
        readOrRefuse("fuzz.jsonl", bytes, skipBad);
    }

    @Property(tries = 400)
    void csvNeverCrashes(@ForAll("corpusBytes") byte[] bytes, @ForAll boolean skipBad) {
        readOrRefuse("fuzz.csv", bytes, skipBad);
    }

    @Property(tries = 100)
    void labelFoldersNeverCrash(@ForAll("corpusBytes") byte[] bytes, @ForAll boolean skipBad) throws IOException {
        Path root = Files.createTempDirectory(dir, "folder");
        CorpusFiles.write(root, "label/doc.txt", bytes);
        try (CorpusReader reader = Corpora.open(root, CorpusSettings.DEFAULTS.withSkipBad(skipBad))) {
            List<Document> docs = reader.readAll();
            assertEquals(1, docs.size() + reader.skipped().bad() + reader.skipped().ignored());
        } catch (TelltaleException e) {
            assertTrue(e.getMessage().contains(root.toString()), e.getMessage());
        }
    }

    private static void readOrRefuse(String name, byte[] bytes, boolean skipBad) {
        Path file;
        try {
            file = Files.write(dir.resolve(name), bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        try (CorpusReader reader = Corpora.open(file, CorpusSettings.DEFAULTS.withSkipBad(skipBad))) {
            for (Document doc : reader.readAll()) {
                assertTrue(doc.origin().startsWith(file + ":"), doc.origin());
            }
        } catch (TelltaleException e) {
            assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        }
    }
}
