package org.telltale.report.json;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.BufferedReader;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.telltale.TelltaleException;
import org.telltale.explain.Explanation;
import org.telltale.text.Span;

/**
 * Writes the {@code telltale.explanations} version 2 format, and reads versions 1 and 2:
 * <pre>{"format":"telltale.explanations","version":1,"explanations":[{"id","label","score","probes",
 *   "fit":{"intercept","r2","prediction"},"terms":[{"term","weight","low","high","spans":[[s,e],…]}],
 *   "timing":{"model_ms","total_ms"}, …}]}</pre>
 * Each explanation also carries {@code predicted}, {@code scores}, {@code gold}, {@code text},
 * {@code units}, {@code calls}, {@code exact}, {@code stability}, {@code interval}, {@code target}
 * ({@code kind}, {@code source}, {@code value}, {@code saturated}), {@code probes_to_go}, {@code notes}
 * and {@code settings}, so that a report can be rendered from the file alone. Version 2 added
 * {@code interval}, {@code target}, {@code probes_to_go} and {@code settings.sampling}, and dropped
 * {@code resamples}; a version 1 file reads as a probability explanation with bootstrap intervals. Fields are always
 * written in the same order and numbers in Java's shortest round-trip form, so equal explanations
 * give byte-identical files; a number that is not finite is written as {@code null}.
 *
 * <p>One explanation per line ({@link #toLine}, {@link #fromLine}) is the streaming form.
 */
public final class ExplanationsJson {
    public static final String FORMAT = "telltale.explanations";
    public static final int VERSION = 2;
    /** The oldest version this reader still accepts (version 1: probability only, bootstrap intervals). */
    public static final int OLDEST = 1;

    private static final JsonFactory FACTORY = new JsonFactory();
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private ExplanationsJson() {
    }

