package org.telltale.audit;

import org.apache.commons.math3.distribution.NormalDistribution;

/**
 * How strongly a term predicts a label in a corpus.
 *
 * <p>The z-statistic is Eq. 1 of Gardner et al. (2021), "Competency Problems: On Finding and
 * Removing Artifacts in Language Data": with {@code n} documents containing the term, of which
 * {@code k} carry the label, p̂ = k / n and z = (p̂ − p0) / sqrt(p0 (1 − p0) / n). Gardner et al.
 * take p0 = 1/m for m labels; Telltale takes p0 = the label's share of the corpus, because real
 * queues are rarely balanced and against 1/m every frequent term of a majority label would look
 * like an artefact. With balanced labels the two coincide.
 *
 * <p>Stateless.
 */
public final class Association {
    private static final NormalDistribution STANDARD_NORMAL = new NormalDistribution(null, 0, 1);

    private Association() {
    }

    /**
     * The one-sided z-statistic of {@code k} labelled documents among {@code n} containing the
     * term, against the prior {@code p0}; NaN when {@code n} is 0 or the prior is 0 or 1.
     */
    public static double z(long k, long n, double p0) {
        if (n <= 0 || !(p0 > 0 && p0 < 1)) {
            return Double.NaN;
        }
        double pHat = (double) k / n;
        return (pHat - p0) / Math.sqrt(p0 * (1 - p0) / n);
    }

    /**
     * The Bonferroni-corrected one-sided critical value: the z a test must reach so that, over
     * {@code tests} tests, the chance of any false alarm stays below {@code alpha}.
     */
    public static double threshold(double alpha, long tests) {
        if (!(alpha > 0 && alpha < 1) || tests < 1) {
            throw new IllegalArgumentException("alpha must lie in (0, 1) and tests be >= 1: " + alpha + ", " + tests);
        }
        return STANDARD_NORMAL.inverseCumulativeProbability(1 - alpha / tests);
    }

    /**
     * Pointwise mutual information in bits, log2 p̂(label | term) / p(label); negative infinity
     * when the term never occurs with the label.
     */
    public static double pmi(double pLabelGivenTerm, double prior) {
        return Math.log(pLabelGivenTerm / prior) / Math.log(2);
    }
}
