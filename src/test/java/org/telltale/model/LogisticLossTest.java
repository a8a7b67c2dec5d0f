package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class LogisticLossTest {
    @Test
    void gradientMatchesCentralDifferences() {
        // Central finite differences, error O(h^2) (common practice for checking gradients).
        List<SparseCounts> rows = List.of(
                new SparseCounts(new int[] {0, 2}, new double[] {1.0, 0.7}),
                new SparseCounts(new int[] {1}, new double[] {2.0}),
                new SparseCounts(new int[] {0, 1, 3}, new double[] {0.5, 0.5, 1.5}),
                new SparseCounts(new int[] {}, new double[] {}));
        int k = 3;
        int v = 4;
        LogisticTrainer.Loss loss = new LogisticTrainer.Loss(rows, new int[] {0, 1, 2, 1}, k, v, 0.05);
        SplittableRandom random = new SplittableRandom(11);
        double[] theta = new double[k * v + k];
        for (int i = 0; i < theta.length; i++) {
            theta[i] = random.nextDouble(-1, 1);
        }
        double[] g = new double[theta.length];
        loss.evaluate(theta, g);
        double h = 1e-6;
        double[] scratch = new double[theta.length];
        for (int i = 0; i < theta.length; i++) {
            double[] plus = theta.clone();
            double[] minus = theta.clone();
            plus[i] += h;
            minus[i] -= h;
            double numeric = (loss.evaluate(plus, scratch) - loss.evaluate(minus, scratch)) / (2 * h);
            assertEquals(numeric, g[i], 1e-8, "component " + i);
        }
    }
}
