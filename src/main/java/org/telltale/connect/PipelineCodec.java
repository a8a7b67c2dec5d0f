package org.telltale.connect;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.net.URI;
import java.util.ArrayList;
import java.util.List;
import org.telltale.json.JsonValue;

/**
 * The text-classification pipeline shape: {@code {"inputs": ["…", …]}} → one list per text of
 * {@code {"label": …, "score": …}} objects, one object per label, usually sorted by score. The
 * answer is either that array itself or an object holding it under {@code "predictions"} (some
 * servers wrap it). The first text's list fixes the label order of the answer; every other text
 * must score exactly the same labels, in any order, and is reordered to it. Across answers,
 * {@link ResponseValidator} holds the labels to the first answer's, as for every protocol.
 */
final class PipelineCodec implements HttpScorer.WireFormat {
    private final URI url;

    PipelineCodec(URI url) {
        this.url = url;
    }

    @Override
    public URI target(HttpTransport transport) {
        return url;
    }

    @Override
    public byte[] request(List<String> texts) {
        ObjectNode root = Json.MAPPER.createObjectNode();
        root.set("inputs", Json.textArray(texts));
        return Json.write(root);
    }

    @Override
    public RawScores parse(byte[] body, int texts) {
        return parse(body);
    }

    static RawScores parse(byte[] body) {
        JsonValue root = Json.parse(body);
        String snippet = Snippet.of(body);
        return Json.read(() -> {
            JsonValue perText = root;
            if (root.node().isObject()) {
                if (root.has("error") && !root.has("predictions")) {
                    throw new MalformedResponse("the model answered an error: " + Json.error(root.get("error")));
                }
                if (!root.has("predictions")) {
                    throw new MalformedResponse("expected one list of {\"label\", \"score\"} per text (or them under "
                            + "'predictions'); response: " + snippet);
                }
                perText = root.get("predictions");
            }
            List<JsonValue> texts = perText.elements();
            if (texts.isEmpty()) {
                return new RawScores(List.of(), new double[0][], snippet);
            }
            List<String> labels = new ArrayList<>();
            for (JsonValue entry : list(texts.get(0), 0, snippet)) {
                String label = label(entry, 0, snippet);
                if (labels.contains(label)) {
                    throw new MalformedResponse("text 0 scores label '" + Snippet.of(label) + "' twice; response: " + snippet);
                }
                labels.add(label);
            }
            double[][] rows = new double[texts.size()][];
            for (int i = 0; i < rows.length; i++) {
                List<JsonValue> entries = list(texts.get(i), i, snippet);
                if (entries.size() != labels.size()) {
                    throw new MalformedResponse("text " + i + " has " + entries.size() + " labels, text 0 has " + labels.size()
                            + " " + labels + "; response: " + snippet);
                }
                double[] row = new double[labels.size()];
                boolean[] seen = new boolean[labels.size()];
                for (JsonValue entry : entries) {
                    String label = label(entry, i, snippet);
                    int j = labels.indexOf(label);
                    if (j < 0 || seen[j]) {
                        throw new MalformedResponse("text " + i + " scores label '" + Snippet.of(label) + "' "
                                + (j < 0 ? "that text 0 lacks " + labels : "twice") + "; response: " + snippet);
                    }
                    seen[j] = true;
                    row[j] = entry.number("score");
                }
                rows[i] = row;
            }
            return new RawScores(labels, rows, snippet);
        }, snippet);
    }

    private static List<JsonValue> list(JsonValue entries, int text, String snippet) {
        if (!entries.node().isArray() || entries.node().isEmpty()) {
            throw new MalformedResponse("the answer for text " + text + " is not a non-empty list of {\"label\", \"score\"}; "
                    + "response: " + snippet);
        }
        return entries.elements();
    }

    private static String label(JsonValue entry, int text, String snippet) {
        if (!entry.node().isObject() || !entry.node().path("label").isTextual()) {
            throw new MalformedResponse("text " + text + ": expected {\"label\": NAME, \"score\": NUMBER}, found "
                    + Snippet.of(entry.node().toString()) + "; response: " + snippet);
        }
        return entry.string("label");
    }
}
