package org.telltale.model;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.DigestInputStream;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.HexFormat;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.telltale.TelltaleException;
import org.telltale.text.Document;

/**
 * Trains a built-in model from labelled documents: counts terms, splits off a stratified holdout,
 * fits naive Bayes or logistic regression on the rest and evaluates on the holdout. The saved
 * model is the one fitted on the training part, so its holdout figures describe exactly it.
 *
 * <p>Term counts of every document are kept in memory while training (the fit needs them all);
 * the texts themselves are not.
 */
public final class ModelTraining {
    private ModelTraining() {
    }

    /**
     * @param documents the corpus, each document with a gold label
     * @param corpus    the corpus file or folder, for its name and SHA-256 in the metadata
     * @throws TelltaleException for a document without a label, an empty corpus, or a single label
     */
    public static TrainingOutcome train(Iterator<Document> documents, Path corpus, TrainingRequest request) {
        TermCounter counter = new TermCounter(request.analyzer(), request.ngrams());
        try {
            return train(documents, corpus, request, counter);
        } catch (RuntimeException e) {
            counter.close();
            throw e;
        }
    }

    private static TrainingOutcome train(Iterator<Document> documents, Path corpus, TrainingRequest request,
            TermCounter counter) {
        List<String> ids = new ArrayList<>();
        List<String> gold = new ArrayList<>();
        List<Map<String, Integer>> counts = new ArrayList<>();
        Map<String, Integer> perLabel = new TreeMap<>();
        while (documents.hasNext()) {
            Document d = documents.next();
            if (d.label() == null || d.label().isBlank()) {
                throw new TelltaleException(d.describe() + " has no gold label; every training document needs one");
            }
            ids.add(d.id());
            gold.add(d.label());
            counts.add(counter.count(d.text()));
            perLabel.merge(d.label(), 1, Integer::sum);
        }
        if (ids.isEmpty()) {
            throw new TelltaleException("corpus " + corpus + " has no documents to train on");
        }
        if (perLabel.size() < 2) {
            throw new TelltaleException("corpus " + corpus + " has only the label '" + gold.get(0)
                    + "'; a classifier needs at least two");
        }
        BitSet held = HoldoutSplit.choose(ids, gold, request.holdout(), request.seed());
        List<Map<String, Integer>> trainCounts = new ArrayList<>();
        List<String> trainGold = new ArrayList<>();
        for (int i = 0; i < ids.size(); i++) {
            if (!held.get(i)) {
                trainCounts.add(counts.get(i));
                trainGold.add(gold.get(i));
            }
        }
        TrainingSet data = TrainingSet.of(trainCounts, trainGold);
        TrainingInfo info = new TrainingInfo(corpus.getFileName() == null ? corpus.toString()
                : corpus.getFileName().toString(), sha256(corpus), ids.size(), data.size(), held.cardinality(),
                perLabel, request.holdout(), request.seed(),
                Instant.now().truncatedTo(ChronoUnit.SECONDS).toString());
        BuiltinModel model = switch (request.algorithm()) {
            case BAYES -> new NaiveBayesTrainer(request.smoothing()).fit(data, counter, info);
            case LOGISTIC -> new LogisticTrainer(request.l2(), request.maxIterations(), 1e-6).fit(data, counter, info);
        };
        Evaluation evaluation = null;
        if (!held.isEmpty()) {
            ConfusionCounter confusion = new ConfusionCounter(model.labels());
            for (int i = held.nextSetBit(0); i >= 0; i = held.nextSetBit(i + 1)) {
                double[] scores = model.linearScores(model.vocabulary().vectorize(counts.get(i)));
                confusion.add(gold.get(i), model.labels().get(argmax(scores)));
            }
            evaluation = confusion.result();
        }
        return new TrainingOutcome(model, evaluation);
    }

    /** First index of the largest value, the tie rule of {@link ScoreMatrix#predicted}. */
    static int argmax(double[] v) {
        int best = 0;
        for (int j = 1; j < v.length; j++) {
            if (v[j] > v[best]) {
                best = j;
            }
        }
        return best;
    }

    /**
     * SHA-256 of a corpus file's bytes; for a label folder, of every regular file in it in order of
     * relative path, each as its path (UTF-8, '/'-separated), a zero byte, then its bytes.
     */
    public static String sha256(Path corpus) {
        try {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            if (Files.isDirectory(corpus)) {
                List<Path> files;
                try (Stream<Path> walk = Files.walk(corpus)) {
                    files = walk.filter(Files::isRegularFile)
                            .sorted(java.util.Comparator.comparing(f -> corpus.relativize(f).toString().replace('\\', '/')))
                            .toList();
                }
                for (Path f : files) {
                    String rel = corpus.relativize(f).toString().replace('\\', '/');
                    digest.update(rel.getBytes(StandardCharsets.UTF_8));
                    digest.update((byte) 0);
                    feed(digest, f);
                }
            } else {
                feed(digest, corpus);
            }
            return HexFormat.of().formatHex(digest.digest());
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        } catch (IOException e) {
            throw new TelltaleException("cannot read corpus " + corpus + " for its checksum: " + e.getMessage(), e);
        }
    }

    private static void feed(MessageDigest digest, Path file) throws IOException {
        try (InputStream in = new DigestInputStream(Files.newInputStream(file), digest)) {
            in.transferTo(java.io.OutputStream.nullOutputStream());
        }
    }
}
