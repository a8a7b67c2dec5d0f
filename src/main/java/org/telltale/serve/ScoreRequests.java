package org.telltale.serve;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
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

    static JsonNode parse(byte[] body) {
        try {
            JsonNode n = MAPPER.readTree(body);
            if (n == null || n.isMissingNode()) {
                throw new HttpError(400, "the request body is empty");
            }
            return n;
        } catch (JsonProcessingException e) {
            throw new HttpError(400, "the request body is not valid JSON: " + e.getOriginalMessage());
        } catch (IOException e) {
            throw new HttpError(400, "the request body cannot be read");
        }
    }

    /** {@code {"texts": ["…", …]}} → the texts. */
    static List<String> nativeTexts(byte[] body, int maxBatch) {
        JsonNode root = parse(body);
        if (!root.isObject()) {
            throw new HttpError(400, "expected a JSON object {\"texts\": [...]}");
        }
        JsonNode texts = root.get("texts");
        if (texts == null || !texts.isArray()) {
            throw new HttpError(400, "expected a field \"texts\" holding an array of strings");
        }
        return strings(texts, "texts", maxBatch);
    }

    /** The texts of an OIP v2 inference request, and its "id" (null when absent). */
    record InferRequest(List<String> texts, String id) {
    }

    /** An OIP v2 inference request → the texts of its one input, a BYTES tensor of shape [n] or [n, 1]. */
    static InferRequest inferTexts(byte[] body, int maxBatch) {
        JsonNode root = parse(body);
        if (!root.isObject()) {
            throw new HttpError(400, "expected an inference request object with \"inputs\"");
        }
        JsonNode inputs = root.get("inputs");
        if (inputs == null || !inputs.isArray() || inputs.size() != 1) {
            throw new HttpError(400, "expected \"inputs\" holding exactly one tensor (the texts)");
        }
        JsonNode input = inputs.get(0);
        if (!"BYTES".equals(input.path("datatype").asText())) {
            throw new HttpError(400, "the input tensor must have datatype BYTES");
        }
        JsonNode shape = input.get("shape");
        JsonNode data = input.get("data");
        if (data == null || !data.isArray()) {
            throw new HttpError(400, "the input tensor has no \"data\" array");
        }
        ArrayNode flat = MAPPER.createArrayNode();
        for (JsonNode d : data) {
            if (d.isArray()) {
                d.forEach(flat::add);
            } else {
                flat.add(d);
            }
        }
        List<String> texts = strings(flat, "data", maxBatch);
        if (shape == null || !shape.isArray() || shape.isEmpty() || shape.size() > 2
                || shape.get(0).asLong(-1) != texts.size() || (shape.size() == 2 && shape.get(1).asLong(-1) != 1)) {
            throw new HttpError(400, "the input tensor's shape must be [" + texts.size() + "] for " + texts.size() + " texts");
        }
        JsonNode id = root.get("id");
        return new InferRequest(texts, id != null && id.isTextual() ? id.textValue() : null);
    }

    private static List<String> strings(JsonNode array, String field, int maxBatch) {
        if (array.size() > maxBatch) {
            throw new HttpError(400, "the request holds " + array.size() + " texts; this server takes at most " + maxBatch
                    + " per request");
        }
        List<String> out = new ArrayList<>(array.size());
        for (int i = 0; i < array.size(); i++) {
            JsonNode t = array.get(i);
            if (!t.isTextual()) {
                throw new HttpError(400, "\"" + field + "\"[" + i + "] is not a string");
            }
            out.add(t.textValue());
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
