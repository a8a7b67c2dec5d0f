package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import org.junit.jupiter.api.Test;

/** The fits' results are values: they copy their coefficients and compare and print by content. */
class FitValuesTest {
    @Test
    void aLarsKnotCopiesItsCoefficients() {
        double[] beta = {0.5, 0.0, -1.25};
        LarsPath.Knot knot = new LarsPath.Knot(2.0, beta);
        beta[0] = 9;
        knot.coefficients()[1] = 9;
        assertArrayEquals(new double[] {0.5, 0.0, -1.25}, knot.coefficients());
        assertEquals(new LarsPath.Knot(2.0, new double[] {0.5, 0.0, -1.25}), knot);
        assertEquals(new LarsPath.Knot(2.0, new double[] {0.5, 0.0, -1.25}).hashCode(), knot.hashCode());
        assertNotEquals(new LarsPath.Knot(1.0, new double[] {0.5, 0.0, -1.25}), knot);
        assertEquals("Knot[correlation=2.0, coefficients=[0.5, 0.0, -1.25]]", knot.toString());
    }

    @Test
    void aLeastSquaresSolutionCopiesItsSlopes() {
        double[] slopes = {3.0, -1.0};
        WeightedLeastSquares.Solution s = new WeightedLeastSquares.Solution(0.5, slopes);
        slopes[0] = 9;
        s.coefficients()[1] = 9;
        assertArrayEquals(new double[] {3.0, -1.0}, s.coefficients());
        assertEquals(0.5 + 3.0 * 2 - 1.0 * 1, s.predict(new double[] {2, 1}));
        assertEquals(new WeightedLeastSquares.Solution(0.5, new double[] {3.0, -1.0}), s);
        assertNotEquals(new WeightedLeastSquares.Solution(0.0, new double[] {3.0, -1.0}), s);
        assertEquals("Solution[intercept=0.5, coefficients=[3.0, -1.0]]", s.toString());
    }
}
