package org.telltale.audit;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;
import org.telltale.text.TermIndex;
import org.telltale.text.Unit;
import org.telltale.text.UnitKind;

/**
 * The counterfactual half of an audit: documents rewritten without flagged terms (or the lines
 * and blocks holding them) are scored again, and the change in predictions is measured.
 *
 * <p>Not thread-safe (it counts); the classifier it calls must be.
 */
final class ScrubTest {
    /** A document with the model's scores on its original text, in the model's label order. */
    record Scored(Document doc, String predicted, double[] scores) {
    }

    /** What removing something did to a set of documents; sums, so that parts can be merged. */
    record Effect(int documents, int flips, double totalDrop, int labelled, int correctBefore, int correctAfter) {
        static final Effect NONE = new Effect(0, 0, 0, 0, 0, 0);

        double flipRate() {
            return documents == 0 ? 0 : (double) flips / documents;
        }

        double meanDrop() {
            return documents == 0 ? Double.NaN : totalDrop / documents;
        }

        Double accuracyBefore() {
            return labelled == 0 ? null : (double) correctBefore / labelled;
        }

        Double accuracyAfter() {
            return labelled == 0 ? null : (double) correctAfter / labelled;
        }

        /** The public face of these sums. */
        AuditResult.Effect result() {
            return new AuditResult.Effect(documents, flips, flipRate(), meanDrop(), accuracyBefore(), accuracyAfter());
        }

        Effect plus(Effect o) {
            return new Effect(documents + o.documents, flips + o.flips, totalDrop + o.totalDrop,
                    labelled + o.labelled, correctBefore + o.correctBefore, correctAfter + o.correctAfter);
        }
    }

    private final TextClassifier classifier;
    private final Rewriter rewriter;
    private final int batch;
    private long calls;

    ScrubTest(TextClassifier classifier, Rewriter rewriter, int batch) {
        this.classifier = classifier;
        this.rewriter = rewriter;
        this.batch = batch;
    }

    /**
     * Removes the flagged terms of one label together from the documents the model assigned to
     * that label, and gives, per flagged term, the effect on the documents that contain it: how
     * many change their prediction and how far the label's score drops. The terms go together
     * because one label's artefacts are often redundant — a case code and a reply address on the
     * same ticket — and removing either alone would leave the other to carry the prediction.
     */
    Map<String, Effect> group(String label, Set<String> terms, List<Scored> documents) {
        List<Scored> changed = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        for (Scored s : documents) {
            if (!s.predicted().equals(label)) {
                continue;
            }
            String rewritten = rewriter.scrub(s.doc().text(), ArtefactKind.CONTENT, terms);
            if (!rewritten.equals(s.doc().text())) {
                changed.add(s);
                texts.add(rewritten);
            }
        }
        Map<String, Effect> byTerm = new LinkedHashMap<>();
        for (String term : terms) {
            byTerm.put(term, Effect.NONE);
        }
        List<Effect> effects = perDocument(changed, texts, label);
        for (int i = 0; i < changed.size(); i++) {
            Set<String> present = new HashSet<>();
            for (Unit unit : TermIndex.of(changed.get(i).doc().text(), rewriter.analyzer(), UnitKind.WORD).units()) {
                present.add(unit.term());
            }
            for (String term : terms) {
                if (present.contains(term)) {
                    byTerm.merge(term, effects.get(i), Effect::plus);
                }
            }
        }
        return byTerm;
    }

    /**
     * Removes one artefact alone from the documents the model assigned to its {@code label} and
     * measures the effect on those it changed: flips away from the label and the drop of its score.
     */
    Effect artefact(String label, Rewriter.Target target, List<Scored> documents) {
        List<Scored> changed = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        for (Scored s : documents) {
            if (!s.predicted().equals(label)) {
                continue;
            }
            String rewritten = rewriter.scrub(s.doc().text(), List.of(target));
            if (!rewritten.equals(s.doc().text())) {
                changed.add(s);
                texts.add(rewritten);
            }
        }
        return measure(changed, texts, label);
    }

