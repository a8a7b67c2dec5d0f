package org.telltale.audit;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.TreeSet;
import java.util.function.Consumer;
import java.util.function.Function;
import java.util.function.Supplier;
import org.apache.lucene.analysis.Analyzer;
import org.telltale.OutOfResources;
import org.telltale.TelltaleException;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.AuditResult.Summary;
import org.telltale.explain.ConcurrentExplanations;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.CorpusReader;
import org.telltale.text.Document;

/**
 * Runs one audit: scores the whole corpus in batches, explains a stratified sample, counts the
 * tested terms across the corpus, decides artefacts, scrubs and rescores, and picks documents for
 * the reviewer. The corpus is read as a stream four times at most and never held; what stays in
 * memory is the sample, two bytes per document for its prediction, bounded line counts, and
 * counts for the terms the explanations selected.
 *
 * <p>Model work is journaled as it finishes, so an audit run again on the same journal redoes
 * nothing that was finished and ends with the same result. One audit per instance; not
 * thread-safe.
 */
public final class Auditor {
    /** Line-count table size: about 40 MB at most, enough for corpora far larger than the sample. */
    static final int LINE_CAPACITY = 400_000;

    /** Where the audit is, for a progress bar; the default does nothing. */
    public interface Progress {
        /** A phase begins; {@code total} is -1 when unknown. */
        default void phase(String name, long total) {
        }

        default void advance(long steps) {
        }

        default void done() {
        }

        Progress SILENT = new Progress() {
        };
    }

    /** Explains one document for the label the model predicts. */
    public interface ExplainStep {
        Explanation explain(Document document);

        /**
         * Applies {@code each} (this step's {@link #explain}, as the audit guards it) to
         * {@code documents} and gives the explanations to {@code then} in the documents' order, on
         * the calling thread; the first failure in that order is thrown as it was. By default one
         * document after another; a front may explain several at once.
         */
        default void inOrder(List<Document> documents, Function<Document, Explanation> each,
                Consumer<Explanation> then) {
            for (Document d : documents) {
                then.accept(each.apply(d));
            }
        }

        /**
         * {@code explainer} for the predicted label, several documents at once as
         * {@code concurrently} allows (the explainer reaching the model through
         * {@link ConcurrentExplanations#waitingOn}); results as one after another.
         */
        static ExplainStep concurrently(Explainer explainer, ConcurrentExplanations concurrently) {
            return new ExplainStep() {
                @Override
                public Explanation explain(Document document) {
                    return explainer.explain(document, null);
                }

                @Override
                public void inOrder(List<Document> documents, Function<Document, Explanation> each,
                        Consumer<Explanation> then) {
                    concurrently.inOrder(documents.size(), i -> each.apply(documents.get(i)), then);
                }
            };
        }
    }

    /** Turns an explanation into one line of JSON and back: the {@code telltale.explanations} line form. */
    public interface ExplanationCodec {
        String toLine(Explanation explanation);

        Explanation fromLine(String line, String place);
    }

    /** An audit's result with the explanations it rests on, in sample order. */
    public record Outcome(AuditResult result, List<Explanation> explanations) {
        public Outcome {
            explanations = List.copyOf(explanations);
        }
    }

    private final TextClassifier classifier;
    private final ExplainStep explainer;
    private final ExplanationCodec codec;
    private final Analyzer analyzer;
    private final AuditSettings settings;
    private final long seed;
    private final Policy policy;
    private final Progress progress;

    private long retriesSeen;

    public Auditor(TextClassifier classifier, ExplainStep explainer, ExplanationCodec codec, Analyzer analyzer,
            AuditSettings settings, long seed, Policy policy, Progress progress) {
        this.classifier = Objects.requireNonNull(classifier, "classifier");
        this.explainer = Objects.requireNonNull(explainer, "explainer");
        this.codec = Objects.requireNonNull(codec, "codec");
        this.analyzer = Objects.requireNonNull(analyzer, "analyzer");
        this.settings = Objects.requireNonNull(settings, "settings");
        this.seed = seed;
        this.policy = policy == null ? Policy.empty() : policy;
        this.progress = progress == null ? Progress.SILENT : progress;
    }

    /**
     * What the decisions need from scoring the corpus, whether one stream produced it or a
     * distributed front reduced it from partitions.
     *
     * @param predictedCounts documents per predicted label, in the model's label order
     * @param repeats         the documents containing each long line (boilerplate)
     * @param sampled         the sampled documents by id (the explained ones)
     */
    public record Scored(List<String> labels, long documents, long labelled, long correct, long skipped,
                         Map<String, Long> predictedCounts, LineRepeats repeats, Map<String, Document> sampled) {
    }

