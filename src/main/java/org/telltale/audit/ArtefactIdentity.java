package org.telltale.audit;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.text.Normalizer;
import java.util.HexFormat;
import java.util.Locale;
import java.util.Objects;

/**
 * What makes two audits' artefacts the same artefact: its kind, the label it pushes towards, and
 * its pattern normalised (Unicode NFKC, lower case under {@link Locale#ROOT}, runs of white space
 * as one space, trimmed). Scores, support and severity are left out on purpose: they move from
 * run to run while the artefact stays. The same identity is written into audit.json, into SARIF's
 * {@code partialFingerprints} and compared against a baseline (docs/ci.md).
 *
 * @param kind    the artefact's kind key ({@code header}, {@code address}, …)
 * @param label   the label it pushes the model towards
 * @param pattern its normalised pattern
 */
public record ArtefactIdentity(String kind, String label, String pattern) {

    public ArtefactIdentity {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(pattern, "pattern");
    }

    /** The identity of {@code kind}, {@code label} and a pattern not yet normalised. */
    public static ArtefactIdentity of(ArtefactKind kind, String label, String pattern) {
        return new ArtefactIdentity(kind.key(), label, normalise(pattern));
    }

    /** The identity of a reported artefact. */
    public static ArtefactIdentity of(AuditResult.Artefact artefact) {
        return of(artefact.kind(), artefact.label(), artefact.pattern());
    }

    /** NFKC, lower case (Locale.ROOT), white space collapsed and trimmed. */
    public static String normalise(String pattern) {
        String folded = Normalizer.normalize(pattern, Normalizer.Form.NFKC).toLowerCase(Locale.ROOT);
        return folded.replaceAll("\\s+", " ").strip();
    }

    /** The artefact's id in audit.json: its kind and the first 12 hex digits of the fingerprint ({@code header-3f9a…}). */
    public String id() {
        return kind + "-" + fingerprint().substring(0, 12);
    }

    /** {@code kind}, {@code label} and {@code pattern} joined by line feeds: the text that is hashed. */
    public String canonical() {
        return kind + "\n" + label + "\n" + pattern;
    }

    /** The SHA-256 (FIPS 180-4) of the UTF-8 canonical text, in lower-case hex: 64 characters. */
    public String fingerprint() {
        return sha256(canonical());
    }

    static String sha256(String text) {
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256").digest(text.getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(digest);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform has SHA-256", e);
        }
    }
}
