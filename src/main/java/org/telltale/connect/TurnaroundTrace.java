package org.telltale.connect;

import java.io.PrintStream;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * An opt-in record of where a connector's time goes between one answer and the next request,
 * for measuring (docs/performance.md, "Where the time between an answer and the next request
 * goes"); off unless the JVM runs with {@code -Dtelltale.turnaround=true}, and then printed to
 * stderr when the connector closes. Nothing reads it to decide anything.
 *
 * <p>Per request it sums the phases of a worker: waiting for a place among the prepared requests,
 * encoding, waiting for the limiter with the body ready, admission to the first byte written
 * (connection, request head), the exchange itself, decoding and validation. Per freed place it
 * measures the gap from the answer that freed it to the admission of the request that took it,
 * split by whether that request's body was already prepared (a hand-off) or the place waited for a
 * body. Thread-safe.
 */
final class TurnaroundTrace {
    /** Whether tracing is on for this JVM. */
    static final boolean ON = Boolean.getBoolean("telltale.turnaround");

    /** When the current thread last wrote the first byte of a request (0 when not traced). */
    private static final ThreadLocal<long[]> FIRST_BYTE = ThreadLocal.withInitial(() -> new long[1]);

    enum Phase {
        RESERVE("waiting for a place among the prepared"),
        ENCODE("encoding the body"),
        LIMITER("body ready, waiting for the limiter"),
        SETUP("admitted to first byte written"),
        EXCHANGE("first byte to answer read"),
        DECODE("decoding the answer"),
        VALIDATE("validating the answer");

        final String words;

        Phase(String words) {
            this.words = words;
        }
    }

    private final long[] sums = new long[Phase.values().length];
    private long requests;
    private long handoffs;
    private long handoffNanos;
    private long waitsForBody;
    private long waitForBodyNanos;
    private long setupAfterFreedNanos;
    private final ArrayDeque<Long> freedAt = new ArrayDeque<>();
    private final List<long[]> inFlightAtAdmission = new ArrayList<>();
    private long lastAnswer;

    /** Whether this thread's last admission took a place an answer had freed. */
    private static final ThreadLocal<boolean[]> TOOK_FREED = ThreadLocal.withInitial(() -> new boolean[1]);

    static void tookFreedPlace(boolean took) {
        TOOK_FREED.get()[0] = took;
    }

    static boolean tookFreedPlace() {
        return TOOK_FREED.get()[0];
    }

    /** Marks the first byte of a request written on this thread. */
    static void firstByte() {
        if (ON) {
            FIRST_BYTE.get()[0] = System.nanoTime();
        }
    }

    /** The first byte written on this thread since {@code since}, or {@code fallback}. */
    static long firstByteSince(long since, long fallback) {
        long t = FIRST_BYTE.get()[0];
        return t >= since ? t : fallback;
    }

    /** One request's stamps, in order: started, reserved, encoded, admitted, first byte, answered, decoded, validated. */
    synchronized void request(long... t) {
        requests++;
        for (int i = 0; i < sums.length; i++) {
            sums[i] += Math.max(0, t[i + 1] - t[i]);
        }
        lastAnswer = Math.max(lastAnswer, t[5]);
        if (stamps != null) {
            for (int i = 0; i < t.length; i++) {
                stamps.append(i == 0 ? "" : " ").append(t[i]);
            }
            stamps.append('\n');
        }
    }

    private final StringBuilder stamps = System.getProperty("telltale.turnaround.requests") == null ? null
            : new StringBuilder("# opened " + System.nanoTime() + "\n");

    private final StringBuilder series = System.getProperty("telltale.turnaround.series") == null ? null : new StringBuilder();

    /** One answer, for the series file: when, its latency, the limit after it and the count in flight. */
    synchronized void answer(long now, long rtt, int limit, int inFlight) {
        if (series != null) {
            series.append(now).append(' ').append(rtt).append(' ').append(limit).append(' ').append(inFlight).append('\n');
        }
    }

    /** A place came free at {@code now} (called under the gate's lock). */
    synchronized void freed(long now) {
        freedAt.addLast(now);
    }

    /**
     * A request was admitted at {@code now} with {@code inFlight} in flight; {@code waited}: its
     * body was ready and waited for the place. Places freed beyond {@code free} (the limit fell)
     * are forgotten.
     */
    synchronized long admitted(long now, int inFlight, int free, boolean waited) {
        inFlightAtAdmission.add(new long[] {now, inFlight});
        while (freedAt.size() > Math.max(0, free)) {
            freedAt.pollFirst();
        }
        Long freed = freedAt.pollFirst();
        if (freed == null) {
            return -1; // a new place (the limit grew), not one an answer freed
        }
        long gap = now - freed;
        if (waited) {
            handoffs++;
            handoffNanos += gap;
        } else {
            waitsForBody++;
            waitForBodyNanos += gap;
        }
        return gap;
    }

    /** Admission to first byte of a request that took a freed place. */
    synchronized void setupAfterFreed(long nanos) {
        setupAfterFreedNanos += nanos;
    }

    synchronized void print(PrintStream out) {
        if (requests == 0) {
            return;
        }
        StringBuilder b = new StringBuilder("turnaround: ").append(requests).append(" requests; mean per request:");
        for (Phase p : Phase.values()) {
            b.append(String.format(Locale.ROOT, " %s %.3f ms;", p.words, sums[p.ordinal()] / 1e6 / requests));
        }
        long taken = handoffs + waitsForBody;
        b.append(String.format(Locale.ROOT, " freed places taken: %d, by a prepared body %d (mean gap %.3f ms),"
                + " after waiting for a body %d (mean gap %.3f ms); admitted to first byte after a freed place %.3f ms",
                taken, handoffs, handoffs == 0 ? 0 : handoffNanos / 1e6 / handoffs, waitsForBody,
                waitsForBody == 0 ? 0 : waitForBodyNanos / 1e6 / waitsForBody,
                taken == 0 ? 0 : setupAfterFreedNanos / 1e6 / taken));
        if (!inFlightAtAdmission.isEmpty()) {
            long first = inFlightAtAdmission.get(0)[0];
            long half = first + (lastAnswer - first) / 2;
            long most = 0;
            long mostSecond = 0;
            for (long[] a : inFlightAtAdmission) {
                most = Math.max(most, a[1]);
                if (a[0] >= half) {
                    mostSecond = Math.max(mostSecond, a[1]);
                }
            }
            b.append(String.format(Locale.ROOT, "; most in flight %d, in the second half %d", most, mostSecond));
        }
        out.println(b);
        if (stamps != null) {
            try {
                java.nio.file.Files.writeString(java.nio.file.Path.of(System.getProperty("telltale.turnaround.requests")),
                        stamps, java.nio.charset.StandardCharsets.UTF_8);
            } catch (java.io.IOException e) {
                out.println("turnaround: cannot write the request stamps: " + e.getMessage());
            }
        }
        if (series != null) {
            try {
                java.nio.file.Files.writeString(java.nio.file.Path.of(System.getProperty("telltale.turnaround.series")),
                        series, java.nio.charset.StandardCharsets.UTF_8);
            } catch (java.io.IOException e) {
                out.println("turnaround: cannot write the series: " + e.getMessage());
            }
        }
    }
}
