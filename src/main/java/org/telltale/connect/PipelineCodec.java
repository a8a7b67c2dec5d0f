package org.telltale.connect;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.net.URI;
import java.util.ArrayList;
import java.util.List;

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
        JsonNode root = Json.parse(body);
        String snippet = Snippet.of(body);
        JsonNode perText = root;
        if (root.isObject()) {
            if (root.has("error") && !root.has("predictions")) {
                throw new MalformedResponse("the model answered an error: " + Snippet.of(root.get("error").toString()));
            }
            perText = root.get("predictions");
        }
        if (perText == null || !perText.isArray()) {
            throw new MalformedResponse("expected one list of {\"label\", \"score\"} per text (or them under 'predictions'); "
                    + "response: " + snippet);
        }
        if (perText.isEmpty()) {
            return new RawScores(List.of(), new double[0][], snippet);
        }
        List<String> labels = new ArrayList<>();
        for (JsonNode entry : list(perText.get(0), 0, snippet)) {
            String label = label(entry, 0, snippet);
            if (labels.contains(label)) {
                throw new MalformedResponse("text 0 scores label '" + Snippet.of(label) + "' twice; response: " + snippet);
            }
            labels.add(label);
        }
        double[][] rows = new double[perText.size()][];
        for (int i = 0; i < rows.length; i++) {
            JsonNode entries = list(perText.get(i), i, snippet);
            if (entries.size() != labels.size()) {
                throw new MalformedResponse("text " + i + " has " + entries.size() + " labels, text 0 has " + labels.size()
                        + " " + labels + "; response: " + snippet);
            }
            double[] row = new double[labels.size()];
            boolean[] seen = new boolean[labels.size()];
            for (JsonNode entry : entries) {
                String label = label(entry, i, snippet);
                int j = labels.indexOf(label);
                if (j < 0 || seen[j]) {
                    throw new MalformedResponse("text " + i + " scores label '" + Snippet.of(label) + "' "
                            + (j < 0 ? "that text 0 lacks " + labels : "twice") + "; response: " + snippet);
                }
                JsonNode score = entry.get("score");
                if (score == null || !score.isNumber()) {
                    throw new MalformedResponse("text " + i + " scores label '" + Snippet.of(label) + "' with "
                            + (score == null ? "no 'score'" : Snippet.of(score.toString()) + ", not a number") + "; response: " + snippet);
                }
                seen[j] = true;
                row[j] = score.doubleValue();
            }
            rows[i] = row;
        }
        return new RawScores(labels, rows, snippet);
    }

    private static JsonNode list(JsonNode entries, int text, String snippet) {
        if (entries == null || !entries.isArray() || entries.isEmpty()) {
            throw new MalformedResponse("the answer for text " + text + " is not a non-empty list of {\"label\", \"score\"}; "
                    + "response: " + snippet);
        }
        return entries;
    }

    private static String label(JsonNode entry, int text, String snippet) {
        JsonNode label = entry.isObject() ? entry.get("label") : null;
        if (label == null || !label.isTextual()) {
            throw new MalformedResponse("text " + text + ": expected {\"label\": NAME, \"score\": NUMBER}, found "
                    + Snippet.of(entry.toString()) + "; response: " + snippet);
        }
        return label.textValue();
    }
}
