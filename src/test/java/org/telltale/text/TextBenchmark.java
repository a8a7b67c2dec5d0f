package org.telltale.text;

import java.io.IOException;
import java.io.Writer;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.BitSet;
import java.util.Locale;
import java.util.Random;

/**
 * Figures for docs/performance.md (not a test: run by hand, see that file). Reports CPU time of
 * the measuring thread, which other processes on the machine stretch far less than wall time.
 */
public final class TextBenchmark {
    private static final ThreadMXBean CPU = ManagementFactory.getThreadMXBean();
    private static final String[] WORDS = ("the invoice for order was charged twice please refund my card and close the ticket "
            + "our printer on floor three keeps jamming since monday when facilities moved it near the window").split(" ");

    private TextBenchmark() {
    }

    public static void main(String[] args) throws IOException {
        Random random = new Random(7);
        maskingFigure("300-word ticket, word units", words(random, 300), UnitKind.WORD, Integer.MAX_VALUE, 2000);
        maskingFigure("300-word ticket, occurrence units", words(random, 300), UnitKind.OCCURRENCE, Integer.MAX_VALUE, 2000);
        String wide = wideText();
        maskingFigure("1 MB text, 50,000 distinct terms, capped at 2,000 word units", wide, UnitKind.WORD, 2000, 200);
        indexFigure("TermIndex.of on the 1 MB text (standard analyzer), capped at 2,000", wide);
        readingFigures(random);
    }

    private static String words(Random random, int n) {
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < n; i++) {
            text.append(WORDS[random.nextInt(WORDS.length)]).append(i % 12 == 11 ? ".\n" : " ");
        }
        return text.toString();
    }

    private static String wideText() {
        StringBuilder text = new StringBuilder();
        for (int i = 0; text.length() < 1_000_000; i++) {
            text.append("w").append(Integer.toString(i % 50_000, 36)).append(i % 9 == 0 ? "\n" : " ");
        }
        return text.toString();
    }

    private static void maskingFigure(String what, String text, UnitKind kind, int cap, int probes) {
        TermIndex index = TermIndex.of(text, Analyzers.standard(), kind, cap);
        Random random = new Random(11);
        BitSet[] masks = new BitSet[probes];
        for (int p = 0; p < probes; p++) {
            masks[p] = new BitSet();
            int removed = 1 + random.nextInt(index.size());
            for (int r = 0; r < removed; r++) {
                masks[p].set(random.nextInt(index.size()));
            }
        }
        Masker masker = new Masker(" ");
        long sink = 0;
        for (int warm = 0; warm < 3; warm++) {
            for (BitSet mask : masks) {
                sink += masker.mask(index, mask).length();
            }
        }
        long start = CPU.getCurrentThreadCpuTime();
        for (BitSet mask : masks) {
            sink += masker.mask(index, mask).length();
        }
        double ms = (CPU.getCurrentThreadCpuTime() - start) / 1e6;
        System.out.printf(Locale.ROOT, "| %s: %d probes (%d units, %d spans, %d chars) | %.1f ms CPU, %.1f µs per probe |%n",
                what, probes, index.size(), index.spanCount(), text.length(), ms, ms * 1000 / probes);
        if (sink == 42) {
            System.out.println();
        }
    }

    private static void indexFigure(String what, String text) {
        for (int warm = 0; warm < 2; warm++) {
            TermIndex.of(text, Analyzers.standard(), UnitKind.WORD, 2000);
        }
        long start = CPU.getCurrentThreadCpuTime();
        TermIndex index = TermIndex.of(text, Analyzers.standard(), UnitKind.WORD, 2000);
        double ms = (CPU.getCurrentThreadCpuTime() - start) / 1e6;
        System.out.printf(Locale.ROOT, "| %s (%d of %d units) | %.0f ms CPU |%n", what, index.size(), index.totalUnits(), ms);
    }

    private static void readingFigures(Random random) throws IOException {
        Path dir = Files.createTempDirectory("telltale-bench");
        Path jsonl = dir.resolve("queue.jsonl");
        Path csv = dir.resolve("queue.csv");
        int docs = 100_000;
        try (Writer j = Files.newBufferedWriter(jsonl, StandardCharsets.UTF_8); Writer c = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            c.write("id,text,label\n");
            for (int i = 0; i < docs; i++) {
                String text = words(random, 40).replace("\n", " ").strip();
                j.write("{\"id\": \"T-" + i + "\", \"text\": \"" + text + "\", \"label\": \"" + (i % 3 == 0 ? "billing" : "facilities") + "\"}\n");
                c.write("T-" + i + ",\"" + text + ", \"\"quoted\"\"\"," + (i % 3 == 0 ? "billing" : "facilities") + "\n");
            }
        }
        for (Path file : new Path[] {jsonl, csv}) {
            for (int warm = 0; warm < 2; warm++) {
                Corpora.readAll(file, CorpusSettings.DEFAULTS).size();
            }
            long start = CPU.getCurrentThreadCpuTime();
            int n = 0;
            try (CorpusReader reader = Corpora.open(file, CorpusSettings.DEFAULTS)) {
                while (reader.hasNext()) {
                    reader.next();
                    n++;
                }
            }
            double s = (CPU.getCurrentThreadCpuTime() - start) / 1e9;
            System.out.printf(Locale.ROOT, "| reading %s: %d documents, %.1f MB | %.2f s CPU, %.0f documents/s |%n",
                    file.getFileName(), n, Files.size(file) / 1e6, s, n / s);
        }
        Files.delete(jsonl);
        Files.delete(csv);
        Files.delete(dir);
    }
}
