package org.telltale.report.json;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.telltale.TelltaleException;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditResult.Example;
import org.telltale.audit.AuditResult.Finding;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.AuditResult.Summary;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.Severity;
import org.telltale.text.Span;

/**
 * Writes and reads the {@code telltale.audit} v1 contract:
 * {@code {"format":"telltale.audit","version":1,"summary":{…},"findings":[…],"scrub":[…],"picks":[…]}}.
 * Field names are snake_case; numbers that are not finite are written as {@code null} and read
 * back as NaN; a missing required field is an error naming the field and its place.
 *
 * <p>Stateless and thread-safe.
 */
public final class AuditJson {
    public static final String FORMAT = "telltale.audit";
    public static final int VERSION = 1;

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private AuditJson() {
    }

    /** Writes {@code result} to {@code file} as UTF-8, ending in a newline. */
    public static void write(AuditResult result, Path file) throws IOException {
        Files.writeString(file, toJson(result) + "\n", StandardCharsets.UTF_8);
    }

    /** Reads the audit in {@code file}; errors name the file. */
    public static AuditResult read(Path file) throws IOException {
        String json = Files.readString(file, StandardCharsets.UTF_8);
        try {
            return fromJson(json);
        } catch (TelltaleException e) {
            throw new TelltaleException(file + ": " + e.getMessage(), e);
        }
    }

    /** The JSON text of {@code result}, indented. */
    public static String toJson(AuditResult result) {
        return toJson(result, null);
    }

    /** The JSON text of {@code result} with its comparison to a baseline ({@code null}: none), indented. */
    public static String toJson(AuditResult result, org.telltale.audit.Baseline.Comparison since) {
        try {
            ObjectNode root = tree(result);
            if (since != null) {
                root.set(BaselineJson.SECTION, BaselineJson.tree(since));
            }
            return MAPPER.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a JSON tree failed to serialise", e);
        }
    }

    /** Parses the JSON text of an audit. */
    public static AuditResult fromJson(String json) {
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            throw new TelltaleException("not valid JSON: " + e.getOriginalMessage()
                    + " at line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr());
        }
        if (root == null || !root.isObject()) {
            throw new TelltaleException("an audit must be a JSON object");
        }
        String format = root.path("format").asText("");
        if (!FORMAT.equals(format)) {
            throw new TelltaleException("format is '" + format + "', expected '" + FORMAT + "'");
        }
        int version = root.path("version").asInt(-1);
        if (version != VERSION) {
            throw new TelltaleException("version " + version + " of " + FORMAT + " is not supported (expected " + VERSION + ")");
        }
        Summary summary = summary(required(root, "summary", ""));
        List<Finding> findings = new ArrayList<>();
        JsonNode fs = required(root, "findings", "");
        for (int i = 0; i < fs.size(); i++) {
            findings.add(finding(fs.get(i), "findings[" + i + "]"));
        }
        List<Scrub> scrub = new ArrayList<>();
        JsonNode ss = required(root, "scrub", "");
        for (int i = 0; i < ss.size(); i++) {
            scrub.add(scrub(ss.get(i), "scrub[" + i + "]"));
        }
        List<String> picks = strings(required(root, "picks", ""));
        return new AuditResult(summary, findings, scrub, picks);
    }

    // ---- writing

