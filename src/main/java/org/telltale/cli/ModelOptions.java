package org.telltale.cli;

import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.telltale.OptionWords;
import org.telltale.connect.ConnectorSettings;
import org.telltale.connect.Connectors;
import org.telltale.connect.Durations;
import org.telltale.connect.Protocol;
import org.telltale.connect.ScoreKind;
import org.telltale.explain.ConcurrentExplanations;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelFile;
import org.telltale.model.ProbeScoring;
import org.telltale.model.TextClassifier;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.Option;

/**
 * The options of every command that talks to a model: {@code --model SPEC} and how to reach it.
 * Use as {@code @Mixin ModelOptions model;} and call {@link #open()}; close what it returns.
 */
public final class ModelOptions {
    @Option(names = "--model", paramLabel = "SPEC", required = true,
            description = "The model: a model file (built-in, in process), an http:// or https:// URL, "
                    + "or exec:COMMAND ARGS… (a subprocess speaking the scoring protocol line by line).")
    String spec;

    @Option(names = "--protocol", paramLabel = "NAME", defaultValue = "native", converter = ProtocolConverter.class,
            description = "For URLs: native (our scoring protocol), open-inference (SPEC is …/v2/models/NAME) "
                    + "instances ({\"instances\"} → {\"predictions\"}) or pipeline ({\"inputs\"} → per text a list of "
                    + "{\"label\", \"score\"}). Default: ${DEFAULT-VALUE}.")
    Protocol protocol;

    @Option(names = "--batch", paramLabel = "N", defaultValue = "64",
            description = "Most texts per request. Default: ${DEFAULT-VALUE}.")
    int batch;

    @Option(names = "--parallel", paramLabel = "N|auto", defaultValue = "auto",
            description = "Requests in flight (subprocesses for exec:), or auto: find the service's capacity from "
                    + "its latency and its 429/503 answers, up to --parallel-max requests (for exec:, processes up "
                    + "to the cores available). Model files use up to 4 threads. Default: ${DEFAULT-VALUE}.")
    String parallel;

    @Option(names = "--parallel-max", paramLabel = "N", defaultValue = "" + ConnectorSettings.DEFAULT_PARALLEL_MAX,
            description = "The most requests in flight --parallel auto may reach. Default: ${DEFAULT-VALUE}.")
    int parallelMax;

    @Option(names = "--timeout", paramLabel = "DURATION", defaultValue = "30s", converter = DurationConverter.class,
            description = "How long one request may take, e.g. 500ms, 30s, 2m. Default: ${DEFAULT-VALUE}.")
    Duration timeout;

    @Option(names = "--retries", paramLabel = "N", defaultValue = "3",
            description = "Retries of a request after a timeout, a reset connection, HTTP 429 or 5xx, "
                    + "or a subprocess that died, with exponential backoff and jitter. Default: ${DEFAULT-VALUE}.")
    int retries;

    @Option(names = "--header", paramLabel = "NAME=ENVVAR",
            description = "Send header NAME with the value of environment variable ENVVAR (repeatable). "
                    + "The value is never printed, logged or written.")
    Map<String, String> headers = new LinkedHashMap<>();

    @Option(names = "--scores", paramLabel = "KIND", defaultValue = "probabilities", converter = ScoreKindConverter.class,
            description = "What the model answers: probabilities, or logits (passed through a softmax). "
                    + "Default: ${DEFAULT-VALUE}.")
    ScoreKind scores;

    @Option(names = "--labels", paramLabel = "A,B,…", split = ",",
            description = "Label names for services that answer bare rows of numbers (instances, open-inference "
                    + "without label metadata).")
    List<String> labels = List.of();

    /** The settings these options describe; a bad value is a usage error, checked once by {@link ConnectorSettings}. */
    public ConnectorSettings settings() {
        try {
            return ConnectorSettings.of(spec).withProtocol(protocol).withBatch(batch)
                    .withParallel(ConnectorSettings.parallelOf(parallel == null ? "auto" : parallel))
                    .withParallelMax(parallelMax).withTimeout(timeout).withRetries(retries).withHeaders(headers)
                    .withScores(scores).withLabels(labels == null ? List.of() : labels);
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
    }

    /** Opens the connector; the caller closes it. */
    public TextClassifier open() {
        return Connectors.open(settings());
    }

    /**
     * A connector and, when {@code --model} is a built-in model file, the model itself, which
     * scores an explanation's probes without their texts where that is exact (null otherwise).
     * Closing the connector closes the model.
     */
    record ForExplaining(TextClassifier classifier, ProbeScoring probeScoring, boolean inProcess) {
        /**
         * How to explain documents at once with this model: one per core when it scores in this
         * process, more in flight than cores when it scores elsewhere (a service, a subprocess).
         */
        ConcurrentExplanations concurrently() {
            return inProcess ? ConcurrentExplanations.inProcess() : ConcurrentExplanations.forRemoteModel();
        }
    }

    /** Opens the connector as {@link #open()} does, keeping a built-in model's probe scoring; the caller closes the classifier. */
    ForExplaining openForExplaining() {
        ConnectorSettings settings = settings();
        if (settings.kind() == ConnectorSettings.Kind.FILE && !settings.spec().contains("://")) {
            BuiltinModel builtin = ModelFile.load(java.nio.file.Path.of(settings.spec()));
            return new ForExplaining(Connectors.inProcess(builtin, settings), builtin, true);
        }
        return new ForExplaining(Connectors.open(settings), null, settings.kind() == ConnectorSettings.Kind.FILE);
    }

    /** Under {@code --verbose}, prints on stderr how many requests the connector kept in flight (for auto, where it settled). */
    static void reportConcurrency(TextClassifier classifier, boolean verbose, java.io.PrintWriter err) {
        String line = classifier.concurrency();
        if (verbose && !line.isEmpty()) {
            err.println("model: " + line);
            err.flush();
        }
    }

    /** The spec as given, for messages. */
    public String spec() {
        return spec;
    }

    static final class ProtocolConverter implements ITypeConverter<Protocol> {
        @Override
        public Protocol convert(String value) {
            return Protocol.byName(value);
        }
    }

    static final class ScoreKindConverter implements ITypeConverter<ScoreKind> {
        @Override
        public ScoreKind convert(String value) {
            return ScoreKind.byName(value);
        }
    }

    static final class DurationConverter implements ITypeConverter<Duration> {
        @Override
        public Duration convert(String value) {
            return Durations.parse(value);
        }
    }
}
