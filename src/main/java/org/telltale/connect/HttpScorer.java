package org.telltale.connect;

import java.net.URI;
import java.util.List;

/** Sends one batch to an HTTP model service in one of the {@link Protocol}s. */
final class HttpScorer implements BatchScorer {
    private final HttpTransport transport;
    private final WireFormat format;
    private final String description;

    HttpScorer(HttpTransport transport, WireFormat format, String description) {
        this.transport = transport;
        this.format = format;
        this.description = description;
    }

    @Override
    public RawScores score(List<String> texts) {
        return prepare(texts).send().decode();
    }

    /** Encodes the batch now when the format is ready (Open Inference needs its metadata first). */
    @Override
    public Exchange prepare(List<String> texts) {
        byte[] early = format.ready() ? format.request(texts) : null;
        return () -> {
            URI target = format.target(transport);
            byte[] answer = transport.post(target, early != null ? early : format.request(texts));
            return () -> format.parse(answer, texts.size());
        };
    }

    /** Requests sent again on a fresh connection after the server closed a reused one. */
    long resent() {
        return transport.resent();
    }

    @Override
    public String describe() {
        return description;
    }

    @Override
    public void close() {
        transport.close();
    }

    /** How one protocol writes a request and reads an answer. */
    interface WireFormat {
        /** The URL to post to; may first fetch what the protocol needs (e.g. metadata), retried like any request. */
        URI target(HttpTransport transport);

        /** Whether {@link #request} can be written before {@link #target} was called. */
        default boolean ready() {
            return true;
        }

        byte[] request(List<String> texts);

        RawScores parse(byte[] body, int texts);
    }

    /** The native protocol: post to the spec URL itself. */
    static WireFormat nativeFormat(URI url) {
        return new WireFormat() {
            @Override
            public URI target(HttpTransport transport) {
                return url;
            }

            @Override
            public byte[] request(List<String> texts) {
                return NativeCodec.request(texts);
            }

            @Override
            public RawScores parse(byte[] body, int texts) {
                return NativeCodec.parse(body);
            }
        };
    }
}
