package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.BitSet;
import java.util.List;
import org.junit.jupiter.api.Test;

class TermIndexTest {

    private static List<String> terms(TermIndex index) {
        return index.units().stream().map(Unit::term).toList();
    }

    @Test
    void wordUnitsGatherEveryOccurrenceInOrderOfFirstAppearance() {
        TermIndex index = TermIndex.of("Refund, refund and REFUND the order", Analyzers.standard(), UnitKind.WORD);
        assertEquals(List.of("refund", "and", "the", "order"), terms(index));
        assertEquals(List.of(new Span(0, 6), new Span(8, 14), new Span(19, 25)), index.units().get(0).spans());
        assertEquals(0, index.indexOf("refund"));
        assertEquals(3, index.indexOf("order"));
        assertEquals(-1, index.indexOf("invoice"));
        assertEquals("", index.note());
    }

    @Test
    void occurrenceUnitsAreOnePerToken() {
        TermIndex index = TermIndex.of("no no no", Analyzers.standard(), UnitKind.OCCURRENCE);
        assertEquals(List.of("no", "no", "no"), terms(index));
        assertEquals(new Span(3, 5), index.units().get(1).spans().get(0));
    }

    @Test
    void aCapKeepsTheMostFrequentWordsInFirstAppearanceOrderAndSaysSo() {
        TermIndex index = TermIndex.of("a b c b c c d", Analyzers.standard(), UnitKind.WORD, 2);
        assertEquals(List.of("b", "c"), terms(index));
        assertEquals(4, index.totalUnits());
        assertEquals(2, index.leftOut());
        assertEquals("kept 2 of 4 word units (the most frequent); the other 2 stay in every probe", index.note());
        BitSet removed = new BitSet();
        removed.set(1);
        assertEquals("a b  b   d", Masker.cutting().mask(index, removed));
    }

    @Test
    void aCapOnFrequencyTiesKeepsTheEarlierTerms() {
        TermIndex index = TermIndex.of("x y z", Analyzers.standard(), UnitKind.WORD).limit(2);
        assertEquals(List.of("x", "y"), terms(index));
    }

    @Test
    void aCapOnLinesKeepsTheFirstLines() {
        TermIndex index = TermIndex.of("one\ntwo\nthree", Analyzers.standard(), UnitKind.LINE, 2);
        assertEquals(List.of("one", "two"), terms(index));
        assertTrue(index.note().startsWith("kept 2 of 3 line units (the first)"), index.note());
    }

    @Test
    void overlappingTokensAreFoldedIntoTheFirstSoSpansNeverOverlap() {
        // Word-delimiter with preserveOriginal emits "wi-fi" and then "wi" and "fi" over the same text.
        var analyzer = Analyzers.byName("custom:tokenizer=whitespace;filters=worddelimitergraph(preserveOriginal=1),lowercase");
        TermIndex index = TermIndex.of("wi-fi down", analyzer, UnitKind.WORD);
        List<Span> all = index.units().stream().flatMap(u -> u.spans().stream()).sorted().toList();
        for (int i = 1; i < all.size(); i++) {
            assertFalse(all.get(i - 1).overlaps(all.get(i)), all.toString());
        }
        assertEquals("down", terms(index).get(terms(index).size() - 1));
        assertTrue(index.note().contains("folded"), index.note());
    }

    @Test
    void aMegabyteDocumentWithFiftyThousandDistinctTermsIsCappedCheaply() {
        // Hostile input (issue 8): 1 MB of text holding 50,000 distinct terms.
        StringBuilder text = new StringBuilder();
        for (int i = 0; text.length() < 1_000_000; i++) {
            text.append("term").append(Integer.toString(i % 50_000, 36)).append(i % 7 == 0 ? "\n" : " ");
        }
        TermIndex full = TermIndex.of(text.toString(), Analyzers.standard(), UnitKind.WORD);
        assertEquals(50_000, full.size());
        TermIndex capped = TermIndex.of(text.toString(), Analyzers.standard(), UnitKind.WORD, 1000);
        assertEquals(1000, capped.size());
        assertEquals(49_000, capped.leftOut());
        BitSet none = new BitSet();
        assertEquals(text.toString(), Masker.cutting().mask(capped, none));
        BitSet all = new BitSet();
        all.set(0, capped.size());
        String masked = Masker.cutting().mask(capped, all);
        TermIndex again = TermIndex.of(masked, Analyzers.standard(), UnitKind.WORD);
        assertEquals(49_000, again.size());
        for (Unit unit : capped.units()) {
            assertEquals(-1, again.indexOf(unit.term()), unit.term());
        }
    }
}
