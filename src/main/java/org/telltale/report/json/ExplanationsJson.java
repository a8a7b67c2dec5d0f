package org.telltale.report.json;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.BufferedReader;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.io.StringReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.telltale.TelltaleException;
import org.telltale.explain.Explanation;
import org.telltale.json.ContractException;
import org.telltale.json.JsonValue;
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
     * @throws TelltaleException naming the file (and line), the path and what was found when the
     *         content breaks the contract
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
        if (content.isBlank()) {
            throw new TelltaleException(source + ": empty file, expected " + FORMAT + " JSON");
        }
        JsonValue whole = wholeDocument(content, source);
        if (whole != null) {
            int version = whole.version(FORMAT, OLDEST, VERSION);
            List<Explanation> out = new ArrayList<>();
            for (JsonValue e : whole.array("explanations")) {
                out.add(explanation(e, version));
            }
            return out;
        }
        List<Explanation> out = new ArrayList<>();
        try (BufferedReader lines = new BufferedReader(new StringReader(content))) {
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

    /** The content as one document when it is one JSON object with a {@code format}; else null (lines). */
    private static JsonValue wholeDocument(String content, String source) {
        JsonValue whole;
        try {
            whole = JsonValue.parse(content, source);
        } catch (ContractException notOneDocument) {
            return null; // several lines, each an explanation
        }
        return whole.node().isObject() && whole.node().has("format") ? whole : null;
    }

    /**
     * One explanation from one line of JSON; {@code place} names it in error messages. A line
     * carries no version: one with {@code interval} reads as version 2, one without as version 1.
     */
    public static Explanation fromLine(String line, String place) {
        JsonValue node = JsonValue.parse(line, place);
        return explanation(node, node.node().isObject() && node.node().has("interval") ? VERSION : OLDEST);
    }

    private static Explanation explanation(JsonValue n, int version) {
        n.requireObject();
        JsonValue fit = n.object("fit");
        List<Explanation.TermWeight> terms = new ArrayList<>();
        for (JsonValue t : n.array("terms")) {
            List<Span> spans = new ArrayList<>();
            for (JsonValue s : t.array("spans")) {
                spans.add(span(s));
            }
            terms.add(new Explanation.TermWeight(t.string("term"), t.numberOrNaN("weight"), t.numberOrNaN("low"),
                    t.numberOrNaN("high"), spans));
        }
        JsonValue timing = n.object("timing");
        Map<String, Double> scores = new LinkedHashMap<>();
        n.object("scores").fields().forEach((label, v) -> scores.put(label, v.node().isNull() ? Double.NaN : v.asNumber()));
        double score = n.numberOrNaN("score");
        Explanation.Method method = n.has("settings") ? method(n, version, score) : null;
        return new Explanation(n.string("id"), n.string("label"), score, n.nullableString("predicted"), scores,
                n.int32("probes"),
                new Explanation.Fit(fit.numberOrNaN("intercept"), fit.numberOrNaN("r2"), fit.numberOrNaN("prediction")),
                terms, new Explanation.Timing(timing.integer("model_ms"), timing.integer("total_ms")),
                n.nullableString("text"), n.nullableString("gold"), method);
    }

    /** How the explanation was computed; version 1 explained the probability, with bootstrap intervals. */
    private static Explanation.Method method(JsonValue n, int version, double score) {
        JsonValue settings = n.object("settings");
        boolean v1 = version == OLDEST;
        String interval = v1 ? (n.bool("exact") ? "exact" : "bootstrap") : n.string("interval");
        JsonValue target = v1 ? null : n.object("target");
        return new Explanation.Method(settings.string("unit"), settings.string("weighting"), settings.string("select"),
                settings.numberOrNaN("bandwidth"), settings.numberOrNaN("ridge"), settings.int32("words"),
                settings.integer("seed"), settings.string("analyzer"), settings.string("filler"),
                settings.numberOrNaN("level"), n.int32("units"), n.int32("calls"), n.bool("exact"),
                n.numberOrNaN("stability"), interval,
                v1 ? "probability" : target.string("kind"),
                v1 ? "probabilities" : target.string("source"),
                v1 ? score : target.numberOrNaN("value"),
                v1 ? Double.NaN : target.numberOrNaN("saturated"),
                v1 ? -1 : n.int32("probes_to_go"),
                v1 ? "uniform" : settings.string("sampling"),
                n.strings("notes"));
    }

    /** A span {@code [start, end]} with {@code 0 <= start <= end}. */
    private static Span span(JsonValue s) {
        List<JsonValue> ends = s.elements();
        if (ends.size() != 2) {
            throw s.here("expected a span [start, end]");
        }
        int start = ends.get(0).asInt32();
        int end = ends.get(1).asInt32();
        if (start < 0 || end < start) {
            throw s.here("expected a span [start, end] with 0 <= start <= end");
        }
        return new Span(start, end);
    }
}
