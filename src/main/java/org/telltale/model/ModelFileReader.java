package org.telltale.model;

import java.nio.file.Path;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.telltale.TelltaleException;
import org.telltale.UnknownKeyException;
import org.telltale.json.JsonValue;

/**
 * Reads a model file's fields through the strict {@link JsonValue} and builds the model. Every
 * error names the file, the path in it ({@code labels[2]}, {@code parameters.weights[1][0]}) and
 * what was found, as for every versioned contract.
 */
final class ModelFileReader {
    private final Path path;

    private ModelFileReader(Path path) {
        this.path = path;
    }

    /** The model in {@code root}, whose format and version the caller has checked. */
    static BuiltinModel build(Path path, JsonValue root) {
        return new ModelFileReader(path).build(root);
    }

    private BuiltinModel build(JsonValue root) {
        Algorithm algorithm = algorithm(root);
        List<String> labels = distinctStrings(root, "labels");
        if (labels.isEmpty()) {
            throw root.get("labels").here("expected at least one label");
        }
        Vocabulary vocabulary = new Vocabulary(distinctStrings(root, "vocabulary"));
        JsonValue p = root.object("parameters");
        TrainingInfo training = root.find("training").map(ModelFileReader::training).orElse(null);
        TermCounter counter = counter(root);
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
            TrainingInfo training, JsonValue p) {
        double smoothing = p.number("smoothing");
        double[] logPrior = vector(p.get("log_prior"), labels.size(), "one per label");
        double[][] logLikelihood = matrix(p.get("log_likelihood"), labels.size(), vocabulary.size());
        return new NaiveBayesModel(labels, counter, vocabulary, training, path.toString(), smoothing, logPrior,
                logLikelihood);
    }

    private LogisticModel logistic(List<String> labels, TermCounter counter, Vocabulary vocabulary,
            TrainingInfo training, JsonValue p) {
        String features = p.string("features");
        if (!features.equals(LogisticModel.FEATURES)) {
            throw p.get("features").here("expected \"" + LogisticModel.FEATURES + "\", the only features this Telltale knows");
        }
        double l2 = p.number("l2");
        double[] intercepts = vector(p.get("intercepts"), labels.size(), "one per label");
        double[][] weights = matrix(p.get("weights"), labels.size(), vocabulary.size());
        OptimiserReport report = p.find("optimiser").map(o -> new OptimiserReport(o.string("method"),
                o.int32("iterations"), o.int32("evaluations"), o.bool("converged"), o.numberOrNaN("objective"),
                o.numberOrNaN("gradient_norm"))).orElse(null);
        return new LogisticModel(labels, counter, vocabulary, training, path.toString(), l2, intercepts, weights,
                report);
    }

    private static Algorithm algorithm(JsonValue root) {
        String key = root.string("algorithm");
        try {
            return Algorithm.fromKey(key);
        } catch (UnknownKeyException e) {
            throw root.at("algorithm", e.getMessage());
        }
    }

    private static TermCounter counter(JsonValue root) {
        String analyzer = root.string("analyzer");
        int ngrams = root.int32("ngrams");
        try {
            return new TermCounter(analyzer, ngrams);
        } catch (TelltaleException e) {
            throw root.at("analyzer", "cannot be used with ngrams " + ngrams + ": " + e.getMessage());
        }
    }

    private static TrainingInfo training(JsonValue t) {
        Map<String, Integer> perLabel = new LinkedHashMap<>();
        for (Map.Entry<String, JsonValue> e : t.object("per_label").fields().entrySet()) {
            perLabel.put(e.getKey(), e.getValue().asInt32());
        }
        return new TrainingInfo(t.nullableString("corpus"), t.nullableString("corpus_sha256"), t.int32("documents"),
                t.int32("training_documents"), t.int32("holdout_documents"), perLabel, t.number("holdout"),
                t.integer("seed"), t.nullableString("date"));
    }

    private static List<String> distinctStrings(JsonValue root, String field) {
        List<JsonValue> items = root.array(field);
        Set<String> seen = new HashSet<>(items.size() * 2);
        for (JsonValue item : items) {
            if (!seen.add(item.asString())) {
                throw item.here("expected each value once, listed again");
            }
        }
        return root.strings(field);
    }

    private static double[] vector(JsonValue array, int length, String rule) {
        List<JsonValue> items = array.elements();
        if (items.size() != length) {
            throw array.here("expected " + length + " numbers, " + rule + ", not " + items.size());
        }
        double[] values = new double[length];
        for (int i = 0; i < length; i++) {
            values[i] = items.get(i).asNumber();
            if (!Double.isFinite(values[i])) {
                throw items.get(i).here("expected a finite number");
            }
        }
        return values;
    }

    private static double[][] matrix(JsonValue array, int count, int length) {
        List<JsonValue> rows = array.elements();
        if (rows.size() != count) {
            throw array.here("expected " + count + " rows, one per label, not " + rows.size());
        }
        double[][] values = new double[count][];
        for (int c = 0; c < count; c++) {
            values[c] = vector(rows.get(c), length, "one per vocabulary term");
        }
        return values;
    }
}
