package org.telltale.report.json;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.telltale.TelltaleException;
import org.telltale.json.JsonValue;
import org.telltale.overlap.Banding;
import org.telltale.overlap.Inflation;
import org.telltale.overlap.OverlapPair;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.OverlapSettings;
import org.telltale.overlap.OverlapSummary;
import org.telltale.overlap.PairKind;

/**
 * Writes and reads the {@code telltale.overlap} v1 contract:
 * <pre>
 * {"format":"telltale.overlap","version":1,"train":…,"test":…,"settings":{…},"summary":{…},
 *  "accuracy":{…}?,"pairs":[{"train","test","similarity","exact","same_label",…}],
 *  "within_train":[{"first","second",…}],"within_test":[…],"documents":{"train":{id:text},"test":{…}}?}
 * </pre>
 * Field names are snake_case; {@code same_label} is {@code null} when either document has no
 * label; non-finite numbers are written as {@code null}. The writer streams, so a million pairs
 * never sit in memory twice.
 *
 * <p>Stateless and thread-safe.
 */
public final class OverlapJson {
    public static final String FORMAT = "telltale.overlap";
    public static final int VERSION = 1;

    private static final JsonFactory FACTORY = new JsonFactory();
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private OverlapJson() {
    }

    /** Writes {@code result} to {@code file} as UTF-8, ending in a newline. */
    public static void write(OverlapResult result, Path file) throws IOException {
        try (OutputStream out = Files.newOutputStream(file)) {
            write(result, out);
        }
    }

    /** The JSON text of {@code result}, indented. */
    public static String toJson(OverlapResult result) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            write(result, out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toString(StandardCharsets.UTF_8);
    }

    private static void write(OverlapResult result, OutputStream out) throws IOException {
        try (JsonGenerator g = FACTORY.createGenerator(out, JsonEncoding.UTF8)) {
            DefaultPrettyPrinter pretty = new DefaultPrettyPrinter().withObjectIndenter(new DefaultIndenter("  ", "\n"));
            g.setPrettyPrinter(pretty);
            g.writeStartObject();
            g.writeStringField("format", FORMAT);
            g.writeNumberField("version", VERSION);
            g.writeStringField("train", result.trainName());
            g.writeStringField("test", result.testName());
            writeSettings(g, result.settings());
            writeSummary(g, result.summary());
            if (result.inflation() != null) {
                writeInflation(g, result.inflation());
            }
            writePairs(g, "pairs", result.pairs(PairKind.TRAIN_TEST), "train", "test");
            writePairs(g, "within_train", result.pairs(PairKind.WITHIN_TRAIN), "first", "second");
            writePairs(g, "within_test", result.pairs(PairKind.WITHIN_TEST), "first", "second");
            if (!result.trainTexts().isEmpty() || !result.testTexts().isEmpty()) {
                g.writeObjectFieldStart("documents");
                writeTexts(g, "train", result.trainTexts());
                writeTexts(g, "test", result.testTexts());
                g.writeEndObject();
            }
            g.writeEndObject();
            g.writeRaw('\n');
        }
    }

    private static void writeSettings(JsonGenerator g, OverlapSettings s) throws IOException {
        Banding banding = s.banding();
        g.writeObjectFieldStart("settings");
        g.writeNumberField("threshold", s.threshold());
        g.writeNumberField("shingle", s.shingle());
        g.writeNumberField("signature", s.signature());
        g.writeNumberField("rows", banding.rows());
        g.writeNumberField("bands", banding.bands());
        g.writeNumberField("hashes", banding.hashes());
        number(g, "candidate_probability_at_threshold", banding.candidateProbability(s.threshold()));
        g.writeNumberField("seed", s.seed());
        g.writeStringField("normalisation", "nfkc, case fold (root locale), reply quotes removed, whitespace collapsed");
        g.writeEndObject();
    }

    private static void writeSummary(JsonGenerator g, OverlapSummary s) throws IOException {
        g.writeObjectFieldStart("summary");
        g.writeNumberField("train_documents", s.trainDocuments());
        g.writeNumberField("test_documents", s.testDocuments());
        g.writeNumberField("train_empty", s.trainEmpty());
        g.writeNumberField("test_empty", s.testEmpty());
        g.writeNumberField("test_seen", s.testSeen());
        number(g, "test_seen_share", s.testSeenShare());
        g.writeNumberField("test_seen_exact", s.testSeenExact());
        g.writeNumberField("test_seen_conflicting", s.testSeenConflicting());
        g.writeNumberField("train_seen", s.trainSeen());
        g.writeNumberField("train_test_pairs", s.trainTestPairs());
        g.writeNumberField("exact_train_test_pairs", s.exactTrainTestPairs());
        g.writeNumberField("within_train_pairs", s.withinTrainPairs());
        g.writeNumberField("within_test_pairs", s.withinTestPairs());
        g.writeNumberField("candidates", s.candidates());
        g.writeEndObject();
    }

