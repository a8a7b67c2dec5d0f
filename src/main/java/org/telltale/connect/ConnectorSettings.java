package org.telltale.connect;

import java.time.Duration;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.function.UnaryOperator;

/**
 * Everything {@link Connectors#open} needs to reach a model: the {@code --model} spec and the
 * connector options.
 *
 * @param spec        a model file path, an {@code http://}/{@code https://} URL, or {@code exec:COMMAND ARGS…}
 * @param protocol    the JSON exchange for URLs; ignored for files and subprocesses
 * @param batch       most texts per request (≥ 1)
 * @param parallel    requests in flight (≥ 1), or {@link #AUTO}: for URLs and {@code exec:}, an
 *                    adaptive limit that finds the service's capacity; for model files, threads to suit the cores
 * @param parallelMax the most requests (processes) in flight that {@link #AUTO} may reach (≥ 1)
 * @param timeout     how long one request may take before it is abandoned (and retried)
 * @param retries     how many times a failed request is retried (≥ 0)
 * @param headers     HTTP header name → name of the environment variable holding its value
 * @param scores      whether the model answers probabilities or logits
 * @param labels      label names for services that answer bare rows of numbers (may be empty)
 * @param backoff     the first retry delay; later ones double, with jitter
 * @param maxRestarts how many times a subprocess may be restarted over the connector's life
 * @param environment looks up environment variables (the process environment unless a test says otherwise)
 */
