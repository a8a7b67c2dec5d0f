package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.BitSet;
import java.util.List;
import org.junit.jupiter.api.Test;

class WeightedCenteredTest {
    @Test
    void squaredNormsOfABitMatrixEqualTheMaterialisedColumnsDotProductsToTheLastBit() {
        for (int d : new int[] {3, 64, 70, 150}) {
            List<BitSet> removed = ProbeSampler.draw(d, 500, new ProbeRandom(d));
            PresenceMatrix x = PresenceMatrix.fromRemoved(removed, d);
            ProbeRandom random = new ProbeRandom(7);
            double[] y = new double[x.rows()];
            double[] w = new double[x.rows()];
            for (int i = 0; i < y.length; i++) {
                y[i] = random.nextDouble();
                w[i] = 0.1 + random.nextDouble();
            }
            WeightedCentered view = new WeightedCentered(x, y, w);
            // The reference is the definition, column by column (common practice).
            double[] expected = new double[d];
            double[] col = new double[x.rows()];
            for (int j = 0; j < d; j++) {
                view.column(j, col);
                expected[j] = ForwardSelection.dot(col, col);
            }
            double[] fused = new double[d];
            view.squaredNorms(fused);
            assertArrayEquals(expected, fused, 0.0, "d = " + d);
        }
    }
}