    /** The corpus-wide term count, done where the corpus is. */
    public interface TermCounting {
        /**
         * Counts {@code selected} over the corpus ({@link CorpusTerms#of} with the audit's
         * analyzer and line counts), each document under its gold label when {@code gold}, else
         * under its predicted label.
         */
        CorpusTerms count(Set<String> selected, List<String> labels, boolean gold);
    }

    /**
     * The scrub test's rescoring, done where the documents are: runs every job of {@code plan}
     * ({@link ScrubTest#explained} on the explained documents, and with {@code --scrub-all}
     * {@link ScrubTest#corpus} on the corpus) in parts, and answers the merged
     * {@link ScrubEffects}. The decisions taken from them are the audit's, on the driver.
     */
    public interface Rescoring {
        /**
         * @param explained the explained documents with their original scores, for a front that
         *                  holds them (a distributed front may rescore its own copies)
         */
        ScrubEffects rescore(ScrubPlan plan, List<ScrubTest.Scored> explained);
    }

    /** Runs the audit over {@code corpus} (opened afresh for each pass), journaling into {@code journal}. */
    public Outcome run(Supplier<CorpusReader> corpus, Journal journal, String model, String corpusName) {
        long started = System.nanoTime();
        retriesSeen = classifier.retries();

        Scoring scoring = scoreCorpus(corpus, journal);
        List<Explanation> explanations = explainSample(corpus, journal, scoring);
        Scored scored = new Scored(scoring.labels, scoring.documents, scoring.labelled, scoring.correct, scoring.skipped,
                scoring.predictedCounts(), scoring.repeats, scoring.documentsById);
        TermCounting counting = (selected, labels, gold) -> countTerms(corpus, selected, labels, scoring, gold);
        Rescoring rescoring = (plan, explained) -> rescore(plan, explained, scoring.repeats, corpus);
        return decide(scored, explanations, counting, rescoring,
                () -> journal.retries() + (classifier.retries() - retriesSeen), model, corpusName, started);
    }

    /**
     * Everything after explaining: counts the selected terms (through {@code counting}), flags
     * terms and groups them into artefacts, plans the scrub test — each artefact alone on the
     * explained documents, each kind and all artefacts at once on the explained documents or with
     * --scrub-all on the corpus — and has {@code rescoring} run it, decides each artefact and the
     * scrub rows from the effects, and picks documents for the reviewer. The single-machine audit
     * and the Spark front both end here; only counting and rescoring run where the corpus is.
     *
     * @param retries the retries of the whole run, read when the result is made
     * @param started {@link System#nanoTime()} at the start of the run
     */
    public Outcome decide(Scored scoring, List<Explanation> explanations, TermCounting counting, Rescoring rescoring,
            java.util.function.LongSupplier retries, String model, String corpusName, long started) {
        List<String> labels = scoring.labels();

        TermWeights weights = new TermWeights();
        explanations.forEach(weights::add);
        boolean gold = scoring.labelled() == scoring.documents();
        CorpusTerms terms = counting.count(weights.terms(), labels, gold);
        Map<String, Double> prior = new LinkedHashMap<>();
        terms.labelTotals().forEach((label, n) -> {
            if (n > 0) {
                prior.put(label, (double) n / terms.documents());
            }
        });

        FindingRules.Outcome rules = FindingRules.apply(weights, terms, prior, policy, settings.alpha());
        Rewriter rewriter = new Rewriter(analyzer, scoring.repeats()::isBoilerplate);
        List<ScrubTest.Scored> explained = new ArrayList<>();
        for (Explanation e : explanations) {
            explained.add(ScrubTest.Scored.of(scoring.sampled().get(e.id()), e, labels));
        }

        List<ArtefactGrouping.Group> groups = ArtefactGrouping.group(rules.candidates(), terms);
        ArtefactAssembly assembly = new ArtefactAssembly(policy, rewriter);
        ScrubJobs jobs = plan(groups, assembly);
        progress.phase("scrubbing", -1);
        ScrubEffects effects = rescoring.rescore(jobs.plan(), explained);
        List<AuditResult.Artefact> artefacts = new ArrayList<>();
        Map<String, String> artefactOfTerm = new HashMap<>();
        for (int i = 0; i < groups.size(); i++) {
            ArtefactGrouping.Group group = groups.get(i);
            int own = jobs.alone().get(i);
            AuditResult.Artefact artefact = assembly.finish(group, own < 0 ? ScrubTest.Effect.NONE : effects.of(own),
                    explanations, scoring.sampled());
            artefacts.add(artefact);
            group.terms().forEach(t -> artefactOfTerm.put(t + '\u0000' + group.label(), artefact.id()));
        }
        artefacts.sort(ArtefactAssembly.ORDER);
        List<AuditResult.TermStat> termStats = new ArrayList<>();
        for (AuditResult.TermStat t : rules.terms()) {
            termStats.add(new AuditResult.TermStat(t.term(), t.label(), t.kind(), t.support(), t.importance(),
                    t.association(), t.pmi(), t.weight(), t.selectedIn(), artefactOfTerm.get(t.term() + '\u0000' + t.label())));
        }
        List<Scrub> scrub = scrubRows(artefacts, jobs, effects);
        progress.done();

        List<SubmodularPick.Row> rows = new ArrayList<>();
        for (Explanation e : explanations) {
            Map<String, Double> w = new HashMap<>();
            e.terms().forEach(t -> w.merge(t.term(), Math.abs(t.weight()), Double::sum));
            rows.add(new SubmodularPick.Row(e.id(), w));
        }
        SubmodularPick.Picks picks = SubmodularPick.pick(rows, settings.picks());

        Summary summary = new Summary(scoring.documents(), explanations.size(), labels,
                scoring.labelled() == 0 ? null : (double) scoring.correct() / scoring.labelled(), scoring.skipped(),
                retries.getAsLong(), model, corpusName, seed, settings, AssociationBasis.of(gold), prior,
                scoring.predictedCounts(), rules.threshold(), rules.tested(), picks.coverage(),
                (System.nanoTime() - started) / 1_000_000);
        return new Outcome(new AuditResult(summary, artefacts, scrub, picks.ids(), termStats), explanations);
    }

