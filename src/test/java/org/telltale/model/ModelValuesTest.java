package org.telltale.model;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The model package's values compare and print by content; which of them copy is part of their contract. */
class ModelValuesTest {
    @Test
    void sparseCountsCompareAndPrintByContentAndKeepTheCallersArrays() {
        int[] columns = {1, 4};
        double[] values = {2.0, 1.0};
        SparseCounts row = new SparseCounts(columns, values);
        assertEquals(new SparseCounts(new int[] {1, 4}, new double[] {2.0, 1.0}), row);
        assertEquals(new SparseCounts(new int[] {1, 4}, new double[] {2.0, 1.0}).hashCode(), row.hashCode());
        assertNotEquals(new SparseCounts(new int[] {1, 4}, new double[] {2.0, 3.0}), row);
        assertEquals("SparseCounts[columns=[1, 4], values=[2.0, 1.0]]", row.toString());
        // On the per-probe path: the row does not copy (documented), the caller owns the arrays.
        assertSame(columns, row.columns());
        assertSame(values, row.values());
    }

    @Test
    void aTrainingSetCopiesItsLabelIndices() {
        List<Map<String, Integer>> counts = List.of(Map.of("refund", 2), Map.of("portal", 1), Map.of("refund", 1));
        List<String> gold = List.of("billing", "outage", "billing");
        TrainingSet set = TrainingSet.of(counts, gold);
        int[] handedOut = set.labelOf();
        handedOut[0] = 1;
        assertArrayEquals(new int[] {0, 1, 0}, set.labelOf());
        assertEquals(0, set.labelOf(0));
        int[] given = {0, 1, 0};
        TrainingSet built = new TrainingSet(set.labels(), set.vocabulary(), set.rows(), given);
        given[0] = 1;
        assertEquals(set, built);
        assertEquals(set.hashCode(), built.hashCode());
        assertEquals(set, TrainingSet.of(counts, gold));
        assertNotEquals(set, TrainingSet.of(counts, List.of("billing", "outage", "outage")));
    }

    @Test
    void anOptimiserResultCopiesItsMinimiserAndComparesByContent() {
        double[] x = {1.0, -2.0};
        OptimiserReport report = new OptimiserReport("L-BFGS", 3, 4, true, 0.5, 1e-9);
        Lbfgs.Result result = new Lbfgs.Result(x, report);
        x[0] = 9;
        result.x()[1] = 9;
        assertArrayEquals(new double[] {1.0, -2.0}, result.x());
        assertEquals(new Lbfgs.Result(new double[] {1.0, -2.0}, report), result);
        assertEquals(new Lbfgs.Result(new double[] {1.0, -2.0}, report).hashCode(), result.hashCode());
        assertEquals("Result[x=[1.0, -2.0], report=" + report + "]", result.toString());
    }
}
