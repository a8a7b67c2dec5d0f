package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.explain.ExplainSettings;
import org.telltale.explain.Explainer;
import org.telltale.explain.Explanation;
import org.telltale.explain.Target;
import org.telltale.model.BuiltinModel;
import org.telltale.model.TextClassifier;
import org.telltale.serve.ModelServer;
import org.telltale.serve.ServerSettings;
import org.telltale.text.Document;

/**
 * The same explanation for the same seed whichever way the model is reached: identical through the
 * scoring protocol over HTTP and through an exec: subprocess, within FP32 rounding through the
 * Open Inference Protocol.
 */
@Timeout(value = 120, unit = TimeUnit.SECONDS)
class ExplainRoundTripTest {
    @TempDir
    static Path dir;
    private static BuiltinModel model;
    private static ModelServer server;
    private static Path file;
    private static final Document TICKET = new Document("t-17",
            "Hello, I was charged twice on my invoice and now I am locked out of my account after the password reset.", null);
    private static final ExplainSettings SETTINGS = ExplainSettings.defaults().withProbes(600).withSeed(20261201L)
            .withTarget(Target.PROBABILITY); // in process the built-in model also answers logits; HTTP and exec do not

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

    private static Explanation explain(ConnectorSettings settings) {
        try (TextClassifier c = Connectors.open(settings)) {
            return new Explainer(c, SETTINGS).explain(TICKET, null);
        }
    }

    private static List<Object> essence(Explanation e) {
        return List.of(e.label(), e.score(), e.predicted(), e.scores(), e.probes(), e.fit(), e.terms());
    }

    @Test
    void nativeHttpAndExecGiveTheSameExplanationAsInProcess() {
        Explanation local = explain(ConnectorSettings.of(file.toString()));
        Explanation http = explain(ConnectorSettings.of(server.url() + "/score").withBatch(50).withParallel(3));
        Explanation exec = explain(ConnectorSettings.of(JavaProcess.spec("org.telltale.cli.Main", "serve", "--stdio",
                "--model", file.toString())).withBatch(100));
        org.junit.jupiter.api.Assertions.assertFalse(local.terms().isEmpty(), "the explanation selected no terms");
        assertEquals(essence(local), essence(http));
        assertEquals(essence(local), essence(exec));
    }

    @Test
    void openInferenceGivesTheSameExplanationWithinFp32Rounding() {
        Explanation local = explain(ConnectorSettings.of(file.toString()));
        Explanation oip = explain(ConnectorSettings.of(server.url() + "/v2/models/support").withProtocol(Protocol.OPEN_INFERENCE));
        assertEquals(local.label(), oip.label());
        assertEquals(local.probes(), oip.probes());
        assertEquals(local.terms().size(), oip.terms().size());
        // FP32 keeps about 7 significant digits of each score; the fit is linear in the scores.
        for (int i = 0; i < local.terms().size(); i++) {
            assertEquals(local.terms().get(i).term(), oip.terms().get(i).term(), "term " + i);
            assertEquals(local.terms().get(i).weight(), oip.terms().get(i).weight(), 1e-5, "weight of " + local.terms().get(i).term());
        }
        assertEquals(local.score(), oip.score(), 1e-6);
        assertEquals(local.fit().r2(), oip.fit().r2(), 1e-5);
    }
}
