package org.telltale.report.html;

import org.telltale.audit.AssociationBasis;
import org.telltale.audit.FailOn;
import org.telltale.audit.ScrubScope;
import org.telltale.audit.ScrubGroup;
import org.telltale.audit.ScrubMode;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.Severity;
import org.telltale.explain.Explanation;

/**
 * An audit of the invented Harbourline Utilities support queue, built by hand for report tests:
 * billing tickets carry a planted queue code in their header ({@code Queue: BIL-7}), account
 * tickets a portal footer, and some tickets a reply address. Seeded, so every run is the same.
 */
final class SampleAudit {
    record Audit(AuditResult result, List<Explanation> explanations) {
    }

    private static final String[] LABELS = {"billing", "outage", "account"};
    private static final String[][] BODY = {
        {"I was charged twice for my invoice this month.", "Please refund the duplicate payment.",
            "The direct debit took the wrong amount.", "My statement shows a late fee I never owed."},
        {"The power has been out on our street since this morning.", "There is no water pressure at all.",
            "The whole block lost power after the storm.", "Our meter box sparks and the lights flicker."},
        {"I cannot log in to my account after the password reset.", "Please change the name on my account.",
            "I moved house and need to update my address.", "Close my account at the end of the month."}};

    private SampleAudit() {
    }

    static Audit of(int documents, long seed) {
        Random random = new Random(seed);
        List<Explanation> explanations = new ArrayList<>(documents);
        Map<String, List<AuditResult.Example>> examples = new LinkedHashMap<>();
        for (String term : List.of("bil", "portal", "noreply", "refund")) {
            examples.put(term, new ArrayList<>());
        }
        int correct = 0;
        for (int i = 0; i < documents; i++) {
            int gold = random.nextInt(3);
            int predicted = random.nextDouble() < 0.9 ? gold : (gold + 1) % 3;
            if (predicted == gold) {
                correct++;
            }
            StringBuilder text = new StringBuilder();
            text.append("From: customer").append(1000 + i).append("@example.net\n");
            if (gold == 0) {
                text.append("Queue: BIL-7\n");
            }
            text.append("Subject: ticket ").append(40000 + i).append("\n\n");
            for (int s = 0; s < 2 + random.nextInt(4); s++) {
                text.append(BODY[gold][random.nextInt(BODY[gold].length)]).append(' ');
            }
            if (random.nextInt(4) == 0) {
                text.append("\nReply to noreply@harbourline.example for updates.");
            }
            if (gold == 2) {
                text.append("\n--\nSent from the Harbourline customer portal");
            }
            text.append('\n');
            String id = String.format(java.util.Locale.ROOT, "HL-%05d", 20000 + i);
            String body = text.toString();
            List<Explanation.TermWeight> terms = new ArrayList<>();
            for (String word : candidates(gold)) {
                if (body.toLowerCase(java.util.Locale.ROOT).contains(word)) {
                    double w = (word.equals("bil") ? 0.25 : word.equals("portal") ? 0.18 : 0.06 + random.nextDouble() * 0.12)
                            * (word.equals("bil") || word.equals("portal") || random.nextInt(6) != 0 ? 1 : -1);
                    double half = 0.02 + random.nextDouble() * 0.04;
                    Explanation.TermWeight t = SampleExplanations.term(body, word, w, w - half, w + half);
                    terms.add(t);
                    if (examples.containsKey(word)) {
                        examples.get(word).add(new AuditResult.Example(id, t.spans()));
                    }
                }
            }
            terms.sort((a, b) -> Double.compare(Math.abs(b.weight()), Math.abs(a.weight())));
            double top = 0.7 + random.nextDouble() * 0.25;
            double rest = (1 - top) / 2;
            Map<String, Double> scores = new LinkedHashMap<>();
            for (int l = 0; l < 3; l++) {
                scores.put(LABELS[l], l == predicted ? top : rest);
            }
            explanations.add(SampleExplanations.explanation(id, body, LABELS[predicted], LABELS[predicted], scores,
                    1000, 0.6 + random.nextDouble() * 0.35, terms, LABELS[gold]));
        }
        List<AuditResult.Artefact> artefacts = List.of(
                artefact("Queue: bil", List.of("bil"), ArtefactKind.HEADER, Severity.HIGH, "billing", 0.25, 21.4, true,
                        false, examples.get("bil")),
                artefact("Sent from the Harbourline customer portal", List.of("portal"), ArtefactKind.BOILERPLATE,
                        Severity.MEDIUM, "account", 0.18, 17.9, true, false, examples.get("portal")),
                artefact("harbourline.example", List.of("noreply"), ArtefactKind.ADDRESS, Severity.LOW, "outage", 0.07,
                        5.2, false, false, examples.get("noreply")),
                artefact("refund", List.of("refund"), ArtefactKind.CONTENT, Severity.LOW, "billing", 0.12, 9.6, false,
                        true, examples.get("refund")));
        List<AuditResult.Scrub> scrub = List.of(
                new AuditResult.Scrub(ScrubGroup.of(ArtefactKind.HEADER), ScrubMode.LINES, List.of(artefacts.get(0).id()), ScrubScope.EXPLAINED, documents / 3,
                        documents / 8, 0.375, 0.212, 0.93, 0.71),
                new AuditResult.Scrub(ScrubGroup.of(ArtefactKind.BOILERPLATE), ScrubMode.LINES, List.of(artefacts.get(1).id()), ScrubScope.EXPLAINED, documents / 3,
                        documents / 20, 0.15, 0.094, 0.91, 0.84),
                new AuditResult.Scrub(ScrubGroup.of(ArtefactKind.ADDRESS), ScrubMode.MATCHES, List.of(artefacts.get(2).id()), ScrubScope.EXPLAINED, documents / 4,
                        0, 0.0, 0.004, 0.9, 0.9),
                new AuditResult.Scrub(ScrubGroup.ALL, ScrubMode.MIXED, artefacts.subList(0, 3).stream()
                        .map(AuditResult.Artefact::id).toList(), ScrubScope.EXPLAINED, documents / 2, documents / 6, 0.33, 0.18,
                        0.92, 0.66));
        List<AuditResult.TermStat> terms = new ArrayList<>();
        for (AuditResult.Artefact a : artefacts) {
            AuditResult.ArtefactTerm t = a.terms().get(0);
            terms.add(new AuditResult.TermStat(t.term(), a.label(), a.kind(), a.support(), t.importance(),
                    t.association(), 1.4, t.weight(), a.examples().size(), a.id()));
        }
        for (String word : List.of("invoice", "charged", "payment", "power", "water", "storm", "account", "password")) {
            terms.add(new AuditResult.TermStat(word, "billing", ArtefactKind.CONTENT, 40, 0.2 + random.nextDouble(),
                    random.nextDouble() * 6, 0.3, 0.05, 10, null));
        }
        List<String> picks = new ArrayList<>();
        for (int i = 0; i < Math.min(3, documents); i++) {
            picks.add(explanations.get(i).id());
        }
        Map<String, Double> prior = new LinkedHashMap<>();
        Map<String, Long> counts = new LinkedHashMap<>();
        for (String label : LABELS) {
            prior.put(label, 1.0 / 3);
            counts.put(label, (long) documents / 3);
        }
        AuditResult.Summary summary = new AuditResult.Summary(documents * 4L, documents, List.of(LABELS),
                documents == 0 ? null : (double) correct / documents, 2, 0, "naive Bayes, harbourline-router.model",
                "harbourline-tickets.jsonl", seed, new AuditSettings(documents, 1000, 8, 3, false, FailOn.HIGH,
                        AuditSettings.DEFAULT_ALPHA, 64, "standard", null),
                AssociationBasis.GOLD, prior, counts, 4.42, 3120, 0.81, 91_000);
        return new Audit(new AuditResult(summary, artefacts, scrub, picks, terms), explanations);
    }

