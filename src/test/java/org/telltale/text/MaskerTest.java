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
}
