package org.telltale.report.html;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AuditResult;
import org.telltale.audit.Severity;
import org.telltale.explain.Explanation;
import org.telltale.text.Span;

/** Builds the {@link AuditView} from an audit result and the explanations it was made of. */
public final class AuditViews {
    /** Index rows shown per page of the document browser. */
    public static final int PAGE_SIZE = 50;
    /** Documents quoted in context under each artefact; the rest are counted and reachable in the browser. */
    static final int CONTEXTS_PER_FINDING = 8;
    private static final int CONTEXT_CHARS = 70;
    private static final int SPANS_PER_CONTEXT_DOC = 2;

    private AuditViews() {
    }

    static AuditView of(AuditResult audit, List<Explanation> explanations) {
        Map<String, Integer> byId = new HashMap<>();
        for (int i = 0; i < explanations.size(); i++) {
            byId.putIfAbsent(explanations.get(i).id(), i);
        }
        List<AuditView.FindingRow> findings = new ArrayList<>();
        for (int i = 0; i < audit.artefacts().size(); i++) {
            findings.add(finding(i, audit.artefacts().get(i), explanations, byId));
        }
        List<DocumentView> picks = new ArrayList<>();
        List<String> missing = new ArrayList<>();
        for (String id : audit.picks()) {
            Integer at = byId.get(id);
            if (at == null) {
                missing.add(VisibleText.inline(id));
            } else {
                picks.add(DocumentViews.of(explanations.get(at), "pick-" + picks.size()));
            }
        }
        List<DocumentView> documents = documentViews(explanations);
        List<AuditView.IndexRow> index = index(explanations, documents, new java.util.HashSet<>(audit.picks()));
        AuditResult.Summary s = audit.summary();
        return new AuditView(tiles(audit), VisibleText.inline(s.model()), VisibleText.inline(s.corpus()),
                verdict(audit), ScrubCharts.of(audit.scrub()), findings, kinds(audit),
                Scatters.of(findings, audit, s.zThreshold()), picks, missing, index, documents, PAGE_SIZE);
    }

    /** The views of the browsable documents, anchored {@code doc-0}, {@code doc-1}, … */
    static List<DocumentView> documentViews(List<Explanation> explanations) {
        List<DocumentView> documents = new ArrayList<>(explanations.size());
        for (int i = 0; i < explanations.size(); i++) {
            documents.add(DocumentViews.of(explanations.get(i), "doc-" + i));
        }
        return documents;
    }

    /** One index row per document; only the first page shows before the script runs. */
    static List<AuditView.IndexRow> index(List<Explanation> explanations, List<DocumentView> views,
            java.util.Set<String> pickIds) {
        List<AuditView.IndexRow> index = new ArrayList<>(explanations.size());
        for (int i = 0; i < explanations.size(); i++) {
            Explanation e = explanations.get(i);
            DocumentView view = views.get(i);
            String top = e.terms().isEmpty() ? "" : VisibleText.inline(e.terms().get(0).term());
            index.add(new AuditView.IndexRow(i, view.anchor(), view.id(), view.predicted(), view.gold(), top,
                    i >= PAGE_SIZE, pickIds.contains(e.id())));
        }
        return index;
    }

    private static List<AuditView.Tile> tiles(AuditResult audit) {
        AuditResult.Summary s = audit.summary();
        long open = audit.artefacts().stream().filter(f -> !f.suppressed()).count();
        long suppressed = audit.artefacts().size() - open;
        List<AuditView.Tile> tiles = new ArrayList<>();
        tiles.add(new AuditView.Tile("documents scored", Long.toString(s.documents()),
                s.skipped() == 0 ? "none skipped" : s.skipped() + " skipped as unreadable"));
        tiles.add(new AuditView.Tile("explained", Integer.toString(s.explained()),
                s.documents() == 0 ? "" : Numbers.percent((double) s.explained() / s.documents()) + " of the corpus"));
        tiles.add(new AuditView.Tile("accuracy", s.accuracy() == null ? "n/a" : Numbers.percent(s.accuracy()),
                s.accuracy() == null ? "no gold labels" : "prediction = gold label"));
        tiles.add(new AuditView.Tile("open artefacts", Long.toString(open), severityBreakdown(audit)));
        audit.scrub().stream().filter(AuditResult.Scrub::all).findFirst()
                .filter(x -> x.accuracyBefore() != null && x.accuracyAfter() != null)
                .ifPresent(x -> tiles.add(new AuditView.Tile("without all artefacts",
                        Numbers.percent(x.accuracyBefore()) + " → " + Numbers.percent(x.accuracyAfter()),
                        "accuracy on the " + x.documents() + " " + x.scope().key() + " documents they touch")));
        tiles.add(new AuditView.Tile("suppressed", Long.toString(suppressed), "accepted by the policy"));
        tiles.add(new AuditView.Tile("labels", Integer.toString(s.labels().size()),
                VisibleText.inline(String.join(", ", s.labels()))));
        return List.copyOf(tiles);
    }

