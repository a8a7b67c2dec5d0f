package org.telltale.model;

import java.util.List;
import java.util.Objects;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;

/**
 * A classifier Telltale trains and runs in-process: naive Bayes or logistic regression over the
 * terms of a Lucene analyzer. Both score a text with one linear function of its term counts per
 * label and turn those scores into probabilities with the softmax, so the posterior of naive
 * Bayes and the probabilities of logistic regression come out the same way.
 *
 * <p>Load and save with {@link ModelFile}. Immutable and thread-safe; {@link #close()} releases
 * the analyzer.
 */
public abstract sealed class BuiltinModel implements TextClassifier, ProbeScoring permits NaiveBayesModel, LogisticModel {
    private final List<String> labels;
    private final TermCounter counter;
    private final Vocabulary vocabulary;
    private final TrainingInfo training;
    private final String source;

    BuiltinModel(List<String> labels, TermCounter counter, Vocabulary vocabulary, TrainingInfo training,
            String source) {
        this.labels = List.copyOf(labels);
        if (this.labels.isEmpty()) {
            throw new IllegalArgumentException("a model needs at least one label");
        }
        this.counter = Objects.requireNonNull(counter, "counter");
        this.vocabulary = Objects.requireNonNull(vocabulary, "vocabulary");
        this.training = training;
        this.source = source;
    }

    public abstract Algorithm algorithm();

    /** The labels, in the order of the score columns. */
    public List<String> labels() {
        return labels;
    }

    /** The analyzer name or spec, as {@link org.telltale.text.Analyzers#byName} reads it. */
    public String analyzer() {
        return counter.analyzerSpec();
    }

    public int ngrams() {
        return counter.ngrams();
    }

    public Vocabulary vocabulary() {
        return vocabulary;
    }

    /** Training metadata, or {@code null} for a model built without a corpus (e.g. in a test). */
    public TrainingInfo training() {
        return training;
    }

    TermCounter counter() {
        return counter;
    }

    /** The known features of {@code text} as raw counts. */
    public SparseCounts counts(String text) {
        return vocabulary.vectorize(counter.count(text));
    }

    /**
     * The unnormalised log score of each label for {@code text}: for naive Bayes the log of
     * prior times likelihood, for logistic regression the linear predictor.
     */
    public double[] logScores(String text) {
        return linearScores(counts(text));
    }

    /** The probability of each label for {@code text}. */
    public double[] probabilities(String text) {
        return Softmax.of(logScores(text));
    }

    /** Probabilities, with the log scores behind them as logits (the softmax of each logit row is its probability row). */
    @Override
    public ScoreMatrix score(List<String> texts) {
        double[][] rows = new double[texts.size()][];
        double[][] logits = new double[texts.size()][];
        for (int i = 0; i < rows.length; i++) {
            logits[i] = logScores(texts.get(i));
            rows[i] = Softmax.of(logits[i]);
        }
        return new ScoreMatrix(labels, rows, logits);
    }

    /**
     * Scores the masks of {@code index} from term counts instead of texts, when that is exact for
     * this document (see {@link MaskedCounts}); {@code null} otherwise.
     */
    @Override
    public MaskScorer prepare(TermIndex index, Masker masker) {
        return MaskedCounts.prepare(this, index, masker);
    }

    @Override
    public String describe() {
        return "built-in " + algorithm().key() + " model" + (source == null ? "" : " " + source)
                + " (" + labels.size() + " labels, " + vocabulary.size() + " terms)";
    }

    /** Where the model was loaded from, or {@code null}. */
    public String source() {
        return source;
    }

    @Override
    public void close() {
        counter.close();
    }

    /** Scores of each label from raw counts of the known features. */
    final double[] linearScores(SparseCounts counts) {
        return linearScores(counts.columns(), counts.values(), counts.nonZeros());
    }

    /**
     * Scores of each label from the first {@code n} known columns (ascending) and their raw
     * counts: the one place a built-in model's arithmetic lives, so that a text and the counts of
     * a mask are scored alike to the last bit.
     */
    abstract double[] linearScores(int[] columns, double[] counts, int n);
}
