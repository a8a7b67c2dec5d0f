package org.telltale.serve;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import org.telltale.json.ContractException;
import org.telltale.json.JsonValue;
import org.telltale.model.ScoreMatrix;

/**
 * Reads the texts out of request bodies and writes score matrices as answers, for the native
 * protocol and the Open Inference Protocol v2. Every problem is an {@link HttpError} 400 with a
 * message a client can act on.
 */
final class ScoreRequests {
    static final ObjectMapper MAPPER = JsonMapper.builder(new JsonFactory()).build();

    private ScoreRequests() {
    }

    /** What a client sent, read by the strict reader; a broken contract is a 400 naming the path and what was found. */
    static JsonValue parse(byte[] body) {
        try {
            return JsonValue.parse(body, "the request body");
        } catch (ContractException e) {
            throw new HttpError(400, e.getMessage());
        }
    }

    /** {@code {"texts": ["…", …]}} → the texts. */
    static List<String> nativeTexts(byte[] body, int maxBatch) {
        JsonValue root = parse(body);
        try {
            return strings(root.requireObject().array("texts"), maxBatch);
        } catch (ContractException e) {
            throw new HttpError(400, e.getMessage() + " (expected {\"texts\": [\"…\", …]})");
        }
    }

    /** The texts of an OIP v2 inference request, and its "id" (null when absent). */
    record InferRequest(List<String> texts, String id) {
    }

    /** An OIP v2 inference request → the texts of its one input, a BYTES tensor of shape [n] or [n, 1]. */
    static InferRequest inferTexts(byte[] body, int maxBatch) {
        JsonValue root = parse(body);
        try {
            List<JsonValue> inputs = root.requireObject().array("inputs");
            if (inputs.size() != 1) {
                throw new HttpError(400, "expected \"inputs\" holding exactly one tensor (the texts), found " + inputs.size());
            }
            JsonValue input = inputs.get(0).requireObject();
            if (!"BYTES".equals(input.string("datatype"))) {
                throw new HttpError(400, "the input tensor must have datatype BYTES");
            }
            List<JsonValue> flat = new ArrayList<>();
            for (JsonValue d : input.array("data")) {
                if (d.node().isArray()) {
                    flat.addAll(d.elements());
                } else {
                    flat.add(d);
                }
            }
            List<String> texts = strings(flat, maxBatch);
            List<JsonValue> shape = input.array("shape");
            if (shape.isEmpty() || shape.size() > 2 || !isInteger(shape.get(0), texts.size())
                    || (shape.size() == 2 && !isInteger(shape.get(1), 1))) {
                throw new HttpError(400, "the input tensor's shape must be [" + texts.size() + "] for " + texts.size() + " texts");
            }
            return new InferRequest(texts, root.find("id").filter(id -> id.node().isTextual()).map(JsonValue::asString).orElse(null));
        } catch (ContractException e) {
            throw new HttpError(400, e.getMessage());
        }
    }

    private static boolean isInteger(JsonValue v, long expected) {
        return v.node().isIntegralNumber() && v.node().asLong() == expected;
    }

    private static List<String> strings(List<JsonValue> array, int maxBatch) {
        if (array.size() > maxBatch) {
            throw new HttpError(400, "the request holds " + array.size() + " texts; this server takes at most " + maxBatch
                    + " per request");
        }
        List<String> out = new ArrayList<>(array.size());
        for (JsonValue t : array) {
            out.add(t.asString());
        }
        return out;
    }

    /** {@code {"labels": […], "scores": [[…], …]}}, doubles written exactly (shortest round-trip form). */
    static byte[] nativeAnswer(ScoreMatrix m) throws JsonProcessingException {
        ObjectNode root = MAPPER.createObjectNode();
        ArrayNode labels = root.putArray("labels");
        m.labels().forEach(labels::add);
        ArrayNode scores = root.putArray("scores");
        for (int i = 0; i < m.size(); i++) {
            ArrayNode row = scores.addArray();
            for (int j = 0; j < m.labels().size(); j++) {
                row.add(m.score(i, j));
            }
        }
        return MAPPER.writeValueAsBytes(root);
    }

    /** An OIP v2 inference response: one FP32 output tensor "scores" of shape [n, labels]. */
    static byte[] inferAnswer(ScoreMatrix m, String model, String requestId) throws JsonProcessingException {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("model_name", model);
        if (requestId != null) {
            root.put("id", requestId);
        }
        ObjectNode out = root.putArray("outputs").addObject();
        out.put("name", "scores");
        out.put("datatype", "FP32");
        out.putArray("shape").add(m.size()).add(m.labels().size());
        ArrayNode data = out.putArray("data");
        for (int i = 0; i < m.size(); i++) {
            for (int j = 0; j < m.labels().size(); j++) {
                data.add((float) m.score(i, j));
            }
        }
        return MAPPER.writeValueAsBytes(root);
    }

    /** The OIP v2 model metadata, with the label names under {@code parameters.labels}. */
    static byte[] metadata(String model, List<String> labels) throws JsonProcessingException {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("name", model);
        root.putArray("versions").add("1");
        root.put("platform", "telltale");
        ObjectNode in = root.putArray("inputs").addObject();
        in.put("name", "text");
        in.put("datatype", "BYTES");
        in.putArray("shape").add(-1);
        ObjectNode out = root.putArray("outputs").addObject();
        out.put("name", "scores");
        out.put("datatype", "FP32");
        out.putArray("shape").add(-1).add(labels.size());
        ArrayNode outLabels = out.putObject("parameters").putArray("labels");
        labels.forEach(outLabels::add);
        ArrayNode topLabels = root.putObject("parameters").putArray("labels");
        labels.forEach(topLabels::add);
        return MAPPER.writeValueAsBytes(root);
    }

    static byte[] error(String message) {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("error", message);
        try {
            return MAPPER.writeValueAsBytes(root);
        } catch (JsonProcessingException e) {
            return "{\"error\":\"internal error\"}".getBytes(java.nio.charset.StandardCharsets.UTF_8);
        }
    }
}
