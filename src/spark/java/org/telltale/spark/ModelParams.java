package org.telltale.spark;

import java.io.Serializable;
import java.time.Duration;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.telltale.OptionWords;
import org.telltale.UsageException;
import org.telltale.connect.ConnectorSettings;
import org.telltale.connect.Connectors;
import org.telltale.connect.Durations;
import org.telltale.connect.Protocol;
import org.telltale.connect.ScoreKind;
import org.telltale.model.TextClassifier;

/**
 * The model options of {@code telltale audit} ({@code --model}, {@code --protocol}, {@code --batch},
 * {@code --parallel}, {@code --parallel-max}, {@code --timeout}, {@code --retries}, {@code --header}, {@code --scores},
 * {@code --labels}) as given, with the same defaults and checks, in a form Spark ships to its
 * tasks: each partition opens its own connector from them. A model file is shipped to the
 * executors with the job ({@code SparkContext.addFile}); {@code --header} values are read from
 * the environment where the connector opens, so executors need the variables too.
 */
record ModelParams(String spec, String protocol, int batch, String parallel, int parallelMax, String timeout,
                   int retries, List<String> headers, String scores, String labels) implements Serializable {

    static final List<String> VALUE_OPTIONS = List.of("--model", "--protocol", "--batch", "--parallel", "--parallel-max",
            "--timeout", "--retries", "--scores", "--labels");
    static final String HEADER = "--header";

    static ModelParams of(SparkOptions o) {
        ModelParams p = new ModelParams(o.required("--model"), o.get("--protocol", "native"),
                o.integer("--batch", ConnectorSettings.DEFAULT_BATCH), o.get("--parallel", "auto"),
                o.integer("--parallel-max", ConnectorSettings.DEFAULT_PARALLEL_MAX), o.get("--timeout", "30s"),
                o.integer("--retries", ConnectorSettings.DEFAULT_RETRIES), List.copyOf(o.all(HEADER)),
                o.get("--scores", "probabilities"), o.get("--labels", null));
        p.settings(p.spec);
        return p;
    }

    /**
     * The connector settings, for {@code where} the model is (the spec, or the shipped copy of a
     * model file): each value read by the core's own parser and checked once by
     * {@link ConnectorSettings}, as {@code telltale}'s model options are, with the same messages.
     */
    ConnectorSettings settings(String where) {
        Protocol readProtocol = read("--protocol", () -> Protocol.byName(protocol));
        Duration wait = read("--timeout", () -> Durations.parse(timeout));
        ScoreKind readScores = read("--scores", () -> ScoreKind.byName(scores));
        Map<String, String> named = new LinkedHashMap<>();
        for (String header : headers) {
            int eq = header.indexOf('=');
            if (eq <= 0 || eq == header.length() - 1) {
                throw new UsageException("--header must be NAME=ENVVAR: '" + header + "'");
            }
            named.put(header.substring(0, eq), header.substring(eq + 1));
        }
        List<String> labelList = labels == null ? List.of() : Arrays.asList(labels.split(","));
        try {
            return ConnectorSettings.of(where).withProtocol(readProtocol).withBatch(batch)
                    .withParallel(ConnectorSettings.parallelOf(parallel)).withParallelMax(parallelMax).withTimeout(wait)
                    .withRetries(retries).withHeaders(named).withScores(readScores).withLabels(labelList);
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
    }

    /** A value of {@code option} read by the core's parser; what it refuses is a usage error naming the option. */
    private static <T> T read(String option, java.util.function.Supplier<T> parse) {
        try {
            return parse.get();
        } catch (IllegalArgumentException e) {
            throw OptionWords.value(option, e);
        }
    }

    boolean isFile() {
        return ConnectorSettings.of(spec).kind() == ConnectorSettings.Kind.FILE;
    }

    /** Opens the connector at {@code where}; the caller closes it. */
    TextClassifier open(String where) {
        return Connectors.open(settings(where));
    }
}
