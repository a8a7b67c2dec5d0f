package org.telltale.cli;

import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.telltale.OptionWords;
import org.telltale.TelltaleException;
import org.telltale.UnknownKeyException;
import org.telltale.model.Algorithm;
import org.telltale.model.BuiltinModel;
import org.telltale.model.LogisticModel;
import org.telltale.model.ModelFile;
import org.telltale.model.ModelTraining;
import org.telltale.model.TrainingOutcome;
import org.telltale.model.TrainingRequest;
import org.telltale.text.CorpusReader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code telltale train}: fits a built-in model on a labelled corpus and reports it on a holdout. */
@Command(
        name = "train",
        mixinStandardHelpOptions = false,
        versionProvider = VersionProvider.class,
        description = {
            "Trains a built-in model (multinomial naive Bayes, or logistic regression fitted by L-BFGS) on a "
                    + "labelled corpus and writes it as a model file.",
            "Prints accuracy, macro-F1 and the confusion matrix on a stratified, seeded holdout (stdout)."})
final class TrainCommand implements Callable<Integer> {
    @Mixin
    CommonOptions common;

    @Mixin
    CorpusOptions corpus;

    @Mixin
    AnalyzerOptions analyzer;

    @Spec
    CommandSpec spec;

    @Option(names = "--out", paramLabel = "MODEL.json", required = true, description = "Model file to write.")
    Path out;

    @Option(names = "--force", description = "Replace --out if it exists.")
    boolean force;

    @Option(names = "--algorithm", paramLabel = "NAME", defaultValue = "bayes",
            description = "bayes or logistic (default: ${DEFAULT-VALUE}).")
    String algorithm;

    @Option(names = "--ngrams", paramLabel = "N", defaultValue = "1",
            description = "1: terms; 2: terms and pairs of adjacent terms (default: ${DEFAULT-VALUE}).")
    int ngrams;

    @Option(names = "--holdout", paramLabel = "FRACTION", defaultValue = "0.2",
            description = "Share of each label held out for evaluation, 0 to train on all (default: ${DEFAULT-VALUE}).")
    double holdout;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed of the holdout split (default: ${DEFAULT-VALUE}).")
    long seed;

    @Option(names = "--smoothing", paramLabel = "A", defaultValue = "" + TrainingRequest.DEFAULT_SMOOTHING,
            description = "bayes: additive smoothing, 1 = Laplace (default: ${DEFAULT-VALUE}).")
    double smoothing;

    @Option(names = "--l2", paramLabel = "LAMBDA", defaultValue = "" + TrainingRequest.DEFAULT_L2,
            description = "logistic: L2 penalty on the mean loss (default: ${DEFAULT-VALUE}).")
    double l2;

    @Option(names = "--max-iterations", paramLabel = "N", defaultValue = "" + TrainingRequest.DEFAULT_MAX_ITERATIONS,
            description = "logistic: L-BFGS iterations at most (default: ${DEFAULT-VALUE}).")
    int maxIterations;

    @Override
    public Integer call() {
        TrainingRequest request = request();
        if (!force && Files.exists(out)) {
            throw new TelltaleException("model file " + out + " already exists (use --force to replace it)");
        }
        TrainingOutcome outcome;
        PrintWriter stdout = spec.commandLine().getOut();
        PrintWriter stderr = spec.commandLine().getErr();
        try (CorpusReader reader = corpus.open()) {
            outcome = ModelTraining.train(reader, corpus.path(), request);
            if (!reader.skipped().isEmpty()) {
                stderr.println("telltale: " + reader.skipped().summary());
            }
        }
        try (BuiltinModel model = outcome.model()) {
            ModelFile.save(model, out, force);
            var t = model.training();
            stdout.printf(Locale.ROOT, "%s model: %d labels, %d terms, trained on %d of %d documents%n",
                    model.algorithm().key(), model.labels().size(), model.vocabulary().size(), t.trainingDocuments(),
                    t.documents());
            if (outcome.holdout() == null) {
                stdout.println("no documents held out: nothing to evaluate");
            } else {
                stdout.printf(Locale.ROOT, "holdout: %d documents (%.0f%% of each label, seed %d)%n",
                        t.holdoutDocuments(), request.holdout() * 100, request.seed());
                stdout.print(outcome.holdout().render());
            }
            if (model instanceof LogisticModel lr && !lr.optimiser().converged()) {
                stderr.printf(Locale.ROOT, "telltale: warning: L-BFGS stopped after %d iterations without reaching "
                        + "the gradient tolerance (largest gradient component %.2e); try --max-iterations%n",
                        lr.optimiser().iterations(), lr.optimiser().gradientNorm());
            }
            stderr.println("wrote " + out);
        }
        stdout.flush();
        return 0;
    }

    private TrainingRequest request() {
        Algorithm algo;
        try {
            algo = Algorithm.fromKey(algorithm.toLowerCase(Locale.ROOT));
        } catch (UnknownKeyException e) {
            throw OptionWords.value("--algorithm", e);
        }
        TrainingRequest request;
        try {
            request = new TrainingRequest(algo, analyzer.spec(), ngrams, holdout, seed, smoothing, l2, maxIterations);
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
        analyzer.analyzer(); // a bad spec is a usage error before any reading
        return request;
    }
}
