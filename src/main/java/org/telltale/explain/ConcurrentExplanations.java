package org.telltale.explain;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import org.telltale.Futures;
import org.telltale.text.Document;

/**
 * Explains several documents at once and hands the explanations on in the documents' order. One
 * document alternates between waiting for the model (a round of probes) and fitting (the
 * explainer's own work); with a few in flight, one's fitting overlaps another's scoring, so a
 * model service stays busy, and fits of different documents share the cores. Results do not
 * change: each document draws from its own random stream ({@link Explainer}).
 */
public final class ConcurrentExplanations {
    private ConcurrentExplanations() {
    }

    /** How many documents to explain at once here: one per core, and at least two so that fitting overlaps scoring. */
    public static int atOnce() {
        return Math.max(2, Runtime.getRuntime().availableProcessors());
    }

    /** Tells what a worker is about to do: document {@code position} (0-based) of {@code of}. */
    public interface Start {
        void explaining(Document document, int position, int of);
    }

    /**
     * Explains {@code documents} for {@code labelOrNull}, at most {@code atOnce} at a time, and
     * gives each explanation to {@code inOrder} in the documents' order, on the calling thread.
     * The first failure in document order is thrown as it was (the rest are abandoned).
     */
    public static void explain(Explainer explainer, List<Document> documents, String labelOrNull, int atOnce,
            Start start, Consumer<Explanation> inOrder) {
        if (atOnce < 1) {
            throw new IllegalArgumentException("atOnce must be at least 1: " + atOnce);
        }
        int threads = Math.min(atOnce, documents.size());
        if (threads <= 1) {
            for (int i = 0; i < documents.size(); i++) {
                start.explaining(documents.get(i), i, documents.size());
                inOrder.accept(explainer.explain(documents.get(i), labelOrNull));
            }
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "telltale-explain");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<Explanation>> pending = new ArrayList<>(documents.size());
            for (int i = 0; i < documents.size(); i++) {
                Document doc = documents.get(i);
                int position = i;
                pending.add(pool.submit(() -> {
                    start.explaining(doc, position, documents.size());
                    return explainer.explain(doc, labelOrNull);
                }));
            }
            for (Future<Explanation> next : pending) {
                inOrder.accept(Futures.await(next, "an explanation"));
            }
        } finally {
            pool.shutdownNow();
        }
    }
}
