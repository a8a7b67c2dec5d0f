package org.telltale.report.json;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import org.telltale.UnknownKeyException;
import org.telltale.audit.ArtefactIdentity;
import org.telltale.audit.ArtefactKind;
import org.telltale.audit.AssociationBasis;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditResult.Artefact;
import org.telltale.audit.AuditResult.ArtefactTerm;
import org.telltale.audit.AuditResult.Effect;
import org.telltale.audit.AuditResult.Example;
import org.telltale.audit.AuditResult.Scrub;
import org.telltale.audit.AuditResult.Summary;
import org.telltale.audit.AuditResult.TermStat;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.FailOn;
import org.telltale.audit.Policy;
import org.telltale.audit.ScrubGroup;
import org.telltale.audit.ScrubMode;
import org.telltale.audit.ScrubScope;
import org.telltale.audit.Severity;
import org.telltale.json.JsonValue;
import org.telltale.text.Span;

/**
 * Writes the {@code telltale.audit} v2 contract and reads v2 and v1:
 * {@code {"format":"telltale.audit","version":2,"summary":{…},"artefacts":[…],"scrub":[…],"picks":[…],"terms":[…]}}.
 * Field names are snake_case; numbers that are not finite are written as {@code null} and read
 * back as NaN. Reading goes through the strict {@link JsonValue}: a missing or mistyped field is
 * an error naming the file and its path, a version this Telltale does not read names the version.
 * A v1 file (one finding per term) reads as one artefact per finding, its pattern the term.
 *
 * <p>Stateless and thread-safe.
 */
public final class AuditJson {
    public static final String FORMAT = "telltale.audit";
    public static final int VERSION = 2;

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private AuditJson() {
    }

    /** Writes {@code result} to {@code file} as UTF-8, ending in a newline. */
    public static void write(AuditResult result, Path file) throws IOException {
        Files.writeString(file, toJson(result) + "\n", StandardCharsets.UTF_8);
    }

    /** Reads the audit in {@code file} (version 1 or 2); errors name the file. */
    public static AuditResult read(Path file) {
        return read(JsonValue.read(file));
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

    /** Parses the JSON text of an audit; {@code source} names it in errors. */
    public static AuditResult fromJson(String json, String source) {
        return read(JsonValue.parse(json, source));
    }

    /** Parses the JSON text of an audit. */
    public static AuditResult fromJson(String json) {
        return fromJson(json, "audit.json");
    }

    private static AuditResult read(JsonValue root) {
        root.requireObject();
        int version = root.version(FORMAT, 1, 2);
        Summary summary = summary(root.object("summary"));
        if (version == 1) {
            return V1.read(root, summary);
        }
        List<Artefact> artefacts = new ArrayList<>();
        for (JsonValue a : root.array("artefacts")) {
            artefacts.add(artefact(a));
        }
        List<Scrub> scrub = new ArrayList<>();
        for (JsonValue s : root.array("scrub")) {
            scrub.add(scrub(s));
        }
        List<TermStat> terms = new ArrayList<>();
        for (JsonValue t : root.array("terms")) {
            terms.add(term(t));
        }
        return new AuditResult(summary, artefacts, scrub, root.strings("picks"), terms);
    }

    // ---- writing

    static ObjectNode tree(AuditResult result) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("format", FORMAT);
        root.put("version", VERSION);
        root.set("summary", summaryTree(result.summary()));
        ArrayNode artefacts = root.putArray("artefacts");
        result.artefacts().forEach(a -> artefacts.add(artefactTree(a)));
        ArrayNode scrub = root.putArray("scrub");
        result.scrub().forEach(s -> scrub.add(scrubTree(s)));
        ArrayNode picks = root.putArray("picks");
        result.picks().forEach(picks::add);
        ArrayNode terms = root.putArray("terms");
        result.terms().forEach(t -> terms.add(termTree(t)));
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
        o.put("association_basis", s.associationBasis().key());
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
        o.put("fail_on", s.failOn().key());
        putNumber(o, "alpha", s.alpha());
        o.put("batch", s.batch());
        o.put("analyzer", s.analyzer());
        o.put("policy", s.policy());
        return o;
    }

