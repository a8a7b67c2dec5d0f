package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayDeque;
import java.util.PriorityQueue;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * {@link AdaptiveLimit} against simulated services of known capacity, on a made-up clock: a
 * service with {@code slots} workers that each take {@code serviceMillis} (±10 %, seeded), and
 * either queue what is over capacity or refuse it with a 429. The client has endless work and
 * loses {@code turnaroundMillis} between an answer and the request that replaces it. Expected
 * behaviour from Brakmo and Peterson (1995), TCP Vegas: the sender settles where between α and β
 * requests wait at the bottleneck, so it is kept busy without an ever-growing queue.
 */
class AdaptiveLimitTest {
    private static final long MS = 1_000_000L;

    /** What a simulated run measured after its first {@code settleMillis}. */
    record Run(double utilization, int minLimit, int maxLimit, int maxInFlight, long requests, long rejected) {
    }

    private static Run simulate(int slots, double serviceMillis, double turnaroundMillis, boolean reject, long seconds,
            long settleMillis, int max, long seed) {
        AdaptiveLimit limit = new AdaptiveLimit(4, max);
        Random random = new Random(seed);
        // events: {time, kind, sentAt, inFlightAtSend}; kind 0 = client sends, 1 = service done, 2 = refused
        PriorityQueue<long[]> events = new PriorityQueue<>((a, b) -> Long.compare(a[0], b[0]));
        ArrayDeque<long[]> queue = new ArrayDeque<>();
        int busy = 0;
        int inFlight = 0;
        int pendingSends = 0;
        long busyNanos = 0;
        long settle = settleMillis * MS;
        long end = seconds * 1000 * MS;
        int minLimit = Integer.MAX_VALUE;
        int maxLimit = 0;
        int maxInFlight = 0;
        long requests = 0;
        long rejected = 0;
        long now = 0;
        for (int i = 0; i < limit.limit(); i++) {
            events.add(new long[] {0, 0, 0, 0});
            pendingSends++;
        }
        while (!events.isEmpty() && now < end) {
            long[] e = events.poll();
            now = e[0];
            if (e[1] == 0) {
                pendingSends--;
                inFlight++;
                long[] request = {now, inFlight};
                if (now >= settle) {
                    requests++;
                    maxInFlight = Math.max(maxInFlight, inFlight);
                }
                if (busy < slots) {
                    busy++;
                    long service = (long) (serviceMillis * MS * (0.9 + 0.2 * random.nextDouble()));
                    busyNanos += now >= settle ? service : 0;
                    events.add(new long[] {now + service, 1, request[0], request[1]});
                } else if (reject) {
                    events.add(new long[] {now + MS / 10, 2, request[0], request[1]});
                } else {
                    queue.add(request);
                }
            } else {
                inFlight--;
                if (e[1] == 1) {
                    busy--;
                    limit.answered(now, e[2], now - e[2], 64, (int) e[3], true);
                    long[] next = queue.poll();
                    if (next != null) {
                        busy++;
                        long service = (long) (serviceMillis * MS * (0.9 + 0.2 * random.nextDouble()));
                        busyNanos += now >= settle ? service : 0;
                        events.add(new long[] {now + service, 1, next[0], next[1]});
                    }
                } else {
                    if (now >= settle) {
                        rejected++;
                    }
                    limit.overloaded(now, e[2], (int) e[3], false);
                }
            }
            if (now >= settle) {
                minLimit = Math.min(minLimit, limit.limit());
                maxLimit = Math.max(maxLimit, limit.limit());
            }
            // The client fills every free place after its turnaround (a refused request is resent likewise).
            while (inFlight + pendingSends < limit.limit()) {
                events.add(new long[] {now + (long) (turnaroundMillis * MS), 0, 0, 0});
                pendingSends++;
            }
        }
        double window = (double) (end - settle) * slots;
        return new Run(busyNanos / window, minLimit, maxLimit, maxInFlight, requests, rejected);
    }

    @Test
    void aQueueingServiceIsKeptBusyWithAFewRequestsWaiting() {
        for (int[] shape : new int[][] {{4, 20}, {16, 20}, {2, 5}}) {
            int slots = shape[0];
            Run run = simulate(slots, shape[1], 1.0, false, 20, 2000, 64, 11);
            String what = slots + " slots of " + shape[1] + " ms: " + run;
            assertTrue(run.utilization() >= 0.95, what);
            // Once settled: more than the slots (a request waits), never more than twice the slots.
            assertTrue(run.minLimit() > slots && run.maxInFlight() <= 2 * slots, what);
        }
    }

    @Test
    void aServiceThatRefusesAboveItsCapacityIsHeldBelowIt() {
        Run run = simulate(4, 20, 1.0, true, 30, 2000, 64, 5);
        String what = run.toString();
        assertTrue(run.maxLimit() <= 5, what); // at most one place above capacity, while probing
        assertTrue(run.rejected() < 0.05 * run.requests(), what);
        assertTrue(run.utilization() >= 0.8, what); // 4 in flight and a 1 ms turnaround per 20 ms
    }

    @Test
    void neverExceedsItsMaximum() {
        Run run = simulate(200, 20, 0.1, false, 5, 0, 24, 3);
        assertEquals(24, run.maxLimit(), run.toString());
        assertTrue(run.maxInFlight() <= 24, run.toString());
    }

    @Test
    void aTimeoutHalvesTheLimitOncePerRound() {
        AdaptiveLimit limit = new AdaptiveLimit(16, 64);
        limit.answered(10 * MS, 0, 10 * MS, 64, 1, false);
        limit.overloaded(100 * MS, 20 * MS, 16, true);
        assertEquals(8, limit.limit());
        // Requests sent before that cut time out too: no further cut for them.
        limit.overloaded(101 * MS, 30 * MS, 16, true);
        assertEquals(8, limit.limit());
        limit.overloaded(300 * MS, 150 * MS, 8, true);
        assertEquals(4, limit.limit());
    }

    @Test
    void doesNotGrowWhileTheCallerSendsLessThanTheLimit() {
        AdaptiveLimit limit = new AdaptiveLimit(4, 64);
        for (int i = 0; i < 100; i++) {
            // flat latency, 2 in flight, nobody waiting: the limit is not what holds throughput back
            limit.answered((i + 1) * 20 * MS, i * 20 * MS, 20 * MS, 64, 2, false);
        }
        assertEquals(4, limit.limit());
    }

    @Test
    void smallBatchesDoNotSetTheBaseLatency() {
        AdaptiveLimit limit = new AdaptiveLimit(4, 64);
        limit.answered(20 * MS, 0, 20 * MS, 64, 1, false);
        limit.answered(30 * MS, 25 * MS, 2 * MS, 3, 1, false); // a last batch of 3 texts, quick
        assertEquals(20 * MS, limit.baseRtt());
    }
}
