package org.telltale.explain;

import java.util.Comparator;
import java.util.PriorityQueue;
import java.util.concurrent.CancellationException;
import java.util.concurrent.locks.Condition;
import java.util.concurrent.locks.ReentrantLock;

/**
 * Turns on the cores for documents explained at once against a model that runs elsewhere: at
 * most {@code cores} documents compute at a time (masking, fitting), while any number may wait
 * for the model without holding a turn. A freed turn goes first to a document still preparing
 * its first round of probes (so the model gets work as soon as possible), then to the document
 * earliest in the run (so explanations come out in order without piling up).
 *
 * <p>Thread-safe.
 */
final class CoreTurns {
    /** Who waits for a turn: whether it prepares its first round, its place in the run, and its wake-up. */
    private record Waiter(boolean preparing, int position, Condition wake) {
    }

    private static final Comparator<Waiter> FIRST_SERVED = Comparator.comparing((Waiter w) -> !w.preparing())
            .thenComparingInt(Waiter::position);

    private final ReentrantLock lock = new ReentrantLock();
    private final PriorityQueue<Waiter> waiting = new PriorityQueue<>(FIRST_SERVED);
    private final int cores;
    private int free;

    CoreTurns(int cores) {
        if (cores < 1) {
            throw new IllegalArgumentException("cores must be at least 1: " + cores);
        }
        this.cores = cores;
        this.free = cores;
    }

    int cores() {
        return cores;
    }

    /**
     * Waits for a turn.
     *
     * @throws CancellationException when the thread is interrupted while it waits (the run was abandoned)
     */
    void take(boolean preparing, int position) {
        lock.lock();
        try {
            if (free > 0 && waiting.isEmpty()) {
                free--;
                return;
            }
            Waiter me = new Waiter(preparing, position, lock.newCondition());
            waiting.add(me);
            try {
                while (free == 0 || waiting.peek() != me) {
                    me.wake().await();
                }
            } catch (InterruptedException e) {
                waiting.remove(me);
                wakeNext();
                Thread.currentThread().interrupt();
                throw new CancellationException("interrupted while waiting for a core");
            }
            waiting.poll();
            free--;
            wakeNext();
        } finally {
            lock.unlock();
        }
    }

    /** Gives a turn back. */
    void give() {
        lock.lock();
        try {
            if (free == cores) {
                throw new IllegalStateException("a turn was given back that was not taken");
            }
            free++;
            wakeNext();
        } finally {
            lock.unlock();
        }
    }

    /** How many wait for a turn now (tests). */
    int waiting() {
        lock.lock();
        try {
            return waiting.size();
        } finally {
            lock.unlock();
        }
    }

    /** Wakes the first waiter when a turn is free for it. Called with the lock held. */
    private void wakeNext() {
        Waiter next = waiting.peek();
        if (next != null && free > 0) {
            next.wake().signal();
        }
    }
}
