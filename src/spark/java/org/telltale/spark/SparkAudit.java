package org.telltale.spark;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Collectors;
import org.apache.lucene.analysis.Analyzer;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.SparkSession;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import org.telltale.UsageException;
import org.telltale.audit.AuditResult;
import org.telltale.audit.AuditSettings;
import org.telltale.audit.Auditor;
import org.telltale.audit.OutputFolder;
import org.telltale.audit.FailOn;
import org.telltale.audit.Policy;
import org.telltale.audit.Severity;
import org.telltale.explain.Explanation;
import org.telltale.model.TextClassifier;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.json.AuditJson;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.report.sarif.AuditSarif;
import org.telltale.report.sarif.SarifWriter;
import org.telltale.text.Analyzers;

/**
 * {@code telltale audit} as a Spark application: the same options, defaults and exit codes (0
 * clean, 3 artefacts at or above {@code --fail-on}, 1 error, 2 usage), the corpus read by Spark
 * from any path it reads, model work by partition, and the same {@code audit.json},
 * {@code explanations.jsonl} and {@code report.html} in {@code --out} on the driver's file
 * system. Spark reruns failed tasks, so there is no journal and {@code --resume} is refused.
 * {@code --master} sets the master for local mode.
 */
public final class SparkAudit {
    private static final List<String> VALUES;
    private static final List<String> FLAGS = List.of("--skip-bad", "--resume", "--force", "--scrub-all", "--quiet",
            "--verbose");

    static {
        List<String> values = new ArrayList<>(List.of("--corpus", "--format", "--id-field", "--text-field",
                "--label-field", "--analyzer", "--sample", "--probes", "--words", "--out", "--policy", "--fail-on",
                "--picks", "--seed", "--sarif", "--master"));
        values.addAll(ModelParams.VALUE_OPTIONS);
        VALUES = List.copyOf(values);
    }

    /**
     * Why {@code --resume} is refused, by design: on one machine the journal lets a failed run
     * continue; on Spark, recomputing failed tasks does that job, and there is no journal to resume.
     */
    static final String RESUME_REFUSED = "--resume is refused by SparkAudit: it keeps no journal, because Spark "
            + "recomputes a failed task from its partition with the same result; a run whose driver died starts over. "
            + "Run it again without --resume (with --force to replace --out)";

    private SparkAudit() {
    }

    public static void main(String[] args) {
        System.exit(SparkMain.run(args, (out, err) -> run(args, out, err)));
    }

