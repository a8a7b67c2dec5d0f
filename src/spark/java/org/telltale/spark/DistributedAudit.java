package org.telltale.spark;

import java.io.Serializable;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.analysis.Analyzer;
import org.apache.spark.SparkFiles;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.broadcast.Broadcast;
import org.apache.spark.storage.StorageLevel;
import org.telltale.TelltaleException;
import org.telltale.audit.Auditor;
import org.telltale.audit.CorpusTerms;
import org.telltale.audit.LineRepeats;
import org.telltale.audit.ScrubEffects;
import org.telltale.audit.ScrubPlan;
import org.telltale.audit.ScrubTest;
import org.telltale.audit.StratifiedSample;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.text.Analyzers;
import org.telltale.text.Document;
import scala.Tuple2;

/**
 * The audit as Spark jobs. Model work runs by partition, each partition with its own connector:
 * scoring (with the line counts and a stratified sample of the partition), explaining the sampled
 * documents, counting the selected terms, and rescoring scrubbed documents for the scrub test.
 * The driver merges the samples, reduces the counts and the scrub effects, and ends in
 * {@link Auditor#decide}, the decisions of the single-machine audit. Every random
 * choice derives from the seed and the document id, so a recomputed task changes nothing.
 */
final class DistributedAudit {
    /** The descriptions of the scrub test's jobs (the Spark UI shows them; a test finds its failures by them). */
    static final String SCRUB_EXPLAINED = "scrub test: rescoring the explained documents";
    static final String SCRUB_CORPUS = "scrub test: rescoring the corpus";

    private final JavaSparkContext context;
    private final AuditParams params;

    DistributedAudit(JavaSparkContext context, AuditParams params) {
        this.context = context;
        this.params = params;
    }

    /** One document's prediction. */
    record Prediction(long position, String predicted) implements Serializable {
    }

    /** What scoring one partition yields. */
    record PartitionScores(List<String> labels, long documents, long labelled, long correct, Map<String, Long> predicted,
                           List<Prediction> predictions, Map<Long, Integer> lines, StratifiedSample sample, long retries)
            implements Serializable {
    }

    /** The reduced scoring pass and the explanations of the sample. */
    record Passes(Auditor.Scored scored, List<Explanation> explanations, long retries) {
    }

    /** What rescoring one partition for the scrub test yields: the plan's effects there, and the connector's retries. */
    record Rescored(ScrubEffects effects, long retries) implements Serializable {
        Rescored plus(Rescored o) {
            return new Rescored(effects.merge(o.effects), retries + o.retries);
        }
    }

    private JavaRDD<PartitionScores> scores;
    private JavaRDD<CorpusRow> corpus;
    private Broadcast<Map<Long, Integer>> boilerplate;
    private long documents;
    private List<Explained> explained;

    Passes scoreAndExplain(JavaRDD<CorpusRow> rows) {
        corpus = rows;
        AuditParams p = params;
        context.setJobDescription("scoring the corpus");
        scores = rows.mapPartitions(it -> List.of(scorePartition(p, it)).iterator()).persist(StorageLevel.MEMORY_AND_DISK());

        // The reduced statistics of scoring: counts, labels, the merged sample; no document leaves its partition.
        List<PartitionScores> parts = scores.map(s -> new PartitionScores(s.labels(), s.documents(), s.labelled(),
                s.correct(), s.predicted(), List.of(), Map.of(), s.sample(), s.retries())).collect();
        List<String> labels = null;
        long labelled = 0;
        long correct = 0;
        long retries = 0;
        documents = 0;
        Map<String, Long> predicted = new LinkedHashMap<>();
        StratifiedSample sample = new StratifiedSample(p.sample(), p.seed());
        for (PartitionScores part : parts) {
            if (part.documents() == 0) {
                continue;
            }
            if (labels == null) {
                labels = part.labels();
                labels.forEach(l -> predicted.put(l, 0L));
            } else if (!labels.equals(part.labels())) {
                throw new TelltaleException("the model's labels changed during the audit, from " + labels + " to "
                        + part.labels());
            }
            documents += part.documents();
            labelled += part.labelled();
            correct += part.correct();
            retries += part.retries();
            part.predicted().forEach((l, n) -> predicted.merge(l, n, Long::sum));
            sample.merge(part.sample());
        }
        if (documents == 0) {
            throw new TelltaleException("the corpus has no documents to audit");
        }
        // Line counts by key; only lines frequent enough to be boilerplate reach the driver.
        int least = LineRepeats.minRepeats(documents);
        context.setJobDescription("counting repeated lines");
        Map<Long, Integer> frequent = new HashMap<>(scores.flatMapToPair(s -> s.lines().entrySet().stream()
                        .map(e -> new Tuple2<>(e.getKey(), e.getValue())).iterator())
                .reduceByKey(Integer::sum)
                .filter(t -> t._2() >= least)
                .collectAsMap());
        boilerplate = context.broadcast(frequent);
        LineRepeats repeats = LineRepeats.ofCounts(frequent, documents);

        List<String> ids = sample.ids();
        Set<String> wanted = new HashSet<>(ids);
        Broadcast<Set<String>> wantedSet = context.broadcast(wanted);
        Map<String, Document> sampled = new HashMap<>();
        Map<String, String> lines = new HashMap<>();
        context.setJobDescription("explaining the sample");
        explained = rows.filter(r -> wantedSet.value().contains(r.id()))
                .mapPartitions(it -> explainPartition(p, it))
                .collect();
        explained.forEach(e -> {
            sampled.put(e.row().id(), e.row().document());
            lines.put(e.row().id(), e.line());
        });
        List<Explanation> explanations = new ArrayList<>();
        for (String id : ids) {
            String line = lines.get(id);
            if (line == null) {
                throw new TelltaleException("document " + id + " was scored but is missing on a second read of the corpus");
            }
            explanations.add(ExplanationsJson.fromLine(line, "explanation of document " + id));
        }
        Auditor.Scored scored = new Auditor.Scored(labels, documents, labelled, correct, 0, predicted, repeats, sampled);
        return new Passes(scored, explanations, retries);
    }

