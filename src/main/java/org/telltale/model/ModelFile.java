package org.telltale.model;

import com.fasterxml.jackson.core.JsonEncoding;
import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
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
import org.telltale.json.JsonValue;

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

    private static final JsonFactory FACTORY = new JsonFactory();

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
                // A number that is not finite is written as null, as in every contract Telltale writes.
                writeFinite(g, "objective", o.objective());
                writeFinite(g, "gradient_norm", o.gradientNorm());
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

    private static void writeFinite(JsonGenerator g, String field, double value) throws IOException {
        if (Double.isFinite(value)) {
            g.writeNumberField(field, value);
        } else {
            g.writeNullField(field);
        }
    }

    private static void writeDoubles(JsonGenerator g, double[] values) throws IOException {
        g.writeArray(values, 0, values.length);
    }

    /**
     * Reads a model file through the strict {@link JsonValue}, the reader of every versioned
     * contract: one format and version check, and every missing or mistyped field named with its
     * path and what was found ({@code m.json: labels[1]: expected a string, found the number 3}).
     *
     * @throws TelltaleException naming the file and the problem, for any file that is not a
     *     complete, valid model of a version this code reads
     */
    public static BuiltinModel load(Path path) {
        JsonValue root = JsonValue.parse(readBytes(path), path.toString()).requireObject();
        root.version(FORMAT, VERSION);
        return ModelFileReader.build(path, root);
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
}
