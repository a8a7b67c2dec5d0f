package org.telltale.model;

import com.fasterxml.jackson.annotation.JsonProperty;
import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import com.fasterxml.jackson.core.exc.StreamReadException;
import com.fasterxml.jackson.core.io.JsonEOFException;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonMappingException;
import com.fasterxml.jackson.databind.MapperFeature;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Map;
import org.telltale.TelltaleException;

/**
 * Reads and writes built-in models as JSON, format {@code telltale.model}, version 1 (described in
 * docs/models.md). Every problem with a file is one {@link TelltaleException} whose message names
 * the file and what is wrong with it: missing, not JSON, truncated, not a model file, a newer
 * version, or a field of the wrong shape.
 */
public final class ModelFile {
    /** The value of {@code "format"} in every model file. */
    public static final String FORMAT = "telltale.model";
    /** The newest version this code reads and the one it writes. */
    public static final int VERSION = 1;

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            // Most of a model file is numbers; the fast parser reads them several times quicker, exactly.
            .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
            .build();
    private static final ObjectMapper MAPPER = JsonMapper.builder(FACTORY)
            .disable(DeserializationFeature.FAIL_ON_UNKNOWN_PROPERTIES)
            .enable(DeserializationFeature.FAIL_ON_NULL_FOR_PRIMITIVES)
            .disable(MapperFeature.ALLOW_COERCION_OF_SCALARS)
            .enable(DeserializationFeature.FAIL_ON_TRAILING_TOKENS)
            .build();

    private ModelFile() {
    }

    /** Writes {@code model} to {@code path}, replacing any file there. */
    public static void save(BuiltinModel model, Path path) {
        save(model, path, true);
    }

