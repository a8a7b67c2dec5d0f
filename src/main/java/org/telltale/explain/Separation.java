package org.telltale.explain;

/**
 * Whether the K reported units of a surrogate are told apart from the best unit left out, from
 * the weights and standard errors of one fit on K + 1 units, and how many probes it would take
 * if not (in the spirit of the "perturbations to go" of Slack, Hilgard, Singh &amp; Lakkaraju 2021,
 * "Reliable post hoc explanations: modeling uncertainty in explainability", NeurIPS, §3.2; here
 * from the sandwich standard errors, which shrink as 1/√N).
 *
 * <p>A reported unit is settled when the lower end of its |weight| interval lies above the upper
 * end of the challenger's, or when both intervals lie within the resolution δ of zero: then
 * which of two negligible units is reported does not matter. With no challenger (every unit
 * reported), a unit is settled when its interval excludes zero or lies within δ of zero.
 */
final class Separation {
    private Separation() {
    }

    /** The verdict: settled, or the total number of probes estimated to settle every unit. */
    record Verdict(boolean settled, double probesNeeded) {
    }

    /**
     * @param fit        a fit on the K reported units followed by the challenger (or on all units)
     * @param reported   how many of its units are reported (the rest, at most one, is the challenger)
     * @param z          the normal quantile of the interval level
     * @param resolution δ: effects below it count as negligible
     * @param probes     the probes behind the fit
     */
    static Verdict of(Surrogate fit, int reported, double z, double resolution, int probes) {
        double[] w = fit.weights();
        double[] se = fit.se();
        boolean challenger = w.length > reported;
        double cw = challenger ? Math.abs(w[reported]) : 0.0;
        double cse = challenger ? se[reported] : 0.0;
        boolean settled = true;
        double needed = probes;
        for (int j = 0; j < reported; j++) {
            double a = Math.abs(w[j]);
            double s = se[j];
            boolean apart = a - z * s > cw + z * cse;
            boolean negligible = a + z * s < resolution && cw + z * cse < resolution;
            if (apart || negligible) {
                continue;
            }
            settled = false;
            // Standard errors shrink as √(N / N'): the N' at which either route would hold.
            double viaGap = a > cw ? probes * square(z * (s + cse) / (a - cw)) : Double.POSITIVE_INFINITY;
            double viaZero = Math.max(a, cw) < resolution
                    ? probes * square(z * Math.max(s, cse) / (resolution - Math.max(a, cw))) : Double.POSITIVE_INFINITY;
            needed = Math.max(needed, Math.min(viaGap, viaZero));
        }
        return new Verdict(settled, settled ? probes : needed);
    }

    private static double square(double v) {
        return v * v;
    }
}
