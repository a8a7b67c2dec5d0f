package org.telltale.connect;

import java.io.IOException;
import java.net.ConnectException;
import java.net.SocketTimeoutException;
import java.net.URI;
import java.time.Duration;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import javax.net.ssl.SSLSocketFactory;
import org.telltale.model.ClassifierException;

/**
 * One HTTP exchange with a model service over pooled HTTP/1.1 keep-alive connections
 * ({@link ConnectionPool}): sends the secret headers, bounds the whole exchange (connect, headers
 * and body) by the timeout, and sorts failures into retryable ({@link TransientFailure}: timeouts,
 * refused or reset connections, 408, 429, 5xx) and final ({@link ClassifierException}: other
 * statuses).
 *
 * <p>A request that fails on a reused connection before any byte of its answer arrived is sent
 * again, once, on a fresh connection, and not counted as a retry: that is what a client sees when
 * the server closed the idle connection just as the request went out (Node.js closes idle
 * keep-alive connections after 5 s by default), and the request never reached the model.
 * The JDK's {@code HttpClient}, used before, never resends a POST, so such a race failed a batch
 * with "HTTP/1.1 header parser received no bytes".
 */
final class HttpTransport implements AutoCloseable {
    private final Duration timeout;
    private final Map<String, String> headers;
    private final SSLSocketFactory tls;
    private final Map<String, ConnectionPool> pools = new ConcurrentHashMap<>();
    private final AtomicLong resent = new AtomicLong();

    HttpTransport(Duration timeout, Map<String, String> headers) {
        this(timeout, headers, null);
    }

    /** With {@code tls} null, https uses the JVM's default trust store. */
    HttpTransport(Duration timeout, Map<String, String> headers, SSLSocketFactory tls) {
        this.timeout = timeout;
        Map<String, String> h = new LinkedHashMap<>();
        h.put("Accept", "application/json");
        h.put("User-Agent", "telltale");
        h.putAll(headers);
        this.headers = h;
        this.tls = tls;
    }

    byte[] post(URI uri, byte[] body) {
        Map<String, String> h = new LinkedHashMap<>();
        h.put("Content-Type", "application/json");
        h.putAll(headers);
        return exchange("POST", uri, HttpWire.request("POST", uri, h, body));
    }

    byte[] get(URI uri) {
        return exchange("GET", uri, HttpWire.request("GET", uri, headers, null));
    }

    /** How many requests were sent again on a fresh connection after the server closed a reused one. */
    long resent() {
        return resent.get();
    }

    private ConnectionPool pool(URI uri) {
        String origin = uri.getScheme() + "://" + uri.getRawAuthority();
        // The default TLS context loads the trust store (about a second in a fresh JVM): only for https.
        return pools.computeIfAbsent(origin, o -> new ConnectionPool(uri, !"https".equals(uri.getScheme()) ? null
                : tls != null ? tls : (SSLSocketFactory) SSLSocketFactory.getDefault()));
    }

    private byte[] exchange(String method, URI uri, byte[] request) {
        if (Thread.currentThread().isInterrupted()) {
            throw new CancellationException("interrupted");
        }
        String where = Endpoints.safe(uri);
        long deadline = System.nanoTime() + timeout.toNanos();
        ConnectionPool pool = pool(uri);
        HttpConnection c = null;
        HttpWire.Answer answer;
        try {
            c = pool.take(millisLeft(deadline));
            boolean reused = c.reused();
            try {
                answer = c.exchange(request, false, deadline);
            } catch (HttpWire.NoAnswer closedUnderUs) {
                if (!reused) {
                    throw closedUnderUs;
                }
                pool.discard(c);
                c = null;
                c = pool.fresh(millisLeft(deadline));
                resent.incrementAndGet();
                answer = c.exchange(request, false, deadline);
            }
        } catch (SocketTimeoutException e) {
            discard(pool, c);
            throw new TransientFailure("no answer from " + where + " within " + Durations.format(timeout), null, e,
                    TransientFailure.Overload.TIMED_OUT);
        } catch (ConnectException e) {
            discard(pool, c);
            throw new TransientFailure("cannot connect to " + where + " (" + describe(e) + ")", e);
        } catch (HttpWire.BodyTooLarge e) {
            discard(pool, c);
            throw new ClassifierException("the answer from " + where + " is refused: " + e.getMessage());
        } catch (IOException e) {
            discard(pool, c);
            throw new TransientFailure("the connection to " + where + " failed (" + describe(e) + ")", e);
        }
        if (answer.keepAlive()) {
            pool.giveBack(c);
        } else {
            pool.discard(c);
        }
        return checkStatus(answer, where);
    }

    private static void discard(ConnectionPool pool, HttpConnection c) {
        if (c != null) {
            pool.discard(c);
        }
    }

    private static int millisLeft(long deadline) {
        long left = (deadline - System.nanoTime()) / 1_000_000;
        return (int) Math.max(1, Math.min(Integer.MAX_VALUE, left));
    }

    private static byte[] checkStatus(HttpWire.Answer answer, String where) {
        int status = answer.status();
        byte[] body = answer.body();
        if (status / 100 == 2) {
            return body;
        }
        String detail = "HTTP " + status + " from " + where + "; response: " + Snippet.of(body);
        if (status == 429 || status == 408 || status / 100 == 5) {
            Duration after = RetryPolicy.parseRetryAfter(answer.header("retry-after"), ZonedDateTime.now(ZoneOffset.UTC));
            // 429 and 503 are the service saying it is over capacity; 500 and others are faults.
            boolean rejected = status == 429 || status == 503;
            throw new TransientFailure(detail, after, null, rejected ? TransientFailure.Overload.REJECTED : TransientFailure.Overload.NONE);
        }
        throw new ClassifierException(detail);
    }

    private static String describe(Throwable t) {
        String m = t.getMessage();
        String kind = t.getClass().getSimpleName();
        return m == null || m.isBlank() ? kind : kind + ": " + m;
    }

    @Override
    public void close() {
        pools.values().forEach(ConnectionPool::close);
    }
}
