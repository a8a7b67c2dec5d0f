package org.telltale.json;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * One value of a JSON document, read strictly: every accessor says what it requires, and a
 * value that is missing or of another type is a {@link ContractException} naming the source, the
 * path ({@code findings[3].support}) and what was found. A string never reads as a number, a
 * fraction never as an integer, a missing array never as an empty one. Parsing refuses duplicate
 * keys and trailing content, and nesting deeper than Jackson's limit (1,000).
 *
 * <pre>
 * JsonValue root = JsonValue.read(file);
 * int version = root.version("telltale.overlap", 1);
 * double threshold = root.object("settings").number("threshold");
 * for (JsonValue pair : root.array("pairs")) { pair.string("train"); ... }
 * </pre>
 *
 * Immutable; thread-safe.
 */
public final class JsonValue {
    private static final ObjectMapper MAPPER = strict().build();
    /** The same, but reading the NaN and Infinity literals that Python's json module writes. */
    private static final ObjectMapper NON_FINITE = strict()
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .build();

    private static JsonMapper.Builder strict() {
        return JsonMapper.builder(new JsonFactory())
                .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
                .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS);
    }

    private final JsonNode node;
    private final String source;
    private final String path;

    private JsonValue(JsonNode node, String source, String path) {
        this.node = node;
        this.source = source;
        this.path = path;
    }

    /** Parses {@code text}; {@code source} names it in errors (a file, {@code file:12}, "the request body"). */
    public static JsonValue parse(String text, String source) {
        return parse(() -> MAPPER.readTree(text), source);
    }

    /** Parses UTF-8 bytes (a request or response body). */
    public static JsonValue parse(byte[] utf8, String source) {
        return parse(() -> MAPPER.readTree(utf8), source);
    }

    /**
     * Parses UTF-8 bytes that may hold {@code NaN}, {@code Infinity} or {@code -Infinity} as
     * numbers: a model's answer, whose validation names such a score instead of a parse error.
     */
    public static JsonValue parseAllowingNonFinite(byte[] utf8, String source) {
        return parse(() -> NON_FINITE.readTree(utf8), source);
    }

    private interface TreeReader {
        JsonNode read() throws IOException;
    }

    private static JsonValue parse(TreeReader reader, String source) {
        try {
            JsonNode node = reader.read();
            if (node == null || node.isMissingNode()) {
                throw new ContractException(source + ": empty, expected JSON");
            }
            return new JsonValue(node, source, "");
        } catch (JsonProcessingException e) {
            String at = e.getLocation() == null ? ""
                    : " at line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr();
            throw new ContractException(source + ": not valid JSON: " + e.getOriginalMessage() + at);
        } catch (IOException e) {
            throw new ContractException(source + ": not valid JSON: " + e.getMessage());
        }
    }

    /** Reads and parses a UTF-8 file; errors name the file. */
    public static JsonValue read(Path file) {
        try {
            return parse(Files.readString(file, StandardCharsets.UTF_8), file.toString());
        } catch (IOException e) {
            throw new org.telltale.TelltaleException("cannot read " + file + ": " + e.getMessage(), e);
        }
    }

    /** Where this value sits: {@code findings[3].support}, or empty for the root. */
    public String path() {
        return path;
    }

    /** The source this value was read from. */
    public String source() {
        return source;
    }

    /** The underlying tree, for code that must keep a value's JSON exactly (the journal keeps explanations). */
    public JsonNode node() {
        return node;
    }

    /**
     * Checks the contract's {@code format} and {@code version} fields and returns the version:
     * {@code format} must equal {@code format}, {@code version} be one of {@code supported}.
     */
    public int version(String format, int... supported) {
        String found = string("format");
        if (!found.equals(format)) {
            throw at("format", "expected \"" + format + "\", found \"" + found + "\"");
        }
        int version = int32("version");
        if (Arrays.stream(supported).noneMatch(v -> v == version)) {
            throw at("version", format + " version " + version + " is not supported (this Telltale reads version "
                    + Arrays.stream(supported).mapToObj(Integer::toString).collect(Collectors.joining(" and ")) + ")");
        }
        return version;
    }

    // ---- fields of an object

    public boolean has(String field) {
        requireObject();
        JsonNode v = node.get(field);
        return v != null && !v.isNull();
    }

    /** The field, of any type; missing or null is an error. */
    public JsonValue get(String field) {
        requireObject();
        JsonNode v = node.get(field);
        if (v == null) {
            throw at(field, "missing");
        }
        if (v.isNull()) {
            throw at(field, "expected a value, found null");
        }
        return new JsonValue(v, source, child(field));
    }

    /** The field, or empty when it is absent or null. */
    public Optional<JsonValue> find(String field) {
        requireObject();
        JsonNode v = node.get(field);
        return v == null || v.isNull() ? Optional.empty() : Optional.of(new JsonValue(v, source, child(field)));
    }

    public String string(String field) {
        return get(field).asString();
    }

    /** The string, or {@code null} when the field is absent or null. */
    public String optionalString(String field) {
        return find(field).map(JsonValue::asString).orElse(null);
    }

    public long integer(String field) {
        return get(field).asInteger();
    }

    public int int32(String field) {
        return get(field).asInt32();
    }

    public double number(String field) {
        return get(field).asNumber();
    }

    /** The number, or {@code null} when the field is absent or null. */
    public Double optionalNumber(String field) {
        return find(field).map(JsonValue::asNumber).orElse(null);
    }

    /**
     * A number that must be present and may be {@code null}: the writers of Telltale's contracts
     * write a value that is not finite as {@code null}. Missing or mistyped is an error.
     */
    public Double nullableNumber(String field) {
        present(field);
        return optionalNumber(field);
    }

    /** As {@link #nullableNumber}, with {@code null} read as NaN. */
    public double numberOrNaN(String field) {
        Double v = nullableNumber(field);
        return v == null ? Double.NaN : v;
    }

    /** A string that must be present and may be {@code null} (an unknown gold label). */
    public String nullableString(String field) {
        present(field);
        return optionalString(field);
    }

    private void present(String field) {
        requireObject();
        if (!node.has(field)) {
            throw at(field, "missing");
        }
    }

    public boolean bool(String field) {
        return get(field).asBool();
    }

    public JsonValue object(String field) {
        return get(field).requireObject();
    }

    public List<JsonValue> array(String field) {
        return get(field).elements();
    }

    public List<String> strings(String field) {
        return array(field).stream().map(JsonValue::asString).toList();
    }

    // ---- this value

    public String asString() {
        if (!node.isTextual()) {
            throw here("expected a string");
        }
        return node.textValue();
    }

    public long asInteger() {
        if (!node.isIntegralNumber() || !node.canConvertToLong()) {
            throw here("expected an integer");
        }
        return node.longValue();
    }

    public int asInt32() {
        long v = asInteger();
        if (v < Integer.MIN_VALUE || v > Integer.MAX_VALUE) {
            throw here("expected an integer of at most 32 bits");
        }
        return (int) v;
    }

    public double asNumber() {
        if (!node.isNumber()) {
            throw here("expected a number");
        }
        return node.doubleValue();
    }

    public boolean asBool() {
        if (!node.isBoolean()) {
            throw here("expected true or false");
        }
        return node.booleanValue();
    }

    /** The elements of this array. */
    public List<JsonValue> elements() {
        if (!node.isArray()) {
            throw here("expected an array");
        }
        List<JsonValue> out = new ArrayList<>(node.size());
        for (int i = 0; i < node.size(); i++) {
            out.add(new JsonValue(node.get(i), source, path + "[" + i + "]"));
        }
        return out;
    }

    /** The fields of this object, in document order. */
    public Map<String, JsonValue> fields() {
        requireObject();
        Map<String, JsonValue> out = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            out.put(e.getKey(), new JsonValue(e.getValue(), source, child(e.getKey())));
        }
        return Collections.unmodifiableMap(out);
    }

    public JsonValue requireObject() {
        if (!node.isObject()) {
            throw here("expected an object");
        }
        return this;
    }

    /** An error about this value: {@code source: path: problem, found …}. */
    public ContractException here(String problem) {
        return new ContractException(place(path) + problem + ", found " + describe(node));
    }

    /** An error about a field of this object, whatever it holds. */
    public ContractException at(String field, String problem) {
        return new ContractException(place(child(field)) + problem);
    }

    private String place(String where) {
        return source + ": " + (where.isEmpty() ? "" : where + ": ");
    }

    private String child(String field) {
        return path.isEmpty() ? field : path + "." + field;
    }

    /** What a value is, for messages: its type and, for scalars, a short form of it. */
    static String describe(JsonNode v) {
        if (v.isTextual()) {
            String t = v.textValue();
            return "the string \"" + (t.length() > 40 ? t.substring(0, 40) + "…" : t) + "\"";
        }
        if (v.isNumber()) {
            return "the number " + v.asText();
        }
        if (v.isBoolean()) {
            return v.asText();
        }
        if (v.isNull()) {
            return "null";
        }
        return v.isArray() ? "an array" : "an object";
    }
}
