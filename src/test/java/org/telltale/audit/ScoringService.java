package org.telltale.audit;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import java.io.IOException;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * A model service on loopback speaking Telltale's scoring protocol
 * ({@code {"texts": […]}} → {@code {"labels": […], "scores": [[…]]}}), with scripted faults: one
 * POST answered 503 (a connector retries it), and once a condition holds, 500 for everything (the
 * service is down) until {@link #heal()}.
 */
final class ScoringService implements AutoCloseable {
    private static final ObjectMapper JSON = new ObjectMapper();

    private final TextClassifier model;
    private final HttpServer server;
    private final ExecutorService pool = Executors.newFixedThreadPool(4);
    final AtomicInteger posts = new AtomicInteger();
    /** Every Authorization header value received, to check that a secret did reach the service. */
    final List<String> authorizations = new java.util.concurrent.CopyOnWriteArrayList<>();
    private volatile int unavailableAt = -1;
    private volatile int downFrom = Integer.MAX_VALUE;
    private volatile java.util.function.BooleanSupplier downWhen = () -> false;

    ScoringService(TextClassifier model) throws IOException {
        this.model = model;
        this.server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 50);
        server.createContext("/score", this::handle);
        server.setExecutor(pool);
        server.start();
    }

    String url() {
        return "http://127.0.0.1:" + server.getAddress().getPort() + "/score";
    }

    /**
     * POST number {@code post} (1-based) is answered 503 once; once {@code down} holds (checked at
     * each POST), every POST from then on gets 500. For clients whose progress, not their count of
     * requests, should decide when the outage begins.
     */
    void fail(int post, java.util.function.BooleanSupplier down) {
        unavailableAt = post;
        downWhen = down;
    }

    void heal() {
        unavailableAt = -1;
        downFrom = Integer.MAX_VALUE;
        downWhen = () -> false;
    }

    private void handle(HttpExchange exchange) throws IOException {
        try (exchange) {
            int n = posts.incrementAndGet();
            String authorization = exchange.getRequestHeaders().getFirst("Authorization");
            if (authorization != null) {
                authorizations.add(authorization);
            }
            if (n == unavailableAt) {
                send(exchange, 503, "{\"error\":\"warming up\"}");
                return;
            }
            if (n < downFrom && downWhen.getAsBoolean()) {
                downFrom = n;
            }
            if (n >= downFrom) {
                send(exchange, 500, "{\"error\":\"down\"}");
                return;
            }
            JsonNode request = JSON.readTree(exchange.getRequestBody());
            List<String> texts = new ArrayList<>();
            request.get("texts").forEach(t -> texts.add(t.textValue()));
            ScoreMatrix scores = model.score(texts);
            ObjectNode answer = JSON.createObjectNode();
            ArrayNode labels = answer.putArray("labels");
            scores.labels().forEach(labels::add);
            ArrayNode rows = answer.putArray("scores");
            for (int i = 0; i < scores.size(); i++) {
                ArrayNode row = rows.addArray();
                for (double v : scores.row(i)) {
                    row.add(v);
                }
            }
            send(exchange, 200, answer.toString());
        }
    }

    private static void send(HttpExchange exchange, int status, String body) throws IOException {
        byte[] bytes = body.getBytes(StandardCharsets.UTF_8);
        exchange.getResponseHeaders().set("Content-Type", "application/json");
        exchange.sendResponseHeaders(status, bytes.length);
        try (OutputStream out = exchange.getResponseBody()) {
            out.write(bytes);
        }
    }

    @Override
    public void close() {
        server.stop(0);
        pool.shutdownNow();
    }
}
