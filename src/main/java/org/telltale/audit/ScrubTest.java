package org.telltale.audit;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Iterator;
import java.util.List;
import java.util.Objects;
import org.apache.lucene.analysis.Analyzer;
import org.telltale.explain.Explanation;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * The counterfactual half of an audit, as a per-document step: documents rewritten without
 * artefacts are scored again, and each rewrite's effect — a flip of the predicted label, the
 * drop of the measured score, accuracy before and after — is added to its job's sums. Any part
 * of the documents can run anywhere (one JVM, a Spark partition); the parts' {@link ScrubEffects}
 * merge into the whole's, and the decisions are taken from them on the driver.
 *
 * <p>Rewrites of several jobs share scoring calls of at most {@code batch} texts. Not
 * thread-safe; the classifier it calls must be.
 */
public final class ScrubTest {
    /**
     * A document with the model's scores on its original text, in the model's label order. Holds
     * a copy of the scores; equal when document, prediction and scores are.
     */
    public record Scored(Document doc, String predicted, double[] scores) {
        public Scored {
            Objects.requireNonNull(doc, "doc");
            Objects.requireNonNull(predicted, "predicted");
            scores = scores.clone();
        }

        /** An explained document, its original scores read from its explanation in {@code labels}' order. */
        public static Scored of(Document doc, Explanation explanation, List<String> labels) {
            double[] row = new double[labels.size()];
            for (int i = 0; i < labels.size(); i++) {
                row[i] = explanation.scores().getOrDefault(labels.get(i), Double.NaN);
            }
            return new Scored(doc, explanation.predicted(), row);
        }

        /** A copy of the scores. */
        @Override
        public double[] scores() {
            return scores.clone();
        }

        double score(int column) {
            return scores[column];
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Scored s && doc.equals(s.doc) && predicted.equals(s.predicted)
                    && Arrays.equals(scores, s.scores);
        }

        @Override
        public int hashCode() {
            return Objects.hash(doc, predicted, Arrays.hashCode(scores));
        }

        @Override
        public String toString() {
            return "Scored[doc=" + doc.id() + ", predicted=" + predicted + ", scores=" + Arrays.toString(scores) + "]";
        }
    }

    /** What removing something did to a set of documents; sums, so that parts can be merged in any order. */
    record Effect(int documents, int flips, ExactSum totalDrop, int labelled, int correctBefore, int correctAfter)
            implements Serializable {
        private static final long serialVersionUID = 1L;
        static final Effect NONE = new Effect(0, 0, ExactSum.ZERO, 0, 0, 0);

        Effect {
            Objects.requireNonNull(totalDrop, "totalDrop");
        }

        double flipRate() {
            return documents == 0 ? 0 : (double) flips / documents;
        }

        double meanDrop() {
            return documents == 0 ? Double.NaN : totalDrop.value() / documents;
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
            return new Effect(documents + o.documents, flips + o.flips, totalDrop.plus(o.totalDrop),
                    labelled + o.labelled, correctBefore + o.correctBefore, correctAfter + o.correctAfter);
        }
    }

    private final TextClassifier classifier;
    private final Rewriter rewriter;
    private final int batch;

    ScrubTest(TextClassifier classifier, Rewriter rewriter, int batch) {
        if (batch < 1) {
            throw new IllegalArgumentException("batch must be at least 1: " + batch);
        }
        this.classifier = Objects.requireNonNull(classifier, "classifier");
        this.rewriter = Objects.requireNonNull(rewriter, "rewriter");
        this.batch = batch;
    }

    /**
     * The scrub test as a distributed front builds it where its documents are: the audit's
     * analyzer, the corpus' line counts (which lines are boilerplate) and its scoring batch.
     */
    public static ScrubTest of(TextClassifier classifier, Analyzer analyzer, LineRepeats repeats, int batch) {
        return new ScrubTest(classifier, new Rewriter(analyzer, repeats::isBoilerplate), batch);
    }

    /**
     * Runs the plan's jobs on explained {@code documents}, whose original scores are known: each
     * job's rewrite of each document it applies to (those assigned its label, or all), scored
     * when the rewrite changed the text.
     */
    public ScrubEffects explained(ScrubPlan plan, Iterator<Scored> documents) {
        Tally tally = new Tally(plan);
        while (documents.hasNext()) {
            Scored s = documents.next();
            for (int j = 0; j < plan.size(); j++) {
                ScrubPlan.Job job = plan.job(j);
                if (!job.corpus() && (job.label() == null || job.label().equals(s.predicted()))) {
                    tally.rewrite(s, j);
                }
            }
        }
        tally.flush();
        return tally.effects();
    }

