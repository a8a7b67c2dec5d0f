package org.telltale.explain;

/**
 * A fitted surrogate: the selected units (feature indexes) with their weights, standard errors
 * and intervals, the intercept, the prediction at the original document and the weighted R² on
 * the probes.
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
}
