package org.telltale.connect;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.net.URI;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.telltale.json.JsonValue;

/**
 * The common {@code {"instances": ["…", …]}} → {@code {"predictions": […]}} shape. Each prediction
 * is either a row of numbers ({@code [0.1, 0.9]}, labels from {@code --labels} or {@code 0, 1, …})
 * or an object label → score ({@code {"spam": 0.9, "ham": 0.1}}), in which case the first
 * prediction's keys name the labels and every other prediction must have the same keys.
 */
final class InstancesCodec implements HttpScorer.WireFormat {
    private final URI url;
    private final List<String> fallbackLabels;

    InstancesCodec(URI url, List<String> fallbackLabels) {
        this.url = url;
        this.fallbackLabels = fallbackLabels;
    }

    @Override
    public URI target(HttpTransport transport) {
        return url;
    }

    @Override
    public byte[] request(List<String> texts) {
        ObjectNode root = Json.MAPPER.createObjectNode();
        root.set("instances", Json.textArray(texts));
        return Json.write(root);
    }

    @Override
    public RawScores parse(byte[] body, int texts) {
        return parse(body, fallbackLabels);
    }

    static RawScores parse(byte[] body, List<String> fallbackLabels) {
        JsonValue root = Json.parse(body);
        String snippet = Snippet.of(body);
        return Json.read(() -> {
            root.requireObject();
            if (!root.has("predictions") && root.has("error")) {
                throw new MalformedResponse("the model answered an error: " + Json.error(root.get("error")));
            }
            List<JsonValue> predictions = root.array("predictions");
            if (predictions.isEmpty()) {
                return new RawScores(fallbackLabels, new double[0][], snippet);
            }
            if (predictions.get(0).node().isObject()) {
                return objects(predictions, snippet);
            }
            double[][] rows = new double[predictions.size()][];
            for (int i = 0; i < rows.length; i++) {
                rows[i] = Json.numbers(predictions.get(i));
            }
            List<String> labels = fallbackLabels.isEmpty() ? OpenInferenceCodec.numbered(rows[0].length) : fallbackLabels;
            return new RawScores(labels, rows, snippet);
        }, snippet);
    }

    private static RawScores objects(List<JsonValue> predictions, String snippet) {
        List<String> labels = new ArrayList<>(predictions.get(0).fields().keySet());
        double[][] rows = new double[predictions.size()][];
        for (int i = 0; i < rows.length; i++) {
            JsonValue p = predictions.get(i);
            if (!p.node().isObject() || p.node().size() != labels.size()) {
                throw new MalformedResponse("prediction " + i + " does not have the labels " + labels
                        + " of prediction 0; response: " + snippet);
            }
            double[] row = new double[labels.size()];
            for (Map.Entry<String, JsonValue> e : p.fields().entrySet()) {
                int j = labels.indexOf(e.getKey());
                if (j < 0) {
                    throw new MalformedResponse("prediction " + i + " has label '" + Snippet.of(e.getKey())
                            + "' that prediction 0 lacks; response: " + snippet);
                }
                row[j] = e.getValue().asNumber();
            }
            rows[i] = row;
        }
        return new RawScores(labels, rows, snippet);
    }
}
