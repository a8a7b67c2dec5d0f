package org.telltale.explain;

/**
 * A fitted surrogate: the selected units (feature indexes) with their weights and intervals, the
 * intercept, the prediction at the original document and the weighted R² on the probes.
 *
 * @param units      the selected feature indexes, in selection order
 * @param weights    one weight per selected unit
 * @param low        lower interval ends, one per selected unit
 * @param high       upper interval ends, one per selected unit
 * @param resamples  the bootstrap resamples behind the intervals (0 when exact or not computed)
 */
public record Surrogate(int[] units, double intercept, double[] weights, double[] low, double[] high,
        double prediction, double r2, int resamples) {
}
