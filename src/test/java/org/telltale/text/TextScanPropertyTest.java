package org.telltale.text;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.BitSet;
import java.util.List;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * The analyzers, units and masking over long hostile runs (jqwik; a failure prints the seed).
 * Each runs on a small stack, and the word after the run must still be found and cut exactly, so
 * a scanner that overflows, gives up or loses its place fails; how the time grows is measured by
 * {@code ScanningBenchmark}, not here.
 */
class TextScanPropertyTest {
    @Provide
    Arbitrary<String> runs() {
        return LongRuns.runs();
    }

    @Provide
    Arbitrary<String> analyzers() {
        return Arbitraries.of("standard", "english", "whitespace");
    }

    @Property(tries = 40)
    void theWordAfterALongRunIsAUnitAndCutsCleanly(@ForAll("runs") String run, @ForAll("analyzers") String spec) {
        String text = run + " refund\n";
        String masked = LongRuns.onSmallStack(() -> {
            TermIndex index = TermIndex.of(text, Analyzers.byName(spec), UnitKind.WORD);
            BitSet removed = new BitSet();
            List<Unit> units = index.units();
            for (int u = 0; u < units.size(); u++) {
                if (units.get(u).term().equals("refund")) {
                    removed.set(u);
                }
            }
            return Masker.cutting().mask(index, removed);
        });
        assertEquals(run + " \n", masked, "cutting 'refund' after a run of " + run.length() + " characters");
    }

    @Property(tries = 20)
    void everyNonBlankLineAroundLongRunsIsAUnit(@ForAll("runs") String run) {
        String text = run + "\n" + run + "\nlast line";
        int lines = LongRuns.onSmallStack(() -> TermIndex.of(text, Analyzers.standard(), UnitKind.LINE).totalUnits());
        assertEquals(run.isBlank() ? 1 : 3, lines, "one unit per non-blank line");
    }
}
