package org.telltale.connect;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** {@link InFlightGate}'s bookkeeping, without threads or clocks. */
class InFlightGateTest {

    /** A fixed limit that records what the gate reports of refusals. */
    private static final class RecordingPolicy implements InFlightGate.Policy {
        final List<Integer> refusedAt = new ArrayList<>();
        private final int limit;

        RecordingPolicy(int limit) {
            this.limit = limit;
        }

        @Override
        public int limit() {
            return limit;
        }

        @Override
        public int max() {
            return limit;
        }

        @Override
        public boolean adaptive() {
            return true;
        }

        @Override
        public void overloaded(long now, long sentAt, int inFlightAtSend, boolean timedOut) {
            refusedAt.add(inFlightAtSend);
        }
    }

    @Test
    void aRefusalReportsTheMostInFlightWhileItWasOutNotOnlyTheCountAtSending() throws InterruptedException {
        RecordingPolicy policy = new RecordingPolicy(8);
        InFlightGate gate = new InFlightGate(policy);
        InFlightGate.Ticket first = gate.admit(false); // sent alone
        for (int i = 0; i < 4; i++) {
            gate.admit(false); // four more went out before the first was refused
        }
        gate.failed(first, TransientFailure.Overload.REJECTED);
        // The service was full at some moment while five were out: one in flight at sending says nothing of that.
        assertEquals(List.of(5), policy.refusedAt);
    }

    @Test
    void aRefusalAfterOthersWereAnsweredReportsTheCountAtSending() throws InterruptedException {
        RecordingPolicy policy = new RecordingPolicy(8);
        InFlightGate gate = new InFlightGate(policy);
        List<InFlightGate.Ticket> others = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            others.add(gate.admit(false));
        }
        InFlightGate.Ticket last = gate.admit(false); // sent as the fourth
        for (InFlightGate.Ticket t : others) {
            gate.answered(t, 64, true);
        }
        gate.failed(last, TransientFailure.Overload.REJECTED);
        assertEquals(List.of(4), policy.refusedAt);
    }

    @Test
    void preparesAFewBodiesAheadOrHalfTheLimitWhenThatIsMore() {
        // Common practice (a bounded look-ahead): four below a limit of 8, half the limit above it.
        assertEquals(4, InFlightGate.ahead(1));
        assertEquals(4, InFlightGate.ahead(8));
        assertEquals(8, InFlightGate.ahead(16));
        assertEquals(32, InFlightGate.ahead(64));
    }
}