    /**
     * Runs the plan's corpus jobs ({@code --scrub-all}) on {@code documents}, whose original
     * scores are not known: a document some rewrite changes is scored as it is, then rewritten.
     */
    public ScrubEffects corpus(ScrubPlan plan, Iterator<Document> documents) {
        Tally tally = new Tally(plan);
        List<Document> chunk = new ArrayList<>(batch);
        while (documents.hasNext()) {
            chunk.add(documents.next());
            if (chunk.size() == batch || !documents.hasNext()) {
                corpusChunk(plan, chunk, tally);
                chunk.clear();
            }
        }
        tally.flush();
        return tally.effects();
    }

    private void corpusChunk(ScrubPlan plan, List<Document> chunk, Tally tally) {
        List<Document> changed = new ArrayList<>();
        List<List<Rewrite>> rewrites = new ArrayList<>();
        for (Document d : chunk) {
            List<Rewrite> mine = new ArrayList<>();
            for (int j = 0; j < plan.size(); j++) {
                ScrubPlan.Job job = plan.job(j);
                if (job.corpus()) {
                    String text = rewriter.scrub(d.text(), job.targets());
                    if (!text.equals(d.text())) {
                        mine.add(new Rewrite(null, j, text, job.label()));
                    }
                }
            }
            if (!mine.isEmpty()) {
                changed.add(d);
                rewrites.add(mine);
            }
        }
        if (changed.isEmpty()) {
            return;
        }
        ScoreMatrix before = classifier.score(changed.stream().map(Document::text).toList(),
                changed.stream().map(Document::id).toList());
        for (int i = 0; i < changed.size(); i++) {
            Scored s = new Scored(changed.get(i), before.predicted(i), before.row(i));
            for (Rewrite r : rewrites.get(i)) {
                tally.add(new Rewrite(s, r.job(), r.text(), r.label()));
            }
        }
    }

    /** One rewritten text waiting to be scored, for job {@code job}; {@code label} is the score measured, or null. */
    private record Rewrite(Scored original, int job, String text, String label) {
    }

    /** The sums of each job, and the rewrites waiting for a scoring call. */
    private final class Tally {
        private final ScrubPlan plan;
        private final Effect[] sums;
        private final List<Rewrite> pending = new ArrayList<>(batch);

        Tally(ScrubPlan plan) {
            this.plan = plan;
            this.sums = new Effect[plan.size()];
            Arrays.fill(sums, Effect.NONE);
        }

        void rewrite(Scored s, int job) {
            ScrubPlan.Job j = plan.job(job);
            String text = rewriter.scrub(s.doc().text(), j.targets());
            if (!text.equals(s.doc().text())) {
                add(new Rewrite(s, job, text, j.label()));
            }
        }

        void add(Rewrite r) {
            pending.add(r);
            if (pending.size() == batch) {
                flush();
            }
        }

        void flush() {
            if (pending.isEmpty()) {
                return;
            }
            ScoreMatrix after = classifier.score(pending.stream().map(Rewrite::text).toList(),
                    pending.stream().map(r -> r.original().doc().id()).toList());
            for (int i = 0; i < pending.size(); i++) {
                Rewrite r = pending.get(i);
                sums[r.job()] = sums[r.job()].plus(effect(r.original(), r.label(), after, i));
            }
            pending.clear();
        }

        ScrubEffects effects() {
            return new ScrubEffects(Arrays.asList(sums));
        }
    }

    /**
     * One rewrite's effect: whether the predicted label changed, the drop of {@code label}'s score
     * (of the document's own prediction when {@code label} is null), and whether the gold label
     * was predicted before and after.
     */
    static Effect effect(Scored original, String label, ScoreMatrix after, int row) {
        int column = after.labelIndex(label == null ? original.predicted() : label);
        String now = after.predicted(row);
        String gold = original.doc().label();
        return new Effect(1, now.equals(original.predicted()) ? 0 : 1,
                ExactSum.ZERO.plus(original.score(column) - after.score(row, column)), gold == null ? 0 : 1,
                gold != null && gold.equals(original.predicted()) ? 1 : 0, gold != null && gold.equals(now) ? 1 : 0);
    }
}