    // ---- pass 1: score every document, count lines, draw the sample

    private static final class Scoring {
        List<String> labels;
        long documents;
        long labelled;
        long correct;
        long skipped;
        long[] predicted;
        final LabelColumn byPosition = new LabelColumn();
        final LineRepeats repeats = new LineRepeats(LINE_CAPACITY);
        StratifiedSample sample;
        Map<String, Document> documentsById = new HashMap<>();

        Map<String, Long> predictedCounts() {
            Map<String, Long> out = new LinkedHashMap<>();
            for (int i = 0; i < labels.size(); i++) {
                out.put(labels.get(i), predicted[i]);
            }
            return out;
        }
    }

    private Scoring scoreCorpus(Supplier<CorpusReader> corpus, Journal journal) {
        Scoring s = new Scoring();
        s.sample = new StratifiedSample(settings.sample(), seed);
        progress.phase("scoring", -1);
        try (CorpusReader reader = corpus.get()) {
            // A batch the journal holds is read back at its own size, which may differ from this
            // run's: batch size is tuning, and a resumed run may change it.
            List<Document> batch = new ArrayList<>(settings.batch());
            long position = 0;
            while (reader.hasNext()) {
                Journal.ScoredBatch done = journal.takeScored(position);
                int size = done == null ? settings.batch() : done.predicted().size();
                while (batch.size() < size && reader.hasNext()) {
                    batch.add(reader.next());
                }
                scoreBatch(position, batch, done, journal, s);
                position += batch.size();
                batch.clear();
            }
            s.skipped = reader.skipped().bad();
        }
        progress.done();
        if (s.documents == 0) {
            throw new TelltaleException("the corpus has no documents to audit");
        }
        return s;
    }

