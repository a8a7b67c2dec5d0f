package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.telltale.UnknownKeyException;

/** The closed sets a scrub row and the summary carry: mode, scope and association basis. */
class ScrubRowKeysTest {
    @Test
    void everyModeScopeAndBasisReadsBackByItsKey() {
        for (ScrubMode mode : ScrubMode.values()) {
            assertEquals(mode, ScrubMode.fromKey(mode.key()));
        }
        for (ScrubScope scope : ScrubScope.values()) {
            assertEquals(scope, ScrubScope.fromKey(scope.key()));
        }
        for (AssociationBasis basis : AssociationBasis.values()) {
            assertEquals(basis, AssociationBasis.fromKey(basis.key()));
        }
    }

    @Test
    void eachKindIsCutInItsOwnMode() {
        // docs/audit.md, "Scrub test": header fields and repeated lines go whole, addresses and
        // identifiers match by match, content term by term.
        assertEquals(ScrubMode.LINES, ScrubMode.of(ArtefactKind.HEADER));
        assertEquals(ScrubMode.LINES, ScrubMode.of(ArtefactKind.BOILERPLATE));
        assertEquals(ScrubMode.MATCHES, ScrubMode.of(ArtefactKind.ADDRESS));
        assertEquals(ScrubMode.MATCHES, ScrubMode.of(ArtefactKind.IDENTIFIER));
        assertEquals(ScrubMode.TERMS, ScrubMode.of(ArtefactKind.CONTENT));
    }

    @Test
    void anUnknownScopeListsTheScopes() {
        UnknownKeyException e = assertThrows(UnknownKeyException.class, () -> ScrubScope.fromKey("sample"));
        assertEquals("unknown scrub scope 'sample'; one of: explained, corpus", e.getMessage());
    }
}
