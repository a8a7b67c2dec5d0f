package org.telltale.audit;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HexFormat;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.telltale.TelltaleException;

/**
 * What decides an audit's result, field by field: the corpus's identity, the model's identity,
 * the seed and every setting that changes a number in {@code audit.json}. The journal's start line
 * keeps it, and {@code --resume} compares it field by field with the run that wants to continue.
 * What only changes how the work is done (batch size, requests in flight, time-outs, retries,
 * headers, the {@code failOn} gate) never enters, so a user may change it between runs.
 *
 * <p>A plain value of ordered string fields, so that any front (one JVM, Spark) can build the same
 * fingerprint from the same facts with {@link #builder()}. Immutable.
 *
 * @param fields field name to value, in the order they were added
 */
public record RunFingerprint(Map<String, String> fields) {
    public RunFingerprint {
        fields = Collections.unmodifiableMap(new LinkedHashMap<>(fields));
    }

    /**
     * The fingerprint of one audit.
     *
     * @param corpus  the corpus's identity (see {@link #corpus(Path)})
     * @param model   the model's identity, field by field (from the connector)
     * @param explain the explainer's settings, a record whose components are the fields
     */
    public static RunFingerprint of(Map<String, String> corpus, Map<String, String> model, long seed,
            AuditSettings settings, String policyDigest, Record explain) {
        return builder().all("", corpus).all("", model).with("seed", seed)
                .with("sample", settings.sample()).with("probes", settings.probes()).with("words", settings.words())
                .with("picks", settings.picks()).with("scrub_all", settings.scrubAll()).with("alpha", settings.alpha())
                .with("analyzer", settings.analyzer()).with("policy_sha256", policyDigest == null ? "none" : policyDigest)
                .record("explain.", explain).build();
    }

    /** The identity of a corpus file or folder: its name, its size in bytes and the SHA-256 of its content. */
    public static Map<String, String> corpus(Path path) {
        Map<String, String> out = new LinkedHashMap<>();
        out.put("corpus", path.getFileName() == null ? path.toString() : path.getFileName().toString());
        out.put("corpus_sha256", sha256(path));
        return out;
    }

    /**
     * The first field (in this fingerprint's order, then the other's) whose value differs, as
     * {@code name was 'a' and is now 'b'}; empty when the two are equal.
     */
    public Optional<String> difference(RunFingerprint now) {
        List<String> names = new ArrayList<>(fields.keySet());
        now.fields.keySet().stream().filter(k -> !fields.containsKey(k)).forEach(names::add);
        List<String> differ = names.stream().filter(k -> !String.valueOf(fields.get(k)).equals(String.valueOf(now.fields.get(k))))
                .toList();
        if (differ.isEmpty()) {
            return Optional.empty();
        }
        String first = differ.get(0);
        String more = differ.size() == 1 ? "" : " (" + (differ.size() - 1) + " more differ: "
                + String.join(", ", differ.subList(1, differ.size())) + ")";
        return Optional.of(first + " was " + shown(fields.get(first)) + " and is now " + shown(now.fields.get(first)) + more);
    }

    private static String shown(String value) {
        return value == null ? "absent" : "'" + value + "'";
    }

    /**
     * SHA-256 of a file's bytes, in hex; for a folder, of every regular file below it in path
     * order, each preceded by its relative path and a NUL, so renaming a file changes the digest.
     */
    public static String sha256(Path path) {
        try {
            MessageDigest digest = MessageDigest.getInstance("SHA-256");
            if (Files.isDirectory(path)) {
                List<Path> files;
                try (Stream<Path> walk = Files.walk(path)) {
                    files = walk.filter(Files::isRegularFile).sorted().toList();
                }
                for (Path file : files) {
                    digest.update((path.relativize(file).toString().replace('\\', '/') + '\u0000')
                            .getBytes(java.nio.charset.StandardCharsets.UTF_8));
                    feed(digest, file);
                }
            } else {
                feed(digest, path);
            }
            return HexFormat.of().formatHex(digest.digest());
        } catch (IOException e) {
            throw new TelltaleException("cannot read " + path + " to fingerprint it: " + e.getMessage(), e);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every JVM has SHA-256", e);
        }
    }

    private static void feed(MessageDigest digest, Path file) throws IOException {
        byte[] buffer = new byte[1 << 16];
        try (InputStream in = Files.newInputStream(file)) {
            for (int n; (n = in.read(buffer)) > 0; ) {
                digest.update(buffer, 0, n);
            }
        }
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Adds fields in order; a value is written with {@code String.valueOf}, numbers in {@link Locale#ROOT}. */
    public static final class Builder {
        private final Map<String, String> fields = new LinkedHashMap<>();

        private Builder() {
        }

        public Builder with(String name, Object value) {
            if (fields.containsKey(name)) {
                throw new IllegalArgumentException("fingerprint field given twice: " + name);
            }
            fields.put(name, value instanceof Double d ? Double.toString(d) : String.valueOf(value));
            return this;
        }

        public Builder all(String prefix, Map<String, String> more) {
            more.forEach((name, value) -> with(prefix + name, value));
            return this;
        }

        /** One field per record component, named {@code prefix + component name}. */
        public Builder record(String prefix, Record record) {
            for (var component : record.getClass().getRecordComponents()) {
                try {
                    with(prefix + component.getName(), component.getAccessor().invoke(record));
                } catch (ReflectiveOperationException e) {
                    throw new IllegalStateException("cannot read " + component, e);
                }
            }
            return this;
        }

        public RunFingerprint build() {
            return new RunFingerprint(fields);
        }
    }
}
