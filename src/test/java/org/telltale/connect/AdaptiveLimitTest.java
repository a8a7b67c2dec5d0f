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
 * either queue what is over capacity or refuse it with a 429. Before a request reaches a worker the
 * service spends {@code handlingMillis} per request it reads or serves on reading it (one interpreter lock for
 * all its threads, as the Python bench service has), so latency grows with load before anything
 * waits for a worker. The client has endless work and loses {@code turnaroundMillis} between an
 * answer and the request that replaces it. Expected behaviour from Cardwell et al. (2016), BBR: the
 * limit doubles per round trip until the delivery rate stops growing, then settles a little above
 * the in-flight count where it stopped, so the workers are kept busy without an ever-growing queue.
 */
class AdaptiveLimitTest {
    private static final long MS = 1_000_000L;

    /** What a simulated run measured after its first {@code settleMillis}. */
    record Run(double utilization, int minLimit, int maxLimit, int maxInFlight, long requests, long rejected) {
    }

    /** A simulated service. */
    record Service(int slots, double serviceMillis, double handlingMillis, boolean reject) {
    }

    private static Run simulate(Service svc, double turnaroundMillis, long millis, long settleMillis, int max, long seed) {
        return simulate(svc, turnaroundMillis, millis, settleMillis, new AdaptiveLimit(4, max), seed);
    }

    private static Run simulate(Service svc, double turnaroundMillis, long millis, long settleMillis, AdaptiveLimit limit,
            long seed) {
        Random random = new Random(seed);
        // events: {time, kind, sentAt, inFlightAtSend, deliveredAtSend}; kind 0 = client sends,
        // 1 = service done, 2 = refused, 3 = request read by the service
        PriorityQueue<long[]> events = new PriorityQueue<>((a, b) -> Long.compare(a[0], b[0]));
        ArrayDeque<long[]> queue = new ArrayDeque<>();
        int busy = 0;
        int held = 0;
        int inFlight = 0;
        int pendingSends = 0;
        long delivered = 0;
        long busyNanos = 0;
        long settle = settleMillis * MS;
        long end = millis * MS;
        int minLimit = Integer.MAX_VALUE;
        int maxLimit = 0;
        int maxInFlight = 0;
        long requests = 0;
        long rejected = 0;
        long now = 0;
        for (int i = 0; i < limit.limit(); i++) {
            events.add(new long[] {0, 0, 0, 0, 0});
            pendingSends++;
        }
        while (!events.isEmpty() && now < end) {
            long[] e = events.poll();
            now = e[0];
            if (e[1] == 0) {
                pendingSends--;
                inFlight++;
                held++;
                if (now >= settle) {
                    requests++;
                    maxInFlight = Math.max(maxInFlight, inFlight);
                }
                // requests waiting for a worker cost the service nothing; those read or served do
                long handling = (long) (svc.handlingMillis() * MS * Math.min(held, svc.slots()));
                events.add(new long[] {now + handling, 3, now, inFlight, delivered});
            } else if (e[1] == 3) {
                if (busy < svc.slots()) {
                    busy++;
                    long service = (long) (svc.serviceMillis() * MS * (0.9 + 0.2 * random.nextDouble()));
                    busyNanos += now >= settle ? Math.min(service, Math.max(0, end - now)) : 0;
                    events.add(new long[] {now + service, 1, e[2], e[3], e[4]});
                } else if (svc.reject()) {
                    events.add(new long[] {now + MS / 10, 2, e[2], e[3], e[4]});
                } else {
                    queue.add(e);
                }
            } else {
                held--;
                if (e[1] == 1) {
                    busy--;
                    delivered++;
                    limit.answered(now, new InFlightGate.Answer(e[2], now - e[2], 64, (int) e[3], inFlight,
                            (int) (delivered - e[4]), true));
                    long[] next = queue.poll();
                    if (next != null) {
                        busy++;
                        long service = (long) (svc.serviceMillis() * MS * (0.9 + 0.2 * random.nextDouble()));
                        busyNanos += now >= settle ? Math.min(service, Math.max(0, end - now)) : 0;
                        events.add(new long[] {now + service, 1, next[2], next[3], next[4]});
                    }
                } else {
                    if (now >= settle) {
                        rejected++;
                    }
                    limit.overloaded(now, e[2], (int) e[3], false);
                }
                inFlight--;
            }
            if (now >= settle) {
                minLimit = Math.min(minLimit, limit.limit());
                maxLimit = Math.max(maxLimit, limit.limit());
            }
            // The client fills every free place after its turnaround (a refused request is resent likewise).
            while (inFlight + pendingSends < limit.limit()) {
                events.add(new long[] {now + (long) (turnaroundMillis * MS), 0, 0, 0, 0});
                pendingSends++;
            }
        }
        double window = (double) (end - settle) * svc.slots();
        return new Run(busyNanos / window, minLimit, maxLimit, maxInFlight, requests, rejected);
    }

