package org.telltale.explain;

import java.util.List;

/**
 * The numbers the surrogate is fitted to, from the model's answers: the explained label's
 * probability, or its log-odds log p(label) − log p(rest). Log-odds come from the logits when the
 * model answered them (ℓ_label − log Σ_{other} exp ℓ, computed stably), and otherwise from the
 * probabilities, each side clipped to at least {@link #CLIP}; the rest's probability is summed over
 * the other labels rather than taken as 1 − p, which keeps its digits when p is near 1.
 */
final class TargetValues {
    /** A probability within this of 0 or 1 counts as saturated. */
    static final double SATURATED = 1e-6;
    /** Probabilities are clipped to [CLIP, 1 − CLIP] before log-odds: at most ±27.6. */
    static final double CLIP = 1e-12;
    /** Saturation is reported when more than this share of the probes is saturated. */
    static final double SATURATED_SHARE = 0.5;

    private TargetValues() {
    }

    /** The share of probes whose probability of label column {@code c} lies within {@link #SATURATED} of 0 or 1. */
    static double saturatedShare(ProbeSet probes, int c) {
        int n = probes.size();
        int saturated = 0;
        for (int i = 0; i < n; i++) {
            double p = probes.scores(i)[c];
            if (p <= SATURATED || p >= 1 - SATURATED) {
                saturated++;
            }
        }
        return n == 0 ? 0 : (double) saturated / n;
    }

    /** What {@code asked} means for this document. */
    static Target resolve(Target asked, boolean logits, double saturatedShare, List<String> labels) {
        if (labels.size() < 2) {
            return Target.PROBABILITY; // one label: there is no "rest" to take odds against
        }
        if (asked != Target.AUTO) {
            return asked;
        }
        return logits || saturatedShare > SATURATED_SHARE ? Target.LOG_ODDS : Target.PROBABILITY;
    }

    /** The target of every probe, in row order. */
    static double[] column(ProbeSet probes, int c, Target kind) {
        int n = probes.size();
        double[] out = new double[n];
        boolean logits = probes.hasLogits();
        for (int i = 0; i < n; i++) {
            out[i] = value(probes, i, c, kind, logits);
        }
        return out;
    }

    static double value(ProbeSet probes, int row, int c, Target kind, boolean logits) {
        if (kind != Target.LOG_ODDS) {
            return probes.scores(row)[c];
        }
        return logits ? fromLogits(probes.logits(row), c) : fromProbabilities(probes.scores(row), c);
    }

    /** ℓ_c − log Σ_{j≠c} exp ℓ_j, with the largest other logit taken out first. */
    static double fromLogits(double[] logits, int c) {
        double max = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < logits.length; j++) {
            if (j != c) {
                max = Math.max(max, logits[j]);
            }
        }
        double sum = 0;
        for (int j = 0; j < logits.length; j++) {
            if (j != c) {
                sum += Math.exp(logits[j] - max);
            }
        }
        return logits[c] - max - Math.log(sum);
    }

    /** log p_c − log Σ_{j≠c} p_j, both clipped to [CLIP, 1 − CLIP]. */
    static double fromProbabilities(double[] p, int c) {
        double rest = 0;
        for (int j = 0; j < p.length; j++) {
            if (j != c) {
                rest += p[j];
            }
        }
        double mine = Math.min(1 - CLIP, Math.max(CLIP, p[c]));
        rest = Math.min(1 - CLIP, Math.max(CLIP, rest));
        return Math.log(mine) - Math.log(rest);
    }
}
