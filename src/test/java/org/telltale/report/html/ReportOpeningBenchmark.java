package org.telltale.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.openqa.selenium.By;
import org.telltale.explain.Explanation;

/**
 * How large audit reports get and how fast Chromium first paints them. A benchmark, not a test of
 * speed: it asserts only that the page is whole, and writes its figures to
 * {@code target/report-benchmark.md} for docs/performance.md. Runs with {@code -Dtelltale.benchmark=true}.
 */
class ReportOpeningBenchmark {
    private static final int RUNS = 5;

    @TempDir
    Path dir;

    @Test
    void measureFileSizeAndTimeToFirstRender() throws Exception {
        assumeTrue(Boolean.getBoolean("telltale.benchmark"), "benchmark: run with -Dtelltale.benchmark=true");
        StringBuilder md = new StringBuilder();
        md.append("| report | documents | mean text (chars) | file size | render in Java (ms) | first contentful paint (ms) | script ready (ms) | DOMContentLoaded (ms) | load (ms) |\n");
        md.append("|---|---:|---:|---:|---:|---:|---:|---:|---:|\n");
        try (HeadlessChromium chromium = HeadlessChromium.start(1400, 1000)) {
            for (int n : new int[] {500, 5000}) {
                SampleAudit.Audit audit = SampleAudit.of(n, 5);
                long t0 = System.nanoTime();
                String html = HtmlReports.audit(audit.result(), audit.explanations());
                long renderMs = (System.nanoTime() - t0) / 1_000_000;
                Path file = dir.resolve("audit-" + n + ".html");
                Files.writeString(file, html, StandardCharsets.UTF_8);
                double meanText = audit.explanations().stream().mapToInt(e -> e.text().length()).average().orElse(0);
                md.append(row("audit", n, meanText, Files.size(file), renderMs, measure(chromium, file, n)));
            }
            List<Explanation> one = List.of(SampleExplanations.billing());
            long t0 = System.nanoTime();
            String html = HtmlReports.explanations(one);
            long renderMs = (System.nanoTime() - t0) / 1_000_000;
            Path file = dir.resolve("explanation.html");
            Files.writeString(file, html, StandardCharsets.UTF_8);
            md.append(row("explanation", 1, one.get(0).text().length(), Files.size(file), renderMs, measure(chromium, file, 0)));
        }
        Path out = Path.of("target", "report-benchmark.md");
        Files.writeString(out, md, StandardCharsets.UTF_8);
        System.out.println(md);
    }

    /** Median over fresh loads of FCP, DOMContentLoaded and load, from the Paint and Navigation Timing APIs. */
    private static double[] measure(HeadlessChromium chromium, Path file, int documents) {
        List<Double> fcp = new ArrayList<>();
        List<Double> ready = new ArrayList<>();
        List<Double> dcl = new ArrayList<>();
        List<Double> load = new ArrayList<>();
        for (int run = 0; run < RUNS; run++) {
            chromium.driver.get("about:blank");
            chromium.open(file);
            @SuppressWarnings("unchecked")
            Map<String, Object> t = (Map<String, Object>) chromium.js(
                    "var n = performance.getEntriesByType('navigation')[0];"
                    + "var r = performance.getEntriesByName('telltale-ready')[0];"
                    + "return {ready: r ? r.startTime : -1, dcl: n.domContentLoadedEventEnd,"
                    + " load: n.loadEventEnd};");
            // A small page may load before its first paint is recorded: wait for it (at most 2 s).
            Object paint = chromium.driver.executeAsyncScript("var done = arguments[0], tries = 0;"
                    + "(function poll() { var p = performance.getEntriesByName('first-contentful-paint')[0];"
                    + " if (p || tries++ > 200) { done(p ? p.startTime : -1); } else { setTimeout(poll, 10); } })();");
            fcp.add(((Number) paint).doubleValue());
            ready.add(((Number) t.get("ready")).doubleValue());
            dcl.add(((Number) t.get("dcl")).doubleValue());
            load.add(((Number) t.get("load")).doubleValue());
            if (documents > 0) {
                assertEquals(documents, chromium.driver.findElements(By.cssSelector("#documents template")).size());
            }
        }
        assertTrue(chromium.consoleErrors().isEmpty());
        return new double[] {median(fcp), median(ready), median(dcl), median(load)};
    }

    private static double median(List<Double> values) {
        List<Double> sorted = new ArrayList<>(values);
        Collections.sort(sorted);
        return sorted.get(sorted.size() / 2);
    }

    private static String row(String kind, int n, double meanText, long bytes, long renderMs, double[] t) {
        return String.format(Locale.ROOT, "| %s | %d | %.0f | %.2f MB | %d | %.0f | %.0f | %.0f | %.0f |%n",
                kind, n, meanText, bytes / 1_000_000.0, renderMs, t[0], t[1], t[2], t[3]);
    }
}
