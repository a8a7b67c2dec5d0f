package org.telltale.connect;

import java.util.Arrays;

/**
 * How many requests to keep in flight against a service whose capacity is unknown, found from
 * the answers alone. The method is TCP Vegas (L. S. Brakmo and L. L. Peterson, "TCP Vegas: End to
 * End Congestion Avoidance on a Global Internet", IEEE Journal on Selected Areas in Communications
 * 13(8), 1995), with requests in the place of packets:
 *
 * <ul>
 *   <li>the base latency is the smallest round-trip time seen (Vegas's BaseRTT), over batches of
 *       about the full size, since a small last batch may answer faster;</li>
 *   <li>with {@code n} requests in flight and a measured latency {@code rtt}, the service holds
 *       about {@code q = n · (1 − base/rtt)} of them waiting (Vegas's Diff, counted in requests):
 *       throughput has stopped growing with {@code n} exactly when {@code q} grows;</li>
 *   <li>once per round (one latency's worth of answers, all sent at the current limit), with the
 *       round's smallest latency (so that the spread of service times is not taken for queueing),
 *       the limit grows by one while {@code q < α} and the demand fills it, shrinks by one while {@code q > β},
 *       else stays: a few requests always wait at the service, so its workers never idle while an
 *       answer travels back and the next request comes in;</li>
 *   <li>slow start, as in Vegas: until the first sign of queueing (in each of the last answers),
 *       the limit grows by one per answer (doubling per round), then drops to the capacity
 *       estimate {@code n − q} plus α;</li>
 *   <li>a 429 or 503 marks the in-flight count it was sent at as over capacity: the limit drops
 *       below it and stays below for {@link #CEILING_HOLD_NANOS} before probing one higher; a
 *       timeout halves the limit (TCP's multiplicative decrease). One cut per round, as TCP does
 *       once per window: only requests sent after the last cut can cut again.</li>
 * </ul>
 * α = 1 and β = max(2, limit / 8) are our choice (Vegas uses 1–3 packets): the upper bound grows
 * with the limit so that latency jitter on a busy client does not make a large limit oscillate.
 *
 * <p>Not thread-safe: {@link InFlightGate} calls it under its lock. Times are in nanoseconds
 * from any fixed origin, so tests drive it with a made-up clock.
 */
final class AdaptiveLimit implements InFlightGate.Policy {
    static final int ALPHA = 1;
    /** How long a limit stays below an in-flight count that drew a 429 or 503 before probing again. */
    static final long CEILING_HOLD_NANOS = 10_000_000_000L;
    /** Answers in a round at least, so that its median latency means something. */
    static final int MIN_ROUND = 4;

    private final int max;
    private int limit;
    private boolean slowStart = true;
    private long baseRtt = Long.MAX_VALUE;
    private int fullBatch;
    private int ceiling;
    private long ceilingSince;
    private long lastChange = Long.MIN_VALUE;
    private long lastCut = Long.MIN_VALUE;
    private long[] roundRtts = new long[16];
    private int roundCount;
    private long roundInFlight;
    private boolean roundLimited;
    private final double[] recent = new double[3];
    private int recentCount;

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

    /** The base latency so far, or -1 before the first answer. */
    long baseRtt() {
        return baseRtt == Long.MAX_VALUE ? -1 : baseRtt;
    }

    @Override
    public void answered(long now, long sentAt, long rtt, int size, int inFlightAtSend, boolean demandWaiting) {
        if (size > 2 * fullBatch) {
            fullBatch = size; // batches grew: the old base latency belonged to smaller work
            baseRtt = Long.MAX_VALUE;
        } else if (size * 2 < fullBatch) {
            return; // a small batch says little about a full one's latency
        }
        baseRtt = Math.min(baseRtt, Math.max(1, rtt));
        double queued = inFlightAtSend * (1 - (double) baseRtt / Math.max(1, rtt));
        boolean limited = demandWaiting || inFlightAtSend >= limit;
        if (slowStart) {
            recent[recentCount++ % recent.length] = queued;
            double typical = min(recent, Math.min(recentCount, recent.length));
            if (recentCount >= 2 && typical > beta()) {
                slowStart = false;
                change(now, (int) Math.round(inFlightAtSend - typical) + ALPHA);
            } else if (limited) {
                change(now, limit + 1);
            }
            return;
        }
        if (sentAt < lastChange) {
            return; // sent under an older limit: not this round's evidence
        }
        if (roundCount == roundRtts.length) {
            roundRtts = Arrays.copyOf(roundRtts, 2 * roundCount);
        }
        roundRtts[roundCount++] = rtt;
        roundInFlight += inFlightAtSend;
        roundLimited |= limited;
        if (roundCount < Math.max(MIN_ROUND, limit)) {
            return;
        }
        long typicalRtt = minOf(roundRtts, roundCount);
        double meanInFlight = (double) roundInFlight / roundCount;
        double roundQueued = meanInFlight * (1 - (double) baseRtt / Math.max(1, typicalRtt));
        boolean grow = roundQueued < ALPHA && roundLimited;
        if (ceiling < max && now - ceilingSince > CEILING_HOLD_NANOS) {
            ceiling++;
            ceilingSince = now;
        }
        if (roundQueued > beta()) {
            change(now, limit - 1);
        } else if (grow && limit < ceiling) {
            change(now, limit + 1);
        } else {
            newRound(now);
        }
    }

    @Override
    public void overloaded(long now, long sentAt, int inFlightAtSend, boolean timedOut) {
        slowStart = false;
        if (timedOut) {
            if (sentAt >= lastCut) {
                lastCut = now;
                change(now, limit / 2);
            }
            return;
        }
        // The service refused at this many in flight: stay below it for a while.
        ceiling = Math.min(ceiling, Math.max(1, inFlightAtSend - 1));
        ceilingSince = now; // every refusal restarts the hold
        if (limit > ceiling) {
            change(now, ceiling);
        }
    }

    private double beta() {
        return Math.max(2.0, limit / 8.0);
    }

    private void change(long now, int to) {
        limit = Math.max(1, Math.min(Math.min(max, ceiling), to));
        lastChange = now;
        newRound(now);
    }

    private void newRound(long now) {
        roundCount = 0;
        roundInFlight = 0;
        roundLimited = false;
        lastChange = Math.max(lastChange, now);
    }

    private static double min(double[] v, int n) {
        double m = Double.MAX_VALUE;
        for (int i = 0; i < n; i++) {
            m = Math.min(m, v[i]);
        }
        return m;
    }

    private static long minOf(long[] v, int n) {
        long m = Long.MAX_VALUE;
        for (int i = 0; i < n; i++) {
            m = Math.min(m, v[i]);
        }
        return m;
    }
}