    /** One answer of a full batch, demand waiting. */
    private static InFlightGate.Answer answer(long sentAt, long rtt, int inFlight, int deliveredSince) {
        return new InFlightGate.Answer(sentAt, rtt, 64, inFlight, inFlight, deliveredSince, true);
    }

    @Test
    void aQueueingServiceIsKeptBusyWithAFewRequestsWaiting() {
        for (int[] shape : new int[][] {{4, 20}, {16, 20}, {2, 5}}) {
            int slots = shape[0];
            Run run = simulate(new Service(slots, shape[1], 0, false), 1.0, 20_000, 2000, 64, 11);
            String what = slots + " slots of " + shape[1] + " ms: " + run;
            assertTrue(run.utilization() >= 0.95, what);
            // Once settled: more than the slots (a request waits), never more than twice the slots.
            assertTrue(run.minLimit() > slots && run.maxInFlight() <= 2 * slots, what);
        }
    }

    @Test
    void aServiceWhoseLatencyGrowsWithLoadBeforeAnythingWaitsIsStillFilled() {
        // 0.5 ms of handling per request held: 16 in flight answer in 28 ms with no worker idle
        // yet, which a latency signal reads as queueing; the delivery rate still grows.
        Service svc = new Service(16, 20, 0.5, false);
        Run run = simulate(svc, 1.0, 20_000, 2000, 64, 7);
        assertTrue(run.utilization() >= 0.95 && run.minLimit() > 16 && run.maxInFlight() <= 32, run.toString());
        Run two = simulate(new Service(2, 5, 0.5, false), 1.0, 20_000, 2000, 64, 7);
        assertTrue(two.utilization() >= 0.9 && two.maxInFlight() <= 4, two.toString());
    }

    @Test
    void reachesALargeCapacityWithinAFewRoundTrips() {
        // 300 batches against 16 workers of 20 ms are 0.375 s of work: the startup must fill them
        // in a few round trips (doubling each), not one more per round.
        Run run = simulate(new Service(16, 20, 0.5, false), 1.0, 400, 0, 64, 3);
        assertTrue(run.utilization() >= 0.85, run.toString());
        AdaptiveLimit limit = new AdaptiveLimit(4, 64);
        simulate(new Service(1000, 10, 0, false), 0.1, 45, 0, limit, 3);
        assertTrue(limit.limit() >= 32 && limit.inStartup(), "limit " + limit.limit()); // 4 → 8 → 16 → 32 in ~40 ms
    }

    @Test
    void leavesStartupWhenTheRateStopsGrowingAndSettlesAboveThePipe() {
        AdaptiveLimit limit = new AdaptiveLimit(4, 64);
        simulate(new Service(8, 20, 0, false), 1.0, 1000, 0, limit, 5);
        assertTrue(!limit.inStartup(), "still in startup at " + limit.limit());
        // 8 workers of 18–22 ms: 400 answers/s × 18 ms smallest latency = a pipe of about 7.2
        assertTrue(limit.pipe() >= 6.5 && limit.pipe() <= 8.5, "pipe " + limit.pipe());
        assertTrue(limit.limit() > 8 && limit.limit() <= 13, "limit " + limit.limit());
    }

    @Test
    void startupDoublesPerRoundTripOnSyntheticAnswers() {
        // Every request answers in 10 ms whatever the load: the rate grows with the limit.
        AdaptiveLimit limit = new AdaptiveLimit(4, 64);
        long now = 0;
        int expected = 4;
        for (int round = 0; round < 3; round++) {
            int n = limit.limit();
            long sentAt = now;
            now += 10 * MS;
            for (int i = 0; i < n; i++) {
                limit.answered(now, answer(sentAt, 10 * MS, n, i + 1));
            }
            expected *= 2;
            assertEquals(expected, limit.limit(), "after round " + round);
        }
    }

