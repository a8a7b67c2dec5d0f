package org.telltale.connect;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.net.URI;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.telltale.json.JsonValue;

/**
 * The Open Inference Protocol v2 (the KServe/Triton "predict protocol v2", REST binding) for text
 * classifiers. The spec URL is the model's {@code …/v2/models/NAME}; its metadata is fetched once
 * for the input tensor name and the label names; a request sends the texts as a BYTES tensor of
 * shape [n]; the answer's first FP32/FP64 output is read as [n, labels], flat or nested.
 *
 * <p>The protocol has no field for label names; Telltale reads them from {@code parameters.labels}
 * of the model metadata or of its first output, and otherwise from {@code --labels}, or names the
 * columns {@code 0, 1, …}.
 */
final class OpenInferenceCodec implements HttpScorer.WireFormat {
    private final URI model;
    private final List<String> fallbackLabels;
    private volatile Metadata metadata;

    OpenInferenceCodec(URI model, List<String> fallbackLabels) {
        this.model = model;
        this.fallbackLabels = fallbackLabels;
    }

    record Metadata(String input, List<String> labels) {
    }

    @Override
    public URI target(HttpTransport transport) {
        if (metadata == null) {
            synchronized (this) {
                if (metadata == null) {
                    metadata = parseMetadata(transport.get(model), fallbackLabels);
                }
            }
        }
        return Endpoints.resolveChild(model, "infer");
    }

    static Metadata parseMetadata(byte[] body, List<String> fallbackLabels) {
        JsonValue root = Json.parse(body);
        String snippet = Snippet.of(body);
        return Json.read(() -> {
            root.requireObject();
            // The input's name and the labels are optional in the metadata: defaults stand in for them.
            String input = "text";
            JsonNode inputs = root.node().get("inputs");
            if (inputs != null && inputs.isArray() && inputs.size() > 0 && inputs.get(0).path("name").isTextual()) {
                input = inputs.get(0).get("name").textValue();
            }
            List<String> labels = labelsOf(root);
            List<JsonValue> outputs = root.node().path("outputs").isArray() ? root.array("outputs") : List.of();
            if (labels == null && !outputs.isEmpty() && outputs.get(0).node().isObject()) {
                labels = labelsOf(outputs.get(0));
            }
            return new Metadata(input, labels != null ? labels : fallbackLabels);
        }, snippet);
    }

    /** {@code parameters.labels} of a metadata object, or null where it is absent. */
    private static List<String> labelsOf(JsonValue owner) {
        Optional<JsonValue> parameters = owner.find("parameters");
        if (parameters.isEmpty() || !parameters.get().node().isObject()) {
            return null;
        }
        return parameters.get().has("labels") ? parameters.get().strings("labels") : null;
    }

    @Override
    public boolean ready() {
        return metadata != null;
    }

    @Override
    public byte[] request(List<String> texts) {
        ObjectNode root = Json.MAPPER.createObjectNode();
        ObjectNode tensor = root.putArray("inputs").addObject();
        tensor.put("name", metadata == null ? "text" : metadata.input());
        tensor.putArray("shape").add(texts.size());
        tensor.put("datatype", "BYTES");
        tensor.set("data", Json.textArray(texts));
        return Json.write(root);
    }

    @Override
    public RawScores parse(byte[] body, int texts) {
        return parseInfer(body, texts, metadata == null ? fallbackLabels : metadata.labels());
    }

    static RawScores parseInfer(byte[] body, int texts, List<String> knownLabels) {
        JsonValue root = Json.parse(body);
        String snippet = Snippet.of(body);
        return Json.read(() -> infer(root, knownLabels, snippet), snippet);
    }

    private static RawScores infer(JsonValue root, List<String> knownLabels, String snippet) {
        root.requireObject();
        if (root.has("error") && !root.has("outputs")) {
            throw new MalformedResponse("the model answered an error: " + Json.error(root.get("error")));
        }
        if (!root.node().path("outputs").isArray() || root.node().path("outputs").isEmpty()) {
            throw new MalformedResponse("the inference response has no 'outputs'; response: " + snippet);
        }
        JsonValue tensor = null;
        for (JsonValue o : root.array("outputs")) {
            String type = o.node().path("datatype").asText("");
            if (type.equals("FP32") || type.equals("FP64") || type.equals("FP16")) {
                tensor = o;
                break;
            }
        }
        if (tensor == null) {
            throw new MalformedResponse("the inference response has no FP32 or FP64 output; response: " + snippet);
        }
        JsonNode shape = tensor.node().get("shape");
        if (shape == null || !shape.isArray() || shape.size() != 2 || !shape.get(0).canConvertToInt() || !shape.get(1).canConvertToInt()) {
            throw new MalformedResponse("the output tensor's shape is not [n, labels]: " + Snippet.of(String.valueOf(shape))
                    + "; response: " + snippet);
        }
        int n = shape.get(0).intValue();
        int k = shape.get(1).intValue();
        if (n < 0 || k < 0) {
            throw new MalformedResponse("the output tensor's shape " + shape + " is negative; response: " + snippet);
        }
        List<Double> flat = new ArrayList<>();
        flatten(tensor.get("data"), flat, 0);
        if ((long) n * k != flat.size()) {
            throw new MalformedResponse("the output tensor has shape " + shape + " but " + flat.size() + " values; response: " + snippet);
        }
        double[][] rows = new double[n][k];
        for (int i = 0; i < n; i++) {
            for (int j = 0; j < k; j++) {
                rows[i][j] = flat.get(i * k + j);
            }
        }
        List<String> labels = knownLabels.isEmpty() ? numbered(k) : knownLabels;
        if (labels.size() != k) {
            throw new MalformedResponse("the output tensor has " + k + " columns but the model names " + labels.size()
                    + " labels " + labels + "; response: " + snippet);
        }
        return new RawScores(labels, rows, snippet);
    }

    /** The tensor's data, flat or nested one level ([n, k] row-major either way). */
    private static void flatten(JsonValue data, List<Double> out, int depth) {
        for (JsonValue v : data.elements()) {
            if (v.node().isArray() && depth < 1) {
                flatten(v, out, depth + 1);
            } else {
                out.add(v.asNumber());
            }
        }
    }

    static List<String> numbered(int k) {
        List<String> l = new ArrayList<>(k);
        for (int i = 0; i < k; i++) {
            l.add(Integer.toString(i));
        }
        return l;
    }
}
