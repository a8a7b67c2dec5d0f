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

    /** Reads the overlap result in {@code file}; errors name the file. */
    public static OverlapResult read(Path file) throws IOException {
        try {
            return fromJson(Files.readString(file, StandardCharsets.UTF_8));
        } catch (TelltaleException e) {
            throw new TelltaleException(file + ": " + e.getMessage(), e);
        }
    }

    /** Parses the JSON text of an overlap result. */
    public static OverlapResult fromJson(String json) {
        JsonNode root;
        try {
            root = MAPPER.readTree(json);
        } catch (JsonProcessingException e) {
            throw new TelltaleException("not valid JSON: " + e.getOriginalMessage()
                    + " at line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr());
        }
        if (root == null || !root.isObject()) {
            throw new TelltaleException("an overlap result must be a JSON object");
        }
        String format = text(root, "format", "");
        if (!FORMAT.equals(format)) {
            throw new TelltaleException("format is '" + format + "', expected '" + FORMAT + "'");
        }
        int version = (int) integer(root, "version", "");
        if (version != VERSION) {
            throw new TelltaleException("version " + version + " of " + FORMAT + " is not supported (expected " + VERSION + ")");
        }
        JsonNode s = object(root, "settings", "");
        OverlapSettings settings = new OverlapSettings(real(s, "threshold", "settings"), (int) integer(s, "shingle", "settings"),
                (int) integer(s, "signature", "settings"),
                new Banding((int) integer(s, "rows", "settings"), (int) integer(s, "bands", "settings")),
                integer(s, "seed", "settings"), 1, root.has("documents"));
        JsonNode m = object(root, "summary", "");
        OverlapSummary summary = new OverlapSummary(integer(m, "train_documents", "summary"),
                integer(m, "test_documents", "summary"), integer(m, "train_empty", "summary"),
                integer(m, "test_empty", "summary"), integer(m, "train_test_pairs", "summary"),
                integer(m, "exact_train_test_pairs", "summary"), integer(m, "within_train_pairs", "summary"),
                integer(m, "within_test_pairs", "summary"), integer(m, "test_seen", "summary"),
                integer(m, "test_seen_exact", "summary"), integer(m, "test_seen_conflicting", "summary"),
                integer(m, "train_seen", "summary"), integer(m, "candidates", "summary"));
        List<OverlapPair> pairs = new ArrayList<>();
        readPairs(root, "pairs", PairKind.TRAIN_TEST, "train", "test", pairs);
        readPairs(root, "within_train", PairKind.WITHIN_TRAIN, "first", "second", pairs);
        readPairs(root, "within_test", PairKind.WITHIN_TEST, "first", "second", pairs);
        Inflation inflation = null;
        if (root.hasNonNull("accuracy")) {
            JsonNode a = object(root, "accuracy", "");
            inflation = new Inflation(text(a, "model", "accuracy"), integer(a, "labelled", "accuracy"),
                    integer(a, "correct", "accuracy"), integer(a, "labelled_unseen", "accuracy"),
                    integer(a, "correct_unseen", "accuracy"));
        }
        Map<String, String> trainTexts = new LinkedHashMap<>();
        Map<String, String> testTexts = new LinkedHashMap<>();
        if (root.hasNonNull("documents")) {
            JsonNode d = object(root, "documents", "");
            readTexts(d, "train", trainTexts);
            readTexts(d, "test", testTexts);
        }
        return new OverlapResult(text(root, "train", ""), text(root, "test", ""), settings, pairs, summary,
                trainTexts, testTexts, inflation);
    }

    private static void readPairs(JsonNode root, String field, PairKind kind, String first, String second,
                                  List<OverlapPair> out) {
        JsonNode array = root.get(field);
        if (array == null || !array.isArray()) {
            throw new TelltaleException("missing array '" + field + "'");
        }
        for (int i = 0; i < array.size(); i++) {
            JsonNode p = array.get(i);
            String where = field + "[" + i + "]";
            out.add(new OverlapPair(kind, text(p, first, where), text(p, second, where), real(p, "similarity", where),
                    bool(p, "exact", where), optionalText(p, first + "_label"), optionalText(p, second + "_label")));
        }
    }

    private static void readTexts(JsonNode documents, String field, Map<String, String> out) {
        JsonNode node = documents.get(field);
        if (node == null) {
            return;
        }
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            out.put(e.getKey(), e.getValue().asText());
        }
    }

    private static JsonNode object(JsonNode node, String field, String where) {
        JsonNode value = node.get(field);
        if (value == null || !value.isObject()) {
            throw missing(field, where, "an object");
        }
        return value;
    }

    private static String text(JsonNode node, String field, String where) {
        JsonNode value = node.get(field);
        if (value == null || !value.isTextual()) {
            throw missing(field, where, "a string");
        }
        return value.asText();
    }

    private static String optionalText(JsonNode node, String field) {
        JsonNode value = node.get(field);
        return value == null || value.isNull() ? null : value.asText();
    }

    private static long integer(JsonNode node, String field, String where) {
        JsonNode value = node.get(field);
        if (value == null || !value.canConvertToLong() || !value.isIntegralNumber()) {
            throw missing(field, where, "an integer");
        }
        return value.asLong();
    }

    private static double real(JsonNode node, String field, String where) {
        JsonNode value = node.get(field);
        if (value == null || !value.isNumber()) {
            throw missing(field, where, "a number");
        }
        return value.asDouble();
    }

    private static boolean bool(JsonNode node, String field, String where) {
        JsonNode value = node.get(field);
        if (value == null || !value.isBoolean()) {
            throw missing(field, where, "true or false");
        }
        return value.asBoolean();
    }

    private static TelltaleException missing(String field, String where, String what) {
        return new TelltaleException("'" + field + "'" + (where.isEmpty() ? "" : " in " + where) + " must be " + what);
    }
}
