package org.telltale.connect;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import java.util.List;
import java.util.function.Supplier;
import org.telltale.json.ContractException;
import org.telltale.json.JsonValue;

/**
 * The JSON plumbing shared by the codecs. Answers are read by {@link JsonValue}, the reader of
 * every contract, so a missing or mistyped value names its path in the answer
 * ({@code scores[1][0]}) and what was found; NaN and Infinity literals (which Python's
 * {@code json} module writes by default) are read as numbers so that validation can name them,
 * instead of a vague parse error. Every broken answer becomes a {@link MalformedResponse}
 * carrying a snippet of the response.
 */
final class Json {
    /** Writes requests; answers are never read with it. */
    static final ObjectMapper MAPPER = new ObjectMapper();
    /** How errors name an answer. */
    static final String SOURCE = "the response";

    private Json() {
    }

    /** The answer, parsed strictly (no duplicate keys, no trailing content, nesting at most 1,000 deep). */
    static JsonValue parse(byte[] body) {
        return read(() -> JsonValue.parseAllowingNonFinite(body, SOURCE), Snippet.of(body));
    }

    /** Runs {@code reading}, turning a broken contract into a MalformedResponse that ends with {@code snippet}. */
    static <T> T read(Supplier<T> reading, String snippet) {
        try {
            return reading.get();
        } catch (ContractException broken) {
            throw new MalformedResponse(broken.getMessage() + (snippet.isEmpty() ? "" : "; response: " + snippet));
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

    /** A row of numbers: the elements of an array, each a number. */
    static double[] numbers(JsonValue row) {
        List<JsonValue> values = row.elements();
        double[] out = new double[values.size()];
        for (int j = 0; j < out.length; j++) {
            out[j] = values.get(j).asNumber();
        }
        return out;
    }

    /** What the model said in its {@code error} field, shortened. */
    static String error(JsonValue error) {
        return Snippet.of(error.node().isTextual() ? error.node().textValue() : error.node().toString());
    }
}
