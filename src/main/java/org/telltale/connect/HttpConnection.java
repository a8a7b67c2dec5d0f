package org.telltale.connect;

import java.io.BufferedInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.SocketTimeoutException;
import java.net.URI;
import javax.net.ssl.SSLParameters;
import javax.net.ssl.SSLSocket;
import javax.net.ssl.SSLSocketFactory;

/**
 * One HTTP/1.1 connection to a model service, kept open between requests (keep-alive). Blocking
 * I/O on one socket: the thread that sends a request reads its answer, with no hand-off between
 * threads. Every read is bounded by the exchange's deadline. Not thread-safe: a
 * {@link ConnectionPool} lends it to one exchange at a time.
 */
final class HttpConnection implements AutoCloseable {
    private final Socket socket;
    private final InputStream in;
    private final OutputStream out;
    private final DeadlineStream deadline;
    private int exchanges;
    private long idleSinceNanos = System.nanoTime();

    private HttpConnection(Socket socket) throws IOException {
        this.socket = socket;
        this.deadline = new DeadlineStream(socket);
        this.in = new BufferedInputStream(deadline, 1 << 16);
        this.out = socket.getOutputStream();
    }

    /**
     * Connects within {@code connectMillis}; for https, completes the TLS handshake with the host
     * name verified against the certificate (as browsers do, RFC 6125).
     */
    static HttpConnection open(URI uri, int connectMillis, SSLSocketFactory tls) throws IOException {
        boolean https = "https".equals(uri.getScheme());
        int port = uri.getPort() != -1 ? uri.getPort() : https ? 443 : 80;
        Socket plain = new Socket();
        try {
            plain.setTcpNoDelay(true); // the request leaves in one write; never wait for an ACK
            plain.setKeepAlive(true);
            plain.connect(new InetSocketAddress(uri.getHost(), port), Math.max(1, connectMillis));
            if (!https) {
                return new HttpConnection(plain);
            }
            plain.setSoTimeout(Math.max(1, connectMillis));
            SSLSocket ssl = (SSLSocket) tls.createSocket(plain, uri.getHost(), port, true);
            SSLParameters params = ssl.getSSLParameters();
            params.setEndpointIdentificationAlgorithm("HTTPS");
            ssl.setSSLParameters(params);
            ssl.startHandshake();
            return new HttpConnection(ssl);
        } catch (IOException | RuntimeException e) {
            plain.close();
            throw e;
        }
    }

    /** True once this connection has carried an exchange: a failure on it may be the server's idle close. */
    boolean reused() {
        return exchanges > 0;
    }

    long idleNanos() {
        return System.nanoTime() - idleSinceNanos;
    }

    /** Sends one request (head and body in one write) and reads its answer, all before {@code deadlineNanos}. */
    HttpWire.Answer exchange(byte[] request, boolean head, long deadlineNanos) throws IOException {
        deadline.until(deadlineNanos);
        exchanges++;
        try {
            TurnaroundTrace.firstByte();
            out.write(request);
            out.flush();
        } catch (IOException e) {
            // Nothing of an answer can have arrived: the server had closed the connection.
            throw new HttpWire.NoAnswer("the request could not be sent (" + e.getMessage() + ")", e);
        }
        HttpWire.Answer answer = HttpWire.read(in, head);
        idleSinceNanos = System.nanoTime();
        return answer;
    }

    /**
     * Whether a connection that sat idle still looks open: a read that returns at once with the
     * end of the stream (or with bytes nobody asked for) means it cannot carry a request. Costs a
     * wait of up to 1 ms, so the pool checks only connections idle for a while.
     */
    boolean stillOpen() {
        try {
            if (in.available() > 0) {
                return false;
            }
            deadline.until(System.nanoTime() + 1_000_000);
            in.read();
            return false;
        } catch (SocketTimeoutException e) {
            return true;
        } catch (IOException e) {
            return false;
        }
    }

    @Override
    public void close() {
        try {
            socket.close();
        } catch (IOException e) {
            // already closed
        }
    }

    /** The socket's stream with each read bounded by the time left until a deadline. */
    private static final class DeadlineStream extends InputStream {
        private final Socket socket;
        private final InputStream raw;
        private long deadlineNanos = Long.MAX_VALUE;

        DeadlineStream(Socket socket) throws IOException {
            this.socket = socket;
            this.raw = socket.getInputStream();
        }

        void until(long nanos) {
            deadlineNanos = nanos;
        }

        private void arm() throws IOException {
            long left = deadlineNanos - System.nanoTime();
            if (left <= 0) {
                throw new SocketTimeoutException("the exchange's deadline passed");
            }
            socket.setSoTimeout((int) Math.max(1, Math.min(Integer.MAX_VALUE, left / 1_000_000)));
        }

        @Override
        public int read() throws IOException {
            arm();
            return raw.read();
        }

        @Override
        public int read(byte[] b, int off, int len) throws IOException {
            arm();
            return raw.read(b, off, len);
        }

        @Override
        public int available() throws IOException {
            return raw.available();
        }
    }
}