    private static String severityBreakdown(AuditResult audit) {
        List<String> parts = new ArrayList<>();
        for (Severity severity : Severity.values()) {
            long n = audit.artefacts().stream().filter(f -> !f.suppressed() && f.severity() == severity).count();
            if (n > 0) {
                parts.add(n + " " + severity.key());
            }
        }
        return parts.isEmpty() ? "none" : String.join(" · ", parts);
    }

    private static String verdict(AuditResult audit) {
        List<AuditResult.Artefact> open = audit.open(Severity.LOW);
        if (open.isEmpty()) {
            return "No open artefact: the audit found none of the artefacts it looks for. That is not a certificate.";
        }
        long confirmed = open.stream().filter(AuditResult.Artefact::confirmed).count();
        return open.size() + (open.size() == 1 ? " open artefact" : " open artefacts") + ", " + confirmed
                + (confirmed == 1 ? " confirmed by its own scrub" : " confirmed each by its own scrub")
                + ": the model's predictions move when that artefact alone is removed.";
    }

    private static List<String> kinds(AuditResult audit) {
        return audit.artefacts().stream().map(f -> f.kind().key()).distinct().sorted().toList();
    }

    private static AuditView.FindingRow finding(int i, AuditResult.Artefact f, List<Explanation> explanations,
            Map<String, Integer> byId) {
        AuditResult.Effect scrub = f.scrub();
        List<AuditView.Fact> facts = new ArrayList<>();
        facts.add(new AuditView.Fact("id", f.id()));
        facts.add(new AuditView.Fact("its own scrub", scrub.documents() + " documents rewritten without it, "
                + scrub.flips() + " flipped, mean score drop " + Numbers.plain(scrub.scoreDrop(), 3)
                + (scrub.accuracyBefore() == null || scrub.accuracyAfter() == null ? ""
                        : ", accuracy " + Numbers.percent(scrub.accuracyBefore()) + " → " + Numbers.percent(scrub.accuracyAfter()))));
        facts.add(new AuditView.Fact("p̂(label | strongest term)", Numbers.plain(f.pLabelGivenTerm(), 3)));
        for (AuditResult.ArtefactTerm t : f.terms()) {
            facts.add(new AuditView.Fact("term " + VisibleText.inline(t.term()), "importance " + Numbers.plain(t.importance(), 3)
                    + ", z " + Numbers.plain(t.association(), 2) + ", mean weight " + Numbers.signed(t.weight())));
        }
        MarkedText.Mark mark = new MarkedText.Mark(0, true, 4);
        List<AuditView.Context> contexts = new ArrayList<>();
        int shown = 0;
        for (AuditResult.Example example : f.examples()) {
            if (shown == CONTEXTS_PER_FINDING) {
                break;
            }
            shown++;
            Integer at = byId.get(example.id());
            String text = at == null ? null : explanations.get(at).text();
            String anchor = at == null ? null : "doc-" + at;
            if (text == null) {
                contexts.add(new AuditView.Context(VisibleText.inline(example.id()), anchor, false, false, null));
                continue;
            }
            int covered = -1;
            int windows = 0;
            for (Span span : example.spans()) {
                if (span.start() < covered || windows == SPANS_PER_CONTEXT_DOC || span.end() > text.length()) {
                    continue;
                }
                int from = safeCut(text, Math.max(0, span.start() - CONTEXT_CHARS));
                int to = safeCut(text, Math.min(text.length(), span.end() + CONTEXT_CHARS));
                // Never cut an occurrence in half at the window's edges: widen to take it whole.
                for (Span other : example.spans()) {
                    if (other.start() < from && from < other.end()) {
                        from = other.start();
                    }
                    if (other.start() < to && to < other.end() && other.end() <= text.length()) {
                        to = other.end();
                    }
                }
                contexts.add(new AuditView.Context(VisibleText.inline(example.id()), anchor, from > 0,
                        to < text.length(), MarkedText.window(text, from, to, example.spans(), mark)));
                covered = to;
                windows++;
            }
        }
        return new AuditView.FindingRow(i, "finding-" + i, VisibleText.inline(f.pattern()),
                VisibleText.inline(String.join(", ", f.termNames())), f.kind().key(),
                f.severity().key(), f.severity().ordinal(), VisibleText.inline(f.label()), f.support(),
                Numbers.plain(f.importance(), 3), f.importance(), Numbers.plain(f.association(), 2), f.association(),
                f.confirmed(), f.suppressed(), VisibleText.inline(f.policyNote()), facts, contexts,
                f.examples().size() - shown);
    }

    /** Moves a cut off the middle of a surrogate pair, so no half character is shown. */
    private static int safeCut(String text, int at) {
        return at > 0 && at < text.length() && Character.isLowSurrogate(text.charAt(at)) ? at - 1 : at;
    }

    /** The SVG shape that stands for a kind, so kinds differ by form as well as by legend. */
    static String shape(String kind) {
        return switch (ArtefactKind.fromKey(kind.toLowerCase(Locale.ROOT))) {
            case HEADER -> "circle";
            case ADDRESS -> "square";
            case IDENTIFIER -> "diamond";
            case BOILERPLATE -> "triangle";
            case CONTENT -> "cross";
        };
    }
}
