package org.telltale.overlap;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.telltale.text.LongRuns;

/**
 * The overlap normaliser and shingler over long hostile runs (jqwik; a failure prints the seed):
 * on a small stack, and the words after the run must come out normalised.
 */
class NormalizerScanPropertyTest {
    @Provide
    Arbitrary<String> runs() {
        return LongRuns.runs();
    }

    @Property(tries = 40)
    void theWordsAfterALongRunAreNormalised(@ForAll("runs") String run) {
        String normalised = LongRuns.onSmallStack(() -> TextNormalizer.forExact(run + "\n>  Meter  FAULT"));
        assertEquals(true, normalised.endsWith("meter fault"), "normalised text ends " + tail(normalised));
    }

    @Property(tries = 20)
    void aLongRunAndTheSameRunFollowedByASentenceShareShingles(@ForAll("runs") String run) {
        Shingler shingler = new Shingler(3);
        double similarity = LongRuns.onSmallStack(
                () -> Shingler.jaccard(shingler.shingles(run + ". The meter hums."), shingler.shingles(run + ". The meter hums.")));
        assertEquals(1.0, similarity, "a text is its own near-duplicate");
    }

    private static String tail(String s) {
        return "'" + s.substring(Math.max(0, s.length() - 20)) + "'";
    }
}