    @Test
    void aFlatRateEndsStartupAtOneAndAHalfPipes() {
        // A service that delivers 8 answers per 10 ms however many are sent: at 8 in flight 10 ms,
        // at n > 8 in flight n/8 × 10 ms.
        AdaptiveLimit limit = new AdaptiveLimit(4, 64);
        long now = 0;
        for (int round = 0; round < 8 && limit.inStartup(); round++) {
            int n = limit.limit();
            long rtt = Math.max(10, n * 10 / 8) * MS;
            long sentAt = now;
            now += rtt;
            for (int i = 0; i < n; i++) {
                limit.answered(now, answer(sentAt, rtt, n, Math.min(n, 8)));
            }
        }
        assertTrue(!limit.inStartup());
        // 8 answers per 10 ms × the 10 ms smallest latency: a pipe of 8, and the limit 1.5 pipes
        assertEquals(8, limit.pipe(), 0.5);
        assertEquals(Math.round(1.5 * limit.pipe()), limit.limit());
    }

    @Test
    void aServiceThatRefusesAboveItsCapacityIsHeldBelowIt() {
        Run run = simulate(new Service(4, 20, 0, true), 1.0, 30_000, 2000, 64, 5);
        String what = run.toString();
        assertTrue(run.maxLimit() <= 5, what); // at most one place above capacity, while probing
        assertTrue(run.rejected() < 0.05 * run.requests(), what);
        assertTrue(run.utilization() >= 0.8, what); // 4 in flight and a 1 ms turnaround per 20 ms
    }

    @Test
    void neverExceedsItsMaximum() {
        Run run = simulate(new Service(200, 20, 0, false), 0.1, 5000, 0, 24, 3);
        assertEquals(24, run.maxLimit(), run.toString());
        assertTrue(run.maxInFlight() <= 24, run.toString());
    }

    @Test
    void aTimeoutHalvesTheLimitOncePerRound() {
        AdaptiveLimit limit = new AdaptiveLimit(16, 64);
        limit.answered(10 * MS, new InFlightGate.Answer(0, 10 * MS, 64, 1, 1, 1, false));
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
            limit.answered((i + 1) * 20 * MS, new InFlightGate.Answer(i * 20 * MS, 20 * MS, 64, 2, 2, 2, false));
        }
        assertEquals(4, limit.limit());
    }

    @Test
    void smallBatchesDoNotSetTheBaseLatency() {
        AdaptiveLimit limit = new AdaptiveLimit(4, 64);
        limit.answered(20 * MS, new InFlightGate.Answer(0, 20 * MS, 64, 1, 1, 1, false));
        limit.answered(30 * MS, new InFlightGate.Answer(25 * MS, 2 * MS, 3, 1, 1, 1, false)); // a last batch of 3 texts, quick
        assertEquals(20 * MS, limit.baseRtt());
    }

    @Test
    void aQueueBuildingWhileTheRateStillGrowsEndsStartup() {
        // A client that gets faster as its code compiles: each round delivers a third more than the
        // last, so the rate alone never says "flat"; but from the third round on the median answer
        // takes 2.5 times the smallest latency: half of what is in flight waits (Vegas's signal).
        AdaptiveLimit limit = new AdaptiveLimit(8, 64);
        long now = 0;
        double perMs = 0.4;
        for (int round = 0; round < 5 && limit.inStartup(); round++) {
            int n = limit.limit();
            long rtt = (round < 2 ? 20 : 50) * MS;
            long sentAt = now;
            now += rtt;
            for (int i = 0; i < n; i++) {
                limit.answered(now, answer(sentAt, rtt, n, (int) Math.round(perMs * rtt / MS)));
            }
            perMs *= 1.34;
        }
        assertTrue(!limit.inStartup(), "still in startup at " + limit.limit());
        assertTrue(limit.limit() < 32, "limit " + limit.limit());
    }

    @Test
    void theFirstRoundsSlowAnswersAreNotTakenForAQueue() {
        // The first flight (connections opened, code cold) answers at three times the smallest
        // latency seen later; startup goes on doubling.
        AdaptiveLimit limit = new AdaptiveLimit(8, 64);
        limit.answered(20 * MS, answer(0, 20 * MS, 8, 1)); // opens the first round
        for (int i = 1; i < 8; i++) {
            limit.answered(60 * MS, answer(0, 60 * MS, 8, i + 1));
        }
        limit.answered(82 * MS, answer(61 * MS, 21 * MS, 16, 8)); // the first answer to a request sent in the round
        assertTrue(limit.inStartup(), "left startup at " + limit.limit());
        assertTrue(limit.limit() >= 16, "limit " + limit.limit());
    }
}
