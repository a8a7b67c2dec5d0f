package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.telltale.UnknownKeyException;

class SeverityTest {
    @Test
    void everySeverityReadsBackByItsKey() {
        for (Severity s : Severity.values()) {
            assertEquals(s, Severity.fromKey(s.key()));
        }
    }

    @Test
    void anUnknownNameListsTheSeverities() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> Severity.fromKey("critical"));
        assertEquals("unknown severity 'critical'; one of: high, medium, low", e.getMessage());
    }
}
