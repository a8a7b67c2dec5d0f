package org.telltale.connect;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.telltale.model.BuiltinModel;
import org.telltale.model.TextClassifier;
import org.telltale.serve.ModelServer;
import org.telltale.serve.ServerSettings;

/**
 * Probes per second through each connector, and the utilization of a service of known capacity,
 * for docs/performance.md. Not a test: runs only with {@code -Dtelltale.benchmark=true}.
 */
@EnabledIfSystemProperty(named = "telltale.benchmark", matches = "true")
class ConnectorBenchmark {

    /** Ticket-length probes: masked variants of the training tickets, like an explanation sends. */
    private static List<String> probes(int n) {
        List<String> out = new ArrayList<>(n);
        java.util.Random random = new java.util.Random(7);
        for (int i = 0; i < n; i++) {
            String[] words = SupportQueueModel.TICKETS.get(2 * random.nextInt(SupportQueueModel.TICKETS.size() / 2)).split(" ");
            StringBuilder sb = new StringBuilder();
            for (String w : words) {
                sb.append(random.nextBoolean() ? w : "").append(' ');
            }
            out.add(sb.toString().strip() + " #" + i);
        }
        return out;
    }

    private static double probesPerSecond(ConnectorSettings settings, List<String> texts) {
        try (TextClassifier c = Connectors.open(settings)) {
            c.score(texts.subList(0, 2000)); // warm-up
            long t0 = System.nanoTime();
            c.score(texts);
            return texts.size() / ((System.nanoTime() - t0) / 1e9);
        }
    }

    @Test
    void probesPerSecond() throws Exception {
        Path dir = Files.createTempDirectory("telltale-bench");
        Path file = SupportQueueModel.write(dir);
        BuiltinModel model = SupportQueueModel.train();
        List<String> texts = probes(40_000);
        System.out.println(String.format(Locale.ROOT, "PROBES in-process: %.0f/s", probesPerSecond(ConnectorSettings.of(file.toString()), texts)));
        try (ModelServer server = ModelServer.start(model, model.labels(), ServerSettings.defaults("support").withPort(0),
                new PrintStream(OutputStream.nullOutputStream()))) {
            for (int parallel : new int[] {1, 2, 4}) {
                double rate = probesPerSecond(ConnectorSettings.of(server.url() + "/score").withParallel(parallel), texts);
                System.out.println(String.format(Locale.ROOT, "PROBES http parallel %d: %.0f/s", parallel, rate));
            }
        }
        String exec = JavaProcess.spec("org.telltale.cli.Main", "serve", "--stdio", "--model", file.toString());
        System.out.println(String.format(Locale.ROOT, "PROBES exec parallel 1: %.0f/s", probesPerSecond(ConnectorSettings.of(exec), texts)));
        System.out.println(String.format(Locale.ROOT, "PROBES exec parallel 2: %.0f/s",
                probesPerSecond(ConnectorSettings.of(exec).withParallel(2), texts)));
    }

    @Test
    void saturation() throws Exception {
        // Issue 7 goal: a 20 ms, 4-concurrent, 64-per-batch service kept >= 90 % busy.
        int requests = 400;
        for (int parallel : new int[] {4, 8, 12}) {
            try (CapacityService service = new CapacityService(20, 4, 64);
                    TextClassifier c = Connectors.open(ConnectorSettings.of(service.url()).withBatch(64).withParallel(parallel))) {
                c.score(probes(64 * 8)); // warm-up connections and JIT
                service.firstStartNanos.set(Long.MAX_VALUE);
                service.lastEndNanos.set(0);
                long before = service.requests.get();
                c.score(probes(64 * requests));
                long served = service.requests.get() - before;
                double ideal = served * 0.020 / 4;
                System.out.println(String.format(Locale.ROOT,
                        "SATURATION parallel %d: %d requests, ideal %.3f s, window %.3f s, utilization %.1f %%",
                        parallel, served, ideal, service.windowSeconds(), 100 * ideal / service.windowSeconds()));
            }
        }
    }
}
