package org.telltale.connect;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.Map;
import org.telltale.TelltaleException;

/**
 * Which model a {@link ConnectorSettings} reaches, as the fields of a run's fingerprint: for a
 * model file the SHA-256 of its bytes (moving or renaming the file changes nothing), for a URL the
 * endpoint without credentials and the protocol, for {@code exec:} the command line; and for every
 * kind the settings that change the scores a run sees ({@code --scores}, {@code --labels}).
 * Connector tuning (batch, requests in flight, time-out, retries, back-off, restarts, headers) is
 * left out: it changes how answers arrive, never what they are.
 */
public final class ModelIdentity {
    private ModelIdentity() {
    }

    /** The identity fields, in a fixed order: {@code model_kind}, {@code model}, then what applies. */
    public static Map<String, String> of(ConnectorSettings settings) {
        Map<String, String> out = new LinkedHashMap<>();
        switch (settings.kind()) {
            case FILE -> {
                out.put("model_kind", "file");
                out.put("model", "sha256:" + sha256(Path.of(settings.spec())));
            }
            case HTTP -> {
                out.put("model_kind", "http");
                out.put("model", Endpoints.safe(settings.spec()));
                out.put("protocol", settings.protocol().cliName());
            }
            case SUBPROCESS -> {
                out.put("model_kind", "exec");
                out.put("model", settings.spec().substring("exec:".length()).strip());
            }
        }
        out.put("scores", settings.scores().cliName());
        out.put("labels", String.join(",", settings.labels()));
        return out;
    }

    private static String sha256(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            byte[] buffer = new byte[1 << 16];
            for (int n; (n = in.read(buffer)) > 0; ) {
                digest.update(buffer, 0, n);
            }
            return HexFormat.of().formatHex(digest.digest());
        } catch (IOException e) {
            throw new TelltaleException("cannot read model file " + file + ": " + e.getMessage(), e);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every JVM has SHA-256", e);
        }
    }
}
