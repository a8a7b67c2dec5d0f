package org.telltale.audit;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.audit.AuditResult.ArtefactTerm;
import org.telltale.audit.AuditResult.Example;
import org.telltale.explain.Explanation;
import org.telltale.text.Document;
import org.telltale.text.Span;

/**
 * Turns grouped terms into reported artefacts: the policy by artefact, the effect of its own scrub
 * (rescored before, by {@link ScrubTest}), its severity from its own evidence, and its examples
 * with every term of it marked (docs/audit.md, "Artefacts", "Severity").
 *
 * <p>Immutable and thread-safe.
 */
final class ArtefactAssembly {
    /** Example documents an artefact keeps for the report. */
    static final int MAX_EXAMPLES = TermWeights.MAX_EXAMPLES;

    private final Policy policy;
    private final Rewriter rewriter;

    ArtefactAssembly(Policy policy, Rewriter rewriter) {
        this.policy = policy;
        this.rewriter = rewriter;
    }

    /** What the scrub removes for a group. */
    static Rewriter.Target target(ArtefactGrouping.Group group) {
        return new Rewriter.Target(group.kind(), group.key(), new LinkedHashSet<>(group.terms()));
    }

    /**
     * Whether the policy accepts {@code group} as expected evidence (a rule for the artefact, or
     * every one of its terms accepted): an accepted artefact is not scrubbed.
     */
    boolean accepted(ArtefactGrouping.Group group) {
        Optional<Policy.Rule> rule = policy.matchArtefact(group.kind(), group.pattern());
        boolean termsAccepted = group.members().stream().allMatch(FindingRules.Candidate::suppressed);
        return rule.map(r -> r.status() == Policy.Status.ACCEPTED).orElse(termsAccepted);
    }

    /**
     * The artefact of {@code group}, given {@code effect}, what removing it alone did to the
     * explained documents assigned its label ({@link ScrubTest.Effect#NONE} when {@link #accepted}).
     */
    Artefact finish(ArtefactGrouping.Group group, ScrubTest.Effect effect, List<Explanation> explanations,
            Map<String, Document> documents) {
        Optional<Policy.Rule> rule = policy.matchArtefact(group.kind(), group.pattern());
        List<FindingRules.Candidate> members = group.members();
        boolean accepted = accepted(group);
        boolean marked = rule.map(r -> r.status() == Policy.Status.ARTEFACT)
                .orElse(members.stream().anyMatch(c -> c.rule().map(r -> r.status() == Policy.Status.ARTEFACT).orElse(false)));
        Policy.Status status = accepted ? Policy.Status.ACCEPTED : marked ? Policy.Status.ARTEFACT : null;
        String note = rule.map(Policy.Rule::note).orElse(status == null ? null : members.stream()
                .map(c -> c.rule().map(Policy.Rule::note).orElse(null)).filter(n -> n != null).findFirst().orElse(null));

        Rewriter.Target target = target(group);
        boolean confirmed = SeverityRules.confirmed(effect.flips(), effect.meanDrop());
        FindingRules.Candidate strongest = members.stream()
                .max(Comparator.comparingDouble((FindingRules.Candidate c) -> Double.isNaN(c.z()) ? Double.NEGATIVE_INFINITY : c.z()))
                .orElseThrow();
        Severity severity = SeverityRules.of(confirmed, strongest.significant(), strongest.pLabelGivenTerm(), marked);

        double sumSquares = 0;
        long support = 0;
        List<ArtefactTerm> terms = new ArrayList<>();
        for (FindingRules.Candidate c : members) {
            sumSquares += c.entry().importance() * c.entry().importance();
            support = Math.max(support, c.support());
            terms.add(new ArtefactTerm(c.term(), c.entry().importance(), c.z(), c.entry().meanWeight()));
        }
        ArtefactIdentity identity = ArtefactIdentity.of(group.kind(), group.label(), group.pattern());
        return new Artefact(identity.id(), group.kind(), severity, group.label(), group.pattern(), support,
                Math.sqrt(sumSquares), strongest.z(), strongest.pLabelGivenTerm(), confirmed, accepted, status, note, terms,
                effect.result(), examples(group, target, explanations, documents));
    }

    /**
     * The first explained documents, in sample order, whose explanation for the artefact's label
     * selected one of its terms, with the artefact's marks in each.
     */
    private List<Example> examples(ArtefactGrouping.Group group, Rewriter.Target target, List<Explanation> explanations,
            Map<String, Document> documents) {
        List<Example> out = new ArrayList<>();
        for (Explanation e : explanations) {
            if (out.size() == MAX_EXAMPLES) {
                break;
            }
            if (!e.label().equals(group.label())
                    || e.terms().stream().noneMatch(t -> target.terms().contains(t.term()))) {
                continue;
            }
            Document d = documents.get(e.id());
            List<Span> spans = d == null ? List.of() : rewriter.marks(d.text(), target);
            if (!spans.isEmpty()) {
                out.add(new Example(e.id(), spans));
            }
        }
        return out;
    }

    /** Artefacts in report order: severity, then importance, then pattern and label. */
    static final Comparator<Artefact> ORDER = Comparator.comparing(Artefact::severity)
            .thenComparing(Comparator.comparingDouble(Artefact::importance).reversed())
            .thenComparing(Artefact::pattern).thenComparing(Artefact::label);
}