    private static List<String> candidates(int label) {
        return switch (label) {
            case 0 -> List.of("bil", "invoice", "refund", "charged", "payment", "noreply");
            case 1 -> List.of("power", "water", "storm", "meter", "noreply");
            default -> List.of("portal", "account", "password", "address", "noreply");
        };
    }

    private static AuditResult.Artefact artefact(String pattern, List<String> termNames, ArtefactKind kind,
            Severity severity, String label, double weight, double z, boolean confirmed, boolean suppressed,
            List<AuditResult.Example> examples) {
        double importance = Math.sqrt(examples.size() * weight);
        List<AuditResult.ArtefactTerm> terms = termNames.stream()
                .map(t -> new AuditResult.ArtefactTerm(t, importance, z, weight)).toList();
        AuditResult.Effect scrub = new AuditResult.Effect(examples.size(), confirmed ? examples.size() / 3 : 0,
                confirmed ? 1.0 / 3 : 0, confirmed ? 0.2 : 0.01, 0.95, confirmed ? 0.6 : 0.95);
        String id = org.telltale.audit.ArtefactIdentity.of(kind, label, pattern).id();
        return new AuditResult.Artefact(id, kind, severity, label, pattern, examples.size(), importance, z, 0.96,
                confirmed, suppressed, suppressed ? org.telltale.audit.Policy.Status.ACCEPTED : null,
                suppressed ? "refund requests are the task's own evidence" : null, terms, scrub, examples);
    }

}
