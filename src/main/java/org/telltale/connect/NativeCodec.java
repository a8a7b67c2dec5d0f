package org.telltale.connect;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Optional;
import org.telltale.json.JsonValue;

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
        JsonValue root = Json.parse(body);
        String snippet = Snippet.of(body);
        return Json.read(() -> {
            root.requireObject();
            Optional<JsonValue> error = root.find("error");
            if (error.isPresent() && !root.has("scores")) {
                throw new MalformedResponse("the model answered an error: " + Json.error(error.get()));
            }
            List<String> labels = root.strings("labels");
            List<JsonValue> scores = root.array("scores");
            double[][] rows = new double[scores.size()][];
            for (int i = 0; i < rows.length; i++) {
                rows[i] = Json.numbers(scores.get(i));
            }
            return new RawScores(labels, rows, snippet);
        }, snippet);
    }
}
