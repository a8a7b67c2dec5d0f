package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.BitSet;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.apache.lucene.analysis.Analyzer;

/**
 * Properties of units and masking over generated texts (jqwik; a failure prints the seed that
 * reproduces it). Texts mix words that repeat, punctuation, digits, line ends, CJK, emoji,
 * combining marks and arbitrary code units, so tokenizer edge cases show up.
 */
class TextUnitPropertyTest {
    private static final List<String> ANALYZERS = List.of("standard", "english", "whitespace",
            "custom:tokenizer=standard;filters=lowercase,worddelimitergraph(preserveOriginal=1)",
            "custom:charfilters=htmlstrip;tokenizer=standard;filters=lowercase");

    @Provide
    Arbitrary<String> texts() {
        Arbitrary<String> pieces = Arbitraries.oneOf(
                Arbitraries.of("refund", "Refund", "REFUNDS", "the", "order", "a", "b", "ab", "can't", "U.S.", "3.5", "x-ray",
                        "caf\u00e9", "cafe\u0301", "\u65e5", "\u672c", "\ud83d\ude00", "\ud83c\udde6\ud83c\udde7", "<b>", "</b>",
                        "&amp;", "wi-fi", "e-mail", "billing@example.org", "O'Neil", "\u00ad", "\u200d", "\u0301"),
                Arbitraries.of(" ", "  ", ",", ".", "'", "-", "_", ":", "\n", "\r\n", "\r", "\t", "\u00a0", "\u0000", "\"", "(", ")"),
                Arbitraries.strings().ofMinLength(1).ofMaxLength(3));
        return pieces.list().ofMaxSize(40).map(list -> String.join("", list));
    }

    @Provide
    Arbitrary<String> analyzers() {
        return Arbitraries.of(ANALYZERS);
    }

    @Provide
    Arbitrary<Long> seeds() {
        return Arbitraries.longs();
    }

    private static BitSet randomSubset(int size, long seed) {
        java.util.Random random = new java.util.Random(seed);
        BitSet set = new BitSet();
        for (int u = 0; u < size; u++) {
            if (random.nextBoolean()) {
                set.set(u);
            }
        }
        return set;
    }

    @Property(tries = 300)
    void maskingNothingReturnsTheOriginalExactly(@ForAll("texts") String text, @ForAll("analyzers") String spec,
            @ForAll UnitKind kind) {
        TermIndex index = TermIndex.of(text, Analyzers.byName(spec), kind);
        assertEquals(text, new Masker("[X]").mask(index, new BitSet()));
        boolean[] present = new boolean[index.size()];
        java.util.Arrays.fill(present, true);
        assertEquals(text, new Masker("[X]").mask(index, present));
    }

    @Property(tries = 300)
    void spansLieInBoundsAndNeverOverlap(@ForAll("texts") String text, @ForAll("analyzers") String spec, @ForAll UnitKind kind) {
        TermIndex index = TermIndex.of(text, Analyzers.byName(spec), kind);
        List<Span> all = new ArrayList<>();
        for (Unit unit : index.units()) {
            for (Span span : unit.spans()) {
                assertTrue(span.start() < span.end() && span.end() <= text.length(), span + " in " + text.length());
                all.add(span);
            }
            assertEquals(unit.spans().stream().sorted().toList(), unit.spans(), "spans of a unit are sorted");
        }
        all.sort(null);
        for (int i = 1; i < all.size(); i++) {
            assertTrue(all.get(i - 1).end() <= all.get(i).start(), all.get(i - 1) + " overlaps " + all.get(i));
        }
    }

    @Property(tries = 300)
    void everythingOutsideTheCutSpansStaysAsItWas(@ForAll("texts") String text, @ForAll("analyzers") String spec,
            @ForAll UnitKind kind, @ForAll("seeds") long seed) {
        TermIndex index = TermIndex.of(text, Analyzers.byName(spec), kind);
        BitSet removed = randomSubset(index.size(), seed);
        // Independent reconstruction: mark every removed character, keep the rest in order.
        boolean[] cut = new boolean[text.length()];
        int cuts = 0;
        for (int u = removed.nextSetBit(0); u >= 0; u = removed.nextSetBit(u + 1)) {
            for (Span span : index.units().get(u).spans()) {
                java.util.Arrays.fill(cut, span.start(), span.end(), true);
                cuts++;
            }
        }
        StringBuilder kept = new StringBuilder();
        for (int i = 0; i < text.length(); i++) {
            if (!cut[i]) {
                kept.append(text.charAt(i));
            }
        }
        assertEquals(kept.toString(), Masker.cutting().mask(index, removed));
        String filled = new Masker("\u2588").mask(index, removed);
        assertEquals(kept.length() + cuts, filled.length());
    }

    /**
     * The precondition: a filler that separates tokens (here one space). Cutting with an empty filler can join the pieces around a cut into a removed term
     * ({@link #cuttingWithoutAFillerCanJoinNeighboursIntoARemovedTerm}).
     */
    @Property(tries = 1000)
    void aRemovedWordNeverReappearsWhenTheMaskedTextIsAnalyzedAgain(@ForAll("texts") String text,
            @ForAll("analyzers") String spec, @ForAll("seeds") long seed) {
        Analyzer analyzer = Analyzers.byName(spec);
        TermIndex index = TermIndex.of(text, analyzer, UnitKind.WORD);
        BitSet removed = randomSubset(index.size(), seed);
        String masked = new Masker(" ").mask(index, removed);
        TermIndex again = TermIndex.of(masked, analyzer, UnitKind.WORD);
        for (int u = removed.nextSetBit(0); u >= 0; u = removed.nextSetBit(u + 1)) {
            String term = index.units().get(u).term();
            assertEquals(-1, again.indexOf(term), () -> "'" + term + "' reappears in " + escape(masked) + " from " + escape(text));
        }
    }

    @net.jqwik.api.Example
    void cuttingWithoutAFillerCanJoinNeighboursIntoARemovedTerm() {
        // "a" and "b" touch the ideograph without a separator; cutting it joins them into "ab".
        TermIndex index = TermIndex.of("a\u65e5b ab", Analyzers.standard(), UnitKind.WORD);
        BitSet removed = new BitSet();
        removed.set(index.indexOf("\u65e5"));
        removed.set(index.indexOf("ab"));
        String masked = Masker.cutting().mask(index, removed);
        assertEquals("ab ", masked);
        assertTrue(TermIndex.of(masked, Analyzers.standard(), UnitKind.WORD).indexOf("ab") >= 0);
        assertEquals(-1, TermIndex.of(new Masker(" ").mask(index, removed), Analyzers.standard(), UnitKind.WORD).indexOf("ab"));
    }

    static String escape(String s) {
        StringBuilder out = new StringBuilder("\"");
        s.codePoints().forEach(c -> out.append(c >= 0x20 && c < 0x7f ? Character.toString(c) : String.format(java.util.Locale.ROOT, "\\u%04x", c)));
        return out.append('"').toString();
    }

}
