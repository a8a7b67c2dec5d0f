package org.telltale;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.Locale;
import org.junit.jupiter.api.Test;

class EnumKeysTest {
    private enum Tide {
        HIGH, SLACK, LOW;

        String key() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    @Test
    void aKnownKeyGivesItsValue() {
        assertEquals(Tide.SLACK, EnumKeys.parse("tide", "slack", Tide.values(), Tide::key));
    }

    @Test
    void anUnknownKeyListsTheAcceptedOnesInOrder() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class,
                () -> EnumKeys.parse("tide", "ebb", Tide.values(), Tide::key));
        assertEquals("unknown tide 'ebb'; one of: high, slack, low", e.getMessage());
    }

    @Test
    void keysAreMatchedExactly() {
        assertThrows(UnknownKeyException.class, () -> EnumKeys.parse("tide", "High", Tide.values(), Tide::key));
    }

    @Test
    void aMissingKeyIsUnknownToo() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class,
                () -> EnumKeys.parse("tide", null, Tide.values(), Tide::key));
        assertEquals("unknown tide 'null'; one of: high, slack, low", e.getMessage());
    }
}
