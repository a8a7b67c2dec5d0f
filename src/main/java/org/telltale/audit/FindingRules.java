package org.telltale.audit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Decides which (term, label) pairs are flagged, to be grouped into artefacts ({@link ArtefactGrouping}): the explanations weigh the term towards the
 * label (mean weight above zero) with an importance of at least {@value #IMPORTANCE_SHARE} of the
 * label's most important term; the corpus associates the term with the label beyond the
 * Bonferroni-corrected threshold and by at least {@value #MIN_PMI} bits of PMI; and its
 * occurrences sit mostly outside content — or the policy marks it {@code artefact}. Severity and
 * confirmation come later, per artefact, from its own scrub.
 */
final class FindingRules {
    /** A term must reach this share of its label's top importance to count as important. */
    static final double IMPORTANCE_SHARE = 0.1;
    /** Fewer documents than this give no usable normal approximation; such pairs are not tested. */
    static final int MIN_SUPPORT = 5;
    /**
     * The least PMI, in bits, of a finding: p̂(label | term) at least 2^0.5 ≈ 1.41 times the prior.
     * On a large corpus a tiny lean passes any significance test; a function word that sits in
     * repeated template lines slightly more often in one queue is not an artefact worth reporting.
     */
    static final double MIN_PMI = 0.5;

    /** A flagged (term, label) pair with its statistics and the policy rule that matched it. */
    record Candidate(TermWeights.Entry entry, ArtefactKind kind, long support, double z, double pmi,
            double pLabelGivenTerm, Map<String, Long> df, Map<String, Double> kindShares,
            boolean significant, Optional<Policy.Rule> rule) {

        String term() {
            return entry.term();
        }

        String label() {
            return entry.label();
        }

        boolean suppressed() {
            return rule.map(r -> r.status() == Policy.Status.ACCEPTED).orElse(false);
        }
    }

    /** The outcome: the candidates, and the test bookkeeping for the summary. */
    record Outcome(List<Candidate> candidates, int tested, double threshold, List<AuditResult.TermStat> terms) {
    }

    private FindingRules() {
    }

    static Outcome apply(TermWeights weights, CorpusTerms corpus, Map<String, Double> prior, Policy policy,
            double alpha) {
        List<TermWeights.Entry> supporting = new ArrayList<>();
        for (TermWeights.Entry e : weights.entries()) {
            if (e.meanWeight() > 0 && prior.containsKey(e.label())) {
                supporting.add(e);
            }
        }
        int tested = 0;
        for (TermWeights.Entry e : supporting) {
            if (support(corpus.df(e.term())) >= MIN_SUPPORT) {
                tested++;
            }
        }
        double threshold = Association.threshold(alpha, Math.max(1, tested));
        List<Candidate> candidates = new ArrayList<>();
        List<AuditResult.TermStat> stats = new ArrayList<>();
        for (TermWeights.Entry e : supporting) {
            Map<String, Long> df = corpus.df(e.term());
            long n = support(df);
            long k = df.getOrDefault(e.label(), 0L);
            double p0 = prior.get(e.label());
            double pHat = n == 0 ? Double.NaN : (double) k / n;
            double z = n >= MIN_SUPPORT ? Association.z(k, n, p0) : Double.NaN;
            boolean significant = z >= threshold;
            boolean important = e.importance() >= IMPORTANCE_SHARE * weights.maxImportance(e.label());
            ArtefactKind kind = ArtefactGrouping.kindOf(e.term(), corpus);
            Optional<Policy.Rule> rule = policy.match(e.term());
            boolean marked = rule.map(r -> r.status() == Policy.Status.ARTEFACT).orElse(false);
            double pmi = Association.pmi(pHat, p0);
            boolean strong = significant && pmi >= MIN_PMI;
            if (n >= MIN_SUPPORT || marked) {
                stats.add(new AuditResult.TermStat(e.term(), e.label(), kind, n, e.importance(), z, pmi, e.meanWeight(),
                        e.selected(), null));
            }
            if ((important && strong && kind != ArtefactKind.CONTENT) || marked) {
                Map<String, Double> shares = new LinkedHashMap<>();
                corpus.kindShares(e.term()).forEach((kk, v) -> shares.put(kk.key(), v));
                candidates.add(new Candidate(e, kind, n, z, pmi, pHat, df, shares,
                        significant, rule));
            }
        }
        return new Outcome(candidates, tested, threshold, stats);
    }

    private static long support(Map<String, Long> df) {
        return df.values().stream().mapToLong(Long::longValue).sum();
    }
}
