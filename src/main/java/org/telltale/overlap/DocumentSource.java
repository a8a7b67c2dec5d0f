package org.telltale.overlap;

import java.util.function.Consumer;
import org.telltale.text.Document;

/**
 * A corpus that can be read more than once, in the same order each time. Overlap detection reads
 * each corpus twice (signatures, then verification of candidates) instead of holding every
 * document's text or shingles in memory.
 */
public interface DocumentSource {
    /** What to call the corpus in messages, e.g. its file name. */
    String name();

    /** Reads the corpus from the start, handing each document to {@code sink} in order. */
    void forEach(Consumer<? super Document> sink);

    /** A source over documents already in memory (tests, small corpora). */
    static DocumentSource of(String name, java.util.List<Document> documents) {
        java.util.List<Document> copy = java.util.List.copyOf(documents);
        return new DocumentSource() {
            @Override
            public String name() {
                return name;
            }

            @Override
            public void forEach(Consumer<? super Document> sink) {
                copy.forEach(sink);
            }
        };
    }
}
