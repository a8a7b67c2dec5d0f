package org.telltale.explain;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

class CoreTurnsTest {

    @Test
    void aFreedTurnGoesToAPreparingDocumentFirstThenToTheEarliest() throws Exception {
        CoreTurns turns = new CoreTurns(1);
        turns.take(true, 0);
        List<String> order = Collections.synchronizedList(new ArrayList<>());
        List<Thread> threads = new ArrayList<>();
        // Queued in this order: fitting 3, preparing 7, fitting 1, preparing 5.
        int[][] waiters = {{0, 3}, {1, 7}, {0, 1}, {1, 5}};
        for (int[] w : waiters) {
            boolean preparing = w[0] == 1;
            int position = w[1];
            Thread t = new Thread(() -> {
                turns.take(preparing, position);
                order.add((preparing ? "preparing " : "fitting ") + position);
                turns.give();
            });
            t.start();
            threads.add(t);
            waitUntil(() -> turns.waiting() == threads.size());
        }
        turns.give();
        for (Thread t : threads) {
            t.join(TimeUnit.SECONDS.toMillis(10));
        }
        assertEquals(List.of("preparing 5", "preparing 7", "fitting 1", "fitting 3"), order);
    }

    @Test
    void atMostTheCoresComputeAtOnce() throws Exception {
        CoreTurns turns = new CoreTurns(2);
        turns.take(true, 0);
        turns.take(true, 1);
        Thread third = new Thread(() -> {
            turns.take(false, 2);
            turns.give();
        });
        third.start();
        waitUntil(() -> turns.waiting() == 1);
        assertEquals(true, third.isAlive());
        turns.give();
        third.join(TimeUnit.SECONDS.toMillis(10));
        assertEquals(false, third.isAlive());
        assertEquals(0, turns.waiting());
    }

    @Test
    void aTurnNotTakenCannotBeGivenBackAndAnInterruptedWaiterLeavesTheQueue() throws Exception {
        CoreTurns turns = new CoreTurns(1);
        assertThrows(IllegalStateException.class, turns::give);
        turns.take(true, 0);
        List<Throwable> thrown = Collections.synchronizedList(new ArrayList<>());
        Thread waiter = new Thread(() -> {
            try {
                turns.take(true, 1);
            } catch (CancellationException e) {
                thrown.add(e);
            }
        });
        waiter.start();
        waitUntil(() -> turns.waiting() == 1);
        waiter.interrupt();
        waiter.join(TimeUnit.SECONDS.toMillis(10));
        assertEquals(1, thrown.size());
        assertEquals(0, turns.waiting());
        turns.give();
        turns.take(false, 2); // the turn is free again: taken at once
        turns.give();
    }

    private static void waitUntil(java.util.function.BooleanSupplier condition) throws InterruptedException {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
        while (!condition.getAsBoolean()) {
            if (System.nanoTime() > deadline) {
                throw new AssertionError("condition not reached within 10 s");
            }
            Thread.sleep(1);
        }
    }
}
