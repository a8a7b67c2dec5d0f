package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The stopping rule and its probes-to-go estimate on hand-worked fits (common practice: each
 * case computed by hand from the rule's definition in docs/method.md, "The adaptive budget").
 */
class SeparationTest {
    private static final double Z = 1.959963984540054;
    private static final int N = 1000;

    private static Surrogate fit(double[] w, double[] se) {
        int[] units = new int[w.length];
        double[] low = new double[w.length];
        double[] high = new double[w.length];
        for (int j = 0; j < w.length; j++) {
            units[j] = j;
            low[j] = w[j] - Z * se[j];
            high[j] = w[j] + Z * se[j];
        }
        return new Surrogate(units, 0, w, low, high, se, 0, 0.9, N);
    }

    @Test
    void unitsWhoseIntervalsStandApartFromTheNextOneAreSettled() {
        // 1.0 − 1.96·0.1 = 0.804 > 0.5 + 0.196 = 0.696.
        Separation.Verdict v = Separation.of(fit(new double[] {1.0, -0.5}, new double[] {0.1, 0.1}), 1, Z, 0.005, N);
        assertTrue(v.settled());
        assertEquals(N, v.probesNeeded(), 0.0);
    }

    @Test
    void twoUnitsBothWithinTheResolutionOfZeroAreSettled() {
        // δ = 0.005: 0.001 + 1.96·0.001 = 0.003 and 0.002 + 0.002 = 0.004 lie below it.
        Surrogate f = fit(new double[] {1.0, 0.001, -0.002}, new double[] {0.01, 0.001, 0.001});
        assertTrue(Separation.of(f, 2, Z, 0.005, N).settled());
        assertFalse(Separation.of(f, 2, Z, 0.003, N).settled(), "0.004 is not within δ = 0.003");
    }

    @Test
    void aUnitCloseToTheNextOneGetsTheProbesThatWouldSeparateIt() {
        // 0.3 − 0.098 = 0.202 < 0.2 + 0.098: not apart. Errors shrink as √(N/N'), so N' = N·(z(s + s')
        // / (|b| − |b'|))² = 1000 · (1.96 · 0.1 / 0.1)² = 3841.5.
        Surrogate f = fit(new double[] {1.0, 0.3, 0.2}, new double[] {0.01, 0.05, 0.05});
        Separation.Verdict v = Separation.of(f, 2, Z, 0.005, N);
        assertFalse(v.settled());
        assertEquals(N * Z * Z, v.probesNeeded(), 1e-6);
        // With the errors of 1 % more probes than that, the unit stands apart.
        double shrink = Math.sqrt(N / (1.01 * v.probesNeeded()));
        Surrogate later = fit(new double[] {1.0, 0.3, 0.2}, new double[] {0.01 * shrink, 0.05 * shrink, 0.05 * shrink});
        assertTrue(Separation.of(later, 2, Z, 0.005, N).settled());
    }

    @Test
    void twoUnitsOfEqualEffectAreNeverSeparated() {
        // |b| = |b'|: no number of probes puts one interval above the other.
        Separation.Verdict v = Separation.of(fit(new double[] {1.0, 0.5, -0.5}, new double[] {0.01, 0.1, 0.1}), 2, Z,
                0.005, N);
        assertFalse(v.settled());
        assertEquals(Double.POSITIVE_INFINITY, v.probesNeeded());
    }

    @Test
    void withEveryUnitReportedAUnitMustExcludeZeroOrLieWithinTheResolution() {
        // 0.001 − 0.0196 < 0 and 0.001 + 0.0196 > 0.005: neither.
        assertFalse(Separation.of(fit(new double[] {1.0, 0.001}, new double[] {0.1, 0.01}), 2, Z, 0.005, N).settled());
        // 0.001 + 1.96 · 0.001 < 0.005.
        assertTrue(Separation.of(fit(new double[] {1.0, 0.001}, new double[] {0.1, 0.001}), 2, Z, 0.005, N).settled());
    }
}
