package org.telltale.connect;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.ServerSocket;
import java.net.Socket;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ConcurrentLinkedQueue;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.atomic.AtomicInteger;

/**
 * A fault-injecting model service on a raw loopback socket, one request per connection (or, with
 * {@link #keepAlive}, as many as the client sends while answers are correct). Each POST
 * takes the next scripted {@link Fault} (then answers correctly); a correct answer scores texts with
 * {@link LengthModel#expected} in the chosen protocol. Counts requests and the largest number it
 * held open at once. Raw sockets let it reset connections and cut bodies short, which an HTTP
 * server library would not do.
 */
final class FaultServer implements AutoCloseable {
    private static final ObjectMapper JSON = new ObjectMapper();

    enum Fault {
        OK, RESET, SLOW, STATUS_500, STATUS_503, STATUS_429, STATUS_400, CUT_BODY, TRUNCATED_JSON, WRONG_SHAPE,
        WRONG_ROWS, NAN, INFINITY, OTHER_LABELS, GARBAGE_BYTES,
        /** Closes the connection on reading the request, before any byte of an answer: what a client sees when the server closed an idle connection just as the request went out. */
        CLOSE_UNANSWERED
    }

    private final Protocol protocol;
    private final ServerSocket socket;
    private final ExecutorService pool = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "fault-server");
        t.setDaemon(true);
        return t;
    });
    private final ConcurrentLinkedQueue<Fault> script = new ConcurrentLinkedQueue<>();
    final AtomicInteger posts = new AtomicInteger();
    final AtomicInteger open = new AtomicInteger();
    final AtomicInteger maxOpen = new AtomicInteger();
    final List<Long> postTimesNanos = new CopyOnWriteArrayList<>();
    final List<String> authorizations = new CopyOnWriteArrayList<>();
    volatile long slowMillis = 2500;
    volatile long pauseMillis = 0;
    volatile String retryAfter = "1";
    /** When set, connections stay open across requests (keep-alive) instead of one request per connection. */
    volatile boolean keepAlive;
    final AtomicInteger connections = new AtomicInteger();

    FaultServer(Protocol protocol) throws IOException {
        this.protocol = protocol;
        this.socket = new ServerSocket(0, 50, InetAddress.getLoopbackAddress());
        pool.submit(this::acceptLoop);
    }

    FaultServer then(Fault... faults) {
        script.addAll(List.of(faults));
        return this;
    }

    /** The spec URL for the protocol. */
    String url() {
        String base = "http://127.0.0.1:" + socket.getLocalPort();
        return switch (protocol) {
            case NATIVE -> base + "/score";
            case OPEN_INFERENCE -> base + "/v2/models/lengths";
            case INSTANCES -> base + "/predict";
            case PIPELINE -> base + "/classify";
        };
    }

    private void acceptLoop() {
        while (!socket.isClosed()) {
            try {
                Socket s = socket.accept();
                pool.submit(() -> serve(s));
            } catch (IOException e) {
                return;
            }
        }
    }

    private void serve(Socket s) {
        connections.incrementAndGet();
        try (s) {
            s.setSoTimeout(10_000);
            InputStream in = s.getInputStream();
            while (serveOne(s, in) && keepAlive) {
                // next request on the same connection
            }
        } catch (IOException | InterruptedException e) {
            // The client gave up (e.g. after its timeout); nothing to do.
        }
    }

    /** Serves one request; false when the connection is done. */
    private boolean serveOne(Socket s, InputStream in) throws IOException, InterruptedException {
        {
            String head = readHead(in);
            if (head == null) {
                return false;
            }
            String[] lines = head.split("\r\n");
            String method = lines[0].split(" ")[0];
            int length = 0;
            for (String l : lines) {
                String lower = l.toLowerCase(Locale.ROOT);
                if (lower.startsWith("content-length:")) {
                    length = Integer.parseInt(l.substring(15).strip());
                }
                if (lower.startsWith("authorization:")) {
                    authorizations.add(l.substring(14).strip());
                }
            }
            byte[] body = in.readNBytes(length);
            OutputStream out = s.getOutputStream();
            if (method.equals("GET")) {
                respond(out, 200, null, metadata(), !keepAlive);
                return true;
            }
            posts.incrementAndGet();
            postTimesNanos.add(System.nanoTime());
            if (pauseMillis > 0) {
                // Counted only while pausing, before answering: a client cannot have its answer yet.
                int now = open.incrementAndGet();
                maxOpen.accumulateAndGet(now, Math::max);
                try {
                    Thread.sleep(pauseMillis);
                } finally {
                    open.decrementAndGet();
                }
            }
            Fault fault = script.poll();
            fault = fault == null ? Fault.OK : fault;
            if (fault == Fault.CLOSE_UNANSWERED) {
                return false;
            }
            act(fault, s, out, texts(body));
            return fault == Fault.OK;
        }
    }

    private void act(Fault fault, Socket s, OutputStream out, List<String> texts) throws IOException, InterruptedException {
        List<String> labels = LengthModel.LABELS;
        List<double[]> rows = new ArrayList<>();
        for (String t : texts) {
            rows.add(LengthModel.expected(t));
        }
        switch (fault) {
            case OK -> respond(out, 200, null, answer(labels, rows), !keepAlive);
            case RESET -> {
                out.write("HTTP/1.1 200 OK\r\nContent-Length: 500\r\n\r\n{\"labels\":".getBytes(StandardCharsets.UTF_8));
                out.flush();
                s.setSoLinger(true, 0); // close with RST
            }
            case SLOW -> {
                Thread.sleep(slowMillis);
                respond(out, 200, null, answer(labels, rows));
            }
            case STATUS_500 -> respond(out, 500, null, "{\"error\":\"internal\"}");
            case STATUS_503 -> respond(out, 503, null, "{\"error\":\"warming up\"}");
            case STATUS_429 -> respond(out, 429, retryAfter, "{\"error\":\"slow down\"}");
            case STATUS_400 -> respond(out, 400, null, "{\"error\":\"bad input\"}");
            case CUT_BODY -> {
                byte[] full = answer(labels, rows).getBytes(StandardCharsets.UTF_8);
                out.write(("HTTP/1.1 200 OK\r\nContent-Type: application/json\r\nContent-Length: " + full.length
                        + "\r\n\r\n").getBytes(StandardCharsets.UTF_8));
                out.write(full, 0, full.length / 2);
                out.flush();
            }
            case TRUNCATED_JSON -> {
                String full = answer(labels, rows);
                respond(out, 200, null, full.substring(0, full.length() / 2));
            }
            case WRONG_SHAPE -> respond(out, 200, null, "{\"unexpected\":true}");
            case WRONG_ROWS -> respond(out, 200, null, answer(labels, rows.subList(0, rows.size() - 1)));
            case NAN -> {
                rows.set(rows.size() - 1, new double[] {Double.NaN, 0.5});
                respond(out, 200, null, answer(labels, rows));
            }
            case INFINITY -> {
                rows.set(0, new double[] {Double.POSITIVE_INFINITY, 0});
                respond(out, 200, null, answer(labels, rows));
            }
            case OTHER_LABELS -> respond(out, 200, null, answer(List.of("tiny", "huge"), rows));
            case GARBAGE_BYTES -> respond(out, 200, null, "\u0000\u00ff<html>oops</html>");
        }
    }

    private List<String> texts(byte[] body) throws IOException {
        JsonNode root = JSON.readTree(body);
        JsonNode array = switch (protocol) {
            case NATIVE -> root.get("texts");
            case OPEN_INFERENCE -> root.get("inputs").get(0).get("data");
            case INSTANCES -> root.get("instances");
            case PIPELINE -> root.get("inputs");
        };
        List<String> out = new ArrayList<>();
        array.forEach(t -> out.add(t.textValue()));
        return out;
    }

    private String metadata() {
        return "{\"name\":\"lengths\",\"inputs\":[{\"name\":\"text\",\"datatype\":\"BYTES\",\"shape\":[-1]}],"
                + "\"outputs\":[{\"name\":\"scores\",\"datatype\":\"FP32\",\"shape\":[-1,2],"
                + "\"parameters\":{\"labels\":[\"short\",\"long\"]}}]}";
    }

    /** The answer in the protocol; non-finite values are written as the NaN / Infinity literals. */
    private String answer(List<String> labels, List<double[]> rows) {
        StringBuilder sb = new StringBuilder();
        switch (protocol) {
            case NATIVE -> {
                sb.append("{\"labels\":[\"").append(String.join("\",\"", labels)).append("\"],\"scores\":[");
                for (int i = 0; i < rows.size(); i++) {
                    sb.append(i == 0 ? "" : ",").append('[').append(num(rows.get(i)[0])).append(',').append(num(rows.get(i)[1])).append(']');
                }
                sb.append("]}");
            }
            case OPEN_INFERENCE -> {
                boolean renamed = !labels.equals(LengthModel.LABELS);
                sb.append("{\"outputs\":[{\"name\":\"scores\",\"datatype\":\"FP64\",\"shape\":[").append(rows.size())
                        .append(',').append(renamed ? 3 : 2).append("],\"data\":[");
                for (int i = 0; i < rows.size(); i++) {
                    sb.append(i == 0 ? "" : ",").append(num(rows.get(i)[0])).append(',').append(num(rows.get(i)[1]));
                    if (renamed) {
                        sb.append(",0");
                    }
                }
                sb.append("]}]}");
            }
            case INSTANCES -> {
                sb.append("{\"predictions\":[");
                for (int i = 0; i < rows.size(); i++) {
                    sb.append(i == 0 ? "" : ",").append("{\"").append(labels.get(0)).append("\":").append(num(rows.get(i)[0]))
                            .append(",\"").append(labels.get(1)).append("\":").append(num(rows.get(i)[1])).append('}');
                }
                sb.append("]}");
            }
            case PIPELINE -> {
                // Per text, the labels sorted by score as pipelines answer: the order changes from text to text.
                sb.append('[');
                for (int i = 0; i < rows.size(); i++) {
                    double[] r = rows.get(i);
                    int first = r[1] > r[0] ? 1 : 0;
                    sb.append(i == 0 ? "" : ",").append("[{\"label\":\"").append(labels.get(first)).append("\",\"score\":")
                            .append(num(r[first])).append("},{\"label\":\"").append(labels.get(1 - first))
                            .append("\",\"score\":").append(num(r[1 - first])).append("}]");
                }
                sb.append(']');
            }
        }
        return sb.toString();
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "NaN" : Double.isInfinite(v) ? (v > 0 ? "Infinity" : "-Infinity") : Double.toString(v);
    }

    private void respond(OutputStream out, int status, String retryAfter, String body) throws IOException {
        respond(out, status, retryAfter, body, true);
    }

    /** Writes a whole answer; {@code close} says the connection ends after it (Connection: close). */
    private void respond(OutputStream out, int status, String retryAfter, String body, boolean close) throws IOException {
        byte[] b = body.getBytes(StandardCharsets.UTF_8);
        String head = "HTTP/1.1 " + status + " X\r\nContent-Type: application/json\r\n" + (close ? "Connection: close\r\n" : "")
                + (retryAfter == null ? "" : "Retry-After: " + retryAfter + "\r\n") + "Content-Length: " + b.length + "\r\n\r\n";
        out.write(head.getBytes(StandardCharsets.UTF_8));
        out.write(b);
        out.flush();
    }

    private static String readHead(InputStream in) throws IOException {
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        int c;
        int state = 0;
        while ((c = in.read()) != -1) {
            buf.write(c);
            state = (c == '\r' && (state == 0 || state == 2)) ? state + 1 : (c == '\n' && (state == 1 || state == 3)) ? state + 1 : 0;
            if (state == 4) {
                return buf.toString(StandardCharsets.ISO_8859_1);
            }
            if (buf.size() > 65536) {
                return null;
            }
        }
        return null;
    }

    @Override
    public void close() throws IOException {
        socket.close();
        pool.shutdownNow();
    }

    /** A loopback port nobody listens on. */
    static int closedPort() throws IOException {
        try (ServerSocket s = new ServerSocket(0, 1, InetAddress.getLoopbackAddress())) {
            return s.getLocalPort();
        }
    }
}
