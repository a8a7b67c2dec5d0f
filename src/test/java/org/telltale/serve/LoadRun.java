package org.telltale.serve;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Duration;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * A bounded load run against {@code POST /score}: {@code clients} threads send batches for a fixed
 * time, each text carrying a marker (client, request, position) and a seeded mix of words, and
 * every answer is compared bitwise with the model scored in this process, so a lost or mixed-up
 * answer shows. Hostile clients run alongside: oversized bodies, malformed JSON, huge batches and
 * a client that sends its headers one byte at a time.
 */
final class LoadRun {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final String[] WORDS = {"invoice", "refund", "charged", "payment", "card", "website", "down", "error",
        "server", "unreachable", "outage", "password", "login", "locked", "account", "code", "sign", "the", "my", "since"};

    /** What a run observed. */
    record Result(int requests, int errors, int mismatches, long p50Micros, long p99Micros, double requestsPerSecond,
            double textsPerSecond, Map<String, Integer> hostileStatuses, int hostileUnexpected, long slowClientCutAfterMillis,
            List<String> problems) {
    }

    private LoadRun() {
    }

    static Result run(URI base, TextClassifier reference, int clients, int batch, Duration duration, boolean hostile)
            throws Exception {
        HttpClient http = HttpClient.newBuilder().version(HttpClient.Version.HTTP_1_1).connectTimeout(Duration.ofSeconds(5))
                .executor(Executors.newFixedThreadPool(4)).build();
        URI score = base.resolve("/score");
        long end = System.nanoTime() + duration.toNanos();
        AtomicInteger requests = new AtomicInteger();
        AtomicInteger errors = new AtomicInteger();
        AtomicInteger mismatches = new AtomicInteger();
        AtomicInteger hostileUnexpected = new AtomicInteger();
        AtomicLong slowCut = new AtomicLong(-1);
        ConcurrentLinkedQueue<Long> latencies = new ConcurrentLinkedQueue<>();
        ConcurrentLinkedQueue<String> problems = new ConcurrentLinkedQueue<>();
        Map<String, Integer> statuses = new ConcurrentHashMap<>();
        ExecutorService pool = Executors.newFixedThreadPool(clients + 5);
        long started = System.nanoTime();
        for (int c = 0; c < clients; c++) {
            int client = c;
            pool.submit(() -> {
                for (int seq = 0; System.nanoTime() < end; seq++) {
                    List<String> texts = texts(client, seq, batch);
                    long t0 = System.nanoTime();
                    try {
                        HttpResponse<String> r = http.send(HttpRequest.newBuilder(score).timeout(Duration.ofSeconds(30))
                                .POST(HttpRequest.BodyPublishers.ofString(JSON.writeValueAsString(Map.of("texts", texts)),
                                        StandardCharsets.UTF_8)).build(), HttpResponse.BodyHandlers.ofString(StandardCharsets.UTF_8));
                        latencies.add((System.nanoTime() - t0) / 1000);
                        requests.incrementAndGet();
                        if (r.statusCode() != 200) {
                            errors.incrementAndGet();
                            problems.add("client " + client + " request " + seq + ": HTTP " + r.statusCode() + " " + r.body());
                            continue;
                        }
                        if (!matches(JSON.readTree(r.body()), reference.score(texts))) {
                            mismatches.incrementAndGet();
                            problems.add("client " + client + " request " + seq + ": answer differs from the model's");
                        }
                    } catch (Exception e) {
                        errors.incrementAndGet();
                        problems.add("client " + client + " request " + seq + ": " + e);
                    }
                }
                return null;
            });
        }
        if (hostile) {
            hostileLoop(pool, http, score, end, "oversized", 413, () -> "{\"texts\":[\"" + "x".repeat(200_000) + "\"]}", statuses, hostileUnexpected, problems);
            hostileLoop(pool, http, score, end, "malformed", 400, () -> "{\"texts\": [\"a\", ", statuses, hostileUnexpected, problems);
            hostileLoop(pool, http, score, end, "huge batch", 400,
                    () -> "{\"texts\":[" + String.join(",", Collections.nCopies(5000, "\"a\"")) + "]}", statuses, hostileUnexpected, problems);
            pool.submit(() -> slowHeaders(base, end, slowCut));
        }
        pool.shutdown();
        if (!pool.awaitTermination(duration.toSeconds() + 60, TimeUnit.SECONDS)) {
            pool.shutdownNow();
            problems.add("the load run did not finish in time");
        }
        double seconds = (System.nanoTime() - started) / 1e9;
        List<Long> sorted = new ArrayList<>(latencies);
        Collections.sort(sorted);
        long p50 = sorted.isEmpty() ? -1 : sorted.get(sorted.size() / 2);
        long p99 = sorted.isEmpty() ? -1 : sorted.get(Math.min(sorted.size() - 1, (int) Math.ceil(sorted.size() * 0.99) - 1));
        return new Result(requests.get(), errors.get(), mismatches.get(), p50, p99, requests.get() / seconds,
                requests.get() * (double) batch / seconds, Map.copyOf(statuses), hostileUnexpected.get(), slowCut.get(),
                List.copyOf(problems));
    }

