package org.telltale.model;

/**
 * Fits multinomial naive Bayes with additive smoothing, the estimates of Manning, Raghavan and
 * Schütze, <i>Introduction to Information Retrieval</i>, §13.2 (eqs. 13.5–13.7):
 * {@code P(c) = N_c / N} and {@code P(t|c) = (T_ct + a) / (sum_t' T_ct' + a |V|)}.
 */
public final class NaiveBayesTrainer {
    private final double smoothing;

    /** @param smoothing the pseudo-count {@code a} added to every term count; 1 is Laplace smoothing */
    public NaiveBayesTrainer(double smoothing) {
        if (!(smoothing > 0) || Double.isInfinite(smoothing)) {
            throw new IllegalArgumentException("smoothing must be a positive number: " + smoothing);
        }
        this.smoothing = smoothing;
    }

    /** Fits on {@code data}; the model reads texts with {@code counter}, which it then owns. */
    public NaiveBayesModel fit(TrainingSet data, TermCounter counter, TrainingInfo training) {
        int k = data.labels().size();
        int v = data.vocabulary().size();
        double[] docs = new double[k];
        double[][] termCounts = new double[k][v];
        double[] tokens = new double[k];
        for (int i = 0; i < data.size(); i++) {
            int c = data.labelOf(i);
            docs[c]++;
            SparseCounts row = data.rows().get(i);
            for (int j = 0; j < row.nonZeros(); j++) {
                termCounts[c][row.columns()[j]] += row.values()[j];
                tokens[c] += row.values()[j];
            }
        }
        double[] logPrior = new double[k];
        double[][] logLikelihood = new double[k][v];
        for (int c = 0; c < k; c++) {
            logPrior[c] = Math.log(docs[c] / data.size());
            double denominator = Math.log(tokens[c] + smoothing * v);
            for (int t = 0; t < v; t++) {
                logLikelihood[c][t] = Math.log(termCounts[c][t] + smoothing) - denominator;
            }
        }
        return new NaiveBayesModel(data.labels(), counter, data.vocabulary(), training, null, smoothing,
                logPrior, logLikelihood);
    }
}
