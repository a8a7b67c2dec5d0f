package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;

class ExactSumTest {
    @Test
    void tenTenthsSumToOneWhereNaiveAdditionFallsShort() {
        // Python's documentation of math.fsum: sum([.1] * 10) gives 0.9999999999999999, fsum gives 1.0.
        double naive = 0;
        ExactSum exact = ExactSum.ZERO;
        for (int i = 0; i < 10; i++) {
            naive += 0.1;
            exact = exact.plus(0.1);
        }
        assertEquals(0.9999999999999999, naive);
        assertEquals(1.0, exact.value());
    }

    @Test
    void orderAndGroupingDoNotChangeTheTotal() {
        // Cancellation that naive addition gets wrong in one order and right in another (common practice):
        // the exact total 1 + 0.1 rounds to 1.1.
        List<Double> terms = new ArrayList<>(List.of(1e100, 1.0, -1e100, 0.1, 3e-20, -3e-20));
        long seed = 20261202L;
        Random random = new Random(seed);
        ExactSum reference = sum(terms);
        assertEquals(1.1, reference.value());
        for (int round = 0; round < 50; round++) {
            Collections.shuffle(terms, random);
            int cut = random.nextInt(terms.size() + 1);
            ExactSum merged = sum(terms.subList(0, cut)).plus(sum(terms.subList(cut, terms.size())));
            assertEquals(reference, merged, "seed " + seed + ", round " + round + ": " + terms);
            assertEquals(reference.hashCode(), merged.hashCode(), "seed " + seed + ", round " + round);
        }
    }

    @Test
    void oppositeInfinitiesGiveNaNInEitherOrder() {
        ExactSum a = ExactSum.ZERO.plus(Double.POSITIVE_INFINITY).plus(2.0).plus(Double.NEGATIVE_INFINITY);
        ExactSum b = ExactSum.ZERO.plus(Double.NEGATIVE_INFINITY).plus(ExactSum.ZERO.plus(Double.POSITIVE_INFINITY));
        assertTrue(Double.isNaN(a.value()), a.toString());
        assertEquals(a, b);
    }

    @Test
    void oneInfinityStaysInfinite() {
        assertEquals(Double.POSITIVE_INFINITY, ExactSum.ZERO.plus(1.0).plus(Double.POSITIVE_INFINITY).value());
    }

    @Test
    void sumsAreValues() {
        assertEquals(ExactSum.ZERO.plus(0.5), ExactSum.ZERO.plus(0.25).plus(0.25));
        assertNotEquals(ExactSum.ZERO.plus(0.5), ExactSum.ZERO.plus(0.25));
        assertEquals("0.5", ExactSum.ZERO.plus(0.5).toString());
    }

    private static ExactSum sum(List<Double> terms) {
        ExactSum s = ExactSum.ZERO;
        for (double t : terms) {
            s = s.plus(t);
        }
        return s;
    }
}
