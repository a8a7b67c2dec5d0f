package org.telltale.text;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamConstraintsException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.BufferedInputStream;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * JSON Lines (jsonlines.org): one JSON object (RFC 8259) per line, UTF-8, lines ended by LF,
 * CRLF or CR. Blank lines are passed over (they hold no record). Each line is parsed on its own,
 * so a broken line never takes the rest of the file with it.
 */
final class JsonLinesReader extends CorpusReader {
    /** Nesting beyond this is refused; a document needs one level, a little metadata a few more. */
    static final int MAX_DEPTH = 64;

    private static final ObjectMapper MAPPER = JsonMapper.builder(JsonFactory.builder()
                    .streamReadConstraints(StreamReadConstraints.builder()
                            .maxNestingDepth(MAX_DEPTH)
                            .maxStringLength(Corpora.MAX_RECORD_BYTES)
                            .build())
                    .build())
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .disable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
            .build();

    private final LineSource lines;
    private final String file;
    private final RecordFields fields;

    JsonLinesReader(Path path, CorpusSettings settings) throws IOException {
        super(path, CorpusFormat.JSONL, settings.skipBad(), "line");
        this.file = path.toString();
        this.fields = new RecordFields(settings);
        this.lines = new LineSource(new BufferedInputStream(Files.newInputStream(path), 1 << 16), Corpora.MAX_RECORD_BYTES);
    }

    @Override
    Document readNext() throws IOException {
        while (lines.next()) {
            String place = file + ":" + lines.lineNumber();
            if (lines.overlong()) {
                throw new BadRecord(SkipReason.TOO_LONG, place + ": line longer than " + Corpora.MAX_RECORD_BYTES + " bytes");
            }
            byte[] bytes = lines.bytes();
            int offset = 0;
            if (lines.lineNumber() == 1) {
                Utf8.refuseOtherEncodings(bytes, lines.length(), file);
                offset = Utf8.bomLength(bytes, lines.length());
            }
            String line = Utf8.decode(bytes, offset, lines.length() - offset, place);
            if (line.isBlank()) {
                continue;
            }
            return toDocument(parse(line, place), place);
        }
        return null;
    }

    private static JsonNode parse(String line, String place) {
        try {
            return MAPPER.readTree(line);
        } catch (StreamConstraintsException e) {
            throw new BadRecord(SkipReason.TOO_DEEP, place + ": " + e.getOriginalMessage());
        } catch (JsonProcessingException e) {
            String column = e.getLocation() == null ? "" : " at column " + e.getLocation().getColumnNr();
            throw new BadRecord(SkipReason.INVALID_JSON, place + ": invalid JSON" + column + ": " + firstLine(e.getOriginalMessage()));
        }
    }

    private Document toDocument(JsonNode node, String place) {
        if (!node.isObject()) {
            throw new BadRecord(SkipReason.NOT_AN_OBJECT, place + ": expected a JSON object, got " + RecordFields.kind(node));
        }
        String id = fields.id(node.get(fields.idField()), place);
        String where = id == null ? place : place + " (id '" + id + "')";
        String text = fields.text(node.get(fields.textField()), where);
        String label = fields.label(node.get(fields.labelField()), where);
        return new Document(id == null ? "line-" + lines.lineNumber() : id, text, label, place, lines.lineNumber());
    }

    private static String firstLine(String message) {
        int newline = message.indexOf('\n');
        return newline < 0 ? message : message.substring(0, newline);
    }

    @Override
    public void close() {
        try {
            lines.close();
        } catch (IOException e) {
            // Nothing is written; a failed close of an input file loses nothing.
        }
    }
}