    private static int run(String[] args, PrintStream out, PrintStream err) throws Exception {
        SparkOptions o = SparkOptions.parse(args, VALUES, List.of(ModelParams.HEADER), FLAGS);
        if (o.has("--resume")) {
            throw new UsageException(RESUME_REFUSED);
        }
        FailOn failOn;
        try {
            failOn = FailOn.fromKey(o.get("--fail-on", "high"));
        } catch (IllegalArgumentException e) {
            throw OptionWords.value("--fail-on", e);
        }
        Severity gate = failOn.least();
        String corpusPath = o.required("--corpus");
        ModelParams model = ModelParams.of(o);
        String analyzerSpec = o.get("--analyzer", "standard");
        Analyzer analyzer = Analyzers.byName(analyzerSpec);
        Path policyFile = o.has("--policy") ? Path.of(o.required("--policy")) : null;
        AuditSettings settings;
        try {
            settings = new AuditSettings(o.integer("--sample", 200), o.integer("--probes", 1000), o.integer("--words", 10),
                    o.integer("--picks", 5), o.has("--scrub-all"), failOn, AuditSettings.DEFAULT_ALPHA, model.batch(), analyzerSpec,
                    policyFile == null ? null : policyFile.getFileName().toString());
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
        long seed = o.longValue("--seed", 1L);
        SparkCorpus.Fields fields = new SparkCorpus.Fields(o.get("--id-field", "id"), o.get("--text-field", "text"),
                o.get("--label-field", "label"), o.has("--skip-bad"));
        SparkFormat format = SparkFormat.of(o.get("--format", null), corpusPath);
        Policy rules = policyFile == null ? Policy.empty() : Policy.read(policyFile);
        Path sarif = o.has("--sarif") ? Path.of(o.required("--sarif")) : null;
        if (sarif != null) {
            SarifWriter.refuseToReplace(sarif, o.has("--force"));
        }
        OutputFolder folder = OutputFolder.open(Path.of(o.get("--out", "telltale-audit")), o.has("--force"), false);
        boolean quiet = o.has("--quiet");

        long started = System.nanoTime();
        Auditor.Outcome outcome;
        try (SparkSession spark = SparkSessions.open("telltale audit", o.get("--master", null));
             TextClassifier classifier = model.open(model.spec())) {
            JavaSparkContext context = JavaSparkContext.fromSparkContext(spark.sparkContext());
            String shipped = null;
            if (model.isFile()) {
                context.addFile(Path.of(model.spec()).toAbsolutePath().toString());
                shipped = Path.of(model.spec()).getFileName().toString();
            }
            AuditParams params = new AuditParams(model, shipped, analyzerSpec, settings.sample(), settings.probes(),
                    settings.words(), seed, settings);
            JavaRDD<CorpusRow> rows = SparkCorpus.read(spark, corpusPath, format, fields, 0);
            DistributedAudit distributed = new DistributedAudit(context, params);
            progress(err, quiet, "scoring and explaining on Spark with " + classifier.describe());
            DistributedAudit.Passes passes = distributed.scoreAndExplain(rows);
            progress(err, quiet, String.format(Locale.ROOT, "scored %d documents, explained %d; counting and scrubbing",
                    passes.scored().documents(), passes.explanations().size()));
            // The driver's connector only describes the model: the scrub test rescores on the executors.
            Auditor auditor = new Auditor(classifier, d -> {
                throw new IllegalStateException("explanations come from the executors");
            }, new LineCodec(), analyzer, settings, seed, rules, Auditor.Progress.SILENT);
            long[] scrubRetries = {0};
            List<String> labels = passes.scored().labels();
            Auditor.Rescoring rescoring = (plan, explained) -> {
                DistributedAudit.Rescored rescored = distributed.rescore(plan, labels);
                scrubRetries[0] = rescored.retries();
                return rescored.effects();
            };
            outcome = auditor.decide(passes.scored(), passes.explanations(),
                    (selected, labelList, gold) -> distributed.countTerms(selected, labelList, gold), rescoring,
                    () -> passes.retries() + scrubRetries[0], classifier.describe(),
                    nameOf(corpusPath), started);
        }
        List<String> files = new ArrayList<>();
        files.add(folder.write(OutputFolder.EXPLANATIONS, outcome.explanations().stream()
                .map(ExplanationsJson::toLine).collect(Collectors.joining("\n", "", "\n"))).toString());
        files.add(folder.write(OutputFolder.AUDIT, AuditJson.toJson(outcome.result()) + "\n").toString());
        files.add(folder.write(OutputFolder.REPORT, HtmlReports.audit(outcome.result(), outcome.explanations())).toString());
        AuditResult result = outcome.result();
        if (sarif != null) {
            // The example documents' record lines are not looked up on Spark: locations name the corpus alone.
            String uri = corpusPath.contains("://") ? corpusPath : SarifWriter.uri(Path.of(corpusPath));
            SarifWriter.write(AuditSarif.of(result, version(), uri, Map.of()), sarif, true);
            files.add(sarif.toString());
        }
        AuditResult.Summary s = result.summary();
        out.printf(Locale.ROOT, "audited %d documents, explained %d; artefacts: %d, %d open at or above %s%n",
                s.documents(), s.explained(), result.artefacts().size(),
                gate == null ? 0 : result.open(gate).size(), failOn.key());
        for (String file : files) {
            out.println("  " + file);
        }
        out.flush();
        return gate != null && !result.open(gate).isEmpty() ? ExitCodes.GATE : ExitCodes.OK;
    }

    /** The version Maven wrote into version.properties, as telltale --version reports it. */
    private static String version() {
        try (java.io.InputStream in = SparkAudit.class.getResourceAsStream("/org/telltale/version.properties")) {
            java.util.Properties p = new java.util.Properties();
            if (in != null) {
                p.load(new java.io.InputStreamReader(in, java.nio.charset.StandardCharsets.UTF_8));
            }
            return p.getProperty("version", "unknown");
        } catch (java.io.IOException e) {
            return "unknown";
        }
    }

    /** The last name of a Spark path, as the single-machine audit names its corpus file. */
    static String nameOf(String path) {
        String p = path;
        while (p.endsWith("/") && p.length() > 1) {
            p = p.substring(0, p.length() - 1);
        }
        return p.substring(p.lastIndexOf('/') + 1);
    }

    private static void progress(PrintStream err, boolean quiet, String line) {
        if (!quiet) {
            err.println(line);
            err.flush();
        }
    }

    /** The explanation line form of the telltale.explanations contract. */
    private static final class LineCodec implements Auditor.ExplanationCodec {
        @Override
        public String toLine(Explanation explanation) {
            return ExplanationsJson.toLine(explanation);
        }

        @Override
        public Explanation fromLine(String line, String place) {
            return ExplanationsJson.fromLine(line, place);
        }
    }
}
