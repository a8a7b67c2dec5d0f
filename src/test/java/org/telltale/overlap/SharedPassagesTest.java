package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import org.junit.jupiter.api.Test;

class SharedPassagesTest {

    private static List<String> marked(String text, String other, int size) {
        return SharedPassages.in(text, other, size).stream().map(s -> text.substring(s.start(), s.end())).toList();
    }

    @Test
    void marksTheWordsOfSharedShinglesInTheOriginalText() {
        // Worked example by hand: with 3-word shingles, "my parcel never arrived" shares
        // "parcel never arrived"; "in time" is only in the first text.
        String a = "Hello, my parcel never arrived in time.";
        String b = "Sadly the parcel never arrived.";
        assertEquals(List.of("parcel never arrived"), marked(a, b, 3));
        assertEquals(List.of("parcel never arrived"), marked(b, a, 3));
    }

    @Test
    void followsQuotingAndRecasingWithOriginalOffsets() {
        String original = "The ramp to deck four was blocked. Nobody came to help my father.";
        String quoted = "On Monday the passenger wrote:\n> THE RAMP to deck four was blocked.\n> Nobody came to help\n> my father.";
        assertEquals(List.of("THE RAMP to deck four was blocked", "Nobody came to help\n> my father"),
                marked(quoted, original, 5));
    }

    @Test
    void marksNothingInUnrelatedTexts() {
        assertEquals(List.of(), marked("Cabin heating failed overnight.", "Where is my lost umbrella?", 2));
    }
}
