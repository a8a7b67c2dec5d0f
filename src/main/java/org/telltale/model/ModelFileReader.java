package org.telltale.model;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.telltale.TelltaleException;
import org.telltale.UnknownKeyException;

/** Checks the bound contents of a model file field by field and builds the model. */
final class ModelFileReader {
    private final Path path;

    private ModelFileReader(Path path) {
        this.path = path;
    }

    static BuiltinModel build(Path path, ModelFile.Contents c) {
        return new ModelFileReader(path).build(c);
    }

    private BuiltinModel build(ModelFile.Contents c) {
        Algorithm algorithm = algorithm(c.algorithm());
        List<String> labels = distinctStrings("labels", c.labels());
        if (labels.isEmpty()) {
            throw bad("has no labels");
        }
        List<String> terms = distinctStrings("vocabulary", c.vocabulary());
        Vocabulary vocabulary = new Vocabulary(terms);
        ModelFile.Parameters p = require("parameters", c.parameters());
        TrainingInfo training = training(c.training());
        TermCounter counter = counter(c.analyzer(), c.ngrams());
        try {
            return switch (algorithm) {
                case BAYES -> bayes(labels, counter, vocabulary, training, p);
                case LOGISTIC -> logistic(labels, counter, vocabulary, training, p);
            };
        } catch (RuntimeException e) {
            counter.close();
            throw e;
        }
    }

    private NaiveBayesModel bayes(List<String> labels, TermCounter counter, Vocabulary vocabulary,
            TrainingInfo training, ModelFile.Parameters p) {
        double smoothing = require("parameters.smoothing", p.smoothing());
        double[] logPrior = vector("parameters.log_prior", p.logPrior(), labels.size());
        double[][] logLikelihood = matrix("parameters.log_likelihood", p.logLikelihood(), labels.size(),
                vocabulary.size());
        return new NaiveBayesModel(labels, counter, vocabulary, training, path.toString(), smoothing, logPrior,
                logLikelihood);
    }

    private LogisticModel logistic(List<String> labels, TermCounter counter, Vocabulary vocabulary,
            TrainingInfo training, ModelFile.Parameters p) {
        String features = require("parameters.features", p.features());
        if (!features.equals(LogisticModel.FEATURES)) {
            throw bad("has features '" + features + "', this telltale knows only '" + LogisticModel.FEATURES + "'");
        }
        double l2 = require("parameters.l2", p.l2());
        double[] intercepts = vector("parameters.intercepts", p.intercepts(), labels.size());
        double[][] weights = matrix("parameters.weights", p.weights(), labels.size(), vocabulary.size());
        OptimiserReport report = null;
        ModelFile.Optimiser o = p.optimiser();
        if (o != null) {
            report = new OptimiserReport(String.valueOf(o.method()), orZero(o.iterations()), orZero(o.evaluations()),
                    Boolean.TRUE.equals(o.converged()), o.objective() == null ? Double.NaN : o.objective(),
                    o.gradientNorm() == null ? Double.NaN : o.gradientNorm());
        }
        return new LogisticModel(labels, counter, vocabulary, training, path.toString(), l2, intercepts, weights,
                report);
    }

    private Algorithm algorithm(String key) {
        require("algorithm", key);
        try {
            return Algorithm.fromKey(key);
        } catch (UnknownKeyException e) {
            throw bad("has " + e.getMessage());
        }
    }

    private TermCounter counter(String analyzer, Integer ngrams) {
        require("analyzer", analyzer);
        require("ngrams", ngrams);
        try {
            return new TermCounter(analyzer, ngrams);
        } catch (TelltaleException e) {
            throw bad("cannot be used: " + e.getMessage());
        }
    }

    private TrainingInfo training(ModelFile.Training t) {
        if (t == null) {
            return null;
        }
        return new TrainingInfo(t.corpus(), t.corpusSha256(), orZero(t.documents()), orZero(t.trainingDocuments()),
                orZero(t.holdoutDocuments()), t.perLabel() == null ? java.util.Map.of() : t.perLabel(),
                t.holdout() == null ? 0 : t.holdout(), t.seed() == null ? 0 : t.seed(), t.date());
    }

    private List<String> distinctStrings(String field, List<String> values) {
        require(field, values);
        Set<String> seen = new HashSet<>(values.size() * 2);
        for (int i = 0; i < values.size(); i++) {
            String v = values.get(i);
            if (v == null) {
                throw bad("has a null in '" + field + "' at position " + i);
            }
            if (!seen.add(v)) {
                throw bad("lists '" + v + "' twice in '" + field + "' (second at position " + i + ")");
            }
        }
        return values;
    }

    private double[] vector(String field, double[] values, int length) {
        require(field, values);
        if (values.length != length) {
            throw bad("has " + values.length + " values in '" + field + "', expected " + length);
        }
        for (int i = 0; i < values.length; i++) {
            if (!Double.isFinite(values[i])) {
                throw bad("has a non-finite value in '" + field + "[" + i + "]'");
            }
        }
        return values;
    }

    private double[][] matrix(String field, double[][] rows, int count, int length) {
        require(field, rows);
        if (rows.length != count) {
            throw bad("has " + rows.length + " rows in '" + field + "', expected one per label (" + count + ")");
        }
        for (int c = 0; c < rows.length; c++) {
            vector(field + "[" + c + "]", rows[c], length);
        }
        return rows;
    }

    private <T> T require(String field, T value) {
        if (value == null) {
            throw bad("has no '" + field + "'");
        }
        return value;
    }

    private static int orZero(Integer v) {
        return v == null ? 0 : v;
    }

    private TelltaleException bad(String what) {
        return ModelFile.bad(path, what);
    }
}