    /** The corpus-wide term count by partition, each document under its gold or predicted label. */
    CorpusTerms countTerms(Set<String> selected, List<String> labels, boolean gold) {
        AuditParams p = params;
        Broadcast<Map<Long, Integer>> lines = boilerplate;
        long total = documents;
        Set<String> terms = new HashSet<>(selected);
        List<String> labelList = List.copyOf(labels);
        context.setJobDescription("counting the selected terms");
        CorpusTerms counted = corpus.zipPartitions(scores, (docs, scored) -> {
            Analyzer analyzer = Analyzers.byName(p.analyzer());
            LineRepeats repeats = LineRepeats.ofCounts(lines.value(), total);
            CorpusTerms part = CorpusTerms.of(terms, labelList, analyzer, repeats);
            Map<Long, String> predictedAt = new HashMap<>();
            while (scored.hasNext()) {
                for (Prediction pr : scored.next().predictions()) {
                    predictedAt.put(pr.position(), pr.predicted());
                }
            }
            while (docs.hasNext()) {
                CorpusRow row = docs.next();
                part.add(row.text(), gold ? row.label() : predictedAt.get(row.position()));
            }
            return List.of(part).iterator();
        }).reduce((a, b) -> {
            a.merge(b);
            return a;
        });
        scores.unpersist();
        return counted;
    }

    /**
     * The scrub test's rescoring by partition, each partition with its own connector
     * ({@link ScrubTest}): the explained documents, spread over the cluster from the driver, which
     * holds them with their explanations; and with --scrub-all the corpus where it is. The
     * partitions' effects are exact sums, so their merge does not depend on how Spark splits or
     * recomputes the work.
     */
    Rescored rescore(ScrubPlan plan, List<String> labels) {
        AuditParams p = params;
        Broadcast<Map<Long, Integer>> lines = boilerplate;
        long total = documents;
        List<String> labelList = List.copyOf(labels);
        Rescored none = new Rescored(ScrubEffects.none(plan), 0);
        int slices = Math.max(1, Math.min(explained.size(), context.defaultParallelism()));
        context.setJobDescription(SCRUB_EXPLAINED);
        Rescored sum = context.parallelize(explained, slices)
                .mapPartitions(it -> List.of(rescoreExplained(p, plan, lines.value(), total, labelList, it)).iterator())
                .fold(none, Rescored::plus);
        if (plan.scrubsCorpus()) {
            context.setJobDescription(SCRUB_CORPUS);
            sum = sum.plus(corpus.mapPartitions(it -> List.of(rescoreCorpus(p, plan, lines.value(), total, it)).iterator())
                    .fold(none, Rescored::plus));
        }
        return sum;
    }

    private static Rescored rescoreExplained(AuditParams p, ScrubPlan plan, Map<Long, Integer> lines, long documents,
            List<String> labels, Iterator<Explained> rows) throws Exception {
        if (!rows.hasNext()) {
            return new Rescored(ScrubEffects.none(plan), 0);
        }
        List<ScrubTest.Scored> scored = new ArrayList<>();
        while (rows.hasNext()) {
            Explained e = rows.next();
            Explanation explanation = ExplanationsJson.fromLine(e.line(), "explanation of document " + e.row().id());
            scored.add(ScrubTest.Scored.of(e.row().document(), explanation, labels));
        }
        try (TextClassifier classifier = p.model().open(where(p))) {
            ScrubTest test = ScrubTest.of(classifier, Analyzers.byName(p.analyzer()), LineRepeats.ofCounts(lines, documents),
                    p.settings().batch());
            return new Rescored(test.explained(plan, scored.iterator()), classifier.retries());
        }
    }

