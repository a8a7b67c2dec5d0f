package org.telltale.connect;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import java.io.IOException;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.Executors;
import java.util.concurrent.Semaphore;
import java.util.concurrent.atomic.AtomicLong;

/**
 * A model service of known capacity on loopback: each request takes {@code latencyMillis}
 * whatever its size, at most {@code concurrency} are served at once (others wait), and batches
 * beyond {@code maxBatch} are refused. Records the window from the first request's start to the
 * last one's end, and the busy time, so utilization = ideal service time / observed window.
 */
final class CapacityService implements AutoCloseable {
    private static final ObjectMapper JSON = new ObjectMapper();
    private final HttpServer server;
    private final Semaphore slots;
    private final long latencyMillis;
    private final int maxBatch;
    final AtomicLong requests = new AtomicLong();
    final AtomicLong firstStartNanos = new AtomicLong(Long.MAX_VALUE);
    final AtomicLong lastEndNanos = new AtomicLong();

    CapacityService(long latencyMillis, int concurrency, int maxBatch) throws IOException {
        // Without TCP_NODELAY every answer waits ~40 ms for a delayed ACK (Nagle), swamping the 20 ms latency.
        System.setProperty("sun.net.httpserver.nodelay", "true");
        this.latencyMillis = latencyMillis;
        this.maxBatch = maxBatch;
        this.slots = new Semaphore(concurrency, true);
        server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 64);
        server.setExecutor(Executors.newFixedThreadPool(32));
        server.createContext("/score", this::handle);
        server.start();
    }

    String url() {
        return "http://127.0.0.1:" + server.getAddress().getPort() + "/score";
    }

    private void handle(HttpExchange ex) throws IOException {
        try (ex) {
            JsonNode texts = JSON.readTree(ex.getRequestBody().readAllBytes()).get("texts");
            if (texts.size() > maxBatch) {
                send(ex, 400, "{\"error\":\"batch too large\"}");
                return;
            }
            slots.acquireUninterruptibly();
            long start = System.nanoTime();
            firstStartNanos.accumulateAndGet(start, Math::min);
            try {
                Thread.sleep(latencyMillis);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            } finally {
                lastEndNanos.accumulateAndGet(System.nanoTime(), Math::max);
                requests.incrementAndGet();
                slots.release();
            }
            StringBuilder sb = new StringBuilder("{\"labels\":[\"a\",\"b\"],\"scores\":[");
            for (int i = 0; i < texts.size(); i++) {
                sb.append(i == 0 ? "" : ",").append("[0.5,0.5]");
            }
            send(ex, 200, sb.append("]}").toString());
        }
    }

    private static void send(HttpExchange ex, int status, String body) throws IOException {
        byte[] b = body.getBytes(StandardCharsets.UTF_8);
        ex.sendResponseHeaders(status, b.length);
        try (OutputStream out = ex.getResponseBody()) {
            out.write(b);
        }
    }

    /** Observed window in seconds, from the first request's service start to the last one's end. */
    double windowSeconds() {
        return (lastEndNanos.get() - firstStartNanos.get()) / 1e9;
    }

    @Override
    public void close() {
        server.stop(0);
    }
}
