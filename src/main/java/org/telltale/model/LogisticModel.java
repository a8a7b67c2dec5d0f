package org.telltale.model;

import java.util.List;

/**
 * Multinomial logistic regression over {@code log(1 + count)} of each known term:
 * {@code z_c = b_c + sum_t w_ct log(1 + n_t)}, probabilities by the softmax of {@code z}.
 * The damped counts keep one term repeated many times (a signature, a pasted log) from
 * dominating a document.
 */
public final class LogisticModel extends BuiltinModel {
    /** The name of the feature transform in model files. */
    public static final String FEATURES = "log1p-counts";

    private final double l2;
    private final double[] intercepts;
    private final double[][] weights;
    private final OptimiserReport optimiser;

    /**
     * @param l2         the penalty the weights were fitted with (see {@link LogisticTrainer})
     * @param intercepts per label, {@code b_c}; unpenalised and centred to mean zero
     * @param weights    per label, per vocabulary column, {@code w_ct}
     * @param optimiser  how the fit ended, or {@code null}
     */
    public LogisticModel(List<String> labels, TermCounter counter, Vocabulary vocabulary, TrainingInfo training,
            String source, double l2, double[] intercepts, double[][] weights, OptimiserReport optimiser) {
        super(labels, counter, vocabulary, training, source);
        if (intercepts.length != labels.size() || weights.length != labels.size()) {
            throw new IllegalArgumentException("parameters for " + intercepts.length + "/" + weights.length
                    + " labels, expected " + labels.size());
        }
        this.weights = new double[weights.length][];
        for (int c = 0; c < weights.length; c++) {
            if (weights[c].length != vocabulary.size()) {
                throw new IllegalArgumentException("weight row of " + weights[c].length + " terms, expected "
                        + vocabulary.size());
            }
            this.weights[c] = weights[c].clone();
        }
        this.l2 = l2;
        this.intercepts = intercepts.clone();
        this.optimiser = optimiser;
    }

    @Override
    public Algorithm algorithm() {
        return Algorithm.LOGISTIC;
    }

    public double l2() {
        return l2;
    }

    public double intercept(int c) {
        return intercepts[c];
    }

    public double weight(int c, int t) {
        return weights[c][t];
    }

    double[] intercepts() {
        return intercepts.clone();
    }

    double[] weightRow(int c) {
        return weights[c];
    }

    /** How the fit ended, or {@code null} when unknown. */
    public OptimiserReport optimiser() {
        return optimiser;
    }

    @Override
    double[] linearScores(int[] cols, double[] n, int nonZeros) {
        double[] x = new double[nonZeros];
        for (int k = 0; k < nonZeros; k++) {
            x[k] = Math.log1p(n[k]);
        }
        double[] z = new double[intercepts.length];
        for (int c = 0; c < z.length; c++) {
            double[] w = weights[c];
            double sum = intercepts[c];
            for (int k = 0; k < nonZeros; k++) {
                sum += x[k] * w[cols[k]];
            }
            z[c] = sum;
        }
        return z;
    }
}
