package org.telltale.connect;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.net.URI;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * HTTP/1.1 message framing as RFC 9112 defines it, for one client exchange: writes a request with
 * a Content-Length body, and reads an answer's status line, header fields and body, whichever
 * framing the server chose (Content-Length, chunked transfer coding, or the connection's end).
 * Knows nothing of sockets, so it is tested on plain streams.
 */
final class HttpWire {
    /** A header block longer than this is not an answer a model service sends. */
    static final int MAX_HEAD_BYTES = 64 << 10;
    /** An answer body longer than this is refused rather than held in memory. */
    static final long MAX_BODY_BYTES = 256L << 20;

    private HttpWire() {
    }

    /** An answer: status, header fields (names lower-cased, first value kept), body, and whether the connection may carry another request. */
    record Answer(int status, Map<String, String> headers, byte[] body, boolean keepAlive) {
        String header(String lowerCaseName) {
            return headers.get(lowerCaseName);
        }
    }

    /** The server closed the connection, or reset it, before sending any byte of an answer. */
    static final class NoAnswer extends IOException {
        private static final long serialVersionUID = 1L;

        NoAnswer(String message, Throwable cause) {
            super(message, cause);
        }
    }

    /** The request head and body as one array, so they leave in one write. */
    static byte[] request(String method, URI uri, Map<String, String> headers, byte[] body) {
        StringBuilder head = new StringBuilder(256);
        String path = uri.getRawPath() == null || uri.getRawPath().isEmpty() ? "/" : uri.getRawPath();
        if (uri.getRawQuery() != null) {
            path += "?" + uri.getRawQuery();
        }
        head.append(method).append(' ').append(path).append(" HTTP/1.1\r\n");
        head.append("Host: ").append(hostHeader(uri)).append("\r\n");
        for (Map.Entry<String, String> h : headers.entrySet()) {
            head.append(h.getKey()).append(": ").append(h.getValue()).append("\r\n");
        }
        if (body != null) {
            head.append("Content-Length: ").append(body.length).append("\r\n");
        }
        head.append("\r\n");
        byte[] h = head.toString().getBytes(StandardCharsets.UTF_8);
        if (body == null) {
            return h;
        }
        byte[] all = new byte[h.length + body.length];
        System.arraycopy(h, 0, all, 0, h.length);
        System.arraycopy(body, 0, all, h.length, body.length);
        return all;
    }

    private static String hostHeader(URI uri) {
        String host = uri.getHost();
        if (host.indexOf(':') >= 0 && !host.startsWith("[")) {
            host = "[" + host + "]";
        }
        int port = uri.getPort();
        boolean defaultPort = port == -1 || (port == 80 && "http".equals(uri.getScheme())) || (port == 443 && "https".equals(uri.getScheme()));
        return defaultPort ? host : host + ":" + port;
    }

    /**
     * Reads one answer, skipping interim 1xx answers. Throws {@link NoAnswer} when the stream ends
     * or fails before the first byte, an IOException when it ends or fails later or breaks the framing.
     */
    static Answer read(InputStream in, boolean headRequest) throws IOException {
        while (true) {
            List<String> lines = readHead(in);
            String status = lines.get(0);
            if (!status.startsWith("HTTP/1.") || status.length() < 12 || status.charAt(8) != ' ') {
                throw new IOException("not an HTTP/1.x status line: " + Snippet.of(status));
            }
            int code;
            try {
                code = Integer.parseInt(status.substring(9, 12));
            } catch (NumberFormatException e) {
                throw new IOException("not an HTTP status code: " + Snippet.of(status));
            }
            Map<String, String> headers = new java.util.HashMap<>();
            for (int i = 1; i < lines.size(); i++) {
                String l = lines.get(i);
                int colon = l.indexOf(':');
                if (colon <= 0) {
                    throw new IOException("a malformed header field: " + Snippet.of(l));
                }
                headers.putIfAbsent(l.substring(0, colon).strip().toLowerCase(Locale.ROOT), l.substring(colon + 1).strip());
            }
            if (code / 100 == 1) {
                continue; // 100 Continue and friends: the real answer follows
            }
            boolean http10 = status.startsWith("HTTP/1.0");
            String connection = headers.getOrDefault("connection", "").toLowerCase(Locale.ROOT);
            boolean keepAlive = http10 ? connection.contains("keep-alive") : !connection.contains("close");
            if (headRequest || code == 204 || code == 304) {
                return new Answer(code, headers, new byte[0], keepAlive);
            }
            String coding = headers.getOrDefault("transfer-encoding", "").toLowerCase(Locale.ROOT);
            if (!coding.isEmpty()) {
                if (!coding.endsWith("chunked")) {
                    return new Answer(code, headers, toEnd(in), false);
                }
                return new Answer(code, headers, chunked(in), keepAlive);
            }
            String length = headers.get("content-length");
            if (length != null) {
                long n;
                try {
                    n = Long.parseLong(length.strip());
                } catch (NumberFormatException e) {
                    throw new IOException("a malformed Content-Length: " + Snippet.of(length));
                }
                if (n < 0) {
                    throw new IOException("a negative Content-Length: " + n);
                }
                return new Answer(code, headers, exactly(in, n), keepAlive);
            }
            return new Answer(code, headers, toEnd(in), false);
        }
    }

    private static List<String> readHead(InputStream in) throws IOException {
        List<String> lines = new ArrayList<>();
        ByteArrayOutputStream line = new ByteArrayOutputStream(128);
        int total = 0;
        boolean first = true;
        while (true) {
            int c;
            try {
                c = in.read();
            } catch (java.net.SocketTimeoutException e) {
                throw e;
            } catch (IOException e) {
                if (first) {
                    throw new NoAnswer("the connection failed before any byte of an answer (" + e.getMessage() + ")", e);
                }
                throw e;
            }
            if (c == -1) {
                if (first) {
                    throw new NoAnswer("the server closed the connection before any byte of an answer", null);
                }
                throw new IOException("the connection closed in the middle of the answer's header");
            }
            first = false;
            if (++total > MAX_HEAD_BYTES) {
                throw new IOException("the answer's header is longer than " + (MAX_HEAD_BYTES >> 10) + " KiB");
            }
            if (c == '\n') {
                String l = line.toString(StandardCharsets.ISO_8859_1);
                if (l.endsWith("\r")) {
                    l = l.substring(0, l.length() - 1);
                }
                line.reset();
                if (l.isEmpty()) {
                    if (lines.isEmpty()) {
                        continue; // tolerate a stray empty line before the status line (RFC 9112 §2.2)
                    }
                    return lines;
                }
                lines.add(l);
            } else {
                line.write(c);
            }
        }
    }

    private static byte[] exactly(InputStream in, long n) throws IOException {
        if (n > MAX_BODY_BYTES) {
            throw new BodyTooLarge();
        }
        byte[] body = in.readNBytes((int) n);
        if (body.length < n) {
            throw new IOException("the connection closed after " + body.length + " of " + n + " body bytes");
        }
        return body;
    }

    private static byte[] chunked(InputStream in) throws IOException {
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        while (true) {
            String size = line(in);
            int semicolon = size.indexOf(';');
            String hex = (semicolon >= 0 ? size.substring(0, semicolon) : size).strip();
            long n;
            try {
                n = Long.parseLong(hex, 16);
            } catch (NumberFormatException e) {
                throw new IOException("a malformed chunk size: " + Snippet.of(size));
            }
            if (n < 0 || body.size() + n > MAX_BODY_BYTES) {
                throw n < 0 ? new IOException("a negative chunk size") : new BodyTooLarge();
            }
            if (n == 0) {
                while (!line(in).isEmpty()) {
                    // trailer fields: not used
                }
                return body.toByteArray();
            }
            byte[] chunk = in.readNBytes((int) n);
            if (chunk.length < n) {
                throw new IOException("the connection closed in the middle of a chunk");
            }
            body.write(chunk);
            if (!line(in).isEmpty()) {
                throw new IOException("a chunk not followed by CRLF");
            }
        }
    }

    private static String line(InputStream in) throws IOException {
        ByteArrayOutputStream line = new ByteArrayOutputStream(16);
        int c;
        while ((c = in.read()) != -1) {
            if (c == '\n') {
                String l = line.toString(StandardCharsets.ISO_8859_1);
                return l.endsWith("\r") ? l.substring(0, l.length() - 1) : l;
            }
            if (line.size() > 8192) {
                throw new IOException("a chunk line longer than 8 KiB");
            }
            line.write(c);
        }
        throw new IOException("the connection closed in the middle of a chunked body");
    }

    private static byte[] toEnd(InputStream in) throws IOException {
        ByteArrayOutputStream body = new ByteArrayOutputStream();
        byte[] buf = new byte[8192];
        int n;
        while ((n = in.read(buf)) != -1) {
            if (body.size() + n > MAX_BODY_BYTES) {
                throw new BodyTooLarge();
            }
            body.write(buf, 0, n);
        }
        return body.toByteArray();
    }

    /** An answer body over {@link #MAX_BODY_BYTES}. */
    static final class BodyTooLarge extends IOException {
        private static final long serialVersionUID = 1L;

        BodyTooLarge() {
            super("the answer is larger than " + (MAX_BODY_BYTES >> 20) + " MiB");
        }
    }
}
