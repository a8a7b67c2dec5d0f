package org.telltale.explain;

import java.util.Arrays;
import java.util.Locale;

/**
 * A fitted surrogate: the selected units (feature indexes) with their weights, standard errors
 * and intervals, the intercept, the prediction at the original document and the weighted R² on
 * the probes. A value: it keeps copies of the arrays it is given, hands out copies, and compares
 * and prints by content.
 *
 * @param units   the selected feature indexes, in selection order
 * @param weights one weight per selected unit
 * @param low     lower interval ends, one per selected unit (never above its weight)
 * @param high    upper interval ends, one per selected unit (never below its weight)
 * @param se      the sandwich standard error of each weight (0 when exact)
 * @param rows    the weighted probe rows the fit used
 */
public record Surrogate(int[] units, double intercept, double[] weights, double[] low, double[] high, double[] se,
        double prediction, double r2, int rows) {

    public Surrogate {
        units = units.clone();
        weights = weights.clone();
        low = low.clone();
        high = high.clone();
        se = se.clone();
        int k = units.length;
        if (weights.length != k || low.length != k || high.length != k || se.length != k) {
            throw new IllegalArgumentException("a surrogate of " + k + " units needs as many weights, interval ends "
                    + "and standard errors: " + weights.length + ", " + low.length + ", " + high.length + ", " + se.length);
        }
    }

    @Override
    public int[] units() {
        return units.clone();
    }

    @Override
    public double[] weights() {
        return weights.clone();
    }

    @Override
    public double[] low() {
        return low.clone();
    }

    @Override
    public double[] high() {
        return high.clone();
    }

    @Override
    public double[] se() {
        return se.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Surrogate s && Arrays.equals(units, s.units) && Double.compare(intercept, s.intercept) == 0
                && Arrays.equals(weights, s.weights) && Arrays.equals(low, s.low) && Arrays.equals(high, s.high)
                && Arrays.equals(se, s.se) && Double.compare(prediction, s.prediction) == 0
                && Double.compare(r2, s.r2) == 0 && rows == s.rows;
    }

    @Override
    public int hashCode() {
        int h = Arrays.hashCode(units);
        h = 31 * h + Double.hashCode(intercept);
        h = 31 * h + Arrays.hashCode(weights);
        h = 31 * h + Arrays.hashCode(low);
        h = 31 * h + Arrays.hashCode(high);
        h = 31 * h + Arrays.hashCode(se);
        h = 31 * h + Double.hashCode(prediction);
        h = 31 * h + Double.hashCode(r2);
        return 31 * h + rows;
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "Surrogate[units=%s, intercept=%s, weights=%s, low=%s, high=%s, se=%s, "
                + "prediction=%s, r2=%s, rows=%d]", Arrays.toString(units), intercept, Arrays.toString(weights),
                Arrays.toString(low), Arrays.toString(high), Arrays.toString(se), prediction, r2, rows);
    }
}
