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
        URI target = format.target(transport);
        return format.parse(transport.post(target, format.request(texts)), texts.size());
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