    private void scoreBatch(long start, List<Document> batch, Journal.ScoredBatch done, Journal journal, Scoring s) {
        List<String> ids = batch.stream().map(Document::id).toList();
        List<String> labels;
        List<String> predicted;
        if (done != null) {
            if (done.idsHash() != Journal.idsHash(ids) || done.predicted().size() != ids.size()) {
                throw new TelltaleException(journal.file() + ": the batch at document " + (start + 1) + " (" + ids.get(0) + " to "
                        + ids.get(ids.size() - 1) + ") differs from the journal: the corpus changed since the audit "
                        + "began; rerun without {resume} and with {force} to start over");
            }
            labels = done.labels();
            predicted = done.predicted();
        } else {
            ScoreMatrix scores = guarded("documents '" + ids.get(0) + "' to '"
                    + ids.get(ids.size() - 1) + "' while scoring", () -> classifier.score(batch.stream().map(Document::text).toList(), ids));
            if (scores.size() != batch.size()) {
                throw new TelltaleException("the model answered " + scores.size() + " rows for a batch of "
                        + batch.size() + " (documents " + ids.get(0) + " to " + ids.get(ids.size() - 1) + ")");
            }
            labels = scores.labels();
            predicted = new ArrayList<>();
            for (int i = 0; i < scores.size(); i++) {
                predicted.add(scores.predicted(i));
            }
            journal.appendScored(start, ids, labels, predicted, newRetries());
        }
        if (s.labels == null) {
            s.labels = List.copyOf(labels);
            s.predicted = new long[labels.size()];
        } else if (!s.labels.equals(labels)) {
            throw new TelltaleException("the model's labels changed during the audit, from " + s.labels + " to "
                    + labels + " at documents " + ids.get(0) + " to " + ids.get(ids.size() - 1));
        }
        for (int i = 0; i < batch.size(); i++) {
            Document d = batch.get(i);
            int label = s.labels.indexOf(predicted.get(i));
            s.documents++;
            s.predicted[label]++;
            s.byPosition.add(label);
            guarded("document '" + d.id() + "' while counting lines", () -> s.repeats.add(d.text()));
            if (d.label() != null) {
                s.labelled++;
                if (d.label().equals(predicted.get(i))) {
                    s.correct++;
                }
            }
            s.sample.offer(d.id(), predicted.get(i), d.label());
        }
        progress.advance(batch.size());
    }

    private long newRetries() {
        long now = classifier.retries();
        long delta = now - retriesSeen;
        retriesSeen = now;
        return delta;
    }

    // ---- pass 2: explain the sample

    private List<Explanation> explainSample(Supplier<CorpusReader> corpus, Journal journal, Scoring s) {
        List<String> ids = s.sample.ids();
        Set<String> wanted = new HashSet<>(ids);
        try (CorpusReader reader = corpus.get()) {
            while (reader.hasNext()) {
                Document d = reader.next();
                if (wanted.contains(d.id())) {
                    s.documentsById.put(d.id(), d);
                }
            }
        }
        progress.phase("explaining", ids.size());
        // The documents the journal does not hold yet, in sample order, up to the first one missing.
        List<Document> todo = new ArrayList<>();
        String missing = null;
        for (String id : ids) {
            Document d = s.documentsById.get(id);
            if (d == null) {
                missing = id;
                break;
            }
            if (journal.explained(id) == null) {
                todo.add(d);
            } else {
                progress.advance(1);
            }
        }
        explainer.inOrder(todo,
                d -> guarded("document '" + d.id() + "' while explaining", () -> explainer.explain(d)),
                e -> {
                    String line = guarded("document '" + e.id() + "' while explaining", () -> codec.toLine(e));
                    journal.appendExplained(e.id(), line, newRetries());
                    progress.advance(1);
                });
        if (missing != null) {
            throw new TelltaleException("document " + missing + " was scored but is missing on a second read of the corpus");
        }
        List<Explanation> out = new ArrayList<>();
        for (String id : ids) {
            // Always the journaled form: a resumed run and an uninterrupted one see the same numbers.
            out.add(codec.fromLine(journal.explained(id), journal.file() + " (document " + id + ")"));
        }
        progress.done();
        return out;
    }

    // ---- pass 3: corpus-wide counts for the selected terms

    private CorpusTerms countTerms(Supplier<CorpusReader> corpus, Set<String> selected, List<String> labels, Scoring s,
            boolean gold) {
        CorpusTerms terms = CorpusTerms.of(selected, labels, analyzer, s.repeats);
        progress.phase("counting", s.documents);
        int position = 0;
        try (CorpusReader reader = corpus.get()) {
            while (reader.hasNext()) {
                Document d = reader.next();
                String basis = gold ? d.label() : labels.get(s.byPosition.get(position));
                guarded("document '" + d.id() + "' while counting terms",
                        () -> terms.add(d.text(), basis));
                position++;
                if (position % 256 == 0) {
                    progress.advance(256);
                }
            }
        }
        progress.done();
        return terms;
    }

    // ---- the scrub test: planned here, rescored where the documents are, decided here

    /**
     * The jobs of one audit's scrub test and where each decision finds its effect: per group its
     * own job (-1 when the policy accepts it), per kind with open artefacts its job, and the job
     * removing every open artefact at once (-1 when none is open).
     */
    private record ScrubJobs(ScrubPlan plan, List<Integer> alone, Map<ArtefactKind, Integer> kinds, int all) {
    }

