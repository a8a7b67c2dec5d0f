package org.telltale.connect;

import java.util.Arrays;

/**
 * How many requests to keep in flight against a service whose capacity is unknown, found from
 * the answers alone: the limit grows while throughput grows, then holds a little more than the
 * service can take at once. The method is BBR's model of a path (N. Cardwell, Y. Cheng, C. S.
 * Gunn, S. H. Yeganeh and V. Jacobson, "BBR: Congestion-Based Congestion Control", ACM Queue 14(5),
 * 2016), with requests in the place of packets, rather than TCP Vegas's reading of queueing from
 * latency (L. S. Brakmo and L. L. Peterson, IEEE JSAC 13(8), 1995): latency against a model
 * service grows with load long before anything waits for a worker (its own request handling, the
 * client's cold code), so a latency signal stops short of the capacity; the delivery rate does not.
 *
 * <ul>
 *   <li><b>Delivery rate</b> (BBR's per-packet sample): an answer that took {@code rtt}, during
 *       which {@code d} answers arrived (itself included), says the service delivered
 *       {@code d / rtt}. A round ends with the first answer to a request sent after it began (one
 *       round trip); the median of its samples is its rate, and the best rate of the last
 *       {@link #RATE_ROUNDS} rounds is the service's capacity (BBR's BtlBw filter). A round in
 *       which the demand did not fill the limit counts only if it delivered more.</li>
 *   <li><b>Pipe</b>: the capacity times the smallest latency of a full batch (BBR's BDP with its
 *       RTprop): how many requests the service holds at capacity with none waiting.</li>
 *   <li><b>Startup</b> (BBR's STARTUP): while the demand fills the limit, one more per answer,
 *       which doubles it per round trip; it ends when the delivery rate has not grown by a quarter
 *       in two rounds (BBR waits three), or in one round when it grew less than 5 %; at once in a
 *       round whose median latency is over {@link #QUEUEING_RATIO} times the smallest (half of what
 *       was in flight waited: TCP Vegas's slow-start exit, Brakmo and Peterson 1995), or at the first
 *       429, 503 or timeout.
 *       So a large capacity is reached in a few round trips, not one more per round.</li>
 *   <li><b>Steady state</b>: the limit is {@link #PIPE_GAIN} times the pipe (at least one more):
 *       a few requests wait at the service, so its workers do not idle while an answer travels
 *       back and the next request comes in, and the extra latency of a loaded service (which the
 *       smallest latency leaves out) is covered. BBR keeps twice the pipe; one and a half keeps
 *       the wait shorter. Once per round in which the demand filled the limit, the limit moves
 *       toward that target by at most an eighth (at least one).</li>
 *   <li><b>Overload</b>: a 429 or 503 marks the most in flight while it was out (at its sending or
 *       its refusal) as over capacity: the limit stays below it for {@link #CEILING_HOLD_NANOS} before probing one higher per round; a
 *       timeout halves it (TCP's multiplicative decrease), held likewise. One cut per round trip, as
 *       TCP cuts once per window: only requests sent after the last cut can cut again.</li>
 * </ul>
 *
 * <p>The smallest latency is kept for the connector's life (BBR renews it every 10 s by draining
 * the queue; an audit is short and its service assumed steady): a service that slows down shows
 * it by 429, 503 or timeouts. Not thread-safe: {@link InFlightGate} calls it under its lock. Times
 * are in nanoseconds from any fixed origin, so tests drive it with a made-up clock.
 */
final class AdaptiveLimit implements InFlightGate.Policy {
    /** How long a limit stays below an in-flight count that drew a 429, 503 or timeout before probing again. */
    static final long CEILING_HOLD_NANOS = 10_000_000_000L;
    /** Rounds over which the best delivery rate is the service's capacity. */
    static final int RATE_ROUNDS = 10;
    /** The limit in steady state, in pipes. */
    static final double PIPE_GAIN = 1.5;
    /**
     * Startup ends in a round whose median latency exceeds the smallest by this factor: by Little's
     * law, about half of what was in flight then waited at the service (TCP Vegas's slow-start exit,
     * Brakmo and Peterson 1995, with its threshold as a share of the requests in flight). Less would
     * read noise as queueing: with nothing waiting, the Python bench service and a cold client
     * answered a 20 ms request in up to 35 ms.
     */
    static final double QUEUEING_RATIO = 2.0;
    /** Growth of the delivery rate per round below which startup counts a round as flat. */
    static final double STARTUP_GROWTH = 1.25;

    private final int max;
    private int limit;
    private boolean startup = true;
    private double startupBest;
    private int flatRounds;
    private int fullBatch;
    private int ceiling;
    private long ceilingSince;
    private long lastCut = Long.MIN_VALUE;
    private long baseRtt = Long.MAX_VALUE;
    private final double[] roundRates = new double[RATE_ROUNDS];
    private int rounds;
    private int roundsEnded;
    private long roundStart = Long.MIN_VALUE;
    private double[] roundSamples = new double[16];
    private long[] roundRtts = new long[16];
    private int roundAnswers;
    private boolean roundLimited;

