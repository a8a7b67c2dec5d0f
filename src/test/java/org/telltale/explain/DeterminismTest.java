package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.telltale.report.json.ExplanationsJson;
import org.telltale.text.Document;

/** Same seed, same JSON byte for byte (timing aside), whatever the order and thread count (common practice). */
class DeterminismTest {
    private static final List<Document> DOCS = List.of(
            Document.unlabelled("q-1", "refund for the broken kettle please, the kettle arrived broken and late"),
            Document.unlabelled("q-2", "where is my parcel, the tracking page has said in transit for nine days"),
            Document.unlabelled("q-3", "thanks, the replacement arrived quickly and works well, great service"),
            Document.unlabelled("q-4", "invoice 7731 charged twice, please cancel one charge and confirm by mail"));

    private static double model(java.util.Set<String> w) {
        double z = (w.contains("broken") ? 1.4 : 0) + (w.contains("late") ? 0.8 : 0) - (w.contains("great") ? 1.1 : 0)
                - (w.contains("thanks") ? 0.6 : 0) + (w.contains("twice") ? 0.9 : 0) + 0.05 * w.size() - 0.7;
        return 1 / (1 + Math.exp(-z));
    }

    private static String stripTiming(String json) {
        return json.replaceAll("\"model_ms\" : \\d+", "\"model_ms\" : 0").replaceAll("\"total_ms\" : \\d+", "\"total_ms\" : 0");
    }

    private static String run(ExplainSettings settings, int threads, boolean reversed) throws Exception {
        Explainer explainer = new Explainer(new FunctionClassifier(DeterminismTest::model), settings);
        List<Document> order = new ArrayList<>(DOCS);
        if (reversed) {
            Collections.reverse(order);
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<Explanation>> futures = new ArrayList<>();
            for (Document d : order) {
                futures.add(pool.submit(() -> explainer.explain(d, null)));
            }
            List<Explanation> out = new ArrayList<>();
            for (Future<Explanation> f : futures) {
                out.add(f.get());
            }
            out.sort(java.util.Comparator.comparing(Explanation::id));
            return stripTiming(ExplanationsJson.toJson(out));
        } finally {
            pool.shutdown();
        }
    }

    @Test
    void sameSeedGivesByteIdenticalJsonWhateverTheThreadCountAndOrder() throws Exception {
        ExplainSettings fixed = ExplainSettings.defaults().withProbes(700).withWords(5);
        String one = run(fixed, 1, false);
        assertEquals(one, run(fixed, 3, true));
        assertEquals(one, run(fixed, 4, false));
        assertNotEquals(one, run(fixed.withSeed(2), 1, false), "another seed must draw other probes");
        ExplainSettings adaptive = fixed.withProbes(ExplainSettings.AUTO).withProbeCap(1500);
        assertEquals(run(adaptive, 1, false), run(adaptive, 3, true));
    }
}
