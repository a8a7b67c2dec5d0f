package org.telltale.connect;

import java.net.URI;
import java.net.URISyntaxException;
import org.telltale.UsageException;

/** URL helpers: parse a model URL with a clear error, and print one without its user-info part. */
final class Endpoints {
    private Endpoints() {
    }

    static URI parse(String spec) {
        try {
            URI uri = new URI(spec);
            if (uri.getHost() == null) {
                throw new UsageException("{model} " + safe(spec) + ": the URL has no host");
            }
            return uri;
        } catch (URISyntaxException e) {
            throw new UsageException("{model}: not a valid URL: " + e.getReason() + " at index " + e.getIndex());
        }
    }

    /** The URL with any {@code user:password@} removed, for messages. */
    static String safe(URI uri) {
        if (uri.getRawUserInfo() == null) {
            return uri.toString();
        }
        return uri.toString().replace(uri.getRawUserInfo() + "@", "");
    }

    static String safe(String spec) {
        try {
            return safe(new URI(spec));
        } catch (URISyntaxException e) {
            return "(unparseable URL)";
        }
    }

    static URI resolveChild(URI base, String child) {
        String s = base.toString();
        return URI.create(s.endsWith("/") ? s + child : s + "/" + child);
    }
}