    /** Removes {@code targets} together from every document and measures the effect on each one's own prediction. */
    Effect together(List<Rewriter.Target> targets, List<Scored> documents) {
        List<Scored> changed = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        for (Scored s : documents) {
            String rewritten = rewriter.scrub(s.doc().text(), targets);
            if (!rewritten.equals(s.doc().text())) {
                changed.add(s);
                texts.add(rewritten);
            }
        }
        return measure(changed, texts, null);
    }

    /** As {@link #together}, for documents whose original scores are not known yet (for {@code --scrub-all}). */
    Effect togetherUnscored(List<Rewriter.Target> targets, List<Document> documents) {
        List<Document> changed = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        for (Document d : documents) {
            String rewritten = rewriter.scrub(d.text(), targets);
            if (!rewritten.equals(d.text())) {
                changed.add(d);
                texts.add(rewritten);
            }
        }
        if (changed.isEmpty()) {
            return Effect.NONE;
        }
        ScoreMatrix before = classifier.score(changed.stream().map(Document::text).toList(),
                changed.stream().map(Document::id).toList());
        calls++;
        List<Scored> scored = new ArrayList<>();
        for (int i = 0; i < changed.size(); i++) {
            scored.add(new Scored(changed.get(i), before.predicted(i), before.row(i)));
        }
        return measure(scored, texts, null);
    }

    /** Scrubs {@code terms} as {@code kind} prescribes from every document, and measures the effect. */
    Effect kind(ArtefactKind kind, Set<String> terms, List<Scored> documents) {
        List<Scored> changed = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        for (Scored s : documents) {
            String rewritten = rewriter.scrub(s.doc().text(), kind, terms);
            if (!rewritten.equals(s.doc().text())) {
                changed.add(s);
                texts.add(rewritten);
            }
        }
        return measure(changed, texts, null);
    }

    /**
     * The effect of scrubbing {@code documents}, whose original scores are not known yet: both
     * versions of each document the rewrite changes are scored (for {@code --scrub-all}).
     */
    Effect kindUnscored(ArtefactKind kind, Set<String> terms, List<Document> documents) {
        List<Document> changed = new ArrayList<>();
        List<String> texts = new ArrayList<>();
        for (Document d : documents) {
            String rewritten = rewriter.scrub(d.text(), kind, terms);
            if (!rewritten.equals(d.text())) {
                changed.add(d);
                texts.add(rewritten);
            }
        }
        if (changed.isEmpty()) {
            return Effect.NONE;
        }
        ScoreMatrix before = classifier.score(changed.stream().map(Document::text).toList(),
                changed.stream().map(Document::id).toList());
        calls++;
        List<Scored> scored = new ArrayList<>();
        for (int i = 0; i < changed.size(); i++) {
            scored.add(new Scored(changed.get(i), before.predicted(i), before.row(i)));
        }
        return measure(scored, texts, null);
    }

    /** Scoring calls made so far. */
    long calls() {
        return calls;
    }

    /**
     * Scores {@code texts}, the rewrites of {@code originals}, and compares: flips of the predicted
     * label, the mean drop of {@code label}'s score (of each document's own prediction when
     * {@code label} is null), and accuracy before and after on the documents with a gold label.
     */
    Effect measure(List<Scored> originals, List<String> texts, String label) {
        return perDocument(originals, texts, label).stream().reduce(Effect.NONE, Effect::plus);
    }

    /** As {@link #measure}, one effect per document. */
    List<Effect> perDocument(List<Scored> originals, List<String> texts, String label) {
        List<Effect> out = new ArrayList<>(texts.size());
        for (int from = 0; from < texts.size(); from += batch) {
            int to = Math.min(texts.size(), from + batch);
            List<String> ids = originals.subList(from, to).stream().map(s -> s.doc().id()).toList();
            ScoreMatrix after = classifier.score(texts.subList(from, to), ids);
            calls++;
            for (int i = from; i < to; i++) {
                Scored s = originals.get(i);
                int column = after.labelIndex(label == null ? s.predicted() : label);
                String now = after.predicted(i - from);
                String gold = s.doc().label();
                out.add(new Effect(1, now.equals(s.predicted()) ? 0 : 1, s.scores()[column] - after.score(i - from, column),
                        gold == null ? 0 : 1, gold != null && gold.equals(s.predicted()) ? 1 : 0,
                        gold != null && gold.equals(now) ? 1 : 0));
            }
        }
        return out;
    }
}
