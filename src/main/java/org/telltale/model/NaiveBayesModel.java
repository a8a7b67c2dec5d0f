package org.telltale.model;

import java.util.List;

/**
 * Multinomial naive Bayes: {@code log P(c) + sum over tokens of log P(t|c)}, the decision rule of
 * Manning, Raghavan and Schütze, <i>Introduction to Information Retrieval</i>, §13.2 (eq. 13.3).
 * Terms outside the vocabulary are skipped, as that section prescribes.
 */
public final class NaiveBayesModel extends BuiltinModel {
    private final double smoothing;
    private final double[] logPrior;
    private final double[][] logLikelihood;

    /**
     * @param smoothing     the additive (Laplace for 1) smoothing the estimates were made with
     * @param logPrior      per label, {@code log P(c)}
     * @param logLikelihood per label, per vocabulary column, {@code log P(t|c)}
     */
    public NaiveBayesModel(List<String> labels, TermCounter counter, Vocabulary vocabulary, TrainingInfo training,
            String source, double smoothing, double[] logPrior, double[][] logLikelihood) {
        super(labels, counter, vocabulary, training, source);
        if (logPrior.length != labels.size() || logLikelihood.length != labels.size()) {
            throw new IllegalArgumentException("parameters for " + logPrior.length + "/" + logLikelihood.length
                    + " labels, expected " + labels.size());
        }
        for (double[] row : logLikelihood) {
            if (row.length != vocabulary.size()) {
                throw new IllegalArgumentException("likelihood row of " + row.length + " terms, expected "
                        + vocabulary.size());
            }
        }
        this.smoothing = smoothing;
        this.logPrior = logPrior.clone();
        this.logLikelihood = new double[logLikelihood.length][];
        for (int c = 0; c < logLikelihood.length; c++) {
            this.logLikelihood[c] = logLikelihood[c].clone();
        }
    }

    @Override
    public Algorithm algorithm() {
        return Algorithm.BAYES;
    }

    public double smoothing() {
        return smoothing;
    }

    /** {@code log P(c)} of label {@code c}. */
    public double logPrior(int c) {
        return logPrior[c];
    }

    /** {@code log P(t|c)} of vocabulary column {@code t} under label {@code c}. */
    public double logLikelihood(int c, int t) {
        return logLikelihood[c][t];
    }

    double[] logPriors() {
        return logPrior.clone();
    }

    double[] logLikelihoodRow(int c) {
        return logLikelihood[c];
    }

    @Override
    double[] linearScores(int[] cols, double[] n, int nonZeros) {
        double[] s = new double[logPrior.length];
        for (int c = 0; c < s.length; c++) {
            double[] ll = logLikelihood[c];
            double sum = logPrior[c];
            for (int k = 0; k < nonZeros; k++) {
                sum += n[k] * ll[cols[k]];
            }
            s[c] = sum;
        }
        return s;
    }
}
