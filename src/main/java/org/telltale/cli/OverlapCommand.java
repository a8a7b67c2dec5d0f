package org.telltale.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import org.telltale.model.TextClassifier;
import org.telltale.overlap.AccuracyInflation;
import org.telltale.overlap.CorpusFile;
import org.telltale.overlap.OverlapFinder;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.OverlapSettings;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.html.OverlapReport;
import org.telltale.report.json.OverlapJson;
import org.telltale.report.terminal.OverlapSummaryText;
import org.telltale.text.CorpusSettings;
import picocli.CommandLine.ArgGroup;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code telltale overlap}: exact and near-duplicate documents shared by a train and a test corpus. */
@Command(name = "overlap", mixinStandardHelpOptions = false, versionProvider = VersionProvider.class, sortOptions = false,
        description = {"Finds test documents that already appear in train, as exact copies (normalised text) or near "
                + "duplicates (Jaccard similarity of word shingles, found by MinHash banding and verified exactly), "
                + "and duplicates within each set. With --model, the accuracy with and without them.",
            "Reads each corpus twice. The JSON and HTML outputs may contain document text and personal data."})
final class OverlapCommand implements Callable<Integer> {
    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--train", required = true, paramLabel = "FILE", description = "The training corpus (.jsonl, .csv or label folder).")
    Path train;

    @Option(names = "--test", required = true, paramLabel = "FILE", description = "The test corpus, in the same format.")
    Path test;

    @Option(names = "--format", paramLabel = "FORMAT", description = "jsonl, csv or folder (default: from the file names).")
    String format;

    @Option(names = "--id-field", paramLabel = "NAME", defaultValue = "id", description = "Id field (default: ${DEFAULT-VALUE}).")
    String idField;

    @Option(names = "--text-field", paramLabel = "NAME", defaultValue = "text", description = "Text field (default: ${DEFAULT-VALUE}).")
    String textField;

    @Option(names = "--label-field", paramLabel = "NAME", defaultValue = "label", description = "Gold label field (default: ${DEFAULT-VALUE}).")
    String labelField;

    @Option(names = "--skip-bad", description = "Skip and count bad records instead of stopping.")
    boolean skipBad;

    @Option(names = "--threshold", paramLabel = "S", defaultValue = "0.8",
            description = "Least Jaccard similarity of near duplicates, in (0, 1] (default: ${DEFAULT-VALUE}).")
    double threshold;

    @Option(names = "--shingle", paramLabel = "N", defaultValue = "5", description = "Words per shingle (default: ${DEFAULT-VALUE}).")
    int shingle;

    @Option(names = "--signature", paramLabel = "K", defaultValue = "128",
            description = "Most MinHash components per document (default: ${DEFAULT-VALUE}).")
    int signature;

    @Option(names = "--rows", paramLabel = "R", description = "Rows per band; with --bands, instead of the banding chosen from the threshold.")
    Integer rows;

    @Option(names = "--bands", paramLabel = "B", description = "Number of bands; with --rows.")
    Integer bands;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed of the MinHash functions (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--threads", paramLabel = "N", defaultValue = "0", description = "Worker threads (default: one per core).")
    int threads;

    @Option(names = "--json", paramLabel = "FILE", description = "Write every pair and the summary as telltale.overlap v1 JSON.")
    Path json;

    @Option(names = "--texts", description = "Put the texts of paired documents into the JSON.")
    boolean texts;

    @Option(names = "--html", paramLabel = "FILE",
            description = "Write the pairs side by side, shared passages marked, as a self-contained HTML report.")
    Path html;

    @Option(names = "--force", description = "Replace an existing --html file.")
    boolean force;

    @Option(names = "--quiet", description = "No progress on stderr.")
    boolean quiet;

    @ArgGroup(exclusive = false, multiplicity = "0..1", heading = "Model (optional: accuracy with and without the overlap)%n")
    ModelOptions model;

    @Override
    public Integer call() throws IOException {
        OverlapSettings settings = settings();
        PrintWriter err = spec.commandLine().getErr();
        CorpusFile trainFile = new CorpusFile(train, corpusSettings());
        CorpusFile testFile = new CorpusFile(test, corpusSettings());
        OverlapResult result = new OverlapFinder(settings, line -> progress(err, line)).find(trainFile, testFile);
        reportSkips(err, trainFile);
        reportSkips(err, testFile);
        if (model != null) {
            try (TextClassifier classifier = model.open()) {
                progress(err, "scoring the test set with " + classifier.describe());
                result = result.withInflation(AccuracyInflation.measure(classifier, testFile, result.seenTestIds()));
            }
        }
        if (json != null) {
            OverlapJson.write(texts ? result : result.withoutTexts(), json);
            progress(err, "wrote " + json);
        }
        if (html != null) {
            HtmlReports.write(OverlapReport.render(result), html, force);
            progress(err, "wrote " + html);
        }
        PrintWriter out = spec.commandLine().getOut();
        out.print(OptionWords.render(OverlapSummaryText.render(result)));
        out.flush();
        return ExitCodes.OK;
    }

    private OverlapSettings settings() {
        try {
            return OverlapSettings.of(threshold, shingle, signature, rows, bands, seed, OverlapSettings.workers(threads),
                    texts || html != null);
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
    }

    private CorpusSettings corpusSettings() {
        return new CorpusSettings(CorpusOptions.format(format), idField, textField, labelField, skipBad);
    }

    private void progress(PrintWriter err, String line) {
        if (!quiet) {
            err.println(line);
            err.flush();
        }
    }

    private static void reportSkips(PrintWriter err, CorpusFile file) {
        if (file.lastSkips() != null && !file.lastSkips().isEmpty()) {
            err.println(String.format(Locale.ROOT, "%s: %s", file.name(), file.lastSkips().summary()));
            err.flush();
        }
    }
}
