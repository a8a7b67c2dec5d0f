package org.telltale.serve;

import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.Semaphore;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import org.telltale.TelltaleException;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * An HTTP server hosting one model: {@code POST /score} in Telltale's scoring protocol, the Open
 * Inference Protocol v2 routes ({@code GET /v2/health/ready}, {@code GET /v2/models/NAME},
 * {@code POST /v2/models/NAME/infer}) and {@code GET /health}.
 *
 * <p>Built on the JDK's {@link HttpServer}: no dependency, and enough for a model that answers in
 * milliseconds. Bodies beyond the limit get 413, batches beyond the limit and malformed JSON 400,
 * every error a JSON {@code {"error": "…"}} and never a stack trace. Connections are read on a
 * pool larger than the scoring pool, so a few slow clients cannot starve the model; a client that
 * takes longer than {@code requestTime} to send its request is cut off.
 *
 * <p>Start with {@link #start}; {@link #close()} stops accepting, lets requests in flight finish
 * (up to the drain time) and releases the port. Thread-safe.
 */
public final class ModelServer implements AutoCloseable {
    private final HttpServer server;
    private final ExecutorService connections;
    private final TextClassifier model;
    private final List<String> labels;
    private final ServerSettings settings;
    private final Semaphore scoring;
    private final PrintStream log;
    private final AtomicInteger served = new AtomicInteger();
    private final AtomicInteger inFlight = new AtomicInteger();
    private volatile boolean closed;

    private ModelServer(HttpServer server, ExecutorService connections, TextClassifier model, List<String> labels,
            ServerSettings settings, PrintStream log) {
        this.server = server;
        this.connections = connections;
        this.model = model;
        this.labels = List.copyOf(labels);
        this.settings = settings;
        this.scoring = new Semaphore(settings.threads());
        this.log = log;
    }

    /** Hosts a built-in model; its labels are the metadata's label names. */
    public static ModelServer start(BuiltinModel model, ServerSettings settings) {
        return start(model, model.labels(), settings, System.err);
    }

    /**
     * Hosts any in-process model with the given labels, logging problems to {@code log}.
     *
     * @throws TelltaleException when the address cannot be bound
     */
    public static ModelServer start(TextClassifier model, List<String> labels, ServerSettings settings, PrintStream log) {
        ServerTuning.apply(settings.requestTime());
        InetSocketAddress address = new InetSocketAddress(settings.host(), settings.port());
        if (address.isUnresolved()) {
            throw new TelltaleException("cannot listen on " + settings.host() + ":" + settings.port() + ": unknown host");
        }
        HttpServer http;
        try {
            http = HttpServer.create(address, 128);
        } catch (IOException e) {
            throw new TelltaleException("cannot listen on " + settings.host() + ":" + settings.port() + ": " + e.getMessage(), e);
        }
        int readers = Math.max(16, 4 * settings.threads());
        AtomicInteger count = new AtomicInteger();
        ThreadPoolExecutor pool = new ThreadPoolExecutor(readers, readers, 30, TimeUnit.SECONDS, new LinkedBlockingQueue<>(),
                r -> {
                    Thread t = new Thread(r, "telltale-serve-" + count.incrementAndGet());
                    t.setDaemon(true);
                    return t;
                });
        pool.allowCoreThreadTimeOut(true);
        http.setExecutor(pool);
        ModelServer s = new ModelServer(http, pool, model, labels, settings, log);
        http.createContext("/", s::handle);
        http.start();
        return s;
    }

    /** The port actually bound (the ephemeral one when settings asked for 0). */
    public int port() {
        return server.getAddress().getPort();
    }

    /** e.g. {@code http://127.0.0.1:43121}. */
    public String url() {
        InetAddress a = server.getAddress().getAddress();
        String host = a.isAnyLocalAddress() ? settings.host() : a.getHostAddress();
        if (host.contains(":")) {
            host = "[" + host + "]";
        }
        return "http://" + host + ":" + port();
    }

    /** True when the server listens beyond this machine (not on a loopback address). */
    public boolean exposed() {
        return !server.getAddress().getAddress().isLoopbackAddress();
    }

    public String modelName() {
        return settings.name();
    }

    /** Requests answered so far, errors included. */
    public int served() {
        return served.get();
    }

    private void handle(HttpExchange exchange) {
        inFlight.incrementAndGet();
        try (exchange) {
            served.incrementAndGet();
            try {
                if (closed) {
                    exchange.getResponseHeaders().set("Connection", "close");
                    throw new HttpError(503, "the server is shutting down");
                }
                route(exchange);
            } catch (HttpError e) {
                send(exchange, e.status(), ScoreRequests.error(e.getMessage()));
            } catch (IOException e) {
                // The client went away mid-request; nothing to answer.
            } catch (RuntimeException e) {
                log.println("telltale serve: internal error on " + exchange.getRequestMethod() + " "
                        + exchange.getRequestURI().getRawPath() + ": " + e);
                send(exchange, 500, ScoreRequests.error("internal error"));
            }
        } catch (IOException e) {
            // Writing the answer failed: the client closed the connection.
        } finally {
            inFlight.decrementAndGet();
        }
    }

    private void route(HttpExchange ex) throws IOException {
        String method = ex.getRequestMethod().toUpperCase(Locale.ROOT);
        String path = ex.getRequestURI().getRawPath();
        String modelPath = "/v2/models/" + settings.name();
        switch (path) {
            case "/score" -> {
                require(method, "POST");
                List<String> texts = ScoreRequests.nativeTexts(readBody(ex), settings.maxBatch());
                send(ex, 200, ScoreRequests.nativeAnswer(score(texts)));
            }
            case "/health" -> {
                require(method, "GET");
                send(ex, 200, json("{\"status\":\"ok\",\"model\":\"" + settings.name() + "\"}"));
            }
            case "/v2/health/ready", "/v2/health/live" -> {
                require(method, "GET");
                send(ex, 200, json(path.endsWith("ready") ? "{\"ready\":" + !closed + "}" : "{\"live\":true}"));
            }
            case "/v2" -> {
                require(method, "GET");
                send(ex, 200, json("{\"name\":\"telltale\",\"extensions\":[]}"));
            }
            default -> {
                if (path.equals(modelPath) || path.equals(modelPath + "/versions/1")) {
                    require(method, "GET");
                    send(ex, 200, ScoreRequests.metadata(settings.name(), labels));
                } else if (path.equals(modelPath + "/ready")) {
                    require(method, "GET");
                    send(ex, 200, json("{\"name\":\"" + settings.name() + "\",\"ready\":true}"));
                } else if (path.equals(modelPath + "/infer") || path.equals(modelPath + "/versions/1/infer")) {
                    require(method, "POST");
                    var request = ScoreRequests.inferTexts(readBody(ex), settings.maxBatch());
                    send(ex, 200, ScoreRequests.inferAnswer(score(request.texts()), settings.name(), request.id()));
                } else if (path.startsWith("/v2/models/")) {
                    throw new HttpError(404, "unknown model or route; this server hosts " + modelPath);
                } else {
                    throw new HttpError(404, "no such route: " + truncate(path)
                            + " (routes: POST /score, GET /health, GET /v2/health/ready, GET " + modelPath
                            + ", POST " + modelPath + "/infer)");
                }
            }
        }
    }

    private ScoreMatrix score(List<String> texts) {
        try {
            scoring.acquire();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new HttpError(503, "the server is shutting down");
        }
        try {
            ScoreMatrix m = model.score(texts);
            if (m.size() != texts.size()) {
                throw new IllegalStateException("model answered " + m.size() + " rows for " + texts.size() + " texts");
            }
            return m;
        } finally {
            scoring.release();
        }
    }

    private static void require(String method, String expected) {
        if (!method.equals(expected)) {
            throw new HttpError(405, "use " + expected + " here, not " + truncate(method));
        }
    }

    private byte[] readBody(HttpExchange ex) throws IOException {
        String length = ex.getRequestHeaders().getFirst("Content-Length");
        long max = settings.maxBody();
        if (length != null) {
            long declared;
            try {
                declared = Long.parseLong(length.strip());
            } catch (NumberFormatException e) {
                throw new HttpError(400, "Content-Length is not a number");
            }
            if (declared > max) {
                ex.getResponseHeaders().set("Connection", "close");
                throw new HttpError(413, "the request body of " + declared + " bytes exceeds this server's limit of " + max + " bytes");
            }
        }
        try (InputStream in = ex.getRequestBody()) {
            byte[] body = in.readNBytes((int) Math.min(Integer.MAX_VALUE - 8, max + 1));
            if (body.length > max) {
                ex.getResponseHeaders().set("Connection", "close");
                throw new HttpError(413, "the request body exceeds this server's limit of " + max + " bytes");
            }
            return body;
        }
    }

    private static void send(HttpExchange ex, int status, byte[] body) throws IOException {
        ex.getResponseHeaders().set("Content-Type", "application/json; charset=utf-8");
        ex.sendResponseHeaders(status, body.length == 0 ? -1 : body.length);
        try (OutputStream out = ex.getResponseBody()) {
            out.write(body);
        }
    }

    private static byte[] json(String s) {
        return s.getBytes(StandardCharsets.UTF_8);
    }

    private static String truncate(String s) {
        return s.length() <= 80 ? s : s.substring(0, 80) + "…";
    }

    /**
     * Stops taking new requests (they get 503), lets requests in flight finish within the drain
     * time, then frees the port. (HttpServer.stop(delay) alone waits the whole delay on Java 17
     * even when nothing is in flight, hence the counting here.)
     */
    @Override
    public void close() {
        if (closed) {
            return;
        }
        closed = true;
        long deadline = System.nanoTime() + settings.drain().toNanos();
        try {
            while (inFlight.get() > 0 && System.nanoTime() < deadline) {
                Thread.sleep(10);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        server.stop(0);
        connections.shutdownNow();
    }
}
