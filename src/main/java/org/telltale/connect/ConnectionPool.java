package org.telltale.connect;

import java.io.IOException;
import java.net.URI;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.LinkedBlockingDeque;
import javax.net.ssl.SSLSocketFactory;

/**
 * The keep-alive connections to one origin (scheme, host, port). Lends the most recently used
 * idle connection first, since the one idle longest is the likeliest to have been closed by the
 * server; one idle longer than {@link #CHECK_AFTER_IDLE_NANOS} is checked before it is lent.
 * Closing the pool closes every connection, lent ones included, so no thread stays blocked on one.
 */
final class ConnectionPool implements AutoCloseable {
    /** Idle this long, a connection is checked (a read of up to 1 ms) before it carries a request. */
    static final long CHECK_AFTER_IDLE_NANOS = 250_000_000L;

    private final URI origin;
    private final SSLSocketFactory tls;
    private final LinkedBlockingDeque<HttpConnection> idle = new LinkedBlockingDeque<>();
    private final Set<HttpConnection> all = ConcurrentHashMap.newKeySet();
    private volatile boolean closed;

    /** {@code tls} is used for https origins only, and may be null for http ones. */
    ConnectionPool(URI origin, SSLSocketFactory tls) {
        this.origin = origin;
        this.tls = tls;
    }

    /** An idle connection that still looks open, else a new one. */
    HttpConnection take(int connectMillis) throws IOException {
        HttpConnection c;
        while ((c = idle.pollFirst()) != null) {
            if (c.idleNanos() < CHECK_AFTER_IDLE_NANOS || c.stillOpen()) {
                return c;
            }
            discard(c);
        }
        return fresh(connectMillis);
    }

    /** A new connection, never a pooled one. */
    HttpConnection fresh(int connectMillis) throws IOException {
        if (closed) {
            throw new IOException("the connector is closed");
        }
        HttpConnection c = HttpConnection.open(origin, connectMillis, tls);
        all.add(c);
        if (closed) {
            discard(c);
            throw new IOException("the connector is closed");
        }
        return c;
    }

    /** Returns a connection whose exchange completed and whose server keeps it open. */
    void giveBack(HttpConnection c) {
        if (closed) {
            discard(c);
        } else {
            idle.offerFirst(c);
        }
    }

    void discard(HttpConnection c) {
        all.remove(c);
        c.close();
    }

    @Override
    public void close() {
        closed = true;
        idle.clear();
        for (HttpConnection c : all) {
            c.close();
        }
        all.clear();
    }
}
