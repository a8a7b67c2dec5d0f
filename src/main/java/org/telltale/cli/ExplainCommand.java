package org.telltale.cli;

import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.Callable;
import org.telltale.ExitCodes;
import org.telltale.TelltaleException;
import org.telltale.OptionWords;
import org.telltale.UsageException;
import org.telltale.explain.ConcurrentExplanations;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.explain.Sampling;
import org.telltale.explain.Selection;
import org.telltale.explain.Target;
import org.telltale.explain.Weighting;
import org.telltale.model.TextClassifier;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.report.terminal.ExplanationTable;
import org.telltale.report.terminal.MarkedLine;
import org.telltale.text.CorpusReader;
import org.telltale.text.Document;
import org.telltale.text.UnitKind;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code telltale explain}: local surrogate explanations of single predictions. */
@Command(name = "explain", mixinStandardHelpOptions = false, versionProvider = VersionProvider.class,
        description = {"Explains single predictions: which units of the text pushed the model toward a label, by how much,"
                + " and how sure that is. Explanations are local approximations of the model, not causes."})
final class ExplainCommand implements Callable<Integer> {
    @Mixin CommonOptions common;
    @Mixin ModelOptions model;
    @Mixin CorpusOptions corpus;
    @Mixin AnalyzerOptions analyzer;
    @Spec CommandSpec spec;

    @Option(names = "--text", paramLabel = "STRING", description = "The text to explain (instead of --corpus).")
    String text;
    @Option(names = "--doc", paramLabel = "ID", description = "Explain the corpus document with this id (repeatable).")
    List<String> docs = new ArrayList<>();
    @Option(names = "--first", paramLabel = "N", description = "Explain the first N corpus documents.")
    Integer first;
    @Option(names = "--label", paramLabel = "NAME", description = "The label to explain (default: the predicted one).")
    String label;
    @Option(names = "--words", paramLabel = "K|all", defaultValue = "10",
            description = "Units to report, or all: every unit, without selection (default: ${DEFAULT-VALUE}).")
    String words;
    @Option(names = "--probes", paramLabel = "N|auto", defaultValue = "" + ExplainSettings.DEFAULT_PROBES,
            description = "Probe budget, or auto: grow in rounds until the reported units are separated from the next one"
                    + " at the interval level (default: ${DEFAULT-VALUE}).")
    String probes;
    @Option(names = "--unit", paramLabel = "KIND", defaultValue = "word", description = "word, occurrence or line (default: ${DEFAULT-VALUE}).")
    String unit;
    @Option(names = "--select", paramLabel = "HOW", defaultValue = "forward",
            description = "How the K units are chosen: forward (forward stepwise) or lasso (the lasso path by least angle"
                    + " regression) (default: ${DEFAULT-VALUE}).")
    String select;
    @Option(names = "--target", paramLabel = "WHAT", defaultValue = "auto",
            description = "What the weights explain: probability, log-odds, or auto: log-odds when the model answers logits"
                    + " or its scores are saturated (default: ${DEFAULT-VALUE}).")
    String target;
    @Option(names = "--split-half", description = "Also fit each half of the probes and report how far their top units agree.")
    boolean splitHalf;
    @Option(names = "--bandwidth", paramLabel = "X|auto", defaultValue = "auto",
            description = "Sigma of the cosine kernel, or auto: chosen per document from the probes by cross-validation"
                    + " among 0.1, 0.15, 0.25 and 0.35, no extra model calls (default: ${DEFAULT-VALUE}; see docs/method.md).")
    String bandwidth;
    @Option(names = "--sampling", paramLabel = "HOW", defaultValue = "kernel",
            description = "How many units a probe removes: kernel (drawn in proportion to the kernel's weight, every probe"
                    + " weighted alike) or uniform (uniform in 1..d, each probe weighted by the kernel)"
                    + " (default: ${DEFAULT-VALUE}; see docs/method.md).")
    String sampling;
    @Option(names = "--weighting", paramLabel = "KIND", defaultValue = "cosine", description = "cosine or shapley (default: ${DEFAULT-VALUE}).")
    String weighting;
    @Option(names = "--filler", paramLabel = "TEXT", defaultValue = "", description = "Written in place of each removed unit (default: nothing).")
    String filler;
    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Run seed (default: ${DEFAULT-VALUE}).")
    long seed;
    @Option(names = "--json", paramLabel = "FILE|-", description = "Write telltale.explanations JSON to FILE, or to stdout with -.")
    String json;
    @Option(names = "--no-color", description = "No ANSI colour, even on a terminal.")
    boolean noColor;
    @Option(names = "--html", paramLabel = "FILE", description = "Also write a self-contained HTML report (see docs/reports.md).")
    Path html;
    @Option(names = "--force", description = "Replace an existing --html FILE.")
    boolean force;

