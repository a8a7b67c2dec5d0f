package org.telltale.audit;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.telltale.text.Span;

/**
 * Everything one audit concluded: a summary of the run, the artefacts (each with its terms and its
 * own scrub), the scrub test per kind and all at once, the documents picked for a reviewer, and the
 * statistics of every tested term. Its public face is the {@code telltale.audit} v2 JSON contract
 * written by {@code org.telltale.report.json.AuditJson}; a report can always be rendered from that
 * file alone (together with {@code explanations.jsonl}).
 *
 * <p>Immutable; collections are copied on construction.
 */
public record AuditResult(Summary summary, List<Artefact> artefacts, List<Scrub> scrub, List<String> picks,
                          List<TermStat> terms) {

    public AuditResult {
        Objects.requireNonNull(summary, "summary");
        artefacts = List.copyOf(artefacts);
        scrub = List.copyOf(scrub);
        picks = List.copyOf(picks);
        terms = List.copyOf(terms);
    }

    /** The artefacts a CI gate counts: not suppressed by the policy, at least {@code severity}. */
    public List<Artefact> open(Severity severity) {
        return artefacts.stream().filter(a -> !a.suppressed() && a.severity().atLeast(severity)).toList();
    }

    /** An unmodifiable copy that keeps the caller's order, so JSON output is stable. */
    static <K, V> Map<K, V> ordered(Map<K, V> map) {
        return Collections.unmodifiableMap(new LinkedHashMap<>(map));
    }

    /**
     * What the audit reports: one header field, repeated line, address or identifier shape that the
     * model leans on for one label, with the terms that make it up (docs/audit.md, "Artefacts").
     *
     * @param id          {@code kind-} and the first 12 hex digits of its {@link ArtefactIdentity}
     *                    fingerprint: the same artefact has the same id in every run
     * @param kind        where it sits
     * @param severity    from its own evidence ({@link SeverityRules})
     * @param label       the label it pushes the model towards
     * @param pattern     what a reviewer recognises: {@code X-Intake-Route: acc7}, the repeated line,
     *                    the host, the shape {@code HR-#####}
     * @param support     corpus documents containing its most frequent term
     * @param importance  sqrt of the absolute weights of all its terms summed over the explained
     *                    documents (its terms' importances added in quadrature)
     * @param association the z-statistic of its most associated term
     * @param pLabelGivenTerm p̂(label | term) of that term
     * @param confirmed   whether removing this artefact alone moved predictions
     * @param suppressed  whether the policy accepts it as expected evidence
     * @param policy      the status the policy gave it, or {@code null}
     * @param policyNote  the reviewer's note on the matching rule, or {@code null}
     * @param terms       its terms, most important first
     * @param scrub       the effect of removing it alone from the explained documents assigned its label
     * @param examples    explained documents where the model leaned on it, with every occurrence of
     *                    its terms in its place marked
     */
    public record Artefact(
            String id,
            ArtefactKind kind,
            Severity severity,
            String label,
            String pattern,
            long support,
            double importance,
            double association,
            double pLabelGivenTerm,
            boolean confirmed,
            boolean suppressed,
            Policy.Status policy,
            String policyNote,
            List<ArtefactTerm> terms,
            Effect scrub,
            List<Example> examples) {

        public Artefact {
            Objects.requireNonNull(id, "id");
            Objects.requireNonNull(kind, "kind");
            Objects.requireNonNull(severity, "severity");
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(pattern, "pattern");
            Objects.requireNonNull(scrub, "scrub");
            terms = List.copyOf(terms);
            examples = List.copyOf(examples);
        }

        /** The identity SARIF fingerprints and a baseline compares. */
        public ArtefactIdentity identity() {
            return ArtefactIdentity.of(kind, label, pattern);
        }

        /** The terms alone. */
        public List<String> termNames() {
            return terms.stream().map(ArtefactTerm::term).toList();
        }
    }

    /** One term of an artefact and its own statistics. */
    public record ArtefactTerm(String term, double importance, double association, double weight) {
        public ArtefactTerm {
            Objects.requireNonNull(term, "term");
        }
    }

    /**
     * What one scrub did: documents rewritten (those it changed), of those the ones whose predicted
     * label changed, the mean drop of the score that was pushed, and accuracy before and after on
     * those with a gold label ({@code null} without).
     */
    public record Effect(int documents, int flips, double flipRate, double scoreDrop, Double accuracyBefore,
                         Double accuracyAfter) {
        public static final Effect NONE = new Effect(0, 0, 0, Double.NaN, null, null);
    }

    /**
     * The statistics of one term the audit tested towards one label, flagged or not: what the
     * importance–association chart draws.
     *
     * @param artefact the id of the artefact it belongs to, or {@code null}
     */
    public record TermStat(String term, String label, ArtefactKind kind, long support, double importance,
                           double association, double pmi, double weight, int selectedIn, String artefact) {
        public TermStat {
            Objects.requireNonNull(term, "term");
            Objects.requireNonNull(label, "label");
            Objects.requireNonNull(kind, "kind");
        }
    }

    /**
     * What was audited and how.
     *
     * @param documents         documents in the corpus that were scored
     * @param explained         documents explained (the stratified sample)
     * @param labels            the model's labels, in its order
     * @param accuracy          share of scored documents whose prediction equals the gold label, or
     *                          {@code null} when the corpus carries no gold labels
     * @param skipped           corpus records skipped as unreadable ({@code --skip-bad})
     * @param retries           scoring calls the connector had to repeat
     * @param model             the model's description; never a secret
     * @param corpus            the corpus file's name
     * @param seed              the run seed every random stream derives from
     * @param settings          the settings that decided this result
     * @param associationBasis  {@code GOLD} when association is measured against gold labels (all
     *                          documents carry one), else {@code PREDICTED}
     * @param prior             each label's share of the corpus on that basis: the null hypothesis
     *                          of the z-test
     * @param predictedCounts   documents the model assigns to each label
     * @param zThreshold        the Bonferroni-corrected one-sided critical value
     * @param termsTested       (term, label) pairs tested, the Bonferroni divisor
     * @param pickCoverage      share of the total importance the picked documents cover
     * @param elapsedMs         wall time of this invocation; with {@code retries}, the only fields
     *                          that may differ between a resumed and an uninterrupted run
     */
    public record Summary(
            long documents,
            int explained,
            List<String> labels,
            Double accuracy,
            long skipped,
            long retries,
            String model,
            String corpus,
            long seed,
            AuditSettings settings,
            AssociationBasis associationBasis,
            Map<String, Double> prior,
            Map<String, Long> predictedCounts,
            double zThreshold,
            int termsTested,
            double pickCoverage,
            long elapsedMs) {

        public Summary {
            labels = List.copyOf(labels);
            Objects.requireNonNull(associationBasis, "associationBasis");
            prior = ordered(prior);
            predictedCounts = ordered(predictedCounts);
        }
    }

    /** One explained document and the spans marked in it. */
    public record Example(String id, List<Span> spans) {
        public Example {
            Objects.requireNonNull(id, "id");
            spans = List.copyOf(spans);
        }
    }

    /**
     * The scrub test of one kind's artefacts together, or of all artefacts at once: documents
     * rewritten without them and scored again.
     *
     * @param group          the kind scrubbed, or all artefacts at once ({@link ScrubGroup#ALL})
     * @param mode           how the kind is cut ({@link ScrubMode}), {@code MIXED} for several modes at once
     * @param artefacts      the ids of the artefacts removed
     * @param scope          the explained documents or the whole corpus (setting {@code scrubAll})
     * @param documents      documents rewritten (those the scrub changed)
     * @param flips          of those, documents whose predicted label changed
     * @param flipRate       {@code flips / documents}
     * @param scoreDrop      mean drop of the originally predicted label's score
     * @param accuracyBefore accuracy on those documents before the rewrite, or {@code null}
     * @param accuracyAfter  accuracy after it, or {@code null}
     */
    public record Scrub(
            ScrubGroup group,
            ScrubMode mode,
            List<String> artefacts,
            ScrubScope scope,
            int documents,
            int flips,
            double flipRate,
            double scoreDrop,
            Double accuracyBefore,
            Double accuracyAfter) {

        public Scrub {
            Objects.requireNonNull(group, "group");
            Objects.requireNonNull(mode, "mode");
            Objects.requireNonNull(scope, "scope");
            artefacts = List.copyOf(artefacts);
        }

        /** Whether this row removed every artefact at once. */
        public boolean all() {
            return group.all();
        }
    }
}
