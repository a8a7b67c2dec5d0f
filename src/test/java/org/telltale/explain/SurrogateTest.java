package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.junit.jupiter.api.Test;

class SurrogateTest {
    private static Surrogate fit(double weight) {
        return new Surrogate(new int[] {3, 1}, 0.2, new double[] {weight, -0.1}, new double[] {weight - 0.05, -0.2},
                new double[] {weight + 0.05, 0.0}, new double[] {0.025, 0.05}, 0.6, 0.9, 500);
    }

    @Test
    void twoFitsOfTheSameNumbersAreEqual() {
        assertEquals(fit(0.4), fit(0.4));
    }

    @Test
    void aDifferentWeightMakesADifferentFit() {
        assertNotEquals(fit(0.4), fit(0.41));
    }

    @Test
    void theArraysGivenAndHandedOutAreCopies() {
        double[] weights = {0.4, -0.1};
        Surrogate s = new Surrogate(new int[] {3, 1}, 0.2, weights, new double[] {0.35, -0.2}, new double[] {0.45, 0.0},
                new double[] {0.025, 0.05}, 0.6, 0.9, 500);
        weights[0] = 9;
        s.weights()[0] = 9;
        assertEquals(0.4, s.weights()[0]);
    }

    @Test
    void toStringShowsTheNumbers() {
        assertEquals("Surrogate[units=[3, 1], intercept=0.2, weights=[0.4, -0.1], low=[0.35000000000000003, -0.2], "
                + "high=[0.45, 0.0], se=[0.025, 0.05], prediction=0.6, r2=0.9, rows=500]", fit(0.4).toString());
    }
}
