package org.telltale.report.html;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Base64;

/**
 * The stylesheet and script inlined in every report, and the Content-Security-Policy that allows
 * exactly these two by their SHA-256 hashes (CSP Level 3, "hash-source"). Nothing else may load:
 * no network, no other script, no inline style attribute, no plugin, no form target.
 */
final class InlineAssets {
    private static final String STYLE = Palette.css() + resource("report.css");
    private static final String SCRIPT = resource("report.js");
    private static final String CSP = "default-src 'none'; "
            + "style-src '" + hash(STYLE) + "'; "
            + "script-src '" + hash(SCRIPT) + "'; "
            + "img-src 'none'; font-src 'none'; connect-src 'none'; object-src 'none'; "
            + "base-uri 'none'; form-action 'none'";

    private InlineAssets() {
    }

    static String style() {
        return STYLE;
    }

    static String script() {
        return SCRIPT;
    }

    static String csp() {
        return CSP;
    }

    /** The CSP hash-source of an inline element's text: {@code sha256-} and the base64 digest of its UTF-8 bytes. */
    static String hash(String inline) {
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(inline.getBytes(StandardCharsets.UTF_8));
            return "sha256-" + Base64.getEncoder().encodeToString(digest);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java runtime provides SHA-256", e);
        }
    }

    private static String resource(String name) {
        try (InputStream in = InlineAssets.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("report asset missing from the jar: " + name);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read report asset " + name, e);
        }
    }
}
