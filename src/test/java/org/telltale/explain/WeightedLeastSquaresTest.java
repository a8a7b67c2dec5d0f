package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.junit.jupiter.api.Test;

class WeightedLeastSquaresTest {
    /**
     * Longley (1967), "An appraisal of least squares programs…", JASA 62: Employed (y) against
     * GNP deflator, GNP, Unemployed, Armed Forces, Population, Year. Typed from memory of the NIST
     * StRD certificate; src/test/reference/fit_references.py refits it with numpy.linalg.lstsq
     * and reproduces the certified values to 11 digits, which checks the typing.
     */
    static final double[][] LONGLEY = {
        {60323, 83.0, 234289, 2356, 1590, 107608, 1947},
        {61122, 88.5, 259426, 2325, 1456, 108632, 1948},
        {60171, 88.2, 258054, 3682, 1616, 109773, 1949},
        {61187, 89.5, 284599, 3351, 1650, 110929, 1950},
        {63221, 96.2, 328975, 2099, 3099, 112075, 1951},
        {63639, 98.1, 346999, 1932, 3594, 113270, 1952},
        {64989, 99.0, 365385, 1870, 3547, 115094, 1953},
        {63761, 100.0, 363112, 3578, 3350, 116219, 1954},
        {66019, 101.2, 397469, 2904, 3048, 117388, 1955},
        {67857, 104.6, 419180, 2822, 2857, 118734, 1956},
        {68169, 108.4, 442769, 2936, 2798, 120445, 1957},
        {66513, 110.8, 444546, 4681, 2637, 121950, 1958},
        {68655, 112.6, 482704, 3813, 2552, 123366, 1959},
        {69564, 114.2, 502601, 3931, 2514, 125368, 1960},
        {69331, 115.7, 518173, 4806, 2572, 127852, 1961},
        {70551, 116.9, 554894, 4007, 2827, 130081, 1962},
    };

    /** NIST StRD, Longley, certified regression coefficients (from memory of the certificate). */
    static final double[] CERTIFIED = {
        -3482258.63459582, 15.0618722713733, -0.358191792925910E-01, -2.02022980381683,
        -1.03322686717359, -0.511041056535807E-01, 1829.15146461355,
    };

    private static double[][] predictors() {
        double[][] x = new double[LONGLEY.length][6];
        for (int i = 0; i < x.length; i++) {
            System.arraycopy(LONGLEY[i], 1, x[i], 0, 6);
        }
        return x;
    }

    private static double[] response() {
        double[] y = new double[LONGLEY.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = LONGLEY[i][0];
        }
        return y;
    }

    @Test
    void reproducesTheNistCertifiedLongleyCoefficientsToSevenSignificantDigits() {
        double[] ones = new double[LONGLEY.length];
        java.util.Arrays.fill(ones, 1.0);
        WeightedLeastSquares.Solution s = WeightedLeastSquares.fit(predictors(), response(), ones, true, 0.0);
        assertEquals(CERTIFIED[0], s.intercept(), Math.abs(CERTIFIED[0]) * 1e-7);
        for (int j = 0; j < 6; j++) {
            assertEquals(CERTIFIED[j + 1], s.coefficients()[j], Math.abs(CERTIFIED[j + 1]) * 1e-7, "b" + (j + 1));
        }
    }

    @org.junit.jupiter.params.ParameterizedTest
    @org.junit.jupiter.params.provider.ValueSource(strings = {"0.01", "1"})
    void weightedRidgeMatchesScikitLearnRidgeWithSampleWeights(String alpha) throws java.io.IOException {
        // scikit-learn 1.2.1 Ridge(alpha, fit_intercept=True, solver="cholesky").fit(X, y, sample_weight=w)
        // on the diabetes data (fit-references.json, from src/test/reference/fit_references.py).
        DiabetesData data = DiabetesData.load();
        com.fasterxml.jackson.databind.JsonNode ref = DiabetesData.references().path("diabetes_ridge_alpha_" + alpha);
        double[] w = new double[data.y.length];
        for (int i = 0; i < w.length; i++) {
            w[i] = 1.0 + (i % 7) / 3.0;
        }
        WeightedLeastSquares.Solution s = WeightedLeastSquares.fit(data.x, data.y, w, true, Double.parseDouble(alpha));
        assertEquals(ref.get("intercept").asDouble(), s.intercept(), 1e-9 * Math.abs(s.intercept()));
        for (int j = 0; j < 10; j++) {
            double want = ref.get("coef").get(j).asDouble();
            assertEquals(want, s.coefficients()[j], 1e-8 * Math.max(1, Math.abs(want)), "coef " + j);
        }
    }

    @Test
    void weightedFitEqualsCommonsMathOrdinaryLeastSquaresOnRootWeightScaledRows() {
        // Reference library: Commons Math OLSMultipleLinearRegression, no intercept, on rows scaled
        // by √w with the intercept as an explicit √w column (weighted least squares by definition).
        double[][] x = predictors();
        double[] y = response();
        double[] w = new double[y.length];
        double[][] scaled = new double[y.length][7];
        double[] ys = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            w[i] = 0.5 + (i * 7 % 11) / 4.0;
            double r = Math.sqrt(w[i]);
            scaled[i][0] = r;
            for (int j = 0; j < 6; j++) {
                scaled[i][j + 1] = r * x[i][j];
            }
            ys[i] = r * y[i];
        }
        OLSMultipleLinearRegression ols = new OLSMultipleLinearRegression(1e-14);
        ols.setNoIntercept(true);
        ols.newSampleData(ys, scaled);
        double[] reference = ols.estimateRegressionParameters();
        WeightedLeastSquares.Solution s = WeightedLeastSquares.fit(x, y, w, true, 0.0);
        assertEquals(reference[0], s.intercept(), Math.abs(reference[0]) * 1e-8);
        for (int j = 0; j < 6; j++) {
            assertEquals(reference[j + 1], s.coefficients()[j], Math.abs(reference[j + 1]) * 1e-8, "b" + (j + 1));
        }
    }
}
