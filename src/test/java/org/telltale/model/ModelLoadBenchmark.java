package org.telltale.model;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.SplittableRandom;

/**
 * Benchmark, not a test: how long {@link ModelFile#load} takes for a model of 50,000 terms.
 * Run by src/test/bench/model-load.sh; {@code write FILE [TERMS] [LABELS]} makes a seeded synthetic
 * logistic model, {@code load FILE [REPEATS]} times the first load in this JVM and then repeats.
 */
public final class ModelLoadBenchmark {
    private ModelLoadBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path file = Path.of(args[1]);
        if (args[0].equals("write")) {
            int terms = args.length > 2 ? Integer.parseInt(args[2]) : 50_000;
            int labels = args.length > 3 ? Integer.parseInt(args[3]) : 5;
            write(file, terms, labels);
        } else {
            int repeats = args.length > 2 ? Integer.parseInt(args[2]) : 10;
            load(file, repeats);
        }
    }

    private static void write(Path file, int terms, int labelCount) {
        SplittableRandom random = new SplittableRandom(50_000);
        List<String> vocabulary = new ArrayList<>(terms);
        for (int t = 0; t < terms; t++) {
            vocabulary.add("term" + Integer.toString(t, 36) + (random.nextBoolean() ? "" : " pair" + t % 977));
        }
        List<String> labels = new ArrayList<>();
        double[][] weights = new double[labelCount][terms];
        for (int c = 0; c < labelCount; c++) {
            labels.add("label-" + c);
            for (int t = 0; t < terms; t++) {
                weights[c][t] = random.nextGaussian() * 0.3;
            }
        }
        TrainingInfo info = new TrainingInfo("synthetic", "0".repeat(64), 10_000, 8_000, 2_000, Map.of("label-0", 10_000),
                0.2, 1, "2026-12-01T00:00:00Z");
        try (LogisticModel model = new LogisticModel(labels, new TermCounter("standard", 2), new Vocabulary(vocabulary),
                info, null, 1e-3, new double[labelCount], weights, new OptimiserReport("L-BFGS", 1, 1, true, 0, 0))) {
            ModelFile.save(model, file);
        }
        System.out.printf(Locale.ROOT, "wrote %s: %d terms, %d labels, %.1f MB%n", file, terms, labelCount,
                file.toFile().length() / 1e6);
    }

    private static void load(Path file, int repeats) throws Exception {
        long[] nanos = new long[repeats + 1];
        long[] cpu = new long[repeats + 1];
        java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
        for (int i = 0; i <= repeats; i++) {
            long start = System.nanoTime();
            long startCpu = threads.getCurrentThreadCpuTime();
            try (BuiltinModel model = ModelFile.load(file)) {
                nanos[i] = System.nanoTime() - start;
                cpu[i] = threads.getCurrentThreadCpuTime() - startCpu;
                if (i == 0) {
                    System.out.printf(Locale.ROOT, "%s (%.1f MB)%n", model.describe(), Files.size(file) / 1e6);
                }
            }
        }
        long[] warm = Arrays.copyOfRange(nanos, 1, nanos.length);
        Arrays.sort(warm);
        System.out.printf(Locale.ROOT, "first load in a fresh JVM: %.0f ms wall (%.0f ms CPU of the loading thread); "
                + "later loads: median %.0f ms, best %.0f ms (%d runs)%n",
                nanos[0] / 1e6, cpu[0] / 1e6, warm[warm.length / 2] / 1e6, warm[0] / 1e6, repeats);
    }
}
