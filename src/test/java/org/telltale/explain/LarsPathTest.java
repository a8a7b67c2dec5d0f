package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

/**
 * The LARS and lasso paths on the diabetes data against scikit-learn's {@code lars_path}
 * (python3-sklearn 1.2.1 from Debian; values in fit-references.json, produced by
 * src/test/reference/fit_references.py).
 */
class LarsPathTest {

    @Test
    void entersTheDiabetesVariablesInTheOrderEfronEtAlReport() throws IOException {
        // Efron, Hastie, Johnstone & Tibshirani 2004, §1 / Figure 1: order 3, 9, 4, 7, 2, 10, 5, 8, 6, 1.
        DiabetesData data = DiabetesData.load();
        LarsPath.Path path = LarsPath.run(new DenseColumns(data.x), centred(data.y), 10, false);
        List<Integer> oneBased = new ArrayList<>();
        path.entered().forEach(j -> oneBased.add(j + 1));
        assertEquals(List.of(3, 9, 4, 7, 2, 10, 5, 8, 6, 1), oneBased);
    }

    @ParameterizedTest
    @ValueSource(strings = {"lar", "lasso"})
    void matchesScikitLearnLarsPathKnotByKnot(String method) throws IOException {
        DiabetesData data = DiabetesData.load();
        JsonNode ref = DiabetesData.references().path("diabetes_" + method);
        LarsPath.Path path = LarsPath.run(new DenseColumns(data.x), centred(data.y), 10, method.equals("lasso"));
        JsonNode coefs = ref.path("coefs");
        JsonNode alphas = ref.path("alphas");
        assertEquals(coefs.size(), path.knots().size(), "number of knots");
        int n = data.y.length;
        for (int k = 0; k < coefs.size(); k++) {
            double[] got = path.knots().get(k).coefficients();
            for (int j = 0; j < 10; j++) {
                double want = coefs.get(k).get(j).asDouble();
                assertEquals(want, got[j], 1e-7 * Math.max(1, Math.abs(want)), "knot " + k + ", variable " + (j + 1));
            }
            // scikit-learn reports the knot's largest absolute correlation divided by n.
            assertEquals(alphas.get(k).asDouble(), path.knots().get(k).correlation() / n, 1e-9, "alpha at knot " + k);
        }
        List<Integer> active = new ArrayList<>();
        ref.path("active").forEach(a -> active.add(a.asInt()));
        assertEquals(active, path.active());
    }

    @Test
    void stopsWhenTheRequestedNumberOfVariablesIsActive() throws IOException {
        DiabetesData data = DiabetesData.load();
        LarsPath.Path path = LarsPath.run(new DenseColumns(data.x), centred(data.y), 4, true);
        assertEquals(List.of(2, 8, 3, 6), path.active());
        JsonNode knot = DiabetesData.references().path("diabetes_lasso").path("coefs").get(4);
        double[] got = path.knots().get(path.knots().size() - 1).coefficients();
        for (int j = 0; j < 10; j++) {
            assertEquals(knot.get(j).asDouble(), got[j], 1e-7 * Math.max(1, Math.abs(got[j])));
        }
    }

    static double[] centred(double[] y) {
        double mean = 0;
        for (double v : y) {
            mean += v;
        }
        mean /= y.length;
        double[] out = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            out[i] = y[i] - mean;
        }
        return out;
    }
}
