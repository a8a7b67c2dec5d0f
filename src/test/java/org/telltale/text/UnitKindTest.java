package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.telltale.UnknownKeyException;

class UnitKindTest {
    @Test
    void everyUnitReadsBackByItsKey() {
        for (UnitKind kind : UnitKind.values()) {
            assertEquals(kind, UnitKind.fromKey(kind.key()));
        }
    }

    @Test
    void anUnknownNameListsTheUnits() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> UnitKind.fromKey("words"));
        assertEquals("unknown unit 'words'; one of: word, occurrence, line", e.getMessage());
    }
}
