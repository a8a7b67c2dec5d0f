package org.telltale.demo;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.telltale.TelltaleException;
import org.telltale.text.Document;

/**
 * Writes the demo corpus as JSON Lines: one object per message with the fields {@code id},
 * {@code text} and {@code label}, in that order, UTF-8, LF after every line.
 */
public final class CorpusFiles {
    public static final String LEAKY = "support-leaky.jsonl";
    public static final String CLEAN = "support-clean.jsonl";

    private static final JsonFactory JSON = new JsonFactory();

    private CorpusFiles() {
    }

    /** Writes both variants into {@code dir}; returns the paths, leaky first. */
    public static List<Path> write(DemoCorpus corpus, Path dir) {
        try {
            Files.createDirectories(dir);
            Path leaky = dir.resolve(LEAKY);
            Path clean = dir.resolve(CLEAN);
            Files.write(leaky, jsonLines(corpus.leaky()));
            Files.write(clean, jsonLines(corpus.clean()));
            return List.of(leaky, clean);
        } catch (IOException e) {
            throw new TelltaleException("cannot write the demo corpus into " + dir + ": " + e.getMessage(), e);
        }
    }

    /** Writes {@code documents} as one JSON Lines file. */
    public static Path writeJsonLines(List<Document> documents, Path file) {
        try {
            Files.write(file, jsonLines(documents));
            return file;
        } catch (IOException e) {
            throw new TelltaleException("cannot write " + file + ": " + e.getMessage(), e);
        }
    }

    /** The exact bytes of the JSON Lines file for {@code documents}. */
    public static byte[] jsonLines(List<Document> documents) {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try {
            for (Document doc : documents) {
                // One generator per line: Jackson writes UTF-8 and leaves non-ASCII characters unescaped.
                try (JsonGenerator json = JSON.createGenerator(bytes)) {
                    json.configure(JsonGenerator.Feature.AUTO_CLOSE_TARGET, false);
                    json.writeStartObject();
                    json.writeStringField("id", doc.id());
                    json.writeStringField("text", doc.text());
                    json.writeStringField("label", doc.label());
                    json.writeEndObject();
                }
                bytes.write('\n');
            }
        } catch (IOException e) {
            throw new UncheckedIOException("writing to memory failed", e);
        }
        return bytes.toByteArray();
    }
}
