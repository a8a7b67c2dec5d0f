package org.telltale.connect;

import java.util.concurrent.TimeUnit;
import java.util.concurrent.locks.Condition;
import java.util.concurrent.locks.ReentrantLock;

/**
 * Admits requests while fewer than the policy's limit are in flight, in arrival order, and feeds
 * each outcome back to the policy: a fixed limit ({@code --parallel N}) or {@link AdaptiveLimit}
 * ({@code --parallel auto}). Also keeps how long each limit was in force while requests were in
 * flight, for the level a run settled at. Thread-safe.
 *
 * <p>Before a request is encoded it {@linkplain #reserve reserves} a place among the prepared
 * ones: at most {@link #ahead} more than the limit are prepared or in flight. So a few
 * bodies are always ready when a place frees, and a call of many batches does not encode them
 * all at once (which, at the start of a run, took the CPU from the first requests' answers).
 */
final class InFlightGate {
    /** Decides the limit from the outcomes; called under the gate's lock. */
    interface Policy {
        int limit();

        int max();

        boolean adaptive();

        /** A request was answered at {@code now}. */
        default void answered(long now, Answer answer) {
        }

        /**
         * A request was refused (429, 503) or timed out; {@code inFlightAtSend} is the most in flight
         * at its sending or at its failure, itself included.
         */
        default void overloaded(long now, long sentAt, int inFlightAtSend, boolean timedOut) {
        }
    }

    /** A fixed limit. */
    static Policy fixed(int n) {
        if (n < 1) {
            throw new IllegalArgumentException("parallel must be at least 1: " + n);
        }
        return new Policy() {
            @Override
            public int limit() {
                return n;
            }

            @Override
            public int max() {
                return n;
            }

            @Override
            public boolean adaptive() {
                return false;
            }
        };
    }

    /**
     * One admitted request: when it was sent, how many were in flight then (itself included), and
     * how many answers had arrived before it.
     */
    record Ticket(long sentAt, int inFlight, long delivered) {
    }

    /**
     * What one answer says about the service: a request of {@code size} texts sent at {@code sentAt}
     * with {@code inFlightAtSend} in flight came back after {@code rtt} with {@code inFlightAtAnswer}
     * in flight (itself included); {@code deliveredSince} answers arrived meanwhile, itself included;
     * {@code demandWaiting}: work was waiting for a place.
     */
    record Answer(long sentAt, long rtt, int size, int inFlightAtSend, int inFlightAtAnswer, int deliveredSince,
            boolean demandWaiting) {
    }

    private final ReentrantLock lock = new ReentrantLock(true);
    /** Requests with a body ready, waiting for a place in flight. */
    private final Condition placeFree = lock.newCondition();
    /** Workers waiting for a place among the prepared before they encode. */
    private final Condition prepareFree = lock.newCondition();
    private final Policy policy;
    private final long[] nanosAtLimit;
    /** Requests encoded, or being encoded, beyond those in flight: ready when a place frees. */
    static final int PREPARED_AHEAD = 4;

    /**
     * How many requests may be prepared beyond a limit: {@link #PREPARED_AHEAD}, or half the limit
     * when that is more. While the limit doubles per round trip every answer opens two places, and
     * with only four bodies ahead half the freed places of a 16-slot service waited for an encode
     * (docs/performance.md).
     */
    static int ahead(int limit) {
        return Math.max(PREPARED_AHEAD, limit / 2);
    }

    private int inFlight;
    private int prepared;
    private int waiting;
    private int reserving;
    private int peak;
    private long delivered;
    private long lastEvent = System.nanoTime();

    private final TurnaroundTrace trace;

    InFlightGate(Policy policy) {
        this(policy, null);
    }

    /** With a {@code trace} (may be null) that records how freed places are taken. */
    InFlightGate(Policy policy, TurnaroundTrace trace) {
        this.policy = policy;
        this.nanosAtLimit = new long[policy.max() + 1];
        this.trace = trace;
    }

    /** Waits until fewer than the limit plus {@link #ahead} of it are prepared or in flight, then counts one prepared. */
    void reserve() throws InterruptedException {
        lock.lockInterruptibly();
        try {
            reserving++;
            try {
                while (inFlight + prepared >= policy.limit() + ahead(policy.limit())) {
                    prepareFree.await(1, TimeUnit.SECONDS);
                }
            } finally {
                reserving--;
            }
            prepared++;
        } finally {
            lock.unlock();
        }
    }

    /** Gives back a reservation that will not be admitted (its encoding failed, or it was cancelled). */
    void unreserve() {
        lock.lock();
        try {
            prepared--;
            wake();
        } finally {
            lock.unlock();
        }
    }