    @Override
    public Integer call() throws IOException {
        if (html != null) {
            HtmlReports.refuseToReplace(html, force);
        }
        List<Document> documents = documents();
        ExplainSettings settings = settings();
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        boolean jsonOnStdout = "-".equals(json);
        boolean color = !noColor && !jsonOnStdout && System.console() != null && System.getenv("NO_COLOR") == null
                && !"dumb".equals(System.getenv("TERM"));
        List<Explanation> explanations = new ArrayList<>();
        ModelOptions.ForExplaining opened = model.openForExplaining();
        try (TextClassifier classifier = opened.classifier()) {
            ConcurrentExplanations concurrently = opened.concurrently();
            Explainer explainer = new Explainer(concurrently.waitingOn(classifier), settings, opened.probeScoring());
            long start = System.nanoTime();
            concurrently.explain(explainer, documents, label,
                    (doc, position, of) -> {
                        if (of > 1) {
                            synchronized (err) {
                                err.printf(Locale.ROOT, "explaining %s (%d of %d)%n", doc.id(), position + 1, of);
                                err.flush();
                            }
                        }
                    },
                    e -> {
                        explanations.add(e);
                        if (!jsonOnStdout) {
                            out.print(ExplanationTable.render(e, color));
                            out.println();
                            out.print(MarkedLine.render(e, color));
                            out.println();
                            out.flush();
                        }
                    });
            if (documents.size() > 1) {
                long probes = explanations.stream().mapToLong(Explanation::probes).sum();
                synchronized (err) {
                    err.printf(Locale.ROOT, "explained %d documents (%d probes) in %d ms%n", documents.size(), probes,
                            (System.nanoTime() - start) / 1_000_000);
                    err.flush();
                }
            }
            ModelOptions.reportConcurrency(classifier, common.verbose, err);
        }
        if (jsonOnStdout) {
            out.print(ExplanationsJson.toJson(explanations));
            out.flush();
        } else if (json != null) {
            try (OutputStream file = Files.newOutputStream(Path.of(json))) {
                ExplanationsJson.write(file, explanations);
            } catch (IOException e) {
                throw new TelltaleException(json + ": cannot write: " + e.getMessage(), e);
            }
        }
        if (html != null) {
            HtmlReports.write(HtmlReports.explanations(explanations), html, force);
        }
        return ExitCodes.OK;
    }

    private ExplainSettings settings() {
        int budget;
        if ("auto".equals(probes.toLowerCase(Locale.ROOT))) {
            budget = ExplainSettings.AUTO;
        } else {
            try {
                budget = Integer.parseInt(probes.trim());
            } catch (NumberFormatException e) {
                throw new UsageException("--probes must be a number or auto: " + probes);
            }
        }
        int k;
        if ("all".equals(words.strip().toLowerCase(Locale.ROOT))) {
            k = ExplainSettings.ALL_UNITS;
        } else {
            try {
                k = Integer.parseInt(words.strip());
            } catch (NumberFormatException e) {
                throw new UsageException("--words must be a number or all: " + words);
            }
        }
        boolean chooseBandwidth = "auto".equals(bandwidth.strip().toLowerCase(Locale.ROOT));
        double sigma = ExplainSettings.DEFAULT_BANDWIDTH;
        if (!chooseBandwidth) {
            try {
                sigma = Double.parseDouble(bandwidth.strip());
            } catch (NumberFormatException e) {
                throw new UsageException("--bandwidth must be a number or auto: " + bandwidth);
            }
        }
        try {
            return ExplainSettings.defaults().withWords(k).withProbes(budget).withUnit(UnitKind.fromKey(unit))
                    .withSelect(Selection.fromKey(select)).withTarget(Target.fromKey(target)).withBandwidth(sigma).withChooseBandwidth(chooseBandwidth)
                    .withWeighting(Weighting.fromKey(weighting)).withSampling(Sampling.fromKey(sampling)).withAnalyzer(analyzer.spec()).withSeed(seed)
                    .withFiller(filler).withSplitHalf(splitHalf);
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
    }

    private List<Document> documents() {
        if ((text == null) == !corpus.given()) {
            throw new UsageException("give exactly one of --text STRING or --corpus FILE");
        }
        if (text != null) {
            if (!docs.isEmpty() || first != null) {
                throw new UsageException("--doc and --first choose corpus documents; they need --corpus");
            }
            return List.of(Document.unlabelled("text", text));
        }
        if (first != null && first < 1) {
            throw new UsageException("--first must be at least 1: " + first);
        }
        Set<String> wanted = new LinkedHashSet<>(docs);
        boolean all = docs.isEmpty() && first == null;
        int leading = 0;
        List<Document> chosen = new ArrayList<>();
        try (CorpusReader reader = corpus.open()) {
            while (reader.hasNext() && (all || !wanted.isEmpty() || (first != null && leading < first))) {
                Document d = reader.next();
                boolean named = wanted.remove(d.id());
                boolean leadingOne = first != null && leading < first;
                if (leadingOne) {
                    leading++;
                }
                if (all || named || leadingOne) {
                    chosen.add(d);
                }
            }
        }
        if (!wanted.isEmpty()) {
            throw new TelltaleException(corpus.path() + ": no document with id " + String.join(", ", wanted));
        }
        return chosen;
    }
}