    static ObjectNode tree(AuditResult result) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("version", VERSION);
        root.set("summary", summaryTree(result.summary()));
        ArrayNode findings = root.putArray("findings");
        result.findings().forEach(f -> findings.add(findingTree(f)));
        ArrayNode scrub = root.putArray("scrub");
        result.scrub().forEach(s -> scrub.add(scrubTree(s)));
        ArrayNode picks = root.putArray("picks");
        result.picks().forEach(picks::add);
        return root;
    }

    private static ObjectNode summaryTree(Summary s) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("documents", s.documents());
        o.put("explained", s.explained());
        ArrayNode labels = o.putArray("labels");
        s.labels().forEach(labels::add);
        putNullable(o, "accuracy", s.accuracy());
        o.put("skipped", s.skipped());
        o.put("retries", s.retries());
        o.put("model", s.model());
        o.put("corpus", s.corpus());
        o.put("seed", s.seed());
        o.set("settings", settingsTree(s.settings()));
        o.put("association_basis", s.associationBasis());
        ObjectNode prior = o.putObject("prior");
        s.prior().forEach((k, v) -> putNumber(prior, k, v));
        ObjectNode counts = o.putObject("predicted_counts");
        s.predictedCounts().forEach(counts::put);
        putNumber(o, "z_threshold", s.zThreshold());
        o.put("terms_tested", s.termsTested());
        putNumber(o, "pick_coverage", s.pickCoverage());
        o.put("elapsed_ms", s.elapsedMs());
        return o;
    }

    private static ObjectNode settingsTree(AuditSettings s) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("sample", s.sample());
        o.put("probes", s.probes());
        o.put("words", s.words());
        o.put("picks", s.picks());
        o.put("scrub_all", s.scrubAll());
        o.put("fail_on", s.failOn());
        putNumber(o, "alpha", s.alpha());
        o.put("batch", s.batch());
        o.put("analyzer", s.analyzer());
        o.put("policy", s.policy());
        return o;
    }

    private static ObjectNode findingTree(Finding f) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("term", f.term());
        o.put("kind", f.kind().key());
        o.put("severity", f.severity().key());
        o.put("label", f.label());
        o.put("support", f.support());
        putNumber(o, "importance", f.importance());
        putNumber(o, "association", f.association());
        o.put("confirmed", f.confirmed());
        putNumber(o, "z", f.z());
        putNumber(o, "pmi", f.pmi());
        putNumber(o, "p_label_given_term", f.pLabelGivenTerm());
        ObjectNode df = o.putObject("df");
        f.df().forEach(df::put);
        putNumber(o, "mean_weight", f.meanWeight());
        putNumber(o, "sign_consistency", f.signConsistency());
        o.put("selected_in", f.selectedIn());
        o.put("suppressed", f.suppressed());
        o.put("policy", f.policy());
        o.put("policy_note", f.policyNote());
        ObjectNode shares = o.putObject("kind_shares");
        f.kindShares().forEach((k, v) -> putNumber(shares, k, v));
        o.put("scrub_flips", f.scrubFlips());
        putNumber(o, "scrub_drop", f.scrubDrop());
        ArrayNode examples = o.putArray("examples");
        for (Example e : f.examples()) {
            ObjectNode x = examples.addObject();
            x.put("id", e.id());
            ArrayNode spans = x.putArray("spans");
            for (Span span : e.spans()) {
                spans.addObject().put("start", span.start()).put("end", span.end());
            }
        }
        return o;
    }

    private static ObjectNode scrubTree(Scrub s) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("kind", s.kind().key());
        o.put("mode", s.mode());
        ArrayNode terms = o.putArray("terms");
        s.terms().forEach(terms::add);
        o.put("scope", s.scope());
        o.put("documents", s.documents());
        o.put("flips", s.flips());
        putNumber(o, "flip_rate", s.flipRate());
        putNumber(o, "score_drop", s.scoreDrop());
        putNullable(o, "accuracy_before", s.accuracyBefore());
        putNullable(o, "accuracy_after", s.accuracyAfter());
        return o;
    }

    private static void putNumber(ObjectNode o, String name, double value) {
        if (Double.isFinite(value)) {
            o.put(name, value);
        } else {
            o.putNull(name);
        }
    }

    private static void putNullable(ObjectNode o, String name, Double value) {
        if (value == null) {
            o.putNull(name);
        } else {
            putNumber(o, name, value);
        }
    }

    // ---- reading

    private static Summary summary(JsonNode o) {
        String at = "summary";
        return new Summary(
                longOf(o, "documents", at),
                intOf(o, "explained", at),
                strings(required(o, "labels", at)),
                nullableDouble(o, "accuracy", at),
                longOf(o, "skipped", at),
                longOf(o, "retries", at),
                textOf(o, "model", at),
                textOf(o, "corpus", at),
                longOf(o, "seed", at),
                settings(required(o, "settings", at)),
                textOf(o, "association_basis", at),
                doubles(required(o, "prior", at)),
                longs(required(o, "predicted_counts", at)),
                doubleOf(o, "z_threshold", at),
                intOf(o, "terms_tested", at),
                doubleOf(o, "pick_coverage", at),
                longOf(o, "elapsed_ms", at));
    }

    private static AuditSettings settings(JsonNode o) {
        String at = "summary.settings";
        return new AuditSettings(
                intOf(o, "sample", at),
                intOf(o, "probes", at),
                intOf(o, "words", at),
                intOf(o, "picks", at),
                required(o, "scrub_all", at).asBoolean(),
                textOf(o, "fail_on", at),
                doubleOf(o, "alpha", at),
                intOf(o, "batch", at),
                textOf(o, "analyzer", at),
                nullableText(o, "policy", at));
    }

    private static Finding finding(JsonNode o, String at) {
        List<Example> examples = new ArrayList<>();
        JsonNode xs = required(o, "examples", at);
        for (int i = 0; i < xs.size(); i++) {
            JsonNode x = xs.get(i);
            String xat = at + ".examples[" + i + "]";
            List<Span> spans = new ArrayList<>();
            for (JsonNode s : required(x, "spans", xat)) {
                spans.add(new Span(intOf(s, "start", xat), intOf(s, "end", xat)));
            }
            examples.add(new Example(textOf(x, "id", xat), spans));
        }
        try {
            return new Finding(
                    textOf(o, "term", at),
                    ArtefactKind.fromKey(textOf(o, "kind", at)),
                    Severity.fromKey(textOf(o, "severity", at)),
                    textOf(o, "label", at),
                    longOf(o, "support", at),
                    doubleOf(o, "importance", at),
                    doubleOf(o, "association", at),
                    required(o, "confirmed", at).asBoolean(),
                    doubleOf(o, "z", at),
                    doubleOf(o, "pmi", at),
                    doubleOf(o, "p_label_given_term", at),
                    longs(required(o, "df", at)),
                    doubleOf(o, "mean_weight", at),
                    doubleOf(o, "sign_consistency", at),
                    intOf(o, "selected_in", at),
                    required(o, "suppressed", at).asBoolean(),
                    nullableText(o, "policy", at),
                    nullableText(o, "policy_note", at),
                    doubles(required(o, "kind_shares", at)),
                    intOf(o, "scrub_flips", at),
                    doubleOf(o, "scrub_drop", at),
                    examples);
        } catch (IllegalArgumentException e) {
            throw new TelltaleException(at + ": " + e.getMessage());
        }
    }

    private static Scrub scrub(JsonNode o, String at) {
        try {
            return new Scrub(
                    ArtefactKind.fromKey(textOf(o, "kind", at)),
                    textOf(o, "mode", at),
                    strings(required(o, "terms", at)),
                    textOf(o, "scope", at),
                    intOf(o, "documents", at),
                    intOf(o, "flips", at),
                    doubleOf(o, "flip_rate", at),
                    doubleOf(o, "score_drop", at),
                    nullableDouble(o, "accuracy_before", at),
                    nullableDouble(o, "accuracy_after", at));
        } catch (IllegalArgumentException e) {
            throw new TelltaleException(at + ": " + e.getMessage());
        }
    }

    private static JsonNode required(JsonNode o, String name, String at) {
        JsonNode v = o.get(name);
        if (v == null) {
            throw new TelltaleException("missing field '" + name + "'" + (at.isEmpty() ? "" : " in " + at));
        }
        return v;
    }

    private static String textOf(JsonNode o, String name, String at) {
        JsonNode v = required(o, name, at);
        if (!v.isTextual()) {
            throw new TelltaleException("field '" + name + "' in " + at + " must be a string");
        }
        return v.asText();
    }

    private static String nullableText(JsonNode o, String name, String at) {
        JsonNode v = o.get(name);
        return v == null || v.isNull() ? null : textOf(o, name, at);
    }

    private static long longOf(JsonNode o, String name, String at) {
        JsonNode v = required(o, name, at);
        if (!v.canConvertToLong() || !v.isIntegralNumber()) {
            throw new TelltaleException("field '" + name + "' in " + at + " must be an integer");
        }
        return v.asLong();
    }

    private static int intOf(JsonNode o, String name, String at) {
        long v = longOf(o, name, at);
        if (v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
            throw new TelltaleException("field '" + name + "' in " + at + " is out of range: " + v);
        }
        return (int) v;
    }

    private static double doubleOf(JsonNode o, String name, String at) {
        JsonNode v = required(o, name, at);
        if (v.isNull()) {
            return Double.NaN;
        }
        if (!v.isNumber()) {
            throw new TelltaleException("field '" + name + "' in " + at + " must be a number");
        }
        return v.asDouble();
    }

    private static Double nullableDouble(JsonNode o, String name, String at) {
        JsonNode v = o.get(name);
        return v == null || v.isNull() ? null : doubleOf(o, name, at);
    }

    private static List<String> strings(JsonNode array) {
        List<String> out = new ArrayList<>();
        for (JsonNode v : array) {
            out.add(v.asText());
        }
        return out;
    }

    private static Map<String, Double> doubles(JsonNode object) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = object.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            out.put(e.getKey(), e.getValue().isNull() ? Double.NaN : e.getValue().asDouble());
        }
        return out;
    }

    private static Map<String, Long> longs(JsonNode object) {
        Map<String, Long> out = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = object.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            out.put(e.getKey(), e.getValue().asLong());
        }
        return out;
    }
}