    /**
     * Waits until the request may go, then counts it in flight; {@code reserved} says it holds a
     * reservation from {@link #reserve}, which admission turns into its place.
     */
    Ticket admit(boolean reserved) throws InterruptedException {
        lock.lockInterruptibly();
        try {
            waiting++;
            boolean waited = false;
            try {
                while (inFlight >= policy.limit()) {
                    waited = true;
                    placeFree.await(1, TimeUnit.SECONDS);
                }
            } finally {
                waiting--;
            }
            account();
            if (reserved) {
                prepared--;
            }
            inFlight++;
            peak = Math.max(peak, inFlight);
            long now = System.nanoTime();
            if (trace != null) {
                TurnaroundTrace.tookFreedPlace(trace.admitted(now, inFlight, policy.limit() - inFlight + 1, waited) >= 0);
            }
            return new Ticket(now, inFlight, delivered);
        } finally {
            lock.unlock();
        }
    }

    /** The request was answered; {@code size} texts. {@code measured} false leaves the latency out (e.g. a process that had to start first). */
    void answered(Ticket t, int size, boolean measured) {
        lock.lock();
        try {
            long now = System.nanoTime();
            account();
            delivered++;
            if (measured) {
                policy.answered(now, new Answer(t.sentAt(), now - t.sentAt(), size, t.inFlight(), inFlight,
                        (int) Math.min(Integer.MAX_VALUE, delivered - t.delivered()), waiting > 0));
            }
            if (trace != null) {
                trace.answer(now, now - t.sentAt(), policy.limit(), inFlight);
            }
            inFlight--;
            if (trace != null && inFlight < policy.limit()) {
                trace.freed(now);
            }
            wake();
        } finally {
            lock.unlock();
        }
    }

    /** The request failed; {@code overload} says whether the failure was the service being over capacity. */
    void failed(Ticket t, TransientFailure.Overload overload) {
        failed(t, overload, false);
    }

    /**
     * The request failed; with {@code keepPlace} its place stays taken for its retry (see
     * {@link #again}), so that a failing batch is retried before the next one starts, as with a
     * single worker.
     */
    void failed(Ticket t, TransientFailure.Overload overload, boolean keepPlace) {
        lock.lock();
        try {
            long now = System.nanoTime();
            account();
            // The service was full at some moment between sending and refusal: the most in flight over
            // that time bounds what it held, the count at sending alone does not (a request on a new
            // connection can wait in the server's accept queue while later ones overtake it, and a
            // refusal of the request sent second once set the limit to one).
            int most = Math.max(t.inFlight(), inFlight);
            if (!keepPlace) {
                inFlight--;
            }
            if (overload != TransientFailure.Overload.NONE) {
                policy.overloaded(now, t.sentAt(), most, overload == TransientFailure.Overload.TIMED_OUT);
            }
            wake();
        } finally {
            lock.unlock();
        }
    }

    /** A retry in the place its failed attempt kept. */
    Ticket again(Ticket kept) {
        lock.lock();
        try {
            return new Ticket(System.nanoTime(), inFlight, delivered);
        } finally {
            lock.unlock();
        }
    }

    /** Gives back a place kept for a retry that will not happen. */
    void release(Ticket kept) {
        lock.lock();
        try {
            account();
            inFlight--;
            wake();
        } finally {
            lock.unlock();
        }
    }

    /**
     * Wakes as many waiters as there are places for them, longest waiting first, instead of all of
     * them: with dozens of workers waiting, waking all made each freed place wait for the whole
     * crowd to pass the (fair) lock before the one that could go went (a mean 1-2 ms per hand-off,
     * docs/performance.md). Called under the lock after every change of the counts or the limit.
     */
    private void wake() {
        int places = Math.min(waiting, policy.limit() - inFlight);
        for (int i = 0; i < places; i++) {
            placeFree.signal();
        }
        int bodies = Math.min(reserving, policy.limit() + ahead(policy.limit()) - inFlight - prepared);
        for (int i = 0; i < bodies; i++) {
            prepareFree.signal();
        }
    }

    private void account() {
        long now = System.nanoTime();
        if (inFlight > 0) {
            nanosAtLimit[Math.min(policy.limit(), nanosAtLimit.length - 1)] += now - lastEvent;
        }
        lastEvent = now;
    }

    int limit() {
        lock.lock();
        try {
            return policy.limit();
        } finally {
            lock.unlock();
        }
    }

    /** The limit in force longest while requests were in flight, or the current one before any request. */
    int settled() {
        lock.lock();
        try {
            int best = policy.limit();
            long most = 0;
            for (int i = 1; i < nanosAtLimit.length; i++) {
                if (nanosAtLimit[i] > most) {
                    most = nanosAtLimit[i];
                    best = i;
                }
            }
            return best;
        } finally {
            lock.unlock();
        }
    }

    /** The most requests that were in flight at once. */
    int peak() {
        lock.lock();
        try {
            return peak;
        } finally {
            lock.unlock();
        }
    }

    boolean adaptive() {
        return policy.adaptive();
    }

    int max() {
        return policy.max();
    }
}
