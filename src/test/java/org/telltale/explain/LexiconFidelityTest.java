package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

/**
 * Fidelity against a published lexicon, AFINN-111 (Nielsen 2011; see {@link LexiconCheck}): at
 * the default budget the top-10 terms of invented reviews are lexicon words, with the valence's
 * sign, in the valence's order — under either sampling of the removed count.
 */
class LexiconFidelityTest {

    @ParameterizedTest
    @EnumSource(Sampling.class)
    void topTermsAreLexiconWordsWithTheirSignsAndOrderAtTheDefaultBudget(Sampling sampling) throws IOException {
        LexiconCheck.Result r = LexiconCheck.measure(ExplainSettings.defaults().withSampling(sampling));
        System.out.println("AFINN-111 fidelity, sampling " + sampling.key() + ": " + r);
        assertEquals(80, r.top(), "each review must give ten terms");
        assertTrue(r.precision() >= 0.95, r.toString());
        assertTrue(r.signs() >= 0.98, r.toString());
        assertTrue(r.meanRank() >= 0.9, r.toString());
    }
}
