package org.telltale.overlap;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.Locale;

/**
 * {@link TextNormalizer#forExact} alone in a fresh JVM, 100 kB against 1 MB for each unit of
 * {@code ScanningBenchmark}, with the minor page faults of each call: the check of why the
 * normaliser's ratio looked superlinear inside the whole benchmark (docs/performance.md). Not a
 * test; reads {@code /proc/thread-self/stat}, so Linux only. Arguments: warm-up runs at 100 kB,
 * measured runs at each size, and {@code reversed} to feed the units in the opposite order.
 */
public final class TextNormalizerGrowth {
    private static final ThreadMXBean THREADS = ManagementFactory.getThreadMXBean();

    private TextNormalizerGrowth() {
    }

    public static void main(String[] args) throws IOException {
        int warmups = Integer.parseInt(args[0]);
        int repeats = Integer.parseInt(args[1]);
        List<String> units = new ArrayList<>(List.of("q", "7", "a.", "b-", "ab.cd%", "a@", "1:", " ", "a1.-@: #"));
        if (args.length > 2 && args[2].equals("reversed")) {
            Collections.reverse(units);
        }
        System.out.println("run of | 100 kB median (ms) | 1 MB median (ms) | ratio | faults per 1 MB call (median)");
        for (String unit : units) {
            String small = repeat(unit, 100_000);
            String large = repeat(unit, 1_000_000);
            measure(small, warmups);
            long[][] a = measure(small, repeats);
            long[][] b = measure(large, repeats);
            System.out.println(String.format(Locale.ROOT, "`%s` | %.3f | %.3f | %.1f | %d", unit, median(a[0]) / 1e6,
                    median(b[0]) / 1e6, (double) median(b[0]) / median(a[0]), median(b[1])));
        }
    }

    /** CPU nanoseconds and minor page faults of each of {@code repeats} calls. */
    private static long[][] measure(String text, int repeats) throws IOException {
        long[][] out = new long[2][repeats];
        for (int r = 0; r < repeats; r++) {
            long faults = minorFaults();
            long t0 = THREADS.getCurrentThreadCpuTime();
            TextNormalizer.forExact(text);
            out[0][r] = THREADS.getCurrentThreadCpuTime() - t0;
            out[1][r] = minorFaults() - faults;
        }
        return out;
    }

    /** Field 10 of proc(5)'s stat line: minor faults of this thread. */
    private static long minorFaults() throws IOException {
        String stat = Files.readString(Path.of("/proc/thread-self/stat"));
        return Long.parseLong(stat.substring(stat.lastIndexOf(')') + 2).split(" ")[7]);
    }

    private static String repeat(String unit, int length) {
        return unit.repeat(length / unit.length() + 1).substring(0, length);
    }

    private static long median(long[] values) {
        long[] sorted = values.clone();
        Arrays.sort(sorted);
        return sorted[sorted.length / 2];
    }
}
