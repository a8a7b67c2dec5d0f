package org.telltale.connect;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.net.URI;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

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
        JsonNode root = Json.parse(body);
        String snippet = Snippet.of(body);
        if (!root.isObject()) {
            throw new MalformedResponse("the response is not a JSON object; response: " + snippet);
        }
        JsonNode predictions = root.get("predictions");
        if (predictions == null || !predictions.isArray()) {
            if (root.has("error")) {
                throw new MalformedResponse("the model answered an error: " + Snippet.of(root.get("error").toString()));
            }
            throw new MalformedResponse("'predictions' is missing or not an array; response: " + snippet);
        }
        if (predictions.isEmpty()) {
            return new RawScores(fallbackLabels, new double[0][], snippet);
        }
        if (predictions.get(0).isObject()) {
            return objects(predictions, snippet);
        }
        double[][] rows = new double[predictions.size()][];
        for (int i = 0; i < rows.length; i++) {
            rows[i] = Json.numbers(predictions.get(i), "predictions", i, snippet);
        }
        List<String> labels = fallbackLabels.isEmpty() ? OpenInferenceCodec.numbered(rows[0].length) : fallbackLabels;
        return new RawScores(labels, rows, snippet);
    }

    private static RawScores objects(JsonNode predictions, String snippet) {
        List<String> labels = new ArrayList<>();
        predictions.get(0).fieldNames().forEachRemaining(labels::add);
        double[][] rows = new double[predictions.size()][];
        for (int i = 0; i < rows.length; i++) {
            JsonNode p = predictions.get(i);
            if (!p.isObject() || p.size() != labels.size()) {
                throw new MalformedResponse("prediction " + i + " does not have the labels " + labels
                        + " of prediction 0; response: " + snippet);
            }
            double[] row = new double[labels.size()];
            for (Iterator<Map.Entry<String, JsonNode>> it = p.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                int j = labels.indexOf(e.getKey());
                if (j < 0) {
                    throw new MalformedResponse("prediction " + i + " has label '" + Snippet.of(e.getKey())
                            + "' that prediction 0 lacks; response: " + snippet);
                }
                if (!e.getValue().isNumber()) {
                    throw new MalformedResponse("prediction " + i + " scores label '" + Snippet.of(e.getKey()) + "' with "
                            + Snippet.of(e.getValue().toString()) + ", not a number; response: " + snippet);
                }
                row[j] = e.getValue().doubleValue();
            }
            rows[i] = row;
        }
        return new RawScores(labels, rows, snippet);
    }
}