    /** Writes the whole document, UTF-8, pretty-printed with two-space indents. */
    public static void write(OutputStream out, List<Explanation> explanations) throws IOException {
        try (JsonGenerator g = FACTORY.createGenerator(out, JsonEncoding.UTF8)) {
            g.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            g.useDefaultPrettyPrinter();
            g.writeStartObject();
            g.writeStringField("format", FORMAT);
            g.writeNumberField("version", VERSION);
            g.writeArrayFieldStart("explanations");
            for (Explanation e : explanations) {
                writeExplanation(g, e);
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        out.write('\n');
        out.flush();
    }

    public static void write(Path file, List<Explanation> explanations) throws IOException {
        try (OutputStream out = Files.newOutputStream(file)) {
            write(out, explanations);
        }
    }

    /** The whole document as a string. */
    public static String toJson(List<Explanation> explanations) {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream();
        try {
            write(buffer, explanations);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return buffer.toString(StandardCharsets.UTF_8);
    }

    /** One explanation as a single line of JSON, without the line end. */
    public static String toLine(Explanation explanation) {
        ByteArrayOutputStream buffer = new ByteArrayOutputStream();
        try (JsonGenerator g = FACTORY.createGenerator(buffer, JsonEncoding.UTF8)) {
            writeExplanation(g, explanation);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return buffer.toString(StandardCharsets.UTF_8);
    }

    private static void writeExplanation(JsonGenerator g, Explanation e) throws IOException {
        g.writeStartObject();
        g.writeStringField("id", e.id());
        g.writeStringField("label", e.label());
        number(g, "score", e.score());
        g.writeNumberField("probes", e.probes());
        g.writeObjectFieldStart("fit");
        number(g, "intercept", e.fit().intercept());
        number(g, "r2", e.fit().r2());
        number(g, "prediction", e.fit().prediction());
        g.writeEndObject();
        g.writeArrayFieldStart("terms");
        for (Explanation.TermWeight t : e.terms()) {
            g.writeStartObject();
            g.writeStringField("term", t.term());
            number(g, "weight", t.weight());
            number(g, "low", t.low());
            number(g, "high", t.high());
            g.writeArrayFieldStart("spans");
            for (Span s : t.spans()) {
                g.writeStartArray();
                g.writeNumber(s.start());
                g.writeNumber(s.end());
                g.writeEndArray();
            }
            g.writeEndArray();
            g.writeEndObject();
        }
        g.writeEndArray();
        g.writeObjectFieldStart("timing");
        g.writeNumberField("model_ms", e.timing().modelMs());
        g.writeNumberField("total_ms", e.timing().totalMs());
        g.writeEndObject();
        g.writeStringField("predicted", e.predicted());
        g.writeObjectFieldStart("scores");
        for (Map.Entry<String, Double> s : e.scores().entrySet()) {
            number(g, s.getKey(), s.getValue());
        }
        g.writeEndObject();
        if (e.gold() == null) {
            g.writeNullField("gold");
        } else {
            g.writeStringField("gold", e.gold());
        }
        g.writeStringField("text", e.text());
        Explanation.Method m = e.method();
        if (m != null) {
            g.writeNumberField("units", m.units());
            g.writeNumberField("calls", m.calls());
            g.writeBooleanField("exact", m.exact());
            number(g, "stability", m.stability());
            g.writeStringField("interval", m.interval());
            g.writeObjectFieldStart("target");
            g.writeStringField("kind", m.target());
            g.writeStringField("source", m.source());
            number(g, "value", m.targetValue());
            number(g, "saturated", m.saturated());
            g.writeEndObject();
            g.writeNumberField("probes_to_go", m.probesToGo());
            g.writeArrayFieldStart("notes");
            for (String note : m.notes()) {
                g.writeString(note);
            }
            g.writeEndArray();
            g.writeObjectFieldStart("settings");
            g.writeStringField("unit", m.unit());
            g.writeStringField("weighting", m.weighting());
            g.writeStringField("select", m.selection());
            g.writeStringField("sampling", m.sampling());
            g.writeNumberField("words", m.words());
            number(g, "bandwidth", m.bandwidth());
            number(g, "ridge", m.ridge());
            number(g, "level", m.level());
            g.writeNumberField("seed", m.seed());
            g.writeStringField("analyzer", m.analyzer());
            g.writeStringField("filler", m.filler());
            g.writeEndObject();
        }
        g.writeEndObject();
    }

    private static void number(JsonGenerator g, String name, double value) throws IOException {
        if (Double.isFinite(value)) {
            g.writeNumberField(name, value);
        } else {
            g.writeNullField(name);
        }
    }

    /**
     * Reads a {@code telltale.explanations} document, or a file of one explanation per line.
     *
     * @throws TelltaleException naming the file (and line) when the content is not valid
     */
    public static List<Explanation> read(Path file) {
        try (InputStream in = Files.newInputStream(file)) {
            return read(in, file.toString());
        } catch (IOException e) {
            throw new TelltaleException(file + ": cannot read: " + e.getMessage(), e);
        }
    }

    /** As {@link #read(Path)}; {@code source} names the input in error messages. */
    public static List<Explanation> read(InputStream in, String source) throws IOException {
        String content = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        String trimmed = content.strip();
        if (trimmed.isEmpty()) {
            throw new TelltaleException(source + ": empty file, expected " + FORMAT + " JSON");
        }
        JsonNode whole = null;
        try {
            whole = MAPPER.readTree(trimmed);
        } catch (JsonProcessingException notOneDocument) {
            // several lines, each an explanation: handled below
        }
        if (whole != null && whole.has("format")) {
            String format = whole.path("format").asText();
            if (!FORMAT.equals(format)) {
                throw new TelltaleException(source + ": format is '" + format + "', expected '" + FORMAT + "'");
            }
            int version = whole.path("version").asInt(-1);
            if (version < OLDEST || version > VERSION) {
                throw new TelltaleException(source + ": version " + whole.path("version") + " of " + FORMAT
                        + " is not supported (this Telltale reads versions " + OLDEST + " to " + VERSION + ")");
            }
            JsonNode list = whole.path("explanations");
            if (!list.isArray()) {
                throw new TelltaleException(source + ": 'explanations' must be an array");
            }
            List<Explanation> out = new ArrayList<>();
            for (int i = 0; i < list.size(); i++) {
                out.add(explanation(list.get(i), source + ": explanations[" + i + "]"));
            }
            return out;
        }
        List<Explanation> out = new ArrayList<>();
        try (BufferedReader lines = new BufferedReader(new InputStreamReader(
                new java.io.ByteArrayInputStream(content.getBytes(StandardCharsets.UTF_8)), StandardCharsets.UTF_8))) {
            String line;
            int number = 0;
            while ((line = lines.readLine()) != null) {
                number++;
                if (!line.isBlank()) {
                    out.add(fromLine(line, source + ":" + number));
                }
            }
        }
        return out;
    }

    /** One explanation from one line of JSON; {@code place} names it in error messages. */
    public static Explanation fromLine(String line, String place) {
        JsonNode node;
        try {
            node = MAPPER.readTree(line);
        } catch (JsonProcessingException e) {
            throw new TelltaleException(place + ": not valid JSON: " + e.getOriginalMessage());
        }
        return explanation(node, place);
    }

    private static Explanation explanation(JsonNode n, String place) {
        if (n == null || !n.isObject()) {
            throw new TelltaleException(place + ": expected an explanation object");
        }
        String id = text(n, "id", place, true);
        JsonNode fit = required(n, "fit", place);
        List<Explanation.TermWeight> terms = new ArrayList<>();
        JsonNode termList = required(n, "terms", place);
        for (int i = 0; i < termList.size(); i++) {
            JsonNode t = termList.get(i);
            String at = place + " (id " + id + "): terms[" + i + "]";
            List<Span> spans = new ArrayList<>();
            for (JsonNode s : required(t, "spans", at)) {
                if (!s.isArray() || s.size() != 2 || !s.get(0).canConvertToInt() || !s.get(1).canConvertToInt()) {
                    throw new TelltaleException(at + ": a span must be [start, end], got " + s);
                }
                try {
                    spans.add(new Span(s.get(0).asInt(), s.get(1).asInt()));
                } catch (IllegalArgumentException bad) {
                    throw new TelltaleException(at + ": " + bad.getMessage());
                }
            }
            terms.add(new Explanation.TermWeight(text(t, "term", at, true), num(t, "weight", at), num(t, "low", at),
                    num(t, "high", at), spans));
        }
        JsonNode timing = n.path("timing");
        Map<String, Double> scores = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = n.path("scores").fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> s = it.next();
            scores.put(s.getKey(), s.getValue().isNumber() ? s.getValue().asDouble() : Double.NaN);
        }
        String at = place + " (id " + id + ")";
        Explanation.Method method = null;
        JsonNode settings = n.get("settings");
        if (settings != null && settings.isObject()) {
            List<String> notes = new ArrayList<>();
            n.path("notes").forEach(x -> notes.add(x.asText()));
            JsonNode target = n.path("target");
            // Version 1 files have no target (they explained the probability) and bootstrap resamples.
            String interval = n.has("interval") ? n.path("interval").asText()
                    : n.path("exact").asBoolean() ? "exact" : "bootstrap";
            method = new Explanation.Method(settings.path("unit").asText(), settings.path("weighting").asText(),
                    settings.path("select").asText(), optNum(settings, "bandwidth"), optNum(settings, "ridge"),
                    settings.path("words").asInt(), settings.path("seed").asLong(), settings.path("analyzer").asText(),
                    settings.path("filler").asText(""), optNum(settings, "level"), n.path("units").asInt(),
                    n.path("calls").asInt(), n.path("exact").asBoolean(), optNum(n, "stability"), interval,
                    target.path("kind").asText("probability"), target.path("source").asText("probabilities"),
                    target.has("value") ? optNum(target, "value") : num(n, "score", at),
                    target.has("saturated") ? optNum(target, "saturated") : Double.NaN,
                    n.path("probes_to_go").asInt(-1), settings.path("sampling").asText("uniform"), notes);
        }
        return new Explanation(id, text(n, "label", at, true), num(n, "score", at), text(n, "predicted", at, false),
                scores, required(n, "probes", at).asInt(),
                new Explanation.Fit(num(fit, "intercept", at), num(fit, "r2", at), num(fit, "prediction", at)),
                terms, new Explanation.Timing(timing.path("model_ms").asLong(), timing.path("total_ms").asLong()),
                text(n, "text", at, false), text(n, "gold", at, false), method);
    }

    private static JsonNode required(JsonNode n, String field, String place) {
        JsonNode v = n.get(field);
        if (v == null || v.isMissingNode()) {
            throw new TelltaleException(place + ": missing field '" + field + "'");
        }
        return v;
    }

    private static String text(JsonNode n, String field, String place, boolean needed) {
        JsonNode v = n.get(field);
        if (v == null || v.isNull()) {
            if (needed) {
                throw new TelltaleException(place + ": missing field '" + field + "'");
            }
            return null;
        }
        return v.asText();
    }

    private static double num(JsonNode n, String field, String place) {
        JsonNode v = required(n, field, place);
        if (v.isNull()) {
            return Double.NaN;
        }
        if (!v.isNumber()) {
            throw new TelltaleException(place + ": field '" + field + "' must be a number, got " + v);
        }
        return v.asDouble();
    }

    private static double optNum(JsonNode n, String field) {
        JsonNode v = n.get(field);
        return v != null && v.isNumber() ? v.asDouble() : Double.NaN;
    }
}
