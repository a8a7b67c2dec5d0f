package org.telltale.report.sarif;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Map;
import org.telltale.TelltaleException;
import org.telltale.report.sarif.SarifLog.Location;
import org.telltale.report.sarif.SarifLog.Result;
import org.telltale.report.sarif.SarifLog.Rule;

/**
 * Writes a {@link SarifLog} as one SARIF 2.1.0 log with one run (OASIS SARIF 2.1.0 errata 01:
 * §3.13 sarifLog, §3.14 run, §3.19 tool, §3.49 reportingDescriptor, §3.27 result, §3.28
 * location). Numbers that are not finite become {@code null}, since JSON has none.
 *
 * <p>Stateless and thread-safe.
 */
public final class SarifWriter {
    /** The OASIS schema of the final standard, as its §3.13.3 recommends naming it. */
    public static final String SCHEMA = "https://docs.oasis-open.org/sarif/sarif/v2.1.0/errata01/os/schemas/sarif-schema-2.1.0.json";

    /** Our own key for a result's stable identity in {@code partialFingerprints} (§3.27.17: name/version). */
    public static final String IDENTITY_KEY = "telltaleArtefact/v1";

    private static final JsonFactory JSON = new JsonFactory();

    private SarifWriter() {
    }

    /** The log as indented JSON text. */
    public static String toJson(SarifLog log) {
        StringWriter out = new StringWriter();
        try (JsonGenerator g = JSON.createGenerator(out)) {
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeStringField("$schema", SCHEMA);
            g.writeStringField("version", "2.1.0");
            g.writeArrayFieldStart("runs");
            run(g, log);
            g.writeEndArray();
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString() + "\n";
    }

    /** Refuses an existing {@code file} unless {@code force}, before any work is done. */
    public static void refuseToReplace(Path file, boolean force) {
        if (!force && Files.exists(file)) {
            throw new TelltaleException(file + ": file exists; pass {force} to replace it");
        }
    }

    /** Writes the log to {@code file} whole or not at all (written beside it, then moved). */
    public static void write(SarifLog log, Path file, boolean force) {
        refuseToReplace(file, force);
        String json = toJson(log);
        try {
            Path parent = file.toAbsolutePath().getParent();
            Files.createDirectories(parent);
            Path temp = Files.createTempFile(parent, ".telltale-sarif", ".tmp");
            try {
                Files.writeString(temp, json, StandardCharsets.UTF_8);
                Files.move(temp, file, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } finally {
                Files.deleteIfExists(temp);
            }
        } catch (IOException e) {
            throw new TelltaleException("cannot write " + file + ": " + e.getMessage(), e);
        }
    }

    /**
     * A file path as a SARIF URI reference (§3.10.2: RFC 3986, forward slashes): relative paths
     * stay relative, so a viewer resolves them against the checkout; absolute ones become
     * {@code file:} URIs.
     */
    public static String uri(Path file) {
        if (file.isAbsolute()) {
            return file.toUri().toASCIIString();
        }
        String path = file.normalize().toString().replace(file.getFileSystem().getSeparator(), "/");
        try {
            return new URI(null, null, path, null).toASCIIString();
        } catch (URISyntaxException e) {
            throw new IllegalArgumentException("not a usable path: " + file, e);
        }
    }

    private static void run(JsonGenerator g, SarifLog log) throws IOException {
        g.writeStartObject();
        g.writeObjectFieldStart("tool");
        g.writeObjectFieldStart("driver");
        g.writeStringField("name", log.tool().name());
        g.writeStringField("version", log.tool().version());
        if (log.tool().informationUri() != null) {
            g.writeStringField("informationUri", log.tool().informationUri());
        }
        g.writeArrayFieldStart("rules");
        for (Rule rule : log.rules()) {
            rule(g, rule);
        }
        g.writeEndArray();
        g.writeEndObject();
        g.writeEndObject();
        if (log.automation() != null) {
            g.writeObjectFieldStart("automationDetails");
            g.writeStringField("id", log.automation());
            g.writeEndObject();
        }
        g.writeArrayFieldStart("invocations");
        g.writeStartObject();
        g.writeBooleanField("executionSuccessful", true);
        g.writeEndObject();
        g.writeEndArray();
        g.writeArrayFieldStart("results");
        List<String> ruleIds = log.rules().stream().map(Rule::id).toList();
        for (Result result : log.results()) {
            result(g, result, ruleIds.indexOf(result.ruleId()));
        }
        g.writeEndArray();
        if (!log.settings().isEmpty()) {
            g.writeObjectFieldStart("properties");
            g.writeFieldName("telltale");
            value(g, log.settings());
            g.writeEndObject();
        }
        g.writeEndObject();
    }

    private static void rule(JsonGenerator g, Rule rule) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", rule.id());
        g.writeStringField("name", rule.name());
        text(g, "shortDescription", rule.shortDescription(), null);
        text(g, "fullDescription", rule.fullDescription(), null);
        text(g, "help", rule.help(), rule.helpMarkdown());
        g.writeObjectFieldStart("defaultConfiguration");
        g.writeStringField("level", rule.level().key());
        g.writeEndObject();
        g.writeEndObject();
    }

    private static void result(JsonGenerator g, Result r, int ruleIndex) throws IOException {
        g.writeStartObject();
        g.writeStringField("ruleId", r.ruleId());
        g.writeNumberField("ruleIndex", ruleIndex);
        g.writeStringField("level", r.level().key());
        text(g, "message", r.message(), null);
        if (!r.locations().isEmpty()) {
            g.writeArrayFieldStart("locations");
            int id = 0;
            for (Location l : r.locations()) {
                location(g, l, id++);
            }
            g.writeEndArray();
        }
        if (!r.fingerprints().isEmpty()) {
            g.writeObjectFieldStart("partialFingerprints");
            for (Map.Entry<String, String> f : r.fingerprints().entrySet()) {
                g.writeStringField(f.getKey(), f.getValue());
            }
            g.writeEndObject();
        }
        if (r.suppression() != null) {
            g.writeArrayFieldStart("suppressions");
            g.writeStartObject();
            g.writeStringField("kind", "external");
            if (r.suppression().justification() != null) {
                g.writeStringField("justification", r.suppression().justification());
            }
            g.writeEndObject();
            g.writeEndArray();
        }
        if (r.baselineState() != null) {
            g.writeStringField("baselineState", r.baselineState().key());
        }
        if (!r.properties().isEmpty()) {
            g.writeFieldName("properties");
            value(g, r.properties());
        }
        g.writeEndObject();
    }

    private static void location(JsonGenerator g, Location l, int id) throws IOException {
        g.writeStartObject();
        g.writeNumberField("id", id);
        g.writeObjectFieldStart("physicalLocation");
        g.writeObjectFieldStart("artifactLocation");
        g.writeStringField("uri", l.uri());
        g.writeEndObject();
        if (l.line() > 0) {
            g.writeObjectFieldStart("region");
            g.writeNumberField("startLine", l.line());
            g.writeEndObject();
        }
        g.writeEndObject();
        if (l.logical() != null) {
            g.writeArrayFieldStart("logicalLocations");
            g.writeStartObject();
            g.writeStringField("name", l.logical());
            // §3.33.7: a JSON Lines or CSV record is an object of the corpus file.
            g.writeStringField("kind", "object");
            g.writeEndObject();
            g.writeEndArray();
        }
        g.writeEndObject();
    }

    private static void text(JsonGenerator g, String field, String text, String markdown) throws IOException {
        g.writeObjectFieldStart(field);
        g.writeStringField("text", text);
        if (markdown != null) {
            g.writeStringField("markdown", markdown);
        }
        g.writeEndObject();
    }

    private static void value(JsonGenerator g, Object v) throws IOException {
        if (v == null) {
            g.writeNull();
        } else if (v instanceof Map<?, ?> map) {
            g.writeStartObject();
            for (Map.Entry<?, ?> e : map.entrySet()) {
                g.writeFieldName(String.valueOf(e.getKey()));
                value(g, e.getValue());
            }
            g.writeEndObject();
        } else if (v instanceof Iterable<?> list) {
            g.writeStartArray();
            for (Object o : list) {
                value(g, o);
            }
            g.writeEndArray();
        } else if (v instanceof Double d) {
            if (d.isNaN() || d.isInfinite()) {
                g.writeNull();
            } else {
                g.writeNumber(d);
            }
        } else if (v instanceof Integer || v instanceof Long) {
            g.writeNumber(((Number) v).longValue());
        } else if (v instanceof Number n) {
            value(g, n.doubleValue());
        } else if (v instanceof Boolean b) {
            g.writeBoolean(b);
        } else {
            g.writeString(v.toString());
        }
    }
}
