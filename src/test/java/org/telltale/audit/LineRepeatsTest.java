package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

class LineRepeatsTest {
    private static List<String> documents() {
        List<String> docs = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            StringBuilder text = new StringBuilder("Ticket about crossing number " + i + " and its cabin\n");
            if (i % 4 == 0) {
                text.append("  Sent from the Harbourline help desk app  \n");
            }
            if (i % 10 == 0) {
                text.append("Sent from the Harbourline help desk app\nSent from the Harbourline help desk app\n");
            }
            text.append("Thanks,\n");
            docs.add(text.toString());
        }
        return docs;
    }

    @Test
    void countsReducedFromPerDocumentKeysDecideBoilerplateAsTheStreamingTableDoes() {
        // Common practice: counting by key (a word count) gives the same totals in any grouping.
        LineRepeats streamed = new LineRepeats(1000);
        Map<Long, Integer> reduced = new HashMap<>();
        for (String doc : documents()) {
            streamed.add(doc);
            for (long key : LineRepeats.lineKeys(doc)) {
                reduced.merge(key, 1, Integer::sum);
            }
        }
        LineRepeats fromCounts = LineRepeats.ofCounts(reduced, 40);
        String footer = "Sent from the Harbourline help desk app";
        // Documents 0, 4, …, 36 (10 of them) and 10 and 30 carry the footer: 12, each counted once
        // however often the footer repeats in it.
        assertEquals(12, streamed.count(footer));
        assertEquals(12, fromCounts.count(footer));
        assertEquals(3, LineRepeats.minRepeats(40));
        assertTrue(fromCounts.isBoilerplate("   " + footer));
        assertTrue(streamed.isBoilerplate(footer));
        String unique = "Ticket about crossing number 7 and its cabin";
        assertEquals(1, fromCounts.count(unique));
        assertFalse(fromCounts.isBoilerplate(unique));
        // Short lines never count: "Thanks," is in every document.
        assertEquals(0, fromCounts.count("Thanks,"));
        assertEquals(streamed.documents(), fromCounts.documents());
    }
}
