package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apache.lucene.analysis.CharArraySet;
import org.apache.lucene.analysis.core.WhitespaceAnalyzer;
import org.apache.lucene.analysis.en.EnglishAnalyzer;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.telltale.UsageException;

class AnalyzerSpecTest {
    private static final String SAMPLE = "The customer's REFUNDS were delayed; she called twice, re-opened ticket #4512 "
            + "and wrote to billing@example.org about Jürgen's café orders (see https://help.example.org/a?b=1).";

    @Test
    void standardTokenizerFollowsTheUax29WordBoundaryExample() {
        // UAX #29 (Unicode Text Segmentation), section 4 "Word Boundaries": the example sentence
        // whose words are The, quick, brown, fox, can't, jump, 32.3, feet, right.
        String text = "The quick (\u201Cbrown\u201D) fox can\u2019t jump 32.3 feet, right?";
        assertEquals(List.of("the", "quick", "brown", "fox", "can\u2019t", "jump", "32.3", "feet", "right"),
                Tokens.terms(Analyzers.standard(), text));
        assertEquals("brown@12-17", Tokens.termsWithSpans(Analyzers.standard(), text).get(2));
    }

    @Test
    void englishStemsWithPorter() {
        // Porter (1980), "An algorithm for suffix stripping": caresses -> caress, ponies -> poni,
        // cats -> cat, motoring -> motor, hopping -> hop, relational -> relat,
        // generalization -> gener (from memory of the paper's step examples).
        assertEquals(List.of("caress", "poni", "cat", "motor", "hop", "relat", "gener"),
                Tokens.terms(Analyzers.english(), "caresses ponies cats motoring hopping relational generalization"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"standard", "english", "whitespace"})
    void presetsEqualTheCustomChainsTheyExpandTo(String preset) {
        // Lucene's own StandardAnalyzer, EnglishAnalyzer and WhitespaceAnalyzer are the reference.
        var reference = switch (preset) {
            case "standard" -> new StandardAnalyzer(CharArraySet.EMPTY_SET);
            case "english" -> new EnglishAnalyzer(CharArraySet.EMPTY_SET);
            default -> new WhitespaceAnalyzer();
        };
        AnalyzerSpec expanded = AnalyzerSpec.parse(preset).expanded();
        assertEquals(Tokens.termsWithSpans(reference, SAMPLE), Tokens.termsWithSpans(expanded.build(), SAMPLE));
        assertEquals(Tokens.termsWithSpans(reference, SAMPLE), Tokens.termsWithSpans(Analyzers.byName(preset), SAMPLE));
    }

    @Test
    void presetsKeepStopWords() {
        assertEquals(List.of("this", "is", "not", "a", "refund"), Tokens.terms(Analyzers.standard(), "This is not a refund"));
    }

    @ParameterizedTest
    @ValueSource(strings = {
        "standard",
        "custom:tokenizer=standard;filters=lowercase,porterstem",
        "custom:charfilters=htmlstrip;tokenizer=whitespace;filters=lowercase,length(max=40,min=2)",
        "custom:tokenizer=pattern(pattern=\"[,;]+\")",
        "custom:tokenizer=pattern(pattern=\"say \"\"hi\"\"\")",
    })
    void canonicalFormsReadBackToThemselves(String canonical) {
        AnalyzerSpec spec = AnalyzerSpec.parse(canonical);
        assertEquals(canonical, spec.toString());
        assertEquals(spec, AnalyzerSpec.parse(spec.toString()));
    }

    @Test
    void canonicalFormNormalisesCaseSpacingAndParameterOrder() {
        assertEquals("custom:tokenizer=standard;filters=lowercase,length(max=9,min=2)",
                Analyzers.canonical(" CUSTOM: filters = LowerCase , length( min=2 , max=9 ) ; tokenizer=Standard ; "));
        assertEquals("english", Analyzers.canonical("English"));
    }

    @Test
    void customChainsBuildWithTheirParameters() {
        var analyzer = Analyzers.byName("custom:tokenizer=standard;filters=lowercase,length(min=3,max=5)");
        assertEquals(List.of("the", "order", "late"), Tokens.terms(analyzer, "The order is so late, unbelievably"));
    }

    @Test
    void charFiltersKeepSpansInTheOriginalText() {
        // Lucene's HTMLStripCharFilter maps an offset just after stripped markup to the markup's
        // end, so a word's span widens over a closing tag that follows it (documented in corpora.md).
        var analyzer = Analyzers.byName("custom:charfilters=htmlstrip;tokenizer=standard;filters=lowercase");
        String html = "<b>Refund</b> now";
        assertEquals(List.of("refund@3-13", "now@14-17"), Tokens.termsWithSpans(analyzer, html));
        assertEquals("Refund</b>", html.substring(3, 13));
    }

    @Test
    void errorsNameTheBadPart() {
        assertMessage("unknown key 'filter' (expected tokenizer, charfilters or filters)", "custom:tokenizer=standard;filter=lowercase");
        assertMessage("unknown filter 'porterstemm'", "custom:tokenizer=standard;filters=porterstemm");
        assertMessage("unknown tokenizer 'klingon'", "custom:tokenizer=klingon");
        assertMessage("filter 'length': ", "custom:tokenizer=standard;filters=length(min=2,max=9,maxx=3)");
        assertMessage("maxx", "custom:tokenizer=standard;filters=length(min=2,max=9,maxx=3)");
        assertMessage("no tokenizer", "custom:filters=lowercase");
        assertMessage("exactly one tokenizer allowed, got 2", "custom:tokenizer=standard,whitespace");
        assertMessage("key 'filters' given twice", "custom:tokenizer=standard;filters=lowercase;filters=porterstem");
        assertMessage("unterminated quoted value", "custom:tokenizer=pattern(pattern=\"abc)");
        assertMessage("unknown analyzer 'klingon'", "klingon");
    }

    private static void assertMessage(String expected, String spec) {
        UsageException e = assertThrows(UsageException.class, () -> Analyzers.byName(spec));
        assertTrue(e.getMessage().contains(expected), e.getMessage());
        assertTrue(e.getMessage().contains(spec), e.getMessage());
    }

    @Test
    void specsThatOnceEscapedAsOtherExceptionsAreRefusedAsUsageErrors() throws java.io.IOException {
        List<String> specs;
        try (var in = AnalyzerSpecTest.class.getResourceAsStream("analyzer-specs-refused.txt")) {
            specs = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8).lines()
                    .filter(l -> !l.isBlank() && !l.startsWith("#")).toList();
        }
        assertEquals(8, specs.size());
        for (String spec : specs) {
            UsageException e = assertThrows(UsageException.class, () -> Analyzers.byName(spec), spec);
            assertTrue(e.getMessage().startsWith("analyzer spec '"), e.getMessage());
        }
    }

    @Test
    void aChainFailingOnlyOnSomeTextsGivesAClearErrorNotACrash() {
        // The trial text at build time has no run of five tildes, so the bad group only shows here.
        var analyzer = Analyzers.byName("custom:tokenizer=keyword;filters=patternreplace(pattern=\"~~~~~\",replacement=\"$7\")");
        var e = assertThrows(org.telltale.TelltaleException.class, () -> TermIndex.of("x~~~~~y", analyzer, UnitKind.WORD));
        assertTrue(e.getMessage().startsWith("the analyzer failed on a text of 7 characters"), e.getMessage());
    }
}
