package org.telltale.connect;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * The JSON plumbing shared by the codecs. NaN and Infinity literals (which Python's {@code json}
 * module writes by default) are read as numbers so that validation can name them, instead of a
 * vague parse error.
 */
final class Json {
    static final ObjectMapper MAPPER = JsonMapper.builder(new JsonFactory())
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .build();

    private Json() {
    }

    static JsonNode parse(byte[] body) {
        try {
            JsonNode node = MAPPER.readTree(body);
            if (node == null || node.isMissingNode()) {
                throw new MalformedResponse("the response is empty");
            }
            return node;
        } catch (JsonProcessingException e) {
            throw new MalformedResponse("the response is not valid JSON (" + e.getOriginalMessage()
                    + "); response: " + Snippet.of(body));
        } catch (IOException e) {
            throw new MalformedResponse("the response could not be read (" + e.getMessage() + ")");
        }
    }

    static byte[] write(Object tree) {
        try {
            return MAPPER.writeValueAsBytes(tree);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("cannot write JSON", e);
        }
    }

    static ArrayNode textArray(List<String> texts) {
        ArrayNode a = MAPPER.createArrayNode();
        for (String t : texts) {
            a.add(t);
        }
        return a;
    }

    /** The strings of a JSON array, or a MalformedResponse naming {@code what}. */
    static List<String> strings(JsonNode node, String what, String snippet) {
        if (node == null || !node.isArray()) {
            throw new MalformedResponse("'" + what + "' is missing or not an array; response: " + snippet);
        }
        List<String> out = new ArrayList<>(node.size());
        for (JsonNode e : node) {
            if (!e.isTextual()) {
                throw new MalformedResponse("'" + what + "' holds a non-string " + e.getNodeType().toString().toLowerCase(java.util.Locale.ROOT)
                        + "; response: " + snippet);
            }
            out.add(e.textValue());
        }
        return out;
    }

    /** A row of numbers, or a MalformedResponse naming row {@code index} of {@code what}. */
    static double[] numbers(JsonNode node, String what, int index, String snippet) {
        if (node == null || !node.isArray()) {
            throw new MalformedResponse("row " + index + " of '" + what + "' is not an array of numbers; response: " + snippet);
        }
        double[] row = new double[node.size()];
        for (int j = 0; j < row.length; j++) {
            JsonNode v = node.get(j);
            if (!v.isNumber()) {
                throw new MalformedResponse("row " + index + " of '" + what + "' holds " + Snippet.of(v.toString())
                        + ", not a number; response: " + snippet);
            }
            row[j] = v.doubleValue();
        }
        return row;
    }
}
