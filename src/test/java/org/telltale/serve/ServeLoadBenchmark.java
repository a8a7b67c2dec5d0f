package org.telltale.serve;

import java.net.URI;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Locale;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfSystemProperty;
import org.telltale.connect.SupportQueueModel;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ModelFile;

/**
 * Latency and throughput of {@code telltale serve} under load, for docs/performance.md. Not a
 * test: runs only with {@code -Dtelltale.benchmark=true}.
 */
@EnabledIfSystemProperty(named = "telltale.benchmark", matches = "true")
class ServeLoadBenchmark {

    @Test
    void measure() throws Exception {
        Path dir = Files.createTempDirectory("telltale-load");
        Path file = SupportQueueModel.write(dir);
        BuiltinModel reference = ModelFile.load(file);
        for (int clients : new int[] {1, 4, 16}) {
            for (boolean hostile : new boolean[] {false, true}) {
                Process p = ServeLoadTest.serve(file, "--threads", "2", "--max-batch", "64", "--max-body", "65536");
                try {
                    URI base = ServeLoadTest.listening(p);
                    LoadRun.run(base, reference, clients, 16, Duration.ofSeconds(3), false); // warm-up
                    LoadRun.Result r = LoadRun.run(base, reference, clients, 16, Duration.ofSeconds(15), hostile);
                    System.out.println(String.format(Locale.ROOT,
                            "LOAD clients=%d hostile=%s requests=%d errors=%d mismatches=%d p50=%.2fms p99=%.2fms req/s=%.0f texts/s=%.0f hostile=%s unexpected=%d slowCutMs=%d",
                            clients, hostile, r.requests(), r.errors(), r.mismatches(), r.p50Micros() / 1000.0, r.p99Micros() / 1000.0,
                            r.requestsPerSecond(), r.textsPerSecond(), r.hostileStatuses(), r.hostileUnexpected(), r.slowClientCutAfterMillis()));
                } finally {
                    p.destroy();
                    p.waitFor(20, TimeUnit.SECONDS);
                }
            }
        }
    }
}
