package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.telltale.UnknownKeyException;

class CorpusFormatTest {
    @Test
    void aFormatReadsInAnyCase() {
        assertEquals(CorpusFormat.CSV, CorpusFormat.fromKey("CSV"));
    }

    @Test
    void anUnknownNameListsTheFormats() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> CorpusFormat.fromKey("xml"));
        assertEquals("unknown corpus format 'xml'; one of: jsonl, csv, folder", e.getMessage());
    }
}
