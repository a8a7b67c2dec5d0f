package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.sun.net.httpserver.HttpExchange;
import com.sun.net.httpserver.HttpServer;
import java.io.IOException;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.telltale.connect.ConnectorSettings;
import org.telltale.connect.Connectors;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * Against a real HTTP service that answers slowly, documents waiting for their scores hold no
 * core: with one core for computing, four documents have probes at the service at once, and the
 * explanations equal those made one document after another.
 */
class RemoteConcurrencyTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final int DOCUMENTS_AT_ONCE = 4;

    /** Document i's words all end in the digit i, so any probe with a word left names its document. */
    private static List<Document> documents() {
        List<Document> out = new ArrayList<>();
        for (int i = 0; i < 6; i++) {
            out.add(Document.unlabelled("d" + i, String.format(
                    "refund%1$d please my order%1$d arrived broken%1$d and the invoice%1$d is wrong%1$d again%1$d", i)));
        }
        return out;
    }

    @Test
    void documentsWaitingForASlowServiceDoNotHoldTheCoreAndResultsDoNotChange() throws Exception {
        try (RendezvousService service = new RendezvousService(DOCUMENTS_AT_ONCE, TimeUnit.SECONDS.toNanos(20));
             TextClassifier model = Connectors.open(ConnectorSettings.of(service.url()).withBatch(100).withParallel(8))) {
            ExplainSettings settings = ExplainSettings.defaults().withProbes(200);
            ConcurrentExplanations oneCore = ConcurrentExplanations.withCores(DOCUMENTS_AT_ONCE, 1);
            List<Explanation> together = new ArrayList<>();
            oneCore.explain(new Explainer(oneCore.waitingOn(model), settings), documents(), null, (d, i, n) -> { },
                    together::add);
            assertTrue(service.reached(), "the service never had probes of " + DOCUMENTS_AT_ONCE
                    + " documents at once; most at once: " + service.most());

            List<Explanation> alone = new ArrayList<>();
            ConcurrentExplanations.atOnce(1).explain(new Explainer(model, settings), documents(), null, (d, i, n) -> { },
                    alone::add);
            assertEquals(documents().stream().map(Document::id).toList(), together.stream().map(Explanation::id).toList());
            for (int i = 0; i < alone.size(); i++) {
                assertEquals(alone.get(i).terms(), together.get(i).terms());
                assertEquals(alone.get(i).fit(), together.get(i).fit());
                assertEquals(alone.get(i).probes(), together.get(i).probes());
            }
            assertTrue(together.get(0).terms().stream().anyMatch(t -> t.term().equals("refund0") && t.weight() > 0),
                    together.get(0).terms().toString());
        }
    }

    /**
     * Scores "yes" from two words of each document; holds every request until requests of
     * {@code wanted} distinct documents are in flight together (or a deadline passes), and from
     * then on answers at once. Records the most documents it saw in flight together.
     */
    private static final class RendezvousService implements AutoCloseable {
        private static final Pattern DIGIT = Pattern.compile("\\p{L}+(\\d)");
        private final HttpServer server;
        private final ExecutorService executor = Executors.newFixedThreadPool(32);
        private final int wanted;
        private final long deadline;
        private final Map<String, Integer> inFlight = new HashMap<>();
        private int most;
        private boolean reached;

        RendezvousService(int wanted, long patienceNanos) throws IOException {
            System.setProperty("sun.net.httpserver.nodelay", "true");
            this.wanted = wanted;
            this.deadline = System.nanoTime() + patienceNanos;
            server = HttpServer.create(new InetSocketAddress(InetAddress.getLoopbackAddress(), 0), 64);
            server.setExecutor(executor);
            server.createContext("/score", this::handle);
            server.start();
        }

        String url() {
            return "http://127.0.0.1:" + server.getAddress().getPort() + "/score";
        }

        synchronized boolean reached() {
            return reached;
        }

        synchronized int most() {
            return most;
        }

        private void handle(HttpExchange ex) throws IOException {
            try (ex) {
                JsonNode texts = JSON.readTree(ex.getRequestBody().readAllBytes()).get("texts");
                String document = documentOf(texts);
                arrive(document);
                StringBuilder sb = new StringBuilder("{\"labels\":[\"yes\",\"no\"],\"scores\":[");
                for (int i = 0; i < texts.size(); i++) {
                    String text = texts.get(i).asText();
                    double yes = 0.1 + (text.contains("refund") ? 0.5 : 0) + (text.contains("broken") ? 0.3 : 0);
                    sb.append(i == 0 ? "" : ",").append('[').append(yes).append(',').append(1 - yes).append(']');
                }
                byte[] body = sb.append("]}").toString().getBytes(StandardCharsets.UTF_8);
                leave(document);
                ex.sendResponseHeaders(200, body.length);
                try (OutputStream out = ex.getResponseBody()) {
                    out.write(body);
                }
            }
        }

        private static String documentOf(JsonNode texts) {
            for (JsonNode t : texts) {
                Matcher m = DIGIT.matcher(t.asText());
                if (m.find()) {
                    return m.group(1);
                }
            }
            return "";
        }

        private synchronized void arrive(String document) {
            inFlight.merge(document, 1, Integer::sum);
            long together = inFlight.keySet().stream().filter(d -> !d.isEmpty()).count();
            most = (int) Math.max(most, together);
            if (together >= wanted) {
                reached = true;
                notifyAll();
            }
            while (!reached && System.nanoTime() < deadline) {
                try {
                    wait(Math.max(1, TimeUnit.NANOSECONDS.toMillis(deadline - System.nanoTime())));
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }

        private synchronized void leave(String document) {
            inFlight.computeIfPresent(document, (d, n) -> n == 1 ? null : n - 1);
        }

        @Override
        public void close() {
            server.stop(0);
            executor.shutdownNow();
        }
    }
}
