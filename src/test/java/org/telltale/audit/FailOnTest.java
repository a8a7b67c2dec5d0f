package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.telltale.UnknownKeyException;

class FailOnTest {
    @Test
    void everyGateReadsBackByItsKey() {
        for (FailOn gate : FailOn.values()) {
            assertEquals(gate, FailOn.fromKey(gate.key()));
        }
    }

    @Test
    void eachLevelGatesAtItsOwnSeverity() {
        // docs/audit.md: exit 3 when open artefacts at or above LEVEL remain.
        assertEquals(Severity.HIGH, FailOn.HIGH.least());
        assertEquals(Severity.MEDIUM, FailOn.MEDIUM.least());
        assertEquals(Severity.LOW, FailOn.LOW.least());
    }

    @Test
    void neverGatesNothing() {
        assertNull(FailOn.NEVER.least());
    }

    @Test
    void anUnknownLevelListsTheGates() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> FailOn.fromKey("sometimes"));
        assertEquals("unknown gate 'sometimes'; one of: high, medium, low, never", e.getMessage());
    }
}