    AdaptiveLimit(int initial, int max) {
        if (max < 1) {
            throw new IllegalArgumentException("parallelMax must be at least 1: " + max);
        }
        this.max = max;
        this.limit = Math.max(1, Math.min(initial, max));
        this.ceiling = max;
    }

    @Override
    public int limit() {
        return limit;
    }

    @Override
    public int max() {
        return max;
    }

    @Override
    public boolean adaptive() {
        return true;
    }

    /** Whether the limit is still in its startup (doubling per round trip). */
    boolean inStartup() {
        return startup;
    }

    /** The smallest latency so far of a batch of about full size, or -1 before the first. */
    long baseRtt() {
        return baseRtt == Long.MAX_VALUE ? -1 : baseRtt;
    }

    /** The service's capacity as measured (answers per second): the best delivery rate of the last rounds. */
    double capacityPerSecond() {
        return capacity() * 1e9;
    }

    /** Requests the service holds at its capacity with none waiting: capacity × smallest latency; 0 before a round. */
    double pipe() {
        return baseRtt == Long.MAX_VALUE ? 0 : capacity() * baseRtt;
    }

    @Override
    public void answered(long now, InFlightGate.Answer a) {
        boolean limited = a.demandWaiting() || a.inFlightAtSend() >= limit;
        roundLimited |= limited;
        if (a.size() > 2 * fullBatch) {
            fullBatch = a.size(); // batches grew: the old latency belonged to smaller work
            baseRtt = Long.MAX_VALUE;
        }
        boolean full = a.size() * 2 >= fullBatch;
        if (full) {
            baseRtt = Math.min(baseRtt, Math.max(1, a.rtt()));
        }
        if (startup && limited) {
            limit = clamp(limit + 1);
        }
        if (roundStart == Long.MIN_VALUE) {
            startRound(now); // the first answer opens the first round
            return;
        }
        if (full) {
            if (roundAnswers == roundSamples.length) {
                roundSamples = Arrays.copyOf(roundSamples, 2 * roundAnswers);
                roundRtts = Arrays.copyOf(roundRtts, 2 * roundAnswers);
            }
            roundRtts[roundAnswers] = Math.max(1, a.rtt());
            roundSamples[roundAnswers++] = Math.max(1, a.deliveredSince()) / (double) Math.max(1, a.rtt());
        }
        if (a.sentAt() >= roundStart && roundAnswers > 0) {
            endRound(now); // the first answer to a request sent after the round began
        }
    }

    private void endRound(long now) {
        Arrays.sort(roundSamples, 0, roundAnswers);
        double rate = roundSamples[roundAnswers / 2];
        Arrays.sort(roundRtts, 0, roundAnswers);
        // Not in the first round: its requests all left before any answer, so their latency holds the
        // connections' set-up and a cold client (up to three times a 20 ms service's), not a queue.
        boolean queueing = roundsEnded++ > 0 && roundRtts[roundAnswers / 2] > QUEUEING_RATIO * baseRtt;
        double c = capacity();
        if (roundLimited || rate > c) {
            roundRates[rounds++ % RATE_ROUNDS] = rate;
            c = capacity();
        }
        if (ceiling < max && now - ceilingSince > CEILING_HOLD_NANOS) {
            ceiling++;
            ceilingSince = now;
        }
        if (startup && queueing) {
            // Half of what was in flight waited: leave now, whatever the rate did (a client that gets
            // faster as its code compiles delivers more per round while the queue grows).
            startup = false;
            limit = clamp(target());
        } else if (startup) {
            if (rate >= STARTUP_GROWTH * startupBest) {
                startupBest = rate;
                flatRounds = 0;
            } else if (roundLimited) {
                flatRounds += rate < 1.05 * startupBest ? 2 : 1;
            }
            if (flatRounds >= 2) {
                startup = false;
                limit = clamp(target());
            }
        } else if (roundLimited) {
            int step = Math.max(1, limit / 8);
            int t = target();
            limit = clamp(t > limit ? Math.min(t, limit + step) : Math.max(t, limit - step));
        }
        startRound(now);
    }

    private void startRound(long now) {
        roundStart = now;
        roundAnswers = 0;
        roundLimited = false;
    }

    /** {@link #PIPE_GAIN} pipes, at least one more than the pipe. */
    private int target() {
        double p = pipe();
        return (int) Math.max(Math.round(p) + 1, Math.round(PIPE_GAIN * p));
    }

    private double capacity() {
        double c = 0;
        for (int i = 0; i < Math.min(rounds, RATE_ROUNDS); i++) {
            c = Math.max(c, roundRates[i]);
        }
        return c;
    }

    @Override
    public void overloaded(long now, long sentAt, int inFlightAtSend, boolean timedOut) {
        startup = false;
        if (timedOut) {
            if (sentAt >= lastCut) {
                lastCut = now;
                ceiling = Math.max(1, limit / 2);
                ceilingSince = now;
                limit = clamp(limit / 2);
            }
            return;
        }
        // The service refused at this many in flight: stay below it for a while.
        ceiling = Math.min(ceiling, Math.max(1, inFlightAtSend - 1));
        ceilingSince = now; // every refusal restarts the hold
        limit = clamp(limit);
    }

    private int clamp(int n) {
        return Math.max(1, Math.min(Math.min(max, ceiling), n));
    }
}