    /** Texts whose words are drawn from the model's vocabulary by a seed of (client, request), each with its marker. */
    static List<String> texts(int client, int seq, int batch) {
        Random random = new Random(client * 1_000_003L + seq);
        List<String> out = new ArrayList<>(batch);
        for (int i = 0; i < batch; i++) {
            StringBuilder sb = new StringBuilder("m").append(client).append('x').append(seq).append('x').append(i);
            int n = 3 + random.nextInt(12);
            for (int w = 0; w < n; w++) {
                sb.append(' ').append(WORDS[random.nextInt(WORDS.length)]);
            }
            out.add(sb.toString());
        }
        return out;
    }

    private static boolean matches(JsonNode answer, ScoreMatrix expected) {
        JsonNode scores = answer.get("scores");
        if (scores == null || scores.size() != expected.size()) {
            return false;
        }
        for (int i = 0; i < expected.size(); i++) {
            for (int j = 0; j < expected.labels().size(); j++) {
                if (scores.get(i).get(j).doubleValue() != expected.score(i, j)) {
                    return false;
                }
            }
        }
        return true;
    }

    private static void hostileLoop(ExecutorService pool, HttpClient http, URI score, long end, String kind, int expected,
            java.util.function.Supplier<String> body, Map<String, Integer> statuses, AtomicInteger unexpected,
            ConcurrentLinkedQueue<String> problems) {
        String payload = body.get();
        pool.submit(() -> {
            while (System.nanoTime() < end) {
                try {
                    HttpResponse<String> r = http.send(HttpRequest.newBuilder(score).timeout(Duration.ofSeconds(30))
                            .POST(HttpRequest.BodyPublishers.ofString(payload)).build(), HttpResponse.BodyHandlers.ofString());
                    statuses.merge(kind + " " + r.statusCode(), 1, Integer::sum);
                    if (r.statusCode() != expected || !r.body().startsWith("{\"error\":")) {
                        unexpected.incrementAndGet();
                        problems.add(kind + ": HTTP " + r.statusCode() + " " + r.body().substring(0, Math.min(100, r.body().length())));
                    }
                } catch (Exception e) {
                    // A server may close the connection on an oversized body before reading it all.
                    statuses.merge(kind + " closed", 1, Integer::sum);
                }
                Thread.sleep(100);
            }
            return null;
        });
    }

    /** Sends a request line, then one header byte every 200 ms; notes when the server cuts it off. */
    private static Void slowHeaders(URI base, long end, AtomicLong cutAfterMillis) {
        long t0 = System.nanoTime();
        try (Socket s = new Socket()) {
            s.connect(new InetSocketAddress(base.getHost(), base.getPort()), 5000);
            s.setSoTimeout(200);
            OutputStream out = s.getOutputStream();
            InputStream in = s.getInputStream();
            out.write("POST /score HTTP/1.1\r\nHost: x\r\n".getBytes(StandardCharsets.US_ASCII));
            byte[] drip = "X-Slow: aaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaaa".getBytes(StandardCharsets.US_ASCII);
            for (int i = 0; System.nanoTime() < end; i = (i + 1) % drip.length) {
                out.write(drip[i]);
                out.flush();
                try {
                    if (in.read() == -1) {
                        break;
                    }
                } catch (java.net.SocketTimeoutException stillOpen) {
                    continue;
                }
            }
            if (System.nanoTime() < end) {
                cutAfterMillis.set((System.nanoTime() - t0) / 1_000_000);
            }
        } catch (Exception e) {
            if (System.nanoTime() < end) {
                cutAfterMillis.set((System.nanoTime() - t0) / 1_000_000);
            }
        }
        return null;
    }
}
