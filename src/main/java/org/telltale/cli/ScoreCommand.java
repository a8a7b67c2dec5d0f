package org.telltale.cli;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.FilterWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.telltale.TelltaleException;
import org.telltale.model.ConfusionCounter;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.CorpusReader;
import org.telltale.text.Document;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code telltale score}: scores a corpus through any connector, one JSON line per document, and
 * evaluates the predictions where the corpus has gold labels.
 */
@Command(
        name = "score",
        mixinStandardHelpOptions = false,
        versionProvider = VersionProvider.class,
        description = {
            "Scores every document of a corpus with a model and writes JSON Lines: id, predicted label, "
                    + "scores per label (and gold when the corpus has it).",
            "With gold labels, prints accuracy, macro-F1 and the confusion matrix: on stdout when --out is a "
                    + "file, on stderr when the JSON Lines go to stdout."})
final class ScoreCommand implements Callable<Integer> {
    /** Documents read and sent to the model at a time; memory holds one chunk, never the corpus. */
    static final int CHUNK = 256;

    private static final JsonFactory JSON = new JsonFactory();

    @Mixin
    CommonOptions common;

    @Mixin
    ModelOptions model;

    @Mixin
    CorpusOptions corpus;

    @Spec
    CommandSpec spec;

    @Option(names = "--out", paramLabel = "FILE", description = "Write the JSON Lines here instead of stdout.")
    Path out;

    @Option(names = "--force", description = "Replace --out if it exists.")
    boolean force;

    @Override
    public Integer call() throws IOException {
        if (out != null && !force && Files.exists(out)) {
            throw new TelltaleException("output file " + out + " already exists (use --force to replace it)");
        }
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter stderr = spec.commandLine().getErr();
        int scored = 0;
        int withoutGold = 0;
        ConfusionCounter confusion = null;
        try (TextClassifier classifier = model.open();
                CorpusReader reader = corpus.open();
                Writer sink = out == null ? keepOpen(stdout) : openOut();
                JsonGenerator json = JSON.createGenerator(sink)) {
            json.disable(JsonGenerator.Feature.AUTO_CLOSE_TARGET);
            json.setRootValueSeparator(null); // one object per line, nothing between lines
            List<Document> chunk = new ArrayList<>(CHUNK);
            while (reader.hasNext()) {
                chunk.clear();
                while (chunk.size() < CHUNK && reader.hasNext()) {
                    chunk.add(reader.next());
                }
                ScoreMatrix scores = classifier.score(chunk.stream().map(Document::text).toList());
                if (scores.size() != chunk.size()) {
                    throw new TelltaleException(classifier.describe() + " answered " + scores.size() + " rows for "
                            + chunk.size() + " documents");
                }
                for (int i = 0; i < chunk.size(); i++) {
                    Document d = chunk.get(i);
                    String predicted = scores.predicted(i);
                    write(json, d, predicted, scores, i);
                    if (d.label() == null) {
                        withoutGold++;
                    } else {
                        if (confusion == null) {
                            confusion = new ConfusionCounter(scores.labels());
                        }
                        confusion.add(d.label(), predicted);
                    }
                }
                scored += chunk.size();
                json.flush();
            }
            if (out == null) {
                stdout.flush();
            }
            if (!reader.skipped().isEmpty()) {
                stderr.println("telltale: " + reader.skipped().summary());
            }
            ModelOptions.reportConcurrency(classifier, common.verbose, stderr);
        }
        PrintWriter report = out == null ? stderr : stdout;
        if (out != null) {
            stderr.printf(Locale.ROOT, "wrote %d scored documents to %s%n", scored, out);
        }
        if (confusion != null) {
            report.print(confusion.result().render());
            if (withoutGold > 0) {
                report.printf(Locale.ROOT, "%d documents without a gold label are not in these figures%n", withoutGold);
            }
        } else if (scored > 0) {
            report.println("no gold labels in the corpus: nothing to evaluate");
        }
        report.flush();
        return 0;
    }

    private Writer openOut() {
        try {
            return Files.newBufferedWriter(out, StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                    StandardOpenOption.TRUNCATE_EXISTING, StandardOpenOption.WRITE);
        } catch (IOException e) {
            throw new TelltaleException("cannot write " + out + ": " + e.getMessage(), e);
        }
    }

    /** stdout belongs to the process: flush it at the end, never close it. */
    private static Writer keepOpen(PrintWriter stdout) {
        return new FilterWriter(stdout) {
            @Override
            public void close() {
                stdout.flush();
            }
        };
    }

    private void write(JsonGenerator json, Document d, String predicted, ScoreMatrix scores, int row) {
        try {
            json.writeStartObject();
            json.writeStringField("id", d.id());
            json.writeStringField("label", predicted);
            json.writeObjectFieldStart("scores");
            for (int j = 0; j < scores.labels().size(); j++) {
                json.writeNumberField(scores.labels().get(j), scores.score(row, j));
            }
            json.writeEndObject();
            if (d.label() != null) {
                json.writeStringField("gold", d.label());
            }
            json.writeEndObject();
            json.writeRaw('\n');
        } catch (IOException e) {
            throw new TelltaleException("cannot write " + (out == null ? "stdout" : out.toString()) + ": "
                    + e.getMessage(), e);
        }
    }
}
