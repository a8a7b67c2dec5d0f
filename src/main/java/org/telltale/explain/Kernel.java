package org.telltale.explain;

import org.apache.commons.math3.util.CombinatoricsUtils;

/**
 * The weight a probe gets in the surrogate fit, from how many of the d units it removes. Both
 * kernels depend on the probe only through that count.
 *
 * <p>The fit minimises Σ weight(z)·(f(z) − g(z))² over the probes. For probes drawn by
 * {@link ProbeSampler} the weight is {@link #sampled}; when every subset is enumerated once
 * ({@link #exact}) it is the sampled weight times the subset's sampling probability times the
 * number of draws, so that exact mode solves the expected normal equations of the sampled fit.
 */
public interface Kernel {

    /** The weight of a drawn probe that removes {@code removed} of {@code d} units. */
    double sampled(int d, int removed);

    /** The weight of one enumerated subset that removes {@code removed} of {@code d} units. */
    double exact(int d, int removed, int draws);

    /** True when the fit must reproduce this probe exactly (a constraint, not a weighted row). */
    default boolean constrains(int d, int removed) {
        return false;
    }

    /** The cosine distance between a presence vector that keeps d − removed units and all-ones. */
    static double cosineDistance(int d, int removed) {
        if (removed >= d) {
            return 1.0; // the zero vector: no angle, taken as orthogonal
        }
        return 1.0 - Math.sqrt((double) (d - removed) / d);
    }

    /** π = exp(−D²/σ²) with D the cosine distance (Ribeiro, Singh &amp; Guestrin 2016, §3.3). */
    static Kernel cosine(double bandwidth) {
        if (!(bandwidth > 0) || Double.isInfinite(bandwidth)) {
            throw new IllegalArgumentException("bandwidth must be a positive number: " + bandwidth);
        }
        return new Kernel() {
            @Override
            public double sampled(int d, int removed) {
                double dist = cosineDistance(d, removed);
                return Math.exp(-dist * dist / (bandwidth * bandwidth));
            }

            @Override
            public double exact(int d, int removed, int draws) {
                if (removed == 0) {
                    return 1.0; // probe 0, which every fit holds once
                }
                return sampled(d, removed) * ProbeSampler.probability(d, removed) * draws;
            }
        };
    }

    /**
     * The Shapley kernel π(z) = (M − 1) / (C(M, |z|)·|z|·(M − |z|)), |z| the units kept (Lundberg
     * &amp; Lee 2017, "A unified approach to interpreting model predictions", Theorem 2). It is
     * infinite at the empty and the full coalition: those two probes are constraints. A drawn
     * probe carries π(z) divided by its sampling probability.
     */
    static Kernel shapley() {
        return new Kernel() {
            @Override
            public double sampled(int d, int removed) {
                int kept = d - removed;
                // π(z) / p(z) with p(z) = 1 / (d·C(d, removed)); the binomials cancel.
                return (double) (d - 1) * d / ((double) kept * removed);
            }

            @Override
            public double exact(int d, int removed, int draws) {
                int kept = d - removed;
                return (d - 1) / (CombinatoricsUtils.binomialCoefficientDouble(d, kept) * kept * removed);
            }

            @Override
            public boolean constrains(int d, int removed) {
                return removed == 0 || removed == d;
            }
        };
    }
}
