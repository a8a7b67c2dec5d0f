package org.telltale.text;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.CharacterCodingException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.telltale.TelltaleException;

/**
 * CSV with a header row, parsed by Commons CSV in its RFC 4180 dialect: comma-separated,
 * double-quoted fields may hold commas, line breaks and doubled quotes; LF, CRLF and CR all end
 * records. The header names the columns; the text column must exist, id and label columns are
 * optional. Strictly UTF-8, with an optional byte-order mark.
 *
 * <p>Broken quoting and invalid UTF-8 stop the read even with skip-bad: after them the parser
 * cannot know where the next record starts, so skipping would guess.
 */
final class CsvReader extends CorpusReader {
    private static final CSVFormat FORMAT = CSVFormat.RFC4180.builder()
            .setHeader()
            .setSkipHeaderRecord(true)
            .setIgnoreEmptyLines(false)
            .get();

    /** Characters one record may take, with room for the parser's read-ahead. */
    private static final long RECORD_ALLOWANCE = Corpora.MAX_RECORD_BYTES + (1 << 16);

    private final String file;
    private final CSVParser parser;
    private final StrictUtf8Reader decoded;
    private final Iterator<CSVRecord> records;
    private final Integer idColumn;
    private final int textColumn;
    private final Integer labelColumn;
    private final CorpusSettings settings;
    private final int columns;
    private long lineAfterPrevious;
    private long rows;

    CsvReader(Path path, CorpusSettings settings) throws IOException {
        super(path, CorpusFormat.CSV, settings.skipBad(), "row");
        this.file = path.toString();
        this.settings = settings;
        InputStream in = new BufferedInputStream(Files.newInputStream(path), 1 << 16);
        this.decoded = new StrictUtf8Reader(in, skipByteOrderMark(in));
        try {
            this.parser = CSVParser.parse(decoded, FORMAT);
        } catch (CharacterCodingException e) {
            in.close();
            throw new TelltaleException(file + ":1: invalid UTF-8 at byte " + decoded.badByte()
                    + " of the file, in the header (Telltale reads UTF-8 only)");
        } catch (IOException | IllegalArgumentException | UncheckedIOException e) {
            in.close();
            throw new TelltaleException(file + ":1: cannot read the CSV header: " + e.getMessage(), e);
        }
        Map<String, Integer> header = parser.getHeaderMap();
        if (header == null || header.isEmpty()) {
            parser.close();
            throw new TelltaleException(file + ": empty; a CSV corpus starts with a header row naming its columns");
        }
        if (!header.containsKey(settings.textField())) {
            parser.close();
            throw new TelltaleException(file + ": the header has no column '" + settings.textField() + "' (columns: "
                    + String.join(", ", header.keySet()) + "); choose one with {textField}");
        }
        this.columns = header.size();
        this.textColumn = header.get(settings.textField());
        this.idColumn = header.get(settings.idField());
        this.labelColumn = header.get(settings.labelField());
        this.lineAfterPrevious = parser.getCurrentLineNumber();
        this.records = parser.iterator();
        decoded.allowAtMost(RECORD_ALLOWANCE);
    }

    /** Skips a UTF-8 byte-order mark; returns the number of bytes skipped. */
    private int skipByteOrderMark(InputStream in) throws IOException {
        in.mark(4);
        byte[] head = in.readNBytes(4);
        in.reset();
        try {
            Utf8.refuseOtherEncodings(head, head.length, file);
        } catch (TelltaleException e) {
            in.close();
            throw e;
        }
        int bom = Utf8.bomLength(head, head.length);
        in.skipNBytes(bom);
        return bom;
    }

    @Override
    Document readNext() {
        while (true) {
            CSVRecord record;
            try {
                if (!records.hasNext()) {
                    return null;
                }
                record = records.next();
            } catch (UncheckedIOException e) {
                String where = file + ":" + (lineAfterPrevious + 1);
                if (e.getCause() instanceof StrictUtf8Reader.RecordTooLongException) {
                    throw new TelltaleException(where + ": a CSV record longer than " + Corpora.MAX_RECORD_BYTES
                            + " characters (an unclosed quote?); reading cannot resume after it");
                }
                if (e.getCause() instanceof CharacterCodingException) {
                    throw new TelltaleException(where + ": invalid UTF-8 at byte " + decoded.badByte()
                            + " of the file (Telltale reads UTF-8 only; CSV reading cannot resume after it)");
                }
                if (!(e.getCause() instanceof org.apache.commons.csv.CSVException)) {
                    throw new TelltaleException("cannot read " + file + " near line " + (lineAfterPrevious + 1) + ": " + e.getMessage(), e);
                }
                throw new TelltaleException(where + ": broken CSV quoting: " + e.getCause().getMessage()
                        + " (RFC 4180: a quoted field ends with a quote followed by a comma or a line end; quotes inside are doubled)");
            }
            decoded.allowAtMost(RECORD_ALLOWANCE);
            long firstLine = lineAfterPrevious + 1;
            lineAfterPrevious = parser.getCurrentLineNumber();
            if (record.size() == 1 && columns > 1 && record.get(0).isEmpty()) {
                continue; // a blank line holds no record
            }
            rows++;
            String place = file + ":" + firstLine;
            String id = cell(record, idColumn);
            if (id != null && id.isEmpty()) {
                id = null;
            }
            String where = id == null ? place : place + " (id '" + id + "')";
            String text = cell(record, textColumn);
            if (text == null) {
                throw new BadRecord(SkipReason.MISSING_TEXT, where + ": the row has " + record.size()
                        + " fields and none for column '" + settings.textField() + "'");
            }
            String label = cell(record, labelColumn);
            if (label != null && label.isEmpty()) {
                label = null;
            }
            return new Document(id == null ? "row-" + rows : id, text, label, place, firstLine);
        }
    }

    private static String cell(CSVRecord record, Integer column) {
        return column == null || column >= record.size() ? null : record.get(column);
    }

    @Override
    public void close() {
        try {
            parser.close();
        } catch (IOException e) {
            // Nothing is written; a failed close of an input file loses nothing.
        }
    }
}
