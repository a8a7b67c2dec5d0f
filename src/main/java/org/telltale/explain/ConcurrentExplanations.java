package org.telltale.explain;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.function.Consumer;
import java.util.function.IntFunction;
import org.telltale.Futures;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;
import org.telltale.text.Document;

/**
 * Explains several documents at once and hands the explanations on in the documents' order. One
 * document alternates between computing (cutting units, drawing and masking probes, fitting) and
 * waiting for the model to score a round of probes. Results do not change with the number at
 * once: each document draws from its own random stream ({@link Explainer}).
 *
 * <p>Two shapes. With the model in this process ({@link #inProcess()}) waiting for the model is
 * computing too, so one document per core is explained at once. With the model elsewhere (a
 * service, a subprocess: {@link #forRemoteModel()}) a document waiting for its scores needs no
 * core, so more documents are in flight than there are cores: at most one per core computes
 * ({@link CoreTurns}) and the rest have their probes queued at the connector, which keeps the
 * service busy while the others fit. The explainer must then reach the model through
 * {@link #waitingOn}, which gives the core back while a round is out.
 *
 * <p>Memory: at most {@link #documentsAtOnce()} documents hold probes at a time, each one round's
 * masked texts (bounded by {@code ProbeSet.MAX_CHARS_PER_CALL} per call) and scores; finished
 * explanations wait for the earlier ones to be handed on.
 */
public final class ConcurrentExplanations {
    /** Documents in flight beyond one per core against a remote model: one being scored, one queued behind it. */
    static final int WAITING_AHEAD = 2;

    private final int documentsAtOnce;
    private final CoreTurns turns;
    private final ThreadLocal<Turn> current = new ThreadLocal<>();

    private ConcurrentExplanations(int documentsAtOnce, CoreTurns turns) {
        if (documentsAtOnce < 1) {
            throw new IllegalArgumentException("documentsAtOnce must be at least 1: " + documentsAtOnce);
        }
        this.documentsAtOnce = documentsAtOnce;
        this.turns = turns;
    }

    /** For a model that scores in this process: one document per core, and at least two. */
    public static ConcurrentExplanations inProcess() {
        return new ConcurrentExplanations(Math.max(2, cores()), null);
    }

    /** For a model that scores elsewhere: one document computing per core, {@value #WAITING_AHEAD} more waiting for the model. */
    public static ConcurrentExplanations forRemoteModel() {
        return withCores(cores() + WAITING_AHEAD, cores());
    }

    /** {@code documentsAtOnce} in flight, all computing at will (tests; {@code 1} is one after another). */
    static ConcurrentExplanations atOnce(int documentsAtOnce) {
        return new ConcurrentExplanations(documentsAtOnce, null);
    }

    /** {@code documentsAtOnce} in flight, at most {@code cores} of them computing (tests). */
    static ConcurrentExplanations withCores(int documentsAtOnce, int cores) {
        return new ConcurrentExplanations(documentsAtOnce, new CoreTurns(cores));
    }

    private static int cores() {
        return Math.max(1, Runtime.getRuntime().availableProcessors());
    }

    /** How many documents are in flight at most. */
    public int documentsAtOnce() {
        return documentsAtOnce;
    }

    /**
     * {@code model} as the explainer should reach it: for a remote model a view that gives the
     * calling worker's core back while a round is being scored; otherwise {@code model} itself.
     * Closing the view does not close {@code model}; its owner does.
     */
    public TextClassifier waitingOn(TextClassifier model) {
        return turns == null ? model : new WaitingModel(model);
    }

    /** Tells what a worker is about to do: document {@code position} (0-based) of {@code of}. */
    public interface Start {
        void explaining(Document document, int position, int of);
    }

    /**
     * Explains {@code documents} for {@code labelOrNull} and gives each explanation to
     * {@code inOrder} in the documents' order, on the calling thread. The first failure in
     * document order is thrown as it was (the rest are abandoned).
     */
    public void explain(Explainer explainer, List<Document> documents, String labelOrNull, Start start,
            Consumer<Explanation> inOrder) {
        inOrder(documents.size(), i -> {
            start.explaining(documents.get(i), i, documents.size());
            return explainer.explain(documents.get(i), labelOrNull);
        }, inOrder);
    }

    /**
     * Runs {@code work} for positions 0 to {@code count - 1}, as many at once as this allows, and
     * gives the results to {@code then} in position order on the calling thread. The first
     * failure in position order is thrown as it was (unchecked exceptions and errors unwrapped;
     * the rest of the work is abandoned).
     */
    public <R> void inOrder(int count, IntFunction<R> work, Consumer<R> then) {
        int threads = Math.min(documentsAtOnce, count);
        if (threads <= 1) {
            for (int i = 0; i < count; i++) {
                then.accept(work.apply(i));
            }
            return;
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "telltale-explain");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<R>> pending = new ArrayList<>(count);
            for (int i = 0; i < count; i++) {
                int position = i;
                pending.add(pool.submit(() -> withTurn(position, work)));
            }
            for (Future<R> next : pending) {
                then.accept(Futures.await(next, "an explanation"));
            }
        } finally {
            pool.shutdownNow();
        }
    }

    /** Runs one position's work holding a core, except while {@link WaitingModel} waits for the model. */
    private <R> R withTurn(int position, IntFunction<R> work) {
        if (turns == null) {
            return work.apply(position);
        }
        Turn turn = new Turn(position);
        current.set(turn);
        try {
            turns.take(true, position);
            turn.held = true;
            return work.apply(position);
        } finally {
            if (turn.held) {
                turns.give();
            }
            current.remove();
        }
    }

    /** A worker's place in the run, and whether it holds a core now. */
    private static final class Turn {
        final int position;
        boolean preparing = true;
        boolean held;

        Turn(int position) {
            this.position = position;
        }
    }

    /** The model as a worker reaches it: the worker's core is free for another while the model scores. */
    private final class WaitingModel implements TextClassifier {
        private final TextClassifier model;

        WaitingModel(TextClassifier model) {
            this.model = model;
        }

        @Override
        public ScoreMatrix score(List<String> texts) {
            return score(texts, null);
        }

        @Override
        public ScoreMatrix score(List<String> texts, List<String> ids) {
            Turn turn = current.get();
            if (turn == null || !turn.held) {
                return model.score(texts, ids);
            }
            turns.give();
            turn.held = false;
            ScoreMatrix answer = model.score(texts, ids); // on failure the turn stays given back
            turn.preparing = false;
            turns.take(false, turn.position);
            turn.held = true;
            return answer;
        }

        @Override
        public long retries() {
            return model.retries();
        }

        @Override
        public String concurrency() {
            return model.concurrency();
        }

        @Override
        public String describe() {
            return model.describe();
        }
    }
}
