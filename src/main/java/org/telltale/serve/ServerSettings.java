package org.telltale.serve;

import java.time.Duration;
import java.util.Objects;

/**
 * How {@link ModelServer} listens and what it accepts.
 *
 * @param host     the address to bind; loopback unless the operator chooses otherwise
 * @param port     the port, or 0 for an ephemeral one
 * @param threads  how many requests are scored at once
 * @param name     the model's name in Open Inference Protocol routes ({@code /v2/models/NAME})
 * @param maxBatch most texts in one request (more is answered 400)
 * @param maxBody  most bytes in one request body (more is answered 413)
 * @param drain    how long shutdown waits for requests in flight
 * @param requestTime how long a client may take to send a whole request (slow clients are cut off)
 */
public record ServerSettings(String host, int port, int threads, String name, int maxBatch, long maxBody,
        Duration drain, Duration requestTime) {

    public static final String LOOPBACK = "127.0.0.1";
    public static final int DEFAULT_PORT = 8080;
    public static final int DEFAULT_MAX_BATCH = 1024;
    public static final long DEFAULT_MAX_BODY = 16L << 20;

    public ServerSettings {
        Objects.requireNonNull(host, "host");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(drain, "drain");
        Objects.requireNonNull(requestTime, "requestTime");
        if (port < 0 || port > 65535) {
            throw new IllegalArgumentException("port must be within 0–65535: " + port);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be at least 1: " + threads);
        }
        if (maxBatch < 1) {
            throw new IllegalArgumentException("maxBatch must be at least 1: " + maxBatch);
        }
        if (maxBody < 64) {
            throw new IllegalArgumentException("maxBody must be at least 64: " + maxBody);
        }
        if (!name.matches("[A-Za-z0-9._-]+")) {
            throw new IllegalArgumentException("the model name may hold letters, digits, '.', '_' and '-' only: '" + name + "'");
        }
    }

    /** Loopback, port 8080, one scoring thread per core, batches up to 1024 texts, bodies up to 16 MiB. */
    public static ServerSettings defaults(String name) {
        return new ServerSettings(LOOPBACK, DEFAULT_PORT, Math.max(1, Runtime.getRuntime().availableProcessors()), name,
                DEFAULT_MAX_BATCH, DEFAULT_MAX_BODY, Duration.ofSeconds(10), Duration.ofSeconds(30));
    }

    public ServerSettings withHost(String h) {
        return new ServerSettings(h, port, threads, name, maxBatch, maxBody, drain, requestTime);
    }

    public ServerSettings withPort(int p) {
        return new ServerSettings(host, p, threads, name, maxBatch, maxBody, drain, requestTime);
    }

    public ServerSettings withThreads(int t) {
        return new ServerSettings(host, port, t, name, maxBatch, maxBody, drain, requestTime);
    }

    public ServerSettings withMaxBatch(int n) {
        return new ServerSettings(host, port, threads, name, n, maxBody, drain, requestTime);
    }

    public ServerSettings withMaxBody(long n) {
        return new ServerSettings(host, port, threads, name, maxBatch, n, drain, requestTime);
    }

    public ServerSettings withDrain(Duration d) {
        return new ServerSettings(host, port, threads, name, maxBatch, maxBody, d, requestTime);
    }

    public ServerSettings withRequestTime(Duration d) {
        return new ServerSettings(host, port, threads, name, maxBatch, maxBody, drain, d);
    }

    /** The model name for a model file: its base name without {@code .json}. */
    public static String nameOf(java.nio.file.Path file) {
        String base = file.getFileName().toString();
        String stem = base.endsWith(".json") ? base.substring(0, base.length() - 5) : base;
        String clean = stem.replaceAll("[^A-Za-z0-9._-]", "_");
        return clean.isEmpty() ? "model" : clean;
    }
}