    private ScrubJobs plan(List<ArtefactGrouping.Group> groups, ArtefactAssembly assembly) {
        ScrubPlan.Builder plan = new ScrubPlan.Builder();
        List<Integer> alone = new ArrayList<>();
        Map<ArtefactKind, List<Rewriter.Target>> open = new EnumMap<>(ArtefactKind.class);
        List<Rewriter.Target> every = new ArrayList<>();
        for (ArtefactGrouping.Group group : groups) {
            if (assembly.accepted(group)) {
                alone.add(-1);
                continue;
            }
            Rewriter.Target target = ArtefactAssembly.target(group);
            alone.add(plan.alone(group.label(), target));
            open.computeIfAbsent(group.kind(), k -> new ArrayList<>()).add(target);
            every.add(target);
        }
        // The order of targets within a job does not change a rewrite: cuts are sorted before they are made.
        Map<ArtefactKind, Integer> kinds = new EnumMap<>(ArtefactKind.class);
        open.forEach((kind, targets) -> kinds.put(kind, plan.together(targets, settings.scrubAll())));
        int all = every.isEmpty() ? -1 : plan.together(every, settings.scrubAll());
        return new ScrubJobs(plan.build(), alone, kinds, all);
    }

    /**
     * One row per kind with open artefacts, removing that kind's artefacts together, and one row
     * removing every open artefact at once: how much of the model's accuracy rests on them.
     */
    private List<Scrub> scrubRows(List<AuditResult.Artefact> artefacts, ScrubJobs jobs, ScrubEffects effects) {
        Map<ArtefactKind, List<String>> byKind = new EnumMap<>(ArtefactKind.class);
        List<String> open = new ArrayList<>();
        for (AuditResult.Artefact a : artefacts) {
            if (!a.suppressed()) {
                byKind.computeIfAbsent(a.kind(), k -> new ArrayList<>()).add(a.id());
                open.add(a.id());
            }
        }
        List<Scrub> out = new ArrayList<>();
        for (Map.Entry<ArtefactKind, List<String>> e : byKind.entrySet()) {
            out.add(scrubRow(ScrubGroup.of(e.getKey()), ScrubMode.of(e.getKey()), e.getValue(),
                    effects.of(jobs.kinds().get(e.getKey()))));
        }
        if (!open.isEmpty()) {
            out.add(scrubRow(ScrubGroup.ALL, byKind.size() == 1 ? out.get(0).mode() : ScrubMode.MIXED, open,
                    effects.of(jobs.all())));
        }
        return out;
    }

    private Scrub scrubRow(ScrubGroup group, ScrubMode mode, List<String> artefacts, ScrubTest.Effect effect) {
        return new Scrub(group, mode, artefacts, ScrubScope.of(settings.scrubAll()), effect.documents(),
                effect.flips(), effect.flipRate(), effect.meanDrop(), effect.accuracyBefore(), effect.accuracyAfter());
    }

    /** The rescoring on one machine: the explained documents at hand, then with --scrub-all the corpus in chunks. */
    private ScrubEffects rescore(ScrubPlan plan, List<ScrubTest.Scored> explained, LineRepeats repeats,
            Supplier<CorpusReader> corpus) {
        ScrubTest scrubTest = ScrubTest.of(classifier, analyzer, repeats, settings.batch());
        ScrubEffects sum = guarded("the explained documents while scrubbing",
                () -> scrubTest.explained(plan, explained.iterator()));
        if (!plan.scrubsCorpus()) {
            return sum;
        }
        try (CorpusReader reader = corpus.get()) {
            List<Document> chunk = new ArrayList<>(settings.batch());
            while (reader.hasNext()) {
                chunk.add(reader.next());
                if (chunk.size() == settings.batch() || !reader.hasNext()) {
                    List<Document> part = chunk;
                    sum = sum.merge(guarded("documents '" + part.get(0).id() + "' to '" + part.get(part.size() - 1).id()
                            + "' while scrubbing the corpus", () -> scrubTest.corpus(plan, part.iterator())));
                    chunk = new ArrayList<>(settings.batch());
                }
            }
        }
        return sum;
    }

    /** Runs work on {@code place}; if the JVM runs out of stack or memory, the error names the place and the way on. */
    private static <T> T guarded(String place, Supplier<T> work) {
        return OutOfResources.naming(place, RESUME, work);
    }

    private static void guarded(String place, Runnable work) {
        OutOfResources.naming(place, RESUME, work);
    }

    /** Journal lines are forced to disk as work finishes, so a run that failed can always be resumed. */
    private static final String RESUME = "the journal keeps the finished work: rerun with {resume} to continue";
}
