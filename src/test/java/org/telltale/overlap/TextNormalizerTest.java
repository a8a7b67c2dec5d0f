package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.junit.jupiter.api.Test;

class TextNormalizerTest {

    @Test
    void appliesNfkcCompatibilityMappings() {
        // Unicode Standard Annex #15, compatibility decomposition: the ligature U+FB01 is "fi",
        // full-width Latin letters are their ASCII forms, NO-BREAK SPACE is a space.
        assertEquals("file", TextNormalizer.forExact("\uFB01le"));
        assertEquals("abc", TextNormalizer.forExact("\uFF21\uFF22\uFF23"));
        assertEquals("new order", TextNormalizer.forExact("new\u00A0order"));
    }

    @Test
    void foldsCaseWithoutTheDefaultLocale() {
        // Unicode case folding (CaseFolding.txt): ß folds like "ss"; with Locale.ROOT "I" is "i"
        // even though the tests run under a Turkish default locale.
        assertEquals(TextNormalizer.forExact("STRASSE"), TextNormalizer.forExact("straße"));
        assertEquals("invoice id", TextNormalizer.forExact("INVOICE ID"));
    }

    @Test
    void dropsReplyQuotingAndCollapsesWhitespace() {
        // common practice: e-mail clients quote with '>' at the line start (RFC 3676 §4.5).
        assertEquals("my parcel never arrived. please help.",
                TextNormalizer.forExact(">  My parcel never\n> > arrived.\t\n>\n>   Please   help.  "));
        assertEquals("a > b", TextNormalizer.forExact("a > b"));
    }

    @Test
    void keepsParagraphBreaksOnlyForShingling() {
        assertEquals("first part\nsecond part", TextNormalizer.forShingles("First part\r\n\r\n  Second part"));
        assertEquals("first part\nsecond part", TextNormalizer.forShingles("First part\n>\n> Second part"));
        assertEquals("first part second part", TextNormalizer.forExact("First part\n\nSecond part"));
        assertNotEquals(TextNormalizer.forExact("one two"), TextNormalizer.forExact("one, two"));
    }

    @Test
    void foldingAgreesWithTheJdkNormalizerOnRandomText() {
        // Reference: java.text.Normalizer (the JDK's implementation of UAX #15) followed by
        // upper- and lower-casing in the root locale; the ASCII shortcut must not change a thing.
        java.util.Random random = new java.util.Random(3);
        String alphabet = "aZ09 .,;!?>\t\n-_'\"ÀéßİıﬁＡ①\u00A0\u2028ǅΣς";
        for (int trial = 0; trial < 2000; trial++) {
            StringBuilder text = new StringBuilder();
            int n = random.nextInt(40);
            boolean ascii = random.nextBoolean();
            for (int i = 0; i < n; i++) {
                text.append(ascii ? (char) (32 + random.nextInt(95)) : alphabet.charAt(random.nextInt(alphabet.length())));
            }
            String expected = java.text.Normalizer.normalize(text, java.text.Normalizer.Form.NFKC)
                    .toUpperCase(java.util.Locale.ROOT).toLowerCase(java.util.Locale.ROOT);
            assertEquals(expected, TextNormalizer.fold(text.toString()), "trial " + trial + ": " + text);
        }
    }
}
