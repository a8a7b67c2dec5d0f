package org.telltale.spark;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.SparkSession;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import org.telltale.overlap.OverlapResult;
import org.telltale.overlap.OverlapSettings;
import org.telltale.report.html.HtmlReports;
import org.telltale.report.html.OverlapReport;
import org.telltale.report.json.OverlapJson;
import org.telltale.report.terminal.OverlapSummaryText;

/**
 * {@code telltale overlap} as a Spark application: the same options, defaults, exit codes and
 * pairs, with corpora read by Spark from any path it reads. {@code --json} and {@code --html} are
 * written on the driver's file system. {@code --master} sets the master for local mode; under
 * spark-submit leave it out. {@code --threads} is accepted for the same command lines and has no
 * effect: Spark's executors and partitions set the parallelism. {@code --model} is not offered.
 */
public final class SparkOverlap {
    private static final List<String> VALUES = List.of("--train", "--test", "--format", "--id-field", "--text-field",
            "--label-field", "--threshold", "--shingle", "--signature", "--rows", "--bands", "--seed", "--threads",
            "--json", "--html", "--master");
    private static final List<String> FLAGS = List.of("--skip-bad", "--texts", "--force", "--quiet", "--verbose");

    private SparkOverlap() {
    }

    public static void main(String[] args) {
        System.exit(SparkMain.run(args, (out, err) -> run(args, out, err)));
    }

    private static int run(String[] args, PrintStream out, PrintStream err) throws Exception {
        SparkOptions o = SparkOptions.parse(args, VALUES, FLAGS);
        String train = o.required("--train");
        String test = o.required("--test");
        Path json = o.has("--json") ? Path.of(o.required("--json")) : null;
        Path html = o.has("--html") ? Path.of(o.required("--html")) : null;
        boolean texts = o.has("--texts");
        OverlapSettings settings;
        try {
            settings = settings(o, texts || html != null);
            // --threads is read for the same check as telltale overlap's; executors bring their own cores.
            OverlapSettings.workers(o.integer("--threads", 0));
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
        SparkCorpus.Fields fields = new SparkCorpus.Fields(o.get("--id-field", "id"), o.get("--text-field", "text"),
                o.get("--label-field", "label"), o.has("--skip-bad"));
        String format = o.get("--format", null);
        SparkFormat trainFormat = SparkFormat.of(format, train);
        SparkFormat testFormat = SparkFormat.of(format, test);
        if (html != null) {
            HtmlReports.refuseToReplace(html, o.has("--force"));
        }
        boolean quiet = o.has("--quiet");
        try (SparkSession spark = SparkSessions.open("telltale overlap", o.get("--master", null))) {
            JavaSparkContext context = JavaSparkContext.fromSparkContext(spark.sparkContext());
            JavaRDD<CorpusRow> trainRows = SparkCorpus.read(spark, train, trainFormat, fields, 0);
            long trainCount = trainRows.count();
            JavaRDD<CorpusRow> testRows = SparkCorpus.read(spark, test, testFormat, fields, trainCount);
            OverlapResult result = new DistributedOverlap(context, settings).find(train, trainRows, trainCount, test, testRows);
            if (!quiet) {
                err.println("overlap on Spark: " + result.summary().trainDocuments() + " train and "
                        + result.summary().testDocuments() + " test documents");
            }
            if (json != null) {
                OverlapJson.write(texts ? result : result.withoutTexts(), json);
                if (!quiet) {
                    err.println("wrote " + json);
                }
            }
            if (html != null) {
                HtmlReports.write(OverlapReport.render(result), html, o.has("--force"));
                if (!quiet) {
                    err.println("wrote " + html);
                }
            }
            out.print(OptionWords.render(OverlapSummaryText.render(result)));
            out.flush();
        }
        return ExitCodes.OK;
    }

    /** The checks and messages of {@code telltale overlap}. */
    private static OverlapSettings settings(SparkOptions o, boolean keepTexts) {
        double threshold = o.decimal("--threshold", OverlapSettings.DEFAULT_THRESHOLD);
        int shingle = o.integer("--shingle", OverlapSettings.DEFAULT_SHINGLE);
        int signature = o.integer("--signature", OverlapSettings.DEFAULT_SIGNATURE);
        Integer rows = o.integerOrNull("--rows");
        Integer bands = o.integerOrNull("--bands");
        long seed = o.longValue("--seed", 1L);
        return OverlapSettings.of(threshold, shingle, signature, rows, bands, seed, 1, keepTexts);
    }
}
