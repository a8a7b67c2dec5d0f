package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.BitSet;
import java.util.List;
import org.junit.jupiter.api.Test;

class MaskerTest {

    @Test
    void removingAWordUnitCutsEveryOccurrenceAndKeepsTheRestByteForByte() {
        TermIndex index = TermIndex.of("Refund the order, then refund  it.", Analyzers.standard(), UnitKind.WORD);
        assertEquals(List.of("refund", "the", "order", "then", "it"), index.units().stream().map(Unit::term).toList());
        BitSet removed = new BitSet();
        removed.set(0);
        assertEquals(" the order, then   it.", Masker.cutting().mask(index, removed));
        assertEquals("[] the order, then []  it.", new Masker("[]").mask(index, removed));
    }

    @Test
    void lineUnitsSkipBlankLinesAndKeepTerminators() {
        TermIndex index = TermIndex.of("From: a@b.example\r\n\r\n  Hello\rBye", Analyzers.standard(), UnitKind.LINE);
        assertEquals(List.of("From: a@b.example", "Hello", "Bye"), index.units().stream().map(Unit::term).toList());
        BitSet removed = new BitSet();
        removed.set(0);
        assertEquals("\r\n\r\n  Hello\rBye", Masker.cutting().mask(index, removed));
    }

    @Test
    void thePresenceVectorPathGivesTheSameTextAsTheBitSetPath() {
        TermIndex index = TermIndex.of("Dear team, the invoice for the team is late.", Analyzers.standard(), UnitKind.WORD);
        boolean[] present = new boolean[index.size()];
        java.util.Arrays.fill(present, true);
        assertEquals(index.text(), new Masker("_").mask(index, present));
        BitSet removed = new BitSet();
        for (int u : new int[] {1, 2, 4}) {
            removed.set(u);
            present[u] = false;
        }
        assertEquals("Dear _, _ invoice _ _ _ is late.", new Masker("_").mask(index, present));
        assertEquals(new Masker("_").mask(index, removed), new Masker("_").mask(index, present));
    }

    @Test
    void surrogatePairsAndCombiningMarksAreCutWhole() {
        TermIndex index = TermIndex.of("cafe\u0301 \uD83D\uDE00 ok", Analyzers.standard(), UnitKind.OCCURRENCE);
        BitSet removed = new BitSet();
        removed.set(0);
        assertEquals(" \uD83D\uDE00 ok", Masker.cutting().mask(index, removed));
    }
}
