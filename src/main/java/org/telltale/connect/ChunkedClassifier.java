package org.telltale.connect;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import org.telltale.TelltaleException;
import org.telltale.model.ClassifierException;
import org.telltale.model.ScoreMatrix;
import org.telltale.model.TextClassifier;

/**
 * The {@link TextClassifier} every connector hands out: it splits whatever the caller passes into
 * batches of at most {@code batch} texts, keeps up to {@code parallel} of them in flight, retries
 * transient failures with backoff, validates every answer and puts the rows back in the caller's
 * order. Thread-safe; calls from several threads share the same in-flight limit.
 */
final class ChunkedClassifier implements TextClassifier {
    private final BatchScorer scorer;
    private final int batch;
    private final int parallel;
    private final RetryPolicy retryPolicy;
    private final ResponseValidator validator;
    private final Redactor redactor;
    private final String description;
    private final ExecutorService pool;
    private final AtomicLong retries = new AtomicLong();

    ChunkedClassifier(BatchScorer scorer, ConnectorSettings settings, Redactor redactor, String description) {
        this.scorer = scorer;
        this.batch = settings.batch();
        this.parallel = settings.effectiveParallel();
        this.retryPolicy = new RetryPolicy(settings.retries(), settings.backoff());
        this.validator = new ResponseValidator(settings.scores());
        this.redactor = redactor;
        this.description = redactor.redact(description);
        this.pool = Executors.newFixedThreadPool(parallel, daemonThreads());
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
        int n = texts.size();
        double[][] rows = new double[n][];
        double[][] logits = validator.kind() == ScoreKind.LOGITS ? new double[n][] : null; // kept for the explainer
        List<Future<?>> pending = new ArrayList<>((n + batch - 1) / batch);
        for (int offset = 0; offset < n; offset += batch) {
            int from = offset;
            int to = Math.min(n, offset + batch);
            var place = new ResponseValidator.BatchPlace(from / batch + 1, from, to - from, ids, redactor);
            List<String> chunk = List.copyOf(texts.subList(from, to));
            pending.add(pool.submit(() -> {
                double[][] partLogits = logits == null ? null : new double[chunk.size()][];
                double[][] part = scoreWithRetries(chunk, place, partLogits);
                System.arraycopy(part, 0, rows, from, part.length);
                if (logits != null) {
                    System.arraycopy(partLogits, 0, logits, from, partLogits.length);
                }
                return null;
            }));
        }
        awaitAll(pending);
        List<String> labels = validator.labels();
        return new ScoreMatrix(labels == null ? List.of() : labels, rows, logits);
    }

    private double[][] scoreWithRetries(List<String> chunk, ResponseValidator.BatchPlace place, double[][] logits) {
        for (int attempt = 0; ; attempt++) {
            if (Thread.currentThread().isInterrupted()) {
                throw new CancellationException();
            }
            RawScores raw;
            try {
                raw = scorer.score(chunk);
            } catch (MalformedResponse bad) {
                throw new ClassifierException(redactor.redact(place.name() + ": " + bad.getMessage()));
            } catch (ClassifierException e) {
                // A final failure (e.g. HTTP 400): name the batch, and make sure no secret travels on.
                throw new ClassifierException(redactor.redact(place.name() + ": " + e.getMessage()), e.getCause());
            } catch (TransientFailure failure) {
                if (attempt >= retryPolicy.retries()) {
                    throw new ClassifierException(redactor.redact(place.name() + ": " + failure.getMessage()
                            + (attempt == 0 ? "" : " (after " + attempt + (attempt == 1 ? " retry)" : " retries)"))),
                            failure.getCause());
                }
                Duration wait = retryPolicy.delay(attempt, failure.retryAfter());
                if (failure.retryAfter() != null && failure.retryAfter().compareTo(RetryPolicy.MAX_RETRY_AFTER) > 0) {
                    throw new ClassifierException(redactor.redact(place.name() + ": the model asks to retry after "
                            + failure.retryAfter().toSeconds() + " s, longer than the "
                            + RetryPolicy.MAX_RETRY_AFTER.toSeconds() + " s Telltale waits; " + failure.getMessage()));
                }
                retries.incrementAndGet();
                sleep(wait);
                continue;
            }
            return validator.validate(raw, chunk.size(), place, logits);
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

    private void awaitAll(List<Future<?>> pending) {
        for (int i = 0; i < pending.size(); i++) {
            try {
                pending.get(i).get();
            } catch (ExecutionException e) {
                for (Future<?> f : pending) {
                    f.cancel(true);
                }
                Throwable cause = e.getCause();
                if (cause instanceof TelltaleException te) {
                    throw te;
                }
                throw new ClassifierException(redactor.redact("scoring through " + description + " failed: " + cause), cause);
            } catch (InterruptedException e) {
                for (Future<?> f : pending) {
                    f.cancel(true);
                }
                Thread.currentThread().interrupt();
                throw new ClassifierException("scoring was interrupted");
            }
        }
    }

    /** How many requests were retried so far, over the connector's life. */
    @Override
    public long retries() {
        return retries.get();
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
