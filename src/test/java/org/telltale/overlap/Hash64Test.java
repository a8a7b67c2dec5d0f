package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class Hash64Test {

    @Test
    void splitMixMatchesThePublishedSequenceForSeed1234567() {
        // Rosetta Code, "Pseudo-random numbers/Splitmix64": the first five outputs for seed 1234567
        // (from memory).
        long[] expected = {
            Long.parseUnsignedLong("6457827717110365317"),
            Long.parseUnsignedLong("3203168211198807973"),
            Long.parseUnsignedLong("9817491932198370423"),
            Long.parseUnsignedLong("4593380528125082431"),
            Long.parseUnsignedLong("16408922859458223821"),
        };
        for (int i = 0; i < expected.length; i++) {
            assertEquals(expected[i], Hash64.splitMix(1234567L, i), "output " + i);
        }
    }

    @Test
    void fnv1aMatchesTheReferenceTestVectors() {
        // FNV-1a 64-bit test vectors of the reference implementation by Landon Curt Noll
        // (from memory): "" is the offset basis.
        assertEquals(0xcbf29ce484222325L, Hash64.fnv1a("", 0, 0));
        assertEquals(0xaf63dc4c8601ec8cL, Hash64.fnv1a("a", 0, 1));
        assertEquals(0x85944171f73967e8L, Hash64.fnv1a("foobar", 0, 6));
    }

    @Test
    void exactKeyTreatsNewlineAsSpaceAndSeparatesOtherTexts() {
        // common practice: the key of the paragraph-keeping form equals that of the flat form.
        assertEquals(java.util.Arrays.toString(Hash64.exactKey("a b\nc")),
                java.util.Arrays.toString(Hash64.exactKey("a b c")));
        long[] one = Hash64.exactKey("refund for order 1");
        long[] two = Hash64.exactKey("refund for order 2");
        org.junit.jupiter.api.Assertions.assertNotEquals(one[0], two[0]);
        org.junit.jupiter.api.Assertions.assertNotEquals(one[1], two[1]);
    }
}
