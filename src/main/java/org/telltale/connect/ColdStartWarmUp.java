package org.telltale.connect;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.net.Socket;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * Runs a connector's per-request code on made-up data, on a background thread, while the caller
 * prepares its first texts: writing a request body and its HTTP head, reading an HTTP answer's head
 * and body, and parsing a native answer of a full batch; and creates (without connecting) one socket. In a fresh JVM the first answers of a run are read by
 * the interpreter with classes still loading: decoding one 64-row answer took 10-20 ms of wall
 * time on two cores in the first 50 ms of a run against a 20 ms service, while the service's slots
 * waited for the next requests (docs/performance.md, "Cold start"). Done before the first request,
 * the same work is done while nothing waits for it, and the first answers meet compiled code. A
 * round costs about 1 ms at first and under 0.1 ms once compiled, after some 300 ms of rounds; an
 * explanation's first request leaves about 180 ms after its connector opens.
 *
 * <p>It ends at the connector's first call ({@link #stop}), after a time budget or after a count of
 * rounds, whichever comes first, so it does not take the CPU from the requests themselves. It
 * touches no network, no file and no shared state: a run that never sends a request loses only the
 * thread's CPU.
 */
final class ColdStartWarmUp {
    /** At most this long per connector. */
    static final long BUDGET_NANOS = 250_000_000L;
    /** At most this many rounds (one request body written, one answer read and parsed per round). */
    static final int MAX_ROUNDS = 3_000;
    private static final URI TARGET = URI.create("http://127.0.0.1:8080/score");

    private static final int TEXTS = 64;
    private static final byte[] ANSWER = httpAnswer(TEXTS);
    private static final List<String> TEXTS_SAMPLE = texts(TEXTS);

    private volatile boolean stopped;

    private ColdStartWarmUp() {
    }

    /** Starts a warm-up on a daemon thread and returns at once. */
    static ColdStartWarmUp start() {
        ColdStartWarmUp w = new ColdStartWarmUp();
        Thread t = new Thread(() -> w.run(BUDGET_NANOS, MAX_ROUNDS), "telltale-warm-up");
        t.setDaemon(true);
        t.start();
        return w;
    }

    /** A warm-up that has not started; {@link #run} runs it on the calling thread. */
    static ColdStartWarmUp notStarted() {
        return new ColdStartWarmUp();
    }

    /** Ends the warm-up after its current round: the connector's real work has begun. */
    void stop() {
        stopped = true;
    }

    /** Runs rounds until {@link #stop}, until {@code budgetNanos} passed or {@code maxRounds} were done; returns the rounds done. */
    int run(long budgetNanos, int maxRounds) {
        long end = System.nanoTime() + budgetNanos;
        int rounds = 0;
        if (!stopped) {
            openNoSocket();
        }
        while (!stopped && rounds < maxRounds && System.nanoTime() < end) {
            once();
            rounds++;
        }
        return rounds;
    }

    /** Loads the socket classes a first connection needs, without connecting anywhere. */
    private static void openNoSocket() {
        try (Socket s = new Socket()) {
            s.setTcpNoDelay(true);
            s.setKeepAlive(true);
        } catch (IOException e) {
            // nothing to warm then; the first connection will load them
        }
    }

    /** One round: a request body written, a made-up answer read from its bytes and parsed; returns the parsed scores. */
    static RawScores once() {
        byte[] body = NativeCodec.request(TEXTS_SAMPLE);
        byte[] request = HttpWire.request("POST", TARGET, Map.of("Content-Type", "application/json"), body);
        if (request.length <= body.length) {
            throw new IllegalStateException("a request without its head");
        }
        try {
            HttpWire.Answer answer = HttpWire.read(new ByteArrayInputStream(ANSWER), false);
            return NativeCodec.parse(answer.body());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static List<String> texts(int n) {
        List<String> texts = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            texts.add("the ferry to the north pier left " + i + " minutes late, and the café \"on board\" was closed");
        }
        return texts;
    }

    /** A native answer of {@code n} rows of three labels, with the head a typical server sends. */
    private static byte[] httpAnswer(int n) {
        StringBuilder json = new StringBuilder("{\"labels\": [\"delay\", \"refund\", \"other\"], \"scores\": [");
        for (int i = 0; i < n; i++) {
            double a = (i % 7 + 1) / 10.0;
            json.append(i == 0 ? "" : ", ").append(String.format(Locale.ROOT, "[%s, %.17g, 0.0]", a, 1 - a));
        }
        json.append("]}");
        byte[] body = json.toString().getBytes(StandardCharsets.UTF_8);
        String head = "HTTP/1.1 200 OK\r\nServer: made-up\r\nContent-Type: application/json\r\nContent-Length: "
                + body.length + "\r\n\r\n";
        byte[] head8 = head.getBytes(StandardCharsets.US_ASCII);
        byte[] all = new byte[head8.length + body.length];
        System.arraycopy(head8, 0, all, 0, head8.length);
        System.arraycopy(body, 0, all, head8.length, body.length);
        return all;
    }
}
