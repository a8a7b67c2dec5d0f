package org.telltale.text;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Objects;
import java.util.Set;

/**
 * Finds where a few documents sit in their corpus: the file that holds each record and the line
 * where the record begins, for outputs that point a reader at the source (SARIF locations). One
 * streaming pass; memory holds only the places asked for.
 */
public final class RecordPlaces {
    /**
     * Where one document's record is.
     *
     * @param file the corpus file for JSON Lines and CSV, the document's own file for a label folder
     * @param line the line where the record begins (1-based), or 0 for a whole-file document
     */
    public record Place(Path file, long line) {
        public Place {
            Objects.requireNonNull(file, "file");
        }
    }

    private RecordPlaces() {
    }

    /** The places of the documents in {@code ids} that {@code reader} yields; reads it to the end or until all are found. */
    public static Map<String, Place> find(CorpusReader reader, Set<String> ids) {
        Map<String, Place> out = new HashMap<>();
        while (out.size() < ids.size() && reader.hasNext()) {
            Document d = reader.next();
            if (ids.contains(d.id()) && !out.containsKey(d.id())) {
                Path file = d.line() > 0 || d.origin() == null ? reader.path() : Path.of(d.origin());
                out.put(d.id(), new Place(file, d.line()));
            }
        }
        return out;
    }
}
