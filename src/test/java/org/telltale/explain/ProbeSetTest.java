package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.BitSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.telltale.text.Analyzers;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;
import org.telltale.text.UnitKind;

class ProbeSetTest {
    private static final String TEXT = "invoice charged twice refund please";

    @Test
    void aLongRoundIsSentInCallsThatFitTheCharacterBudgetWithTheSameScores() {
        TermIndex index = TermIndex.of(TEXT, Analyzers.standard(), UnitKind.WORD);
        List<BitSet> masks = ProbeSampler.draw(index.size(), 40, new ProbeRandom(3));
        FunctionClassifier oneCall = new FunctionClassifier(w -> w.size() / 10.0);
        ProbeSet whole = new ProbeSet("d", index, Masker.cutting(), oneCall);
        whole.add(masks);
        FunctionClassifier small = new FunctionClassifier(w -> w.size() / 10.0);
        ProbeSet chunked = new ProbeSet("d", index, Masker.cutting(), small, 3L * TEXT.length());
        chunked.add(masks);
        assertEquals(1, oneCall.calls.get());
        int distinct = whole.calls();
        assertEquals((distinct + 2) / 3, small.calls.get()); // three texts per call
        assertArrayEquals(whole.column(0), chunked.column(0), 0);
        assertEquals(distinct, chunked.calls());
    }

    @Test
    void masksSeenInAnEarlierRoundAreNotSentAgain() {
        TermIndex index = TermIndex.of(TEXT, Analyzers.standard(), UnitKind.WORD);
        FunctionClassifier model = new FunctionClassifier(w -> w.contains("refund") ? 0.9 : 0.1);
        ProbeSet probes = new ProbeSet("d", index, Masker.cutting(), model);
        BitSet a = new BitSet();
        a.set(3);
        probes.add(List.of(new BitSet(), a));
        probes.add(List.of((BitSet) a.clone(), new BitSet()));
        assertEquals(2, model.seen.size());
        assertEquals(4, probes.size());
        assertArrayEquals(new double[] {0.9, 0.1, 0.1, 0.9}, probes.column(0), 0);
    }
}
