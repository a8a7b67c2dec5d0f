package org.telltale.connect;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.CompletionService;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutionException;
import java.util.Locale;
import java.util.concurrent.Future;
import java.util.concurrent.LinkedBlockingQueue;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import org.telltale.TelltaleException;
import org.telltale.model.ClassifierException;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * The {@link TextClassifier} every connector hands out: it splits whatever the caller passes into
 * batches of at most {@code batch} texts, keeps requests in flight as its {@link InFlightGate}
 * admits them (a fixed number, or an {@link AdaptiveLimit} that finds the service's capacity),
 * retries transient failures with backoff, validates every answer and puts the rows back in the
 * caller's order. Thread-safe; calls from several threads share the same gate.
 *
 * <p>Each batch runs on a worker that reserves a place among the prepared requests, encodes its
 * batch, then asks the gate for a place in flight, so a prepared request is waiting whenever a
 * place frees; it decodes and validates the answer after giving its place back. The gate keeps at
 * most {@link InFlightGate#ahead} requests prepared beyond its limit (four, or half the limit), which bounds the
 * bodies held in memory and the encoding done ahead of need.
 */
final class ChunkedClassifier implements TextClassifier {

    private final BatchScorer scorer;
    private final int batch;
    private final InFlightGate gate;
    private final String unit;
    private final RetryPolicy retryPolicy;
    private final ResponseValidator validator;
    private final Redactor redactor;
    private final String description;
    private final ThreadPoolExecutor pool;
    private final int maxWorkers;
    private final AtomicLong retries = new AtomicLong();
    private final TurnaroundTrace trace;
    private final ColdStartWarmUp warmUp;

    ChunkedClassifier(BatchScorer scorer, ConnectorSettings settings, Redactor redactor, String description) {
        this(scorer, settings, settings.gatePolicy(), redactor, description, ColdStartWarmUp.notStarted());
    }

    /** With a {@code warmUp} of the connector's code, stopped at the first call. */
    ChunkedClassifier(BatchScorer scorer, ConnectorSettings settings, Redactor redactor, String description,
            ColdStartWarmUp warmUp) {
        this(scorer, settings, settings.gatePolicy(), redactor, description, warmUp);
    }

    ChunkedClassifier(BatchScorer scorer, ConnectorSettings settings, InFlightGate.Policy policy, Redactor redactor,
            String description) {
        this(scorer, settings, policy, redactor, description, ColdStartWarmUp.notStarted());
    }

    private ChunkedClassifier(BatchScorer scorer, ConnectorSettings settings, InFlightGate.Policy policy, Redactor redactor,
            String description, ColdStartWarmUp warmUp) {
        this.warmUp = warmUp;
        this.scorer = scorer;
        this.batch = settings.batch();
        this.trace = TurnaroundTrace.ON ? new TurnaroundTrace() : null;
        this.gate = new InFlightGate(policy, trace);
        this.unit = settings.kind() == ConnectorSettings.Kind.SUBPROCESS ? "processes" : "requests";
        this.retryPolicy = new RetryPolicy(settings.retries(), settings.backoff());
        this.validator = new ResponseValidator(settings.scores());
        this.redactor = redactor;
        this.description = redactor.redact(description);
        this.maxWorkers = policy.max() + InFlightGate.ahead(policy.max());
        int first = workersFor(policy.limit());
        this.pool = new ThreadPoolExecutor(first, maxWorkers, 30, TimeUnit.SECONDS, new LinkedBlockingQueue<>(), daemonThreads());
        this.pool.allowCoreThreadTimeOut(true);
        // Started now, while the caller prepares its texts: in a fresh JVM, starting a thread per batch
        // submitted spread the first 16 requests of a run over 30 ms (docs/performance.md, "Cold start").
        this.pool.prestartAllCoreThreads();
    }

    /** Workers to keep a limit busy: one per place in flight and per body prepared ahead of it. */
    private int workersFor(int limit) {
        return Math.min(maxWorkers, limit + InFlightGate.ahead(limit));
    }

    /**
     * Grows the workers with the limit (a worker waits for its place, so more than the limit plus
     * the bodies ahead would only wait); never shrinks them, so a lower limit keeps its threads.
     */
    private void growWorkers() {
        int wanted = workersFor(gate.limit());
        if (wanted > pool.getCorePoolSize()) {
            synchronized (pool) {
                if (wanted > pool.getCorePoolSize()) {
                    pool.setCorePoolSize(wanted);
                }
            }
        }
    }

    @Override
    public ScoreMatrix score(List<String> texts) {
        return score(texts, null);
    }

    @Override
    public ScoreMatrix score(List<String> texts, List<String> ids) {
        if (ids != null && ids.size() != texts.size()) {
            throw new IllegalArgumentException(ids.size() + " ids for " + texts.size() + " texts");
        }
        warmUp.stop();
        int n = texts.size();
        double[][] rows = new double[n][];
        double[][] logits = validator.kind() == ScoreKind.LOGITS ? new double[n][] : null; // kept for the explainer
        List<Future<?>> pending = new ArrayList<>((n + batch - 1) / batch);
        CompletionService<Object> done = new ExecutorCompletionService<>(pool);
        for (int offset = 0; offset < n; offset += batch) {
            int from = offset;
            int to = Math.min(n, offset + batch);
            var place = new ResponseValidator.BatchPlace(from / batch + 1, from, to - from, ids, redactor);
            List<String> chunk = texts.subList(from, to);
            pending.add(done.submit(() -> {
                double[][] partLogits = logits == null ? null : new double[chunk.size()][];
                double[][] part = scoreWithRetries(chunk, place, partLogits);
                System.arraycopy(part, 0, rows, from, part.length);
                if (logits != null) {
                    System.arraycopy(partLogits, 0, logits, from, partLogits.length);
                }
                return null;
            }));
        }
        awaitAll(pending, done);
        List<String> labels = validator.labels();
        return new ScoreMatrix(labels == null ? List.of() : labels, rows, logits);
    }

    private double[][] scoreWithRetries(List<String> chunk, ResponseValidator.BatchPlace place, double[][] logits) {
        long started = trace == null ? 0 : System.nanoTime();
        reserve();
        long reservedAt = trace == null ? 0 : System.nanoTime();
        boolean reserved = true;
        InFlightGate.Ticket kept = null;
        try {
            BatchScorer.Exchange exchange = scorer.prepare(chunk);
            long encodedAt = trace == null ? 0 : System.nanoTime();
            for (int attempt = 0; ; attempt++) {
                if (Thread.currentThread().isInterrupted()) {
                    throw new CancellationException();
                }
                InFlightGate.Ticket ticket = kept != null ? gate.again(kept) : admit(reserved);
                reserved = false;
                kept = null;
                BatchScorer.Reply reply;
                try {
                    reply = exchange.send();
                } catch (TransientFailure failure) {
                    // A retry keeps its place unless the service named a delay (Retry-After): then the
                    // place goes to work the service can take now.
                    boolean retry = attempt < retryPolicy.retries();
                    boolean keep = retry && failure.retryAfter() == null;
                    gate.failed(ticket, failure.overload(), keep);
                    kept = keep ? ticket : null;
                    if (!retry) {
                        throw new ClassifierException(redactor.redact(place.name() + ": " + failure.getMessage()
                                + (attempt == 0 ? "" : " (after " + attempt + (attempt == 1 ? " retry)" : " retries)"))),
                                failure.getCause());
                    }
                    if (failure.retryAfter() != null && failure.retryAfter().compareTo(RetryPolicy.MAX_RETRY_AFTER) > 0) {
                        throw new ClassifierException(redactor.redact(place.name() + ": the model asks to retry after "
                                + failure.retryAfter().toSeconds() + " s, longer than the "
                                + RetryPolicy.MAX_RETRY_AFTER.toSeconds() + " s Telltale waits; " + failure.getMessage()));
                    }
                    retries.incrementAndGet();
                    sleep(retryPolicy.delay(attempt, failure.retryAfter()));
                    continue;
                } catch (MalformedResponse bad) {
                    gate.failed(ticket, TransientFailure.Overload.NONE);
                    throw new ClassifierException(redactor.redact(place.name() + ": " + bad.getMessage()));
                } catch (ClassifierException e) {
                    gate.failed(ticket, TransientFailure.Overload.NONE);
                    // A final failure (e.g. HTTP 400): name the batch, and make sure no secret travels on.
                    throw new ClassifierException(redactor.redact(place.name() + ": " + e.getMessage()), e.getCause());
                } catch (RuntimeException | Error e) {
                    gate.failed(ticket, TransientFailure.Overload.NONE);
                    throw e;
                }
                long answeredAt = trace == null ? 0 : System.nanoTime();
                gate.answered(ticket, chunk.size(), reply.measured());
                growWorkers();
                RawScores raw;
                try {
                    raw = reply.decode();
                } catch (MalformedResponse bad) {
                    throw new ClassifierException(redactor.redact(place.name() + ": " + bad.getMessage()));
                }
                if (trace == null) {
                    return validator.validate(raw, chunk.size(), place, logits);
                }
                long decodedAt = System.nanoTime();
                double[][] valid = validator.validate(raw, chunk.size(), place, logits);
                if (attempt == 0) {
                    long firstByte = TurnaroundTrace.firstByteSince(ticket.sentAt(), ticket.sentAt());
                    if (TurnaroundTrace.tookFreedPlace()) {
                        trace.setupAfterFreed(firstByte - ticket.sentAt());
                    }
                    trace.request(started, reservedAt, encodedAt, ticket.sentAt(), firstByte, answeredAt, decodedAt,
                            System.nanoTime());
                }
                return valid;
            }
        } finally {
            if (kept != null) {
                gate.release(kept);
            }
            if (reserved) {
                gate.unreserve();
            }
        }
    }

    private void reserve() {
        try {
            gate.reserve();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException();
        }
    }

    private InFlightGate.Ticket admit(boolean reserved) {
        try {
            return gate.admit(reserved);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException();
        }
    }

    private static void sleep(Duration d) {
        try {
            Thread.sleep(d.toMillis());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException();
        }
    }

    /**
     * Waits for every batch, in the order they finish: the first batch to fail stops the call with
     * its own error (the others are cancelled), so the error shown is the one that happened first,
     * not whichever belongs to the lowest batch number.
     */
    private void awaitAll(List<Future<?>> pending, CompletionService<Object> done) {
        for (int i = 0; i < pending.size(); i++) {
            try {
                done.take().get();
            } catch (ExecutionException e) {
                cancel(pending);
                Throwable cause = e.getCause();
                if (cause instanceof TelltaleException te) {
                    throw te;
                }
                throw new ClassifierException(redactor.redact("scoring through " + description + " failed: " + cause), cause);
            } catch (InterruptedException e) {
                cancel(pending);
                Thread.currentThread().interrupt();
                throw new ClassifierException("scoring was interrupted");
            }
        }
    }

    private static void cancel(List<Future<?>> pending) {
        for (Future<?> f : pending) {
            f.cancel(true);
        }
    }

    /** How many requests were retried so far, over the connector's life. */
    @Override
    public long retries() {
        return retries.get();
    }

    /**
     * How many requests (processes, for {@code exec:}) were in flight: for {@code auto}, the level
     * the limit settled at (the one in force longest while requests were in flight) and the peak.
     */
    @Override
    public String concurrency() {
        if (!gate.adaptive()) {
            return String.format(Locale.ROOT, "%s in flight: %d (fixed)", unit, gate.max());
        }
        return String.format(Locale.ROOT, "%s in flight: auto, settled at %d (peak %d, at most %d)", unit, gate.settled(),
                gate.peak(), gate.max());
    }

    /** How many worker threads are started. */
    int workers() {
        return pool.getPoolSize();
    }

    /** The gate's current limit. */
    int limit() {
        return gate.limit();
    }

    /** The labels the first answer fixed, or null before any answer. */
    List<String> labels() {
        return validator.labels();
    }

    @Override
    public String describe() {
        return description;
    }

    @Override
    public void close() {
        warmUp.stop();
        if (trace != null) {
            trace.print(System.err);
        }
        pool.shutdownNow();
        scorer.close();
    }

    private static ThreadFactory daemonThreads() {
        AtomicInteger count = new AtomicInteger();
        return r -> {
            Thread t = new Thread(r, "telltale-scoring-" + count.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
    }
}
