package org.telltale.audit;

import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.BitSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.telltale.cli.Main;
import org.telltale.model.ModelFile;
import org.telltale.overlap.Shingler;
import org.telltale.overlap.TextNormalizer;
import org.telltale.text.Analyzers;
import org.telltale.text.LongRuns;
import org.telltale.text.Masker;
import org.telltale.text.TermIndex;
import org.telltale.text.UnitKind;

/**
 * How the scans of document text grow with its length, and what long runs cost a whole audit,
 * for docs/performance.md. Not a test: runs only with {@code -Dtelltale.benchmark=true}. Figures
 * are CPU time: of the measuring thread for the scans, the median of seven repetitions after ten
 * warm-up ones at 100 kB and three at 1 MB; of the process for audits, the best of three rounds
 * after a warm-up one.
 */
@EnabledIfSystemProperty(named = "telltale.benchmark", matches = "true")
class ScanningBenchmark {
    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();
    private static final List<String> UNITS = List.of("q", "7", "a.", "b-", "ab.cd%", "a@", "1:", " ", "a1.-@: #");

    private static Map<String, Consumer<String>> scans() {
        Map<String, Consumer<String>> scans = new LinkedHashMap<>();
        scans.put("Places.of", text -> Places.of(text, line -> false));
        scans.put("header regions", text -> Places.headerRegions(text, TextLines.of(text)));
        scans.put("LineRepeats.add", text -> new LineRepeats(64).add(text));
        scans.put("TermIndex.of standard", text -> TermIndex.of(text, Analyzers.standard(), UnitKind.WORD));
        scans.put("TermIndex.of whitespace", text -> TermIndex.of(text, Analyzers.whitespace(), UnitKind.WORD));
        scans.put("Masker.mask", text -> {
            TermIndex index = TermIndex.of(text, Analyzers.whitespace(), UnitKind.OCCURRENCE, 2000);
            BitSet removed = new BitSet();
            removed.set(0, index.size(), true);
            Masker.cutting().mask(index, removed);
        });
        scans.put("TextNormalizer.forExact", TextNormalizer::forExact);
        scans.put("Shingler.shingles", text -> new Shingler(5).shingles(text));
        return scans;
    }

    /**
     * The median CPU time of {@code repeats} runs after {@code warmups} unmeasured ones, at the size
     * being measured: the first runs at a new size pay for the heap growing to hold it (fresh pages
     * faulted in by the kernel), not for the scan.
     */
    private static double cpuSeconds(Consumer<String> scan, String text, int warmups, int repeats) {
        for (int r = 0; r < warmups; r++) {
            scan.accept(text);
        }
        long[] times = new long[repeats];
        for (int r = 0; r < repeats; r++) {
            long t0 = THREADS.getCurrentThreadCpuTime();
            scan.accept(text);
            times[r] = THREADS.getCurrentThreadCpuTime() - t0;
        }
        Arrays.sort(times);
        return times[repeats / 2] / 1e9;
    }

    @Test
    void scansGrowLinearly() {
        System.out.println("| scan | run of | 100 kB (ms) | 1 MB (ms) | ratio |");
        System.out.println("|---|---|---:|---:|---:|");
        double worst = 0;
        for (Map.Entry<String, Consumer<String>> scan : scans().entrySet()) {
            for (String unit : UNITS) {
                String small = LongRuns.repeat(unit, 100_000);
                String large = LongRuns.repeat(unit, 1_000_000);
                double a = cpuSeconds(scan.getValue(), small, 10, 7); // the JIT settles during these
                double b = cpuSeconds(scan.getValue(), large, 3, 7);
                worst = Math.max(worst, b / a);
                System.out.println(String.format(Locale.ROOT, "| %s | `%s` | %.2f | %.2f | %.1f |", scan.getKey(), unit,
                        a * 1e3, b * 1e3, b / a));
            }
        }
        System.out.println(String.format(Locale.ROOT, "SCANNING worst 1 MB / 100 kB ratio: %.1f", worst));
    }

    @Test
    void longRunsCostAnAuditLittle() throws Exception {
        Path dir = Files.createTempDirectory("telltale-bench");
        Path model = dir.resolve("desk.model");
        ModelFile.save(TrainedModels.naiveBayes(UtilityQueues.generate(1, 150, true)), model);
        Path clean = UtilityQueues.write(HostileCorpusAuditTest.corpus(false), dir.resolve("clean.jsonl"));
        Path hostile = UtilityQueues.write(HostileCorpusAuditTest.corpus(true), dir.resolve("hostile.jsonl"));
        long[] best = {Long.MAX_VALUE, Long.MAX_VALUE};
        int run = 0;
        for (int round = 0; round < 4; round++) {
            for (int c = 0; c < 2; c++) {
                Path out = dir.resolve("audit-" + run++);
                String[] args = HostileCorpusAuditTest.audit(model, c == 0 ? clean : hostile, out);
                long t0 = processCpu();
                int code = Main.run(args);
                long cpu = processCpu() - t0;
                if (code != 0) {
                    throw new AssertionError("audit exited " + code);
                }
                if (round > 0) { // round 0 warms the JIT
                    best[c] = Math.min(best[c], cpu);
                }
            }
        }
        System.out.println(String.format(Locale.ROOT,
                "AUDIT clean %.2f s CPU, hostile %.2f s CPU (200 documents, 8 with runs of 40,000-57,500), ratio %.2f",
                best[0] / 1e9, best[1] / 1e9, (double) best[1] / best[0]));
    }

    private static long processCpu() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean()).getProcessCpuTime();
    }
}
