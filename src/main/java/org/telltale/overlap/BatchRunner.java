package org.telltale.overlap;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import java.util.function.Function;
import org.telltale.Futures;

/**
 * Feeds items, in batches, to worker threads while the caller keeps reading: at most
 * {@code maxInFlight} batches wait or run at once, so memory stays bounded by the work in flight.
 * Results come back in submission order. Used from one thread.
 */
final class BatchRunner<T, R> {
    private final ExecutorService pool;
    private final int batchSize;
    private final int maxInFlight;
    private final Function<List<T>, R> work;
    private final List<Future<R>> futures = new ArrayList<>();
    private final List<R> results = new ArrayList<>();
    private List<T> current;

    BatchRunner(ExecutorService pool, int batchSize, int maxInFlight, Function<List<T>, R> work) {
        this.pool = pool;
        this.batchSize = batchSize;
        this.maxInFlight = maxInFlight;
        this.work = work;
        this.current = new ArrayList<>(batchSize);
    }

    void add(T item) {
        current.add(item);
        if (current.size() == batchSize) {
            submit();
        }
    }

    /** Waits for every batch and returns the results in order. */
    List<R> finish() {
        if (!current.isEmpty()) {
            submit();
        }
        while (results.size() < futures.size()) {
            collectOldest();
        }
        return results;
    }

    private void submit() {
        List<T> batch = current;
        current = new ArrayList<>(batchSize);
        futures.add(pool.submit(() -> work.apply(batch)));
        while (futures.size() - results.size() > maxInFlight) {
            collectOldest();
        }
    }

    private void collectOldest() {
        Future<R> oldest = futures.get(results.size());
        futures.set(results.size(), null);
        results.add(Futures.await(oldest, "a worker"));
    }
}
