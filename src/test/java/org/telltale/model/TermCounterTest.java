package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.telltale.TelltaleException;

class TermCounterTest {
    @Test
    void bigramsJoinAdjacentTermsWithOneSpace() {
        try (TermCounter counter = new TermCounter("standard", 2)) {
            // Lower-cased UAX #29 words (Lucene StandardAnalyzer), then adjacent pairs (common practice).
            Map<String, Integer> counts = counter.count("Late delivery, late DELIVERY again");
            assertEquals(Map.of("late", 2, "delivery", 2, "late delivery", 2, "delivery late", 1,
                    "again", 1, "delivery again", 1), counts);
        }
    }

    @Test
    void unigramsOnlyWithOneGram() {
        try (TermCounter counter = new TermCounter("whitespace", 1)) {
            assertEquals(List.of("Ticket", "T-1041:", "ticket"), counter.terms("Ticket T-1041: ticket"));
            assertEquals(Map.of("Ticket", 1, "T-1041:", 1, "ticket", 1), counter.count("Ticket T-1041: ticket"));
        }
    }

    @Test
    void vocabularyIgnoresUnknownTermsAndSortsColumns() {
        Vocabulary v = Vocabulary.sortedOf(List.of("zebra", "apple", "mango"));
        assertEquals(List.of("apple", "mango", "zebra"), v.terms());
        SparseCounts row = v.vectorize(Map.of("zebra", 3, "kiwi", 9, "apple", 1));
        assertEquals(2, row.nonZeros());
        assertEquals(0, row.columns()[0]);
        assertEquals(1.0, row.values()[0]);
        assertEquals(2, row.columns()[1]);
        assertEquals(3.0, row.values()[1]);
        assertThrows(IllegalArgumentException.class, () -> new Vocabulary(List.of("a", "a")));
    }

    @Test
    void badSettingsAreClearErrors() {
        assertThrows(TelltaleException.class, () -> new TermCounter("standard", 3));
        assertThrows(TelltaleException.class, () -> new TermCounter("no-such-analyzer", 1));
    }
}
