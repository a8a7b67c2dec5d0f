package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.telltale.UnknownKeyException;

class ArtefactKindTest {
    @Test
    void everyKindReadsBackByItsKey() {
        for (ArtefactKind kind : ArtefactKind.values()) {
            assertEquals(kind, ArtefactKind.fromKey(kind.key()));
        }
    }

    @Test
    void anUnknownNameListsTheKinds() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> ArtefactKind.fromKey("headline"));
        assertEquals("unknown kind 'headline'; one of: header, address, identifier, boilerplate, content", e.getMessage());
    }
}
