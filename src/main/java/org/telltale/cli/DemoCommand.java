package org.telltale.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.telltale.ExitCodes;
import org.telltale.OptionWords;
import org.telltale.demo.CorpusFiles;
import org.telltale.demo.DemoCorpus;
import org.telltale.demo.DemoOutcome;
import org.telltale.demo.DemoProgress;
import org.telltale.demo.DemoRun;
import org.telltale.demo.DemoSettings;
import org.telltale.demo.Plant;
import org.telltale.demo.SupportCorpusGenerator;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code telltale demo}: the invented support-queue scenario, generated and audited end to end. */
@Command(
        name = "demo",
        mixinStandardHelpOptions = false,
        versionProvider = VersionProvider.class,
        description = {
            "Audits a model trained on an invented support-ticket corpus with planted leakage, then one trained on "
                    + "its clean variant, and writes report.html and audit.json.",
            "With --generate, only writes the two corpus variants (JSON Lines) into a folder."})
final class DemoCommand implements Callable<Integer> {
    @Mixin
    CommonOptions common;

    @Spec
    CommandSpec spec;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "reports/demo",
            description = "Folder for the report, audit.json and the demo's corpora and models (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--force", description = "Overwrite an earlier demo's files in the output folder.")
    boolean force;

    @Option(names = "--quiet", description = "No progress on stderr.")
    boolean quiet;

    @Option(names = "--generate", paramLabel = "DIR",
            description = "Write support-leaky.jsonl and support-clean.jsonl into DIR and stop.")
    Path generate;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "" + SupportCorpusGenerator.DEFAULT_SEED,
            description = "Seed of the generated corpus (default: ${DEFAULT-VALUE}, the committed corpora-demo files).")
    long seed;

    @Option(names = "--size", paramLabel = "N", defaultValue = "" + SupportCorpusGenerator.DEFAULT_SIZE,
            description = "Messages in the generated corpus, at least " + SupportCorpusGenerator.MIN_SIZE
                    + " (default: ${DEFAULT-VALUE}).")
    int size;

    @Override
    public Integer call() {
        SupportCorpusGenerator generator;
        try {
            generator = new SupportCorpusGenerator(seed, size);
        } catch (IllegalArgumentException e) {
            throw OptionWords.usage(e);
        }
        if (generate != null) {
            return writeCorpus(generator.generate());
        }
        return runDemo();
    }

    private int runDemo() {
        PrintWriter err = spec.commandLine().getErr();
        DemoProgress progress = quiet ? DemoProgress.silent() : message -> {
            err.println(message);
            err.flush();
        };
        DemoSettings settings = DemoSettings.defaults(out).withCorpus(seed, size).withForce(force);
        DemoOutcome outcome = DemoRun.run(settings, progress);
        PrintWriter stdout = spec.commandLine().getOut();
        outcome.summary().forEach(stdout::println);
        stdout.flush();
        return ExitCodes.OK;
    }

    private int writeCorpus(DemoCorpus corpus) {
        PrintWriter stdout = spec.commandLine().getOut();
        List<Path> files = CorpusFiles.write(corpus, generate);
        for (Path file : files) {
            stdout.println(file);
        }
        if (!quiet) {
            PrintWriter err = spec.commandLine().getErr();
            err.printf(Locale.ROOT, "%d messages per variant, seed %d%n", corpus.size(), corpus.seed());
            for (Plant plant : Plant.values()) {
                err.printf(Locale.ROOT, "  %-20s %-12s %4d %s messages%n", plant.name().toLowerCase(Locale.ROOT),
                        plant.kind(), corpus.planted().get(plant).size(), plant.queue().label());
            }
            err.flush();
        }
        stdout.flush();
        return ExitCodes.OK;
    }
}