    /**
     * Writes {@code model} to {@code path} through a temporary file in the same directory, so a
     * reader never sees half a model.
     *
     * @param overwrite whether an existing file may be replaced
     * @throws TelltaleException when the file exists and {@code overwrite} is false, or on I/O errors
     */
    public static void save(BuiltinModel model, Path path, boolean overwrite) {
        if (!overwrite && Files.exists(path)) {
            throw new TelltaleException("model file " + path + " already exists (use {force} to replace it)");
        }
        Path dir = path.toAbsolutePath().getParent();
        Path tmp = null;
        try {
            Files.createDirectories(dir);
            tmp = Files.createTempFile(dir, ".telltale-model-", ".tmp");
            try (OutputStream out = Files.newOutputStream(tmp);
                    JsonGenerator g = FACTORY.createGenerator(out, JsonEncoding.UTF8)) {
                write(model, g);
            }
            if (overwrite) {
                Files.move(tmp, path, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
            } else {
                Files.move(tmp, path);
            }
            tmp = null;
        } catch (FileAlreadyExistsException e) {
            throw new TelltaleException("model file " + path + " already exists (use {force} to replace it)", e);
        } catch (IOException e) {
            throw new TelltaleException("cannot write model file " + path + ": " + e.getMessage(), e);
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // the temporary file is left behind; the error above is what matters
                }
            }
        }
    }

    private static void write(BuiltinModel model, JsonGenerator g) throws IOException {
        g.writeStartObject();
        g.writeStringField("format", FORMAT);
        g.writeNumberField("version", VERSION);
        g.writeStringField("algorithm", model.algorithm().key());
        g.writeFieldName("labels");
        writeStrings(g, model.labels());
        g.writeStringField("analyzer", model.analyzer());
        g.writeNumberField("ngrams", model.ngrams());
        g.writeFieldName("vocabulary");
        writeStrings(g, model.vocabulary().terms());
        g.writeFieldName("parameters");
        g.writeStartObject();
        if (model instanceof NaiveBayesModel nb) {
            g.writeNumberField("smoothing", nb.smoothing());
            g.writeFieldName("log_prior");
            writeDoubles(g, nb.logPriors());
            g.writeFieldName("log_likelihood");
            g.writeStartArray();
            for (int c = 0; c < model.labels().size(); c++) {
                writeDoubles(g, nb.logLikelihoodRow(c));
            }
            g.writeEndArray();
        } else if (model instanceof LogisticModel lr) {
            g.writeStringField("features", LogisticModel.FEATURES);
            g.writeNumberField("l2", lr.l2());
            g.writeFieldName("intercepts");
            writeDoubles(g, lr.intercepts());
            g.writeFieldName("weights");
            g.writeStartArray();
            for (int c = 0; c < model.labels().size(); c++) {
                writeDoubles(g, lr.weightRow(c));
            }
            g.writeEndArray();
            OptimiserReport o = lr.optimiser();
            if (o != null) {
                g.writeObjectFieldStart("optimiser");
                g.writeStringField("method", o.method());
                g.writeNumberField("iterations", o.iterations());
                g.writeNumberField("evaluations", o.evaluations());
                g.writeBooleanField("converged", o.converged());
                g.writeNumberField("objective", o.objective());
                g.writeNumberField("gradient_norm", o.gradientNorm());
                g.writeEndObject();
            }
        }
        g.writeEndObject();
        TrainingInfo t = model.training();
        if (t != null) {
            g.writeObjectFieldStart("training");
            g.writeStringField("corpus", t.corpus());
            g.writeStringField("corpus_sha256", t.corpusSha256());
            g.writeNumberField("documents", t.documents());
            g.writeNumberField("training_documents", t.trainingDocuments());
            g.writeNumberField("holdout_documents", t.holdoutDocuments());
            g.writeObjectFieldStart("per_label");
            for (Map.Entry<String, Integer> e : t.perLabelSorted().entrySet()) {
                g.writeNumberField(e.getKey(), e.getValue());
            }
            g.writeEndObject();
            g.writeNumberField("holdout", t.holdout());
            g.writeNumberField("seed", t.seed());
            g.writeStringField("date", t.date());
            g.writeEndObject();
        }
        g.writeEndObject();
        g.writeRaw('\n');
    }

    private static void writeStrings(JsonGenerator g, List<String> values) throws IOException {
        g.writeStartArray();
        for (String v : values) {
            g.writeString(v);
        }
        g.writeEndArray();
    }

    private static void writeDoubles(JsonGenerator g, double[] values) throws IOException {
        g.writeArray(values, 0, values.length);
    }

    /**
     * Reads a model file.
     *
     * @throws TelltaleException naming the file and the problem, for any file that is not a
     *     complete, valid model of a version this code reads
     */
    public static BuiltinModel load(Path path) {
        byte[] bytes = readBytes(path);
        Contents contents;
        try {
            checkHeader(path, bytes);
            contents = MAPPER.readValue(bytes, Contents.class);
        } catch (JsonEOFException e) {
            throw truncated(path, e);
        } catch (JsonMappingException e) {
            if (e.getCause() instanceof JsonEOFException eof) {
                throw truncated(path, eof);
            }
            if (e.getCause() instanceof StreamReadException cause) {
                throw notJson(path, cause);
            }
            if (e.getPath().isEmpty() && String.valueOf(e.getOriginalMessage()).startsWith("Trailing token")) {
                throw bad(path, "has more content after the model object");
            }
            throw bad(path, "has field " + fieldPath(e) + " of the wrong type or shape");
        } catch (StreamReadException e) {
            throw notJson(path, e);
        } catch (IOException e) {
            throw bad(path, "cannot be read: " + e.getMessage());
        }
        return ModelFileReader.build(path, contents);
    }

    private static TelltaleException truncated(Path path, JsonEOFException e) {
        return bad(path, "is truncated: the JSON ends at line " + e.getLocation().getLineNr() + ", column "
                + e.getLocation().getColumnNr() + " before the model is complete");
    }

    private static TelltaleException notJson(Path path, StreamReadException e) {
        String where = e.getLocation() == null ? ""
                : " (line " + e.getLocation().getLineNr() + ", column " + e.getLocation().getColumnNr() + ")";
        return bad(path, "is not valid JSON" + where + ": " + e.getOriginalMessage());
    }

    private static byte[] readBytes(Path path) {
        if (Files.isDirectory(path)) {
            throw new TelltaleException("model file " + path + " is a directory");
        }
        try {
            return Files.readAllBytes(path);
        } catch (NoSuchFileException e) {
            throw new TelltaleException("model file " + path + " does not exist", e);
        } catch (IOException e) {
            throw new TelltaleException("cannot read model file " + path + ": " + e.getMessage(), e);
        }
    }

    /**
     * A first, cheap look at the top-level fields: does the file say it is a model file of a version
     * we read? Doing this before data binding means a newer or foreign file is reported as such,
     * not as a confusing type error deep inside it. Our files begin with format and version, so the
     * look stops there; JSON errors anywhere are left to the binding pass, which reads every token.
     */
    private static void checkHeader(Path path, byte[] bytes) throws IOException {
        if (bytes.length == 0) {
            throw bad(path, "is empty");
        }
        String format = null;
        Object version = null;
        try (JsonParser p = FACTORY.createParser(bytes)) {
            JsonToken first = p.nextToken();
            if (first != JsonToken.START_OBJECT) {
                throw bad(path, "is not a Telltale model file (the JSON is not an object)");
            }
            for (JsonToken t = p.nextToken(); t == JsonToken.FIELD_NAME; t = p.nextToken()) {
                String name = p.currentName();
                JsonToken value = p.nextToken();
                if (name.equals("format") && value == JsonToken.VALUE_STRING) {
                    format = p.getText();
                } else if (name.equals("version") && value.isNumeric()) {
                    version = p.getNumberValue();
                } else if (name.equals("version") && value.isScalarValue()) {
                    version = p.getText();
                } else {
                    p.skipChildren();
                }
                if (format != null && version != null) {
                    break;
                }
            }
        }
        if (!FORMAT.equals(format)) {
            throw bad(path, "is not a Telltale model file ("
                    + (format == null ? "no \"format\" field" : "format is '" + format + "'")
                    + ", expected \"" + FORMAT + "\")");
        }
        if (!(version instanceof Integer v)) {
            throw bad(path, version == null ? "has no \"version\"" : "has version '" + version + "', not a whole number");
        }
        if (v > VERSION) {
            throw bad(path, "is model format version " + v + ", newer than this telltale reads (" + VERSION
                    + "); upgrade telltale");
        }
        if (v < 1) {
            throw bad(path, "has invalid version " + v);
        }
    }

    private static String fieldPath(JsonMappingException e) {
        StringBuilder sb = new StringBuilder();
        for (JsonMappingException.Reference r : e.getPath()) {
            if (r.getFieldName() != null) {
                if (!sb.isEmpty()) {
                    sb.append('.');
                }
                sb.append(r.getFieldName());
            } else if (r.getIndex() >= 0) {
                sb.append('[').append(r.getIndex()).append(']');
            }
        }
        return sb.isEmpty() ? "(top level)" : "'" + sb + "'";
    }

    static TelltaleException bad(Path path, String what) {
        return new TelltaleException("model file " + path + " " + what);
    }

    /** The file as data binding sees it; every field may be missing, validation names what is. */
    record Contents(
            String format,
            Integer version,
            String algorithm,
            List<String> labels,
            String analyzer,
            Integer ngrams,
            List<String> vocabulary,
            Parameters parameters,
            Training training) {
    }

    record Parameters(
            Double smoothing,
            @JsonProperty("log_prior") double[] logPrior,
            @JsonProperty("log_likelihood") double[][] logLikelihood,
            String features,
            Double l2,
            double[] intercepts,
            double[][] weights,
            Optimiser optimiser) {
    }

    record Optimiser(
            String method,
            Integer iterations,
            Integer evaluations,
            Boolean converged,
            Double objective,
            @JsonProperty("gradient_norm") Double gradientNorm) {
    }

    record Training(
            String corpus,
            @JsonProperty("corpus_sha256") String corpusSha256,
            Integer documents,
            @JsonProperty("training_documents") Integer trainingDocuments,
            @JsonProperty("holdout_documents") Integer holdoutDocuments,
            @JsonProperty("per_label") Map<String, Integer> perLabel,
            Double holdout,
            Long seed,
            String date) {
    }
}
