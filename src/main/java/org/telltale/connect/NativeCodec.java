package org.telltale.connect;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;

/**
 * Telltale's scoring protocol, spoken over HTTP and by subprocesses: request
 * {@code {"texts": ["…", …]}}, answer {@code {"labels": ["a", …], "scores": [[…], …]}} with one row
 * per text in order. An answer {@code {"error": "…"}} is the model reporting a failure.
 */
final class NativeCodec {
    private NativeCodec() {
    }

    static byte[] request(List<String> texts) {
        ObjectNode root = Json.MAPPER.createObjectNode();
        root.set("texts", Json.textArray(texts));
        return Json.write(root);
    }

    static RawScores parse(byte[] body) {
        JsonNode root = Json.parse(body);
        String snippet = Snippet.of(body);
        if (!root.isObject()) {
            throw new MalformedResponse("the response is not a JSON object; response: " + snippet);
        }
        JsonNode error = root.get("error");
        if (error != null && !root.has("scores")) {
            throw new MalformedResponse("the model answered an error: " + Snippet.of(error.isTextual() ? error.textValue() : error.toString()));
        }
        List<String> labels = Json.strings(root.get("labels"), "labels", snippet);
        JsonNode scores = root.get("scores");
        if (scores == null || !scores.isArray()) {
            throw new MalformedResponse("'scores' is missing or not an array; response: " + snippet);
        }
        double[][] rows = new double[scores.size()][];
        for (int i = 0; i < rows.length; i++) {
            rows[i] = Json.numbers(scores.get(i), "scores", i, snippet);
        }
        return new RawScores(labels, rows, snippet);
    }
}
