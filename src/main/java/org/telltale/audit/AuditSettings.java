package org.telltale.audit;

import java.util.Objects;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Target;

/**
 * The knobs of one audit that decide its result, recorded in {@code audit.json} and checked on
 * {@code --resume} so that a resumed run cannot silently mix two configurations.
 *
 * @param sample   how many documents to explain (N), stratified
 * @param probes   the probe budget of each explanation
 * @param words    how many terms each explanation selects (K)
 * @param picks    how many documents the submodular pick chooses for the reviewer (B)
 * @param scrubAll whether the scrub test rewrites the whole corpus, not only the explained documents
 * @param failOn   the gate for exit code 3
 * @param alpha    the family-wise significance level before the Bonferroni correction
 * @param batch    how many documents one scoring call carries while the corpus is scored
 * @param analyzer the analyzer name that cut texts into terms
 * @param policy   the policy file's name, or {@code null}
 */
public record AuditSettings(
        int sample,
        int probes,
        int words,
        int picks,
        boolean scrubAll,
        FailOn failOn,
        double alpha,
        int batch,
        String analyzer,
        String policy) implements java.io.Serializable {

    /** The family-wise level a finding's association must pass, before the Bonferroni division. */
    public static final double DEFAULT_ALPHA = 0.05;

    public AuditSettings {
        Objects.requireNonNull(failOn, "failOn");
        Objects.requireNonNull(analyzer, "analyzer");
        atLeast("sample", sample, 1);
        atLeast("probes", probes, 2);
        atLeast("words", words, 1);
        atLeast("picks", picks, 0);
        atLeast("batch", batch, 1);
        if (!(alpha > 0 && alpha < 1)) {
            throw new IllegalArgumentException("alpha must lie in (0, 1): " + alpha);
        }
    }

    /**
     * One setting, one message, in the core's own words ({@code "words must be at least 1: 0"});
     * the command line maps the setting's name to its option once ({@code OptionWords}).
     */
    private static void atLeast(String setting, int value, int least) {
        if (value < least) {
            throw new IllegalArgumentException(setting + " must be at least " + least + ": " + value);
        }
    }

    /**
     * How the audit explains each sampled document, for every front that runs an audit: the
     * explainer's defaults with these words, probes and analyzer and the run seed, in probability
     * (the audit's rules are set on that scale).
     */
    public ExplainSettings explainSettings(long seed) {
        return ExplainSettings.defaults().withWords(words).withProbes(probes).withSeed(seed).withAnalyzer(analyzer)
                .withTarget(Target.PROBABILITY);
    }
}
