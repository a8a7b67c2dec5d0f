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
}
