package org.telltale.audit;

/**
 * The documented rules that decide a finding's {@link Severity} (docs/audit.md, "Severity"):
 * <ul>
 *   <li>{@code high}: the scrub test confirmed it, its association passed the corrected threshold,
 *       and p̂(label | term) ≥ {@value #STRONG}: the model leans on a term that almost decides the
 *       label by itself;</li>
 *   <li>{@code medium}: confirmed, or significant with p̂(label | term) ≥ {@value #STRONG}, or
 *       marked {@code artefact} by the policy;</li>
 *   <li>{@code low}: every other finding — significant and important, but neither proven nor a
 *       near-perfect predictor.</li>
 * </ul>
 */
public final class SeverityRules {
    /** p̂(label | term) at or above which a term nearly decides the label on its own. */
    public static final double STRONG = 0.8;
    /**
     * Mean drop of the label's score, over the explained documents that contain the term, that
     * confirms a finding when its label's flagged terms are scrubbed together.
     */
    public static final double CONFIRMING_DROP = 0.05;

    private SeverityRules() {
    }

    public static Severity of(boolean confirmed, boolean significant, double pLabelGivenTerm, boolean policyArtefact) {
        boolean strong = significant && pLabelGivenTerm >= STRONG;
        if (confirmed && strong) {
            return Severity.HIGH;
        }
        if (confirmed || strong || policyArtefact) {
            return Severity.MEDIUM;
        }
        return Severity.LOW;
    }

    /** Whether removing the terms moved predictions: a flip, or a mean score drop of at least {@value #CONFIRMING_DROP}. */
    public static boolean confirmed(int flips, double meanDrop) {
        return flips > 0 || meanDrop >= CONFIRMING_DROP;
    }
}
