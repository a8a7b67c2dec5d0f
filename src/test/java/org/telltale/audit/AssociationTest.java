package org.telltale.audit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class AssociationTest {

    @Test
    void zFollowsGardnerEquationOneByHand() {
        // Gardner et al. 2021, Eq. 1: z = (p̂ − p0) / sqrt(p0 (1 − p0) / n), uniform prior p0 = 1/m.
        // Hand computation, m = 2 labels, a term in n = 20 documents, 17 of them with the label:
        //   p̂ = 17 / 20 = 0.85;  sqrt(0.5 · 0.5 / 20) = sqrt(0.0125) = 0.111803…
        //   z = (0.85 − 0.5) / 0.111803 = 3.130495…
        assertEquals(3.130495, Association.z(17, 20, 0.5), 1e-6);
        // m = 3 labels, n = 50, k = 30: p̂ = 0.6, p0 = 1/3;
        //   sqrt((1/3)(2/3) / 50) = sqrt(0.0044444…) = 0.0666667;  z = (0.6 − 0.333333) / 0.0666667 = 4.0
        assertEquals(4.0, Association.z(30, 50, 1.0 / 3), 1e-9);
        // The label prior in place of 1/m (our choice, docs/audit.md): p0 = 0.2, n = 25, k = 5 gives
        //   p̂ = 0.2 = p0, so z = 0; and k = 15: (0.6 − 0.2) / sqrt(0.16 / 25) = 0.4 / 0.08 = 5.0
        assertEquals(0.0, Association.z(5, 25, 0.2), 1e-12);
        assertEquals(5.0, Association.z(15, 25, 0.2), 1e-9);
        // Under-represented: k = 0 of n = 16 with p0 = 0.5 gives (0 − 0.5) / 0.125 = −4.
        assertEquals(-4.0, Association.z(0, 16, 0.5), 1e-12);
    }

    @Test
    void zIsUndefinedWithoutDocumentsOrWithADegeneratePrior() {
        assertTrue(Double.isNaN(Association.z(0, 0, 0.5)));
        assertTrue(Double.isNaN(Association.z(3, 3, 1.0)));
    }

    @Test
    void bonferroniThresholdMatchesNormalTables() {
        // Standard normal upper quantiles, from printed tables (from memory): z(0.05) = 1.6449,
        // z(0.001) = 3.0902, z(0.00005) = 3.8906.
        assertEquals(1.6449, Association.threshold(0.05, 1), 1e-4);
        assertEquals(3.0902, Association.threshold(0.05, 50), 1e-4);
        assertEquals(3.8906, Association.threshold(0.05, 1000), 1e-4);
    }

    @Test
    void pmiIsInBits() {
        // log2(0.8 / 0.2) = log2 4 = 2 bits; log2(0.5 / 0.5) = 0 (common practice: PMI in bits).
        assertEquals(2.0, Association.pmi(0.8, 0.2), 1e-12);
        assertEquals(0.0, Association.pmi(0.5, 0.5), 1e-12);
        assertEquals(Double.NEGATIVE_INFINITY, Association.pmi(0.0, 0.5));
    }
}