    private static Rescored rescoreCorpus(AuditParams p, ScrubPlan plan, Map<Long, Integer> lines, long documents,
            Iterator<CorpusRow> rows) throws Exception {
        if (!rows.hasNext()) {
            return new Rescored(ScrubEffects.none(plan), 0);
        }
        try (TextClassifier classifier = p.model().open(where(p))) {
            ScrubTest test = ScrubTest.of(classifier, Analyzers.byName(p.analyzer()), LineRepeats.ofCounts(lines, documents),
                    p.settings().batch());
            Iterator<Document> docs = new Iterator<>() {
                @Override
                public boolean hasNext() {
                    return rows.hasNext();
                }

                @Override
                public Document next() {
                    return rows.next().document();
                }
            };
            return new Rescored(test.corpus(plan, docs), classifier.retries());
        }
    }

    private static PartitionScores scorePartition(AuditParams p, Iterator<CorpusRow> rows) throws Exception {
        List<String> labels = null;
        long documents = 0;
        long labelled = 0;
        long correct = 0;
        long[] predictedCounts = null;
        List<Prediction> predictions = new ArrayList<>();
        Map<Long, Integer> lines = new HashMap<>();
        StratifiedSample sample = new StratifiedSample(p.sample(), p.seed());
        long retries;
        try (TextClassifier classifier = p.model().open(where(p))) {
            int batchSize = p.model().batch();
            List<CorpusRow> batch = new ArrayList<>(batchSize);
            while (rows.hasNext() || !batch.isEmpty()) {
                if (rows.hasNext()) {
                    batch.add(rows.next());
                    if (batch.size() < batchSize && rows.hasNext()) {
                        continue;
                    }
                }
                List<String> ids = batch.stream().map(CorpusRow::id).toList();
                ScoreMatrix m = classifier.score(batch.stream().map(CorpusRow::text).toList(), ids);
                if (m.size() != batch.size()) {
                    throw new TelltaleException("the model answered " + m.size() + " rows for a batch of "
                            + batch.size() + " (documents " + ids.get(0) + " to " + ids.get(ids.size() - 1) + ")");
                }
                if (labels == null) {
                    labels = List.copyOf(m.labels());
                    predictedCounts = new long[labels.size()];
                } else if (!labels.equals(m.labels())) {
                    throw new TelltaleException("the model's labels changed during the audit, from " + labels + " to "
                            + m.labels() + " at documents " + ids.get(0) + " to " + ids.get(ids.size() - 1));
                }
                for (int i = 0; i < batch.size(); i++) {
                    CorpusRow row = batch.get(i);
                    String predicted = m.predicted(i);
                    documents++;
                    predictedCounts[labels.indexOf(predicted)]++;
                    predictions.add(new Prediction(row.position(), predicted));
                    for (long key : LineRepeats.lineKeys(row.text())) {
                        lines.merge(key, 1, Integer::sum);
                    }
                    if (row.label() != null) {
                        labelled++;
                        if (row.label().equals(predicted)) {
                            correct++;
                        }
                    }
                    sample.offer(row.id(), predicted, row.label());
                }
                batch.clear();
            }
            retries = classifier.retries();
        }
        Map<String, Long> predicted = new LinkedHashMap<>();
        if (labels != null) {
            for (int i = 0; i < labels.size(); i++) {
                predicted.put(labels.get(i), predictedCounts[i]);
            }
        }
        return new PartitionScores(labels == null ? List.of() : labels, documents, labelled, correct, predicted,
                predictions, lines, sample, retries);
    }

    /** A sampled document and its explanation line (the telltale.explanations line form). */
    record Explained(CorpusRow row, String line) implements Serializable {
    }

    private static Iterator<Explained> explainPartition(AuditParams p, Iterator<CorpusRow> rows) throws Exception {
        List<Explained> out = new ArrayList<>();
        if (!rows.hasNext()) {
            return out.iterator();
        }
        try (TextClassifier classifier = p.model().open(where(p))) {
            Explainer explainer = new Explainer(classifier, p.explainSettings());
            while (rows.hasNext()) {
                CorpusRow row = rows.next();
                out.add(new Explained(row, ExplanationsJson.toLine(explainer.explain(row.document(), null))));
            }
        }
        return out.iterator();
    }

    /** Where a task finds the model: the shipped copy of a model file, else the spec itself. */
    private static String where(AuditParams p) {
        return p.modelWhere() == null ? p.model().spec() : SparkFiles.get(p.modelWhere());
    }
}
