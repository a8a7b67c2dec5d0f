package org.telltale.model;

/**
 * Turns a row of logits into probabilities: {@code exp(x_i - max) / Σ exp(x_j - max)}. Subtracting
 * the maximum first keeps large logits from overflowing (common practice; Goodfellow, Bengio and
 * Courville, Deep Learning, 2016, §4.1). Used by the built-in models and by connectors whose
 * models answer logits.
 */
public final class Softmax {
    private Softmax() {
    }

    public static double[] of(double[] logits) {
        double max = Double.NEGATIVE_INFINITY;
        for (double v : logits) {
            max = Math.max(max, v);
        }
        double[] out = new double[logits.length];
        double sum = 0;
        for (int i = 0; i < logits.length; i++) {
            out[i] = Math.exp(logits[i] - max);
            sum += out[i];
        }
        for (int i = 0; i < out.length; i++) {
            out[i] /= sum;
        }
        return out;
    }
}
