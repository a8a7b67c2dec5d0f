package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.PrintStream;
import java.io.OutputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.BuiltinModel;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.serve.ModelServer;
import org.telltale.serve.ServerSettings;

/**
 * A real loopback round trip: the model served by {@code ModelServer} on an ephemeral port, and by
 * {@code telltale serve --stdio} as a subprocess, scores exactly as in process — bitwise through the
 * scoring protocol (JSON doubles in shortest round-trip form), within FP32 rounding through the Open
 * Inference Protocol.
 */
class RoundTripTest {
    @TempDir
    static Path dir;
    private static BuiltinModel model;
    private static ModelServer server;
    private static Path file;

    @BeforeAll
    static void start() {
        model = SupportQueueModel.train();
        file = SupportQueueModel.write(dir);
        server = ModelServer.start(model, model.labels(), ServerSettings.defaults("support").withPort(0).withThreads(2),
                new PrintStream(OutputStream.nullOutputStream()));
    }

    @AfterAll
    static void stop() {
        server.close();
    }

    private static List<String> texts() {
        List<String> t = new ArrayList<>(SupportQueueModel.PROBES);
        for (int i = 0; i < 150; i++) {
            t.add(SupportQueueModel.TICKETS.get((2 * i) % SupportQueueModel.TICKETS.size()) + " #" + i);
        }
        return t;
    }

    private static ScoreMatrix through(ConnectorSettings settings) {
        try (TextClassifier c = Connectors.open(settings)) {
            return c.score(texts());
        }
    }

    @Test
    void nativeHttpIsBitwiseIdentical() {
        ScoreMatrix expected = model.score(texts());
        ScoreMatrix got = through(ConnectorSettings.of(server.url() + "/score").withBatch(16).withParallel(3));
        assertEquals(expected.labels(), got.labels());
        for (int i = 0; i < expected.size(); i++) {
            assertArrayEquals(expected.row(i), got.row(i), 0, "row " + i);
        }
    }

    @Test
    void openInferenceIsIdenticalUpToFp32Rounding() {
        ScoreMatrix expected = model.score(texts());
        ScoreMatrix got = through(ConnectorSettings.of(server.url() + "/v2/models/support")
                .withProtocol(Protocol.OPEN_INFERENCE).withBatch(16));
        assertEquals(expected.labels(), got.labels());
        for (int i = 0; i < expected.size(); i++) {
            for (int j = 0; j < expected.labels().size(); j++) {
                assertEquals((float) expected.score(i, j), (float) got.score(i, j), "row " + i + " label " + j);
            }
        }
    }

    @Test
    void execSubprocessIsBitwiseIdentical() {
        ScoreMatrix expected = model.score(texts());
        String spec = JavaProcess.spec("org.telltale.cli.Main", "serve", "--stdio", "--model", file.toString());
        ScoreMatrix got = through(ConnectorSettings.of(spec).withBatch(40).withParallel(2));
        assertEquals(expected.labels(), got.labels());
        for (int i = 0; i < expected.size(); i++) {
            assertArrayEquals(expected.row(i), got.row(i), 0, "row " + i);
        }
    }
}
