package org.telltale.connect;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.net.URI;
import java.util.ArrayList;
import java.util.List;

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
        JsonNode root = Json.parse(body);
        String snippet = Snippet.of(body);
        if (!root.isObject()) {
            throw new MalformedResponse("the model metadata is not a JSON object; response: " + snippet);
        }
        String input = "text";
        JsonNode inputs = root.get("inputs");
        if (inputs != null && inputs.isArray() && inputs.size() > 0 && inputs.get(0).path("name").isTextual()) {
            input = inputs.get(0).get("name").textValue();
        }
        List<String> labels = labelsAt(root.path("parameters").get("labels"), snippet);
        JsonNode outputs = root.get("outputs");
        if (labels == null && outputs != null && outputs.isArray() && outputs.size() > 0) {
            labels = labelsAt(outputs.get(0).path("parameters").get("labels"), snippet);
        }
        return new Metadata(input, labels != null ? labels : fallbackLabels);
    }

    private static List<String> labelsAt(JsonNode node, String snippet) {
        return node == null || node.isNull() ? null : Json.strings(node, "parameters.labels", snippet);
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
        JsonNode root = Json.parse(body);
        String snippet = Snippet.of(body);
        if (!root.isObject()) {
            throw new MalformedResponse("the inference response is not a JSON object; response: " + snippet);
        }
        if (root.has("error") && !root.has("outputs")) {
            throw new MalformedResponse("the model answered an error: " + Snippet.of(root.get("error").toString()));
        }
        JsonNode outputs = root.get("outputs");
        if (outputs == null || !outputs.isArray() || outputs.isEmpty()) {
            throw new MalformedResponse("the inference response has no 'outputs'; response: " + snippet);
        }
        JsonNode tensor = null;
        for (JsonNode o : outputs) {
            String type = o.path("datatype").asText("");
            if (type.equals("FP32") || type.equals("FP64") || type.equals("FP16")) {
                tensor = o;
                break;
            }
        }
        if (tensor == null) {
            throw new MalformedResponse("the inference response has no FP32 or FP64 output; response: " + snippet);
        }
        JsonNode shape = tensor.get("shape");
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
        flatten(tensor.get("data"), flat, snippet, 0);
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

    private static void flatten(JsonNode data, List<Double> out, String snippet, int depth) {
        if (data == null || !data.isArray()) {
            throw new MalformedResponse("the output tensor's 'data' is not an array; response: " + snippet);
        }
        for (JsonNode v : data) {
            if (v.isArray() && depth < 1) {
                flatten(v, out, snippet, depth + 1);
            } else if (v.isNumber()) {
                out.add(v.doubleValue());
            } else {
                throw new MalformedResponse("the output tensor holds " + Snippet.of(v.toString()) + ", not a number; response: " + snippet);
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