public record ConnectorSettings(
        String spec,
        Protocol protocol,
        int batch,
        int parallel,
        int parallelMax,
        Duration timeout,
        int retries,
        Map<String, String> headers,
        ScoreKind scores,
        List<String> labels,
        Duration backoff,
        int maxRestarts,
        UnaryOperator<String> environment) {

    public static final int DEFAULT_BATCH = 64;
    public static final Duration DEFAULT_TIMEOUT = Duration.ofSeconds(30);
    public static final int DEFAULT_RETRIES = 3;
    public static final Duration DEFAULT_BACKOFF = Duration.ofMillis(200);
    public static final int DEFAULT_MAX_RESTARTS = 10;
    /** {@link #parallel} for an adaptive limit. */
    public static final int AUTO = 0;
    public static final int DEFAULT_PARALLEL_MAX = 64;
    /**
     * Where an adaptive limit starts for a URL: a guess that slow start corrects within a few
     * answers. Eight, not four, saves a cold round trip against a large service (20 ms / 16 slots:
     * 88 % busy against 79-84 % from four, docs/performance.md); not sixteen, which a one-worker
     * service taking 2 s a batch would answer only after the default 30 s timeout.
     */
    static final int AUTO_START_HTTP = 8;

    public ConnectorSettings {
        Objects.requireNonNull(spec, "spec");
        Objects.requireNonNull(protocol, "protocol");
        Objects.requireNonNull(timeout, "timeout");
        Objects.requireNonNull(scores, "scores");
        Objects.requireNonNull(backoff, "backoff");
        Objects.requireNonNull(environment, "environment");
        if (spec.isBlank()) {
            throw new IllegalArgumentException("the model spec is empty");
        }
        if (batch < 1) {
            throw new IllegalArgumentException("batch must be at least 1: " + batch);
        }
        if (parallel < 0) {
            throw new IllegalArgumentException("parallel must be at least 1: " + parallel);
        }
        if (parallelMax < 1) {
            throw new IllegalArgumentException("parallelMax must be at least 1: " + parallelMax);
        }
        if (retries < 0) {
            throw new IllegalArgumentException("retries must be 0 or more: " + retries);
        }
        if (maxRestarts < 0) {
            throw new IllegalArgumentException("maxRestarts must be 0 or more: " + maxRestarts);
        }
        if (timeout.isNegative() || timeout.isZero()) {
            throw new IllegalArgumentException("timeout must be positive: " + Durations.format(timeout));
        }
        headers = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(headers));
        labels = List.copyOf(labels);
    }

    /**
     * {@link #parallel} from its written form, as every front takes it: a count of at least 1, or
     * {@code auto} (any case) for {@link #AUTO}. The one parser of that form.
     */
    public static int parallelOf(String value) {
        String v = value.strip();
        if (v.equalsIgnoreCase("auto")) {
            return AUTO;
        }
        int n;
        try {
            n = Integer.parseInt(v);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("parallel must be a number or auto: " + value);
        }
        if (n < 1) {
            throw new IllegalArgumentException("parallel must be at least 1: " + n);
        }
        return n;
    }

    /** Defaults for everything but the spec: native protocol, batch 64, 30 s timeout, 3 retries. */
    public static ConnectorSettings of(String spec) {
        return new ConnectorSettings(spec, Protocol.NATIVE, DEFAULT_BATCH, AUTO, DEFAULT_PARALLEL_MAX, DEFAULT_TIMEOUT, DEFAULT_RETRIES,
                Map.of(), ScoreKind.PROBABILITIES, List.of(), DEFAULT_BACKOFF, DEFAULT_MAX_RESTARTS, System::getenv);
    }

    /** The same options for another model spec. */
    public ConnectorSettings withSpecOf(String otherSpec) {
        return new ConnectorSettings(otherSpec, protocol, batch, parallel, parallelMax, timeout, retries, headers, scores, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withProtocol(Protocol p) {
        return new ConnectorSettings(spec, p, batch, parallel, parallelMax, timeout, retries, headers, scores, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withBatch(int n) {
        return new ConnectorSettings(spec, protocol, n, parallel, parallelMax, timeout, retries, headers, scores, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withParallel(int n) {
        return new ConnectorSettings(spec, protocol, batch, n, parallelMax, timeout, retries, headers, scores, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withParallelMax(int n) {
        return new ConnectorSettings(spec, protocol, batch, parallel, n, timeout, retries, headers, scores, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withTimeout(Duration d) {
        return new ConnectorSettings(spec, protocol, batch, parallel, parallelMax, d, retries, headers, scores, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withRetries(int n) {
        return new ConnectorSettings(spec, protocol, batch, parallel, parallelMax, timeout, n, headers, scores, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withHeaders(Map<String, String> h) {
        return new ConnectorSettings(spec, protocol, batch, parallel, parallelMax, timeout, retries, h, scores, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withScores(ScoreKind k) {
        return new ConnectorSettings(spec, protocol, batch, parallel, parallelMax, timeout, retries, headers, k, labels, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withLabels(List<String> l) {
        return new ConnectorSettings(spec, protocol, batch, parallel, parallelMax, timeout, retries, headers, scores, l, backoff, maxRestarts, environment);
    }

    public ConnectorSettings withBackoff(Duration d) {
        return new ConnectorSettings(spec, protocol, batch, parallel, parallelMax, timeout, retries, headers, scores, labels, d, maxRestarts, environment);
    }

    public ConnectorSettings withMaxRestarts(int n) {
        return new ConnectorSettings(spec, protocol, batch, parallel, parallelMax, timeout, retries, headers, scores, labels, backoff, n, environment);
    }

    public ConnectorSettings withEnvironment(UnaryOperator<String> env) {
        return new ConnectorSettings(spec, protocol, batch, parallel, parallelMax, timeout, retries, headers, scores, labels, backoff, maxRestarts, env);
    }

    /** The connector this spec selects. */
    public Kind kind() {
        if (spec.startsWith("exec:")) {
            return Kind.SUBPROCESS;
        }
        if (spec.startsWith("http://") || spec.startsWith("https://")) {
            return Kind.HTTP;
        }
        return Kind.FILE;
    }

    /** Whether requests in flight follow an adaptive limit: {@link #AUTO} for a URL or {@code exec:}. */
    public boolean adaptive() {
        return parallel == AUTO && kind() != Kind.FILE;
    }

    /**
     * The most requests (processes) in flight: {@link #parallel} when fixed; for {@link #AUTO},
     * {@link #parallelMax} for URLs, and as many processes as there are cores (at most
     * {@code parallelMax}) for {@code exec:}, since more processes than cores only queue for them;
     * for model files, threads up to 4 to suit the cores.
     */
    public int effectiveParallel() {
        if (parallel > 0) {
            return parallel;
        }
        int cores = Runtime.getRuntime().availableProcessors();
        return switch (kind()) {
            case HTTP -> parallelMax;
            case SUBPROCESS -> Math.max(1, Math.min(parallelMax, cores));
            case FILE -> Math.max(1, Math.min(4, cores));
        };
    }

    /** The in-flight policy these settings describe. */
    InFlightGate.Policy gatePolicy() {
        if (!adaptive()) {
            return InFlightGate.fixed(effectiveParallel());
        }
        // A subprocess starts at one process (more cost memory and start-up); a URL at a few requests.
        int start = kind() == Kind.SUBPROCESS ? 1 : AUTO_START_HTTP;
        return new AdaptiveLimit(start, effectiveParallel());
    }

    /** The three ways to reach a model. */
    public enum Kind { FILE, HTTP, SUBPROCESS }
}
