package org.telltale.model;

/**
 * What to train.
 *
 * @param algorithm     bayes or logistic
 * @param analyzer      analyzer name or spec for {@link org.telltale.text.Analyzers#byName}
 * @param ngrams        1 (terms) or 2 (terms and adjacent pairs)
 * @param holdout       share of each label kept back for evaluation, in [0, 1)
 * @param seed          seed of the holdout split
 * @param smoothing     additive smoothing of naive Bayes
 * @param l2            L2 penalty of logistic regression (on the mean loss)
 * @param maxIterations L-BFGS iterations at most
 */
public record TrainingRequest(Algorithm algorithm, String analyzer, int ngrams, double holdout, long seed,
        double smoothing, double l2, int maxIterations) {
    public static final double DEFAULT_SMOOTHING = 1.0;
    public static final double DEFAULT_L2 = 1e-3;
    public static final int DEFAULT_MAX_ITERATIONS = 500;

    /** Each setting checked once, here, in the core's own words; the command line names the option (OptionWords). */
    public TrainingRequest {
        java.util.Objects.requireNonNull(algorithm, "algorithm");
        java.util.Objects.requireNonNull(analyzer, "analyzer");
        if (ngrams != 1 && ngrams != 2) {
            throw new IllegalArgumentException("ngrams must be 1 or 2: " + ngrams);
        }
        if (!(holdout >= 0 && holdout < 1)) {
            throw new IllegalArgumentException("holdout must be at least 0 and below 1: " + holdout);
        }
        if (!(smoothing > 0) || Double.isInfinite(smoothing)) {
            throw new IllegalArgumentException("smoothing must be a positive number: " + smoothing);
        }
        if (!(l2 > 0) || Double.isInfinite(l2)) {
            throw new IllegalArgumentException("l2 must be a positive number: " + l2);
        }
        if (maxIterations < 1) {
            throw new IllegalArgumentException("maxIterations must be at least 1: " + maxIterations);
        }
    }

    public static TrainingRequest defaults(Algorithm algorithm) {
        return new TrainingRequest(algorithm, "standard", 1, 0.2, 1L, DEFAULT_SMOOTHING, DEFAULT_L2,
                DEFAULT_MAX_ITERATIONS);
    }

    public TrainingRequest withAnalyzer(String newAnalyzer, int newNgrams) {
        return new TrainingRequest(algorithm, newAnalyzer, newNgrams, holdout, seed, smoothing, l2, maxIterations);
    }

    public TrainingRequest withHoldout(double newHoldout, long newSeed) {
        return new TrainingRequest(algorithm, analyzer, ngrams, newHoldout, newSeed, smoothing, l2, maxIterations);
    }
}