    private static ObjectNode artefactTree(Artefact a) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("id", a.id());
        o.put("kind", a.kind().key());
        o.put("severity", a.severity().key());
        o.put("label", a.label());
        o.put("pattern", a.pattern());
        o.put("support", a.support());
        putNumber(o, "importance", a.importance());
        putNumber(o, "association", a.association());
        putNumber(o, "p_label_given_term", a.pLabelGivenTerm());
        o.put("confirmed", a.confirmed());
        o.put("suppressed", a.suppressed());
        o.put("policy", a.policy() == null ? null : a.policy().key());
        o.put("policy_note", a.policyNote());
        ArrayNode terms = o.putArray("terms");
        for (ArtefactTerm t : a.terms()) {
            ObjectNode x = terms.addObject();
            x.put("term", t.term());
            putNumber(x, "importance", t.importance());
            putNumber(x, "association", t.association());
            putNumber(x, "weight", t.weight());
        }
        o.set("scrub", effectTree(a.scrub()));
        ArrayNode examples = o.putArray("examples");
        for (Example e : a.examples()) {
            ObjectNode x = examples.addObject();
            x.put("id", e.id());
            ArrayNode spans = x.putArray("spans");
            for (Span span : e.spans()) {
                spans.addObject().put("start", span.start()).put("end", span.end());
            }
        }
        return o;
    }

    private static ObjectNode effectTree(Effect e) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("documents", e.documents());
        o.put("flips", e.flips());
        putNumber(o, "flip_rate", e.flipRate());
        putNumber(o, "score_drop", e.scoreDrop());
        putNullable(o, "accuracy_before", e.accuracyBefore());
        putNullable(o, "accuracy_after", e.accuracyAfter());
        return o;
    }

    private static ObjectNode scrubTree(Scrub s) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("kind", s.group().key());
        o.put("mode", s.mode().key());
        ArrayNode ids = o.putArray("artefacts");
        s.artefacts().forEach(ids::add);
        o.put("scope", s.scope().key());
        o.put("documents", s.documents());
        o.put("flips", s.flips());
        putNumber(o, "flip_rate", s.flipRate());
        putNumber(o, "score_drop", s.scoreDrop());
        putNullable(o, "accuracy_before", s.accuracyBefore());
        putNullable(o, "accuracy_after", s.accuracyAfter());
        return o;
    }

    private static ObjectNode termTree(TermStat t) {
        ObjectNode o = MAPPER.createObjectNode();
        o.put("term", t.term());
        o.put("label", t.label());
        o.put("kind", t.kind().key());
        o.put("support", t.support());
        putNumber(o, "importance", t.importance());
        putNumber(o, "association", t.association());
        putNumber(o, "pmi", t.pmi());
        putNumber(o, "weight", t.weight());
        o.put("selected_in", t.selectedIn());
        o.put("artefact", t.artefact());
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

    private static Summary summary(JsonValue o) {
        return new Summary(
                o.integer("documents"),
                o.int32("explained"),
                o.strings("labels"),
                nullable(o, "accuracy"),
                o.integer("skipped"),
                o.integer("retries"),
                o.string("model"),
                o.string("corpus"),
                o.integer("seed"),
                settings(o.object("settings")),
                key(o, "association_basis", AssociationBasis::fromKey),
                numbers(o.object("prior")),
                integers(o.object("predicted_counts")),
                number(o, "z_threshold"),
                o.int32("terms_tested"),
                number(o, "pick_coverage"),
                o.integer("elapsed_ms"));
    }

    private static AuditSettings settings(JsonValue o) {
        try {
            return new AuditSettings(o.int32("sample"), o.int32("probes"), o.int32("words"), o.int32("picks"),
                    o.bool("scrub_all"), key(o, "fail_on", FailOn::fromKey), o.number("alpha"), o.int32("batch"), o.string("analyzer"),
                    o.optionalString("policy"));
        } catch (IllegalArgumentException e) {
            throw o.here(e.getMessage());
        }
    }

    private static Artefact artefact(JsonValue o) {
        List<ArtefactTerm> terms = new ArrayList<>();
        for (JsonValue t : o.array("terms")) {
            terms.add(new ArtefactTerm(t.string("term"), number(t, "importance"), number(t, "association"),
                    number(t, "weight")));
        }
        Artefact a = new Artefact(o.string("id"), kind(o, "kind"), severity(o), o.string("label"), o.string("pattern"),
                o.integer("support"), number(o, "importance"), number(o, "association"),
                number(o, "p_label_given_term"), o.bool("confirmed"), o.bool("suppressed"), status(o),
                o.optionalString("policy_note"), terms, effect(o.object("scrub")), examples(o));
        return a;
    }

    private static Effect effect(JsonValue o) {
        return new Effect(o.int32("documents"), o.int32("flips"), number(o, "flip_rate"), number(o, "score_drop"),
                nullable(o, "accuracy_before"), nullable(o, "accuracy_after"));
    }

    static List<Example> examples(JsonValue o) {
        List<Example> examples = new ArrayList<>();
        for (JsonValue x : o.array("examples")) {
            List<Span> spans = new ArrayList<>();
            for (JsonValue s : x.array("spans")) {
                int start = s.int32("start");
                int end = s.int32("end");
                if (start < 0 || end < start) {
                    throw s.here("expected 0 <= start <= end");
                }
                spans.add(new Span(start, end));
            }
            examples.add(new Example(x.string("id"), spans));
        }
        return examples;
    }

    private static Scrub scrub(JsonValue o) {
        return new Scrub(key(o, "kind", ScrubGroup::fromKey), key(o, "mode", ScrubMode::fromKey), o.strings("artefacts"), key(o, "scope", ScrubScope::fromKey),
                o.int32("documents"),
                o.int32("flips"), number(o, "flip_rate"), number(o, "score_drop"), nullable(o, "accuracy_before"),
                nullable(o, "accuracy_after"));
    }

    private static TermStat term(JsonValue o) {
        return new TermStat(o.string("term"), o.string("label"), kind(o, "kind"), o.integer("support"),
                number(o, "importance"), number(o, "association"), number(o, "pmi"), number(o, "weight"),
                o.int32("selected_in"), o.optionalString("artefact"));
    }

    static ArtefactKind kind(JsonValue o, String field) {
        return key(o, field, ArtefactKind::fromKey);
    }

    static Severity severity(JsonValue o) {
        return key(o, "severity", Severity::fromKey);
    }

    /** The policy status of an artefact or finding, or {@code null} when the policy did not touch it. */
    static Policy.Status status(JsonValue o) {
        return o.optionalString("policy") == null ? null : key(o, "policy", Policy.Status::fromKey);
    }

    /** The value of a closed set whose key is the string {@code field}; an unknown key is an error naming the file and the field. */
    static <E> E key(JsonValue o, String field, Function<String, E> fromKey) {
        String key = o.string(field);
        try {
            return fromKey.apply(key);
        } catch (UnknownKeyException e) {
            throw o.at(field, e.getMessage());
        }
    }

    /** A number that must be present and may be {@code null} (written for a value that is not finite): NaN then. */
    static double number(JsonValue o, String field) {
        return o.numberOrNaN(field);
    }

    /** A number that must be present and may be {@code null}. */
    static Double nullable(JsonValue o, String field) {
        return o.nullableNumber(field);
    }

    static Map<String, Double> numbers(JsonValue o) {
        Map<String, Double> out = new LinkedHashMap<>();
        o.fields().forEach((k, v) -> out.put(k, v.node().isNull() ? Double.NaN : v.asNumber()));
        return out;
    }

    static Map<String, Long> integers(JsonValue o) {
        Map<String, Long> out = new LinkedHashMap<>();
        o.fields().forEach((k, v) -> out.put(k, v.asInteger()));
        return out;
    }

    /**
     * Version 1: one finding per (term, label). Each reads as an artefact of that one term, its
     * pattern the term, its id from its identity as in version 2; its scrub fields
     * ({@code scrub_flips}, {@code scrub_drop}) were of its label's terms removed together, and
     * version 1 kept no document count for them (0 here). Scrub rows name the artefacts of
     * their kind; there is no all-at-once row and no per-term cloud beyond the findings.
     */
    private static final class V1 {
        static AuditResult read(JsonValue root, Summary summary) {
            List<Artefact> artefacts = new ArrayList<>();
            List<TermStat> terms = new ArrayList<>();
            for (JsonValue f : root.array("findings")) {
                String term = f.string("term");
                ArtefactKind kind = kind(f, "kind");
                String label = f.string("label");
                String id = ArtefactIdentity.of(kind, label, term).id();
                double importance = number(f, "importance");
                double z = number(f, "z");
                double weight = number(f, "mean_weight");
                int flips = f.int32("scrub_flips");
                Effect effect = new Effect(0, flips, Double.NaN, number(f, "scrub_drop"), null, null);
                artefacts.add(new Artefact(id, kind, severity(f), label, term, f.integer("support"), importance,
                        number(f, "association"), number(f, "p_label_given_term"), f.bool("confirmed"),
                        f.bool("suppressed"), status(f), f.optionalString("policy_note"),
                        List.of(new ArtefactTerm(term, importance, z, weight)), effect, examples(f)));
                terms.add(new TermStat(term, label, kind, f.integer("support"), importance, z, number(f, "pmi"), weight,
                        f.int32("selected_in"), id));
            }
            List<Scrub> scrub = new ArrayList<>();
            for (JsonValue s : root.array("scrub")) {
                ArtefactKind kind = kind(s, "kind");
                List<String> ids = artefacts.stream().filter(a -> a.kind() == kind && !a.suppressed())
                        .map(Artefact::id).toList();
                s.strings("terms");
                scrub.add(new Scrub(ScrubGroup.of(kind), key(s, "mode", ScrubMode::fromKey), ids, key(s, "scope", ScrubScope::fromKey),
                        s.int32("documents"),
                        s.int32("flips"), number(s, "flip_rate"), number(s, "score_drop"),
                        nullable(s, "accuracy_before"), nullable(s, "accuracy_after")));
            }
            return new AuditResult(summary, artefacts, scrub, root.strings("picks"), terms);
        }
    }
}
