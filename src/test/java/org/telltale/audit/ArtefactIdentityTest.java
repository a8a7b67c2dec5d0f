package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.junit.jupiter.api.Test;

class ArtefactIdentityTest {
    @Test
    void theFingerprintIsTheSha256OfTheCanonicalText() {
        // FIPS 180-2, Appendix B.1: SHA-256("abc").
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", ArtefactIdentity.sha256("abc"));
        ArtefactIdentity id = ArtefactIdentity.of(ArtefactKind.HEADER, "access", "X-Intake-Route: ACC7");
        assertEquals("header\naccess\nx-intake-route: acc7", id.canonical());
        assertEquals(ArtefactIdentity.sha256(id.canonical()), id.fingerprint());
        assertEquals(64, id.fingerprint().length());
    }

    @Test
    void casingWidthAndWhiteSpaceDoNotChangeTheIdentityButKindAndLabelDo() {
        // Unicode NFKC folds the fullwidth forms (U+FF21…) to ASCII; Locale.ROOT keeps the dotted I an i.
        ArtefactIdentity plain = ArtefactIdentity.of(ArtefactKind.BOILERPLATE, "moving", "Exported by Casefile Archive");
        assertEquals(plain, ArtefactIdentity.of(ArtefactKind.BOILERPLATE, "moving", "  EXPORTED  by\tCasefile \u00a0Archive "));
        assertEquals(plain.fingerprint(),
                ArtefactIdentity.of(ArtefactKind.BOILERPLATE, "moving", "\uff25xported by Casefile Archive").fingerprint());
        assertNotEquals(plain.fingerprint(), ArtefactIdentity.of(ArtefactKind.HEADER, "moving", "Exported by Casefile Archive").fingerprint());
        assertNotEquals(plain.fingerprint(), ArtefactIdentity.of(ArtefactKind.BOILERPLATE, "billing", "Exported by Casefile Archive").fingerprint());
        assertEquals("id", ArtefactIdentity.normalise("ID"));
    }

    @Test
    void theIdIsTheKindAndTheFirstTwelveHexDigitsOfTheFingerprint() {
        // docs/audit.md, "Artefacts": an id is the kind and the first 12 hex digits of the fingerprint.
        ArtefactIdentity id = ArtefactIdentity.of(ArtefactKind.ADDRESS, "billing", "ledgerline.example");
        assertEquals("address-" + id.fingerprint().substring(0, 12), id.id());
    }
}
