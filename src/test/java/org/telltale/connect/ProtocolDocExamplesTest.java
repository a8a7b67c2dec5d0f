package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/** The Python examples of docs/protocol.md are printed verbatim and really work with python3. */
@Timeout(value = 60, unit = TimeUnit.SECONDS)
class ProtocolDocExamplesTest {
    private static final List<String> TEXTS = List.of("Where is my INVOICE?", "the site is down", "refund me", "");
    @TempDir
    Path dir;

    private static String resource(String name) throws Exception {
        try (InputStream in = ProtocolDocExamplesTest.class.getResourceAsStream("/org/telltale/connect/" + name)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    private static String exampleInDoc(String name) throws Exception {
        String doc = Files.readString(Path.of("docs/protocol.md"), StandardCharsets.UTF_8);
        Matcher m = Pattern.compile("<!-- example: " + Pattern.quote(name) + " -->\n```python\n(.*?)```", Pattern.DOTALL).matcher(doc);
        assertTrue(m.find(), "docs/protocol.md lacks the example " + name);
        return m.group(1);
    }

    /** What the toy keyword model answers (its rule, restated). */
    private static void assertKeywordScores(ScoreMatrix m) {
        assertEquals(List.of("billing", "other"), m.labels());
        assertArrayEquals(new double[] {0.9, 0.1}, m.row(0), 1e-12);
        assertArrayEquals(new double[] {0.2, 0.8}, m.row(1), 1e-12);
        assertArrayEquals(new double[] {0.9, 0.1}, m.row(2), 1e-12);
        assertArrayEquals(new double[] {0.2, 0.8}, m.row(3), 1e-12);
    }

    @Test
    void theDocPrintsTheExamplesVerbatim() throws Exception {
        assertEquals(resource("keyword_model.py"), exampleInDoc("keyword_model.py"));
        assertEquals(resource("keyword_model_lines.py"), exampleInDoc("keyword_model_lines.py"));
        assertEquals(resource("feedback_pipeline.py"), exampleInDoc("feedback_pipeline.py"));
    }

    @Test
    void thePipelineExampleServesThePipelineProtocol() throws Exception {
        Path script = Python.script("/org/telltale/connect/feedback_pipeline.py", dir);
        Process p = new ProcessBuilder(Python.python3(), script.toString(), "0").redirectError(ProcessBuilder.Redirect.DISCARD).start();
        try {
            String line = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8)).readLine();
            assertTrue(line != null && line.startsWith("listening on http://127.0.0.1:"), "python printed: " + line);
            String url = line.substring("listening on ".length()) + "/classify";
            List<String> texts = List.of("the 9:40 was late again", "thank you, crew", "timetable?", "thanks despite the delay");
            try (TextClassifier c = Connectors.open(ConnectorSettings.of(url).withProtocol(Protocol.PIPELINE).withBatch(3))) {
                ScoreMatrix m = c.score(texts);
                // The first text's list, highest score first, fixes the order; later texts are reordered to it.
                assertEquals(List.of("other", "delay", "praise"), m.labels());
                assertArrayEquals(new double[] {1.0 / 1.8, 0.7 / 1.8, 0.1 / 1.8}, m.row(0), 1e-12);
                assertArrayEquals(new double[] {1.0 / 1.7, 0.1 / 1.7, 0.6 / 1.7}, m.row(1), 1e-12);
                assertArrayEquals(new double[] {1.0 / 1.2, 0.1 / 1.2, 0.1 / 1.2}, m.row(2), 1e-12);
                assertArrayEquals(new double[] {1.0 / 2.3, 0.7 / 2.3, 0.6 / 2.3}, m.row(3), 1e-12);
            }
        } finally {
            p.destroyForcibly();
            p.waitFor(10, TimeUnit.SECONDS);
        }
    }

    @Test
    void theHttpExampleServesTheNativeProtocol() throws Exception {
        Path script = Python.script("/org/telltale/connect/keyword_model.py", dir);
        Process p = new ProcessBuilder(Python.python3(), script.toString(), "0").redirectError(ProcessBuilder.Redirect.DISCARD).start();
        try {
            String line = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8)).readLine();
            assertTrue(line != null && line.startsWith("listening on http://127.0.0.1:"), "python printed: " + line);
            String url = line.substring("listening on ".length()) + "/score";
            try (TextClassifier c = Connectors.open(ConnectorSettings.of(url).withBatch(3).withParallel(2))) {
                assertKeywordScores(c.score(TEXTS));
            }
        } finally {
            p.destroyForcibly();
            p.waitFor(10, TimeUnit.SECONDS);
        }
    }

    @Test
    void theLineExampleServesAsAnExecModel() throws Exception {
        Path script = Python.script("/org/telltale/connect/keyword_model_lines.py", dir);
        try (TextClassifier c = Connectors.open(ConnectorSettings.of("exec:" + Python.python3() + " "
                + JavaProcess.quote(script.toString())).withBatch(3))) {
            assertKeywordScores(c.score(TEXTS));
        }
    }
}