    private static void writeInflation(JsonGenerator g, Inflation a) throws IOException {
        g.writeObjectFieldStart("accuracy");
        g.writeStringField("model", a.model());
        g.writeNumberField("labelled", a.labelled());
        g.writeNumberField("correct", a.correct());
        g.writeNumberField("labelled_unseen", a.labelledUnseen());
        g.writeNumberField("correct_unseen", a.correctUnseen());
        number(g, "accuracy", a.accuracy());
        number(g, "accuracy_unseen", a.accuracyUnseen());
        number(g, "accuracy_seen", a.accuracySeen());
        number(g, "inflation", a.inflation());
        g.writeEndObject();
    }

    private static void writePairs(JsonGenerator g, String field, List<OverlapPair> pairs, String first, String second)
            throws IOException {
        g.writeArrayFieldStart(field);
        for (OverlapPair p : pairs) {
            g.writeStartObject();
            g.writeStringField(first, p.first());
            g.writeStringField(second, p.second());
            g.writeNumberField("similarity", p.similarity());
            g.writeBooleanField("exact", p.exact());
            Boolean same = p.sameLabel();
            if (same == null) {
                g.writeNullField("same_label");
            } else {
                g.writeBooleanField("same_label", same);
            }
            g.writeStringField(first + "_label", p.firstLabel());
            g.writeStringField(second + "_label", p.secondLabel());
            g.writeEndObject();
        }
        g.writeEndArray();
    }

    private static void writeTexts(JsonGenerator g, String field, Map<String, String> texts) throws IOException {
        g.writeObjectFieldStart(field);
        for (Map.Entry<String, String> e : new TreeMap<>(texts).entrySet()) {
            g.writeStringField(e.getKey(), e.getValue());
        }
        g.writeEndObject();
    }

    private static void number(JsonGenerator g, String field, double value) throws IOException {
        if (Double.isFinite(value)) {
            g.writeNumberField(field, value);
        } else {
            g.writeNullField(field);
        }
    }

    /** Reads the overlap result in {@code file}; errors name the file and the path inside it. */
    public static OverlapResult read(Path file) throws IOException {
        return fromJson(JsonValue.read(file));
    }

    /** Parses the JSON text of an overlap result. */
    public static OverlapResult fromJson(String json) {
        return fromJson(JsonValue.parse(json, "overlap result"));
    }

    /** The settings as written; a value out of range is an error naming the file and the settings object. */
    private static OverlapSettings settings(JsonValue s, boolean keepTexts) {
        double threshold = s.number("threshold");
        int shingle = s.int32("shingle");
        int signature = s.int32("signature");
        int rows = s.int32("rows");
        int bands = s.int32("bands");
        long seed = s.integer("seed");
        try {
            return OverlapSettings.of(threshold, shingle, signature, rows, bands, seed, 1, keepTexts);
        } catch (IllegalArgumentException e) {
            throw s.here(e.getMessage());
        }
    }

    private static OverlapResult fromJson(JsonValue root) {
        root.version(FORMAT, VERSION);
        JsonValue s = root.object("settings");
        OverlapSettings settings = settings(s, root.has("documents"));
        JsonValue m = root.object("summary");
        OverlapSummary summary = new OverlapSummary(m.integer("train_documents"), m.integer("test_documents"),
                m.integer("train_empty"), m.integer("test_empty"), m.integer("train_test_pairs"),
                m.integer("exact_train_test_pairs"), m.integer("within_train_pairs"), m.integer("within_test_pairs"),
                m.integer("test_seen"), m.integer("test_seen_exact"), m.integer("test_seen_conflicting"),
                m.integer("train_seen"), m.integer("candidates"));
        List<OverlapPair> pairs = new ArrayList<>();
        readPairs(root, "pairs", PairKind.TRAIN_TEST, "train", "test", pairs);
        readPairs(root, "within_train", PairKind.WITHIN_TRAIN, "first", "second", pairs);
        readPairs(root, "within_test", PairKind.WITHIN_TEST, "first", "second", pairs);
        Inflation inflation = null;
        if (root.has("accuracy")) {
            JsonValue a = root.object("accuracy");
            inflation = new Inflation(a.string("model"), a.integer("labelled"), a.integer("correct"),
                    a.integer("labelled_unseen"), a.integer("correct_unseen"));
        }
        Map<String, String> trainTexts = new LinkedHashMap<>();
        Map<String, String> testTexts = new LinkedHashMap<>();
        if (root.has("documents")) {
            JsonValue d = root.object("documents");
            readTexts(d, "train", trainTexts);
            readTexts(d, "test", testTexts);
        }
        return new OverlapResult(root.string("train"), root.string("test"), settings, pairs, summary,
                trainTexts, testTexts, inflation);
    }

    private static void readPairs(JsonValue root, String field, PairKind kind, String first, String second,
                                  List<OverlapPair> out) {
        for (JsonValue p : root.array(field)) {
            out.add(new OverlapPair(kind, p.string(first), p.string(second), p.number("similarity"), p.bool("exact"),
                    p.optionalString(first + "_label"), p.optionalString(second + "_label")));
        }
    }

    private static void readTexts(JsonValue documents, String field, Map<String, String> out) {
        documents.find(field).ifPresent(texts -> texts.requireObject().fields()
                .forEach((id, text) -> out.put(id, text.asString())));
    }
}
