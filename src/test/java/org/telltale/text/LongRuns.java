package org.telltale.text;

import java.util.List;
import java.util.concurrent.atomic.AtomicReference;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;

/**
 * Hostile document text for the scanning properties: one unit repeated into a run of 10 kB or
 * 100 kB. The units cover every character class the scanning patterns use (letters, digits, dots,
 * dashes, {@code @}, {@code :}, spaces) alone and mixed, the shapes that made backtracking
 * patterns quadratic or overflow the stack ({@code a.}, {@code b-}, {@code ab.cd%}), and random
 * mixtures of those classes.
 */
public final class LongRuns {
    /** Run lengths the properties use. */
    public static final List<Integer> LENGTHS = List.of(10_000, 100_000);

    /** The fixed units: single classes, then the known hostile shapes. */
    public static final List<String> UNITS = List.of("a", "Z", "7", ".", "-", "@", ":", " ", "_", "#", "/",
            "a.", "b-", "1.", "7-", "a@", "x:", "1:", "ab.cd%", "a1", "A-1", "#1", "12:3", "1 ", "a@b.", "www.",
            "http://", "1.2.", "Aug 1 ");

    /** Characters the random units are drawn from: every class the patterns name. */
    private static final char[] CLASSES = "aZ7.-@: #%/_+".toCharArray();

    /** A stack far smaller than a JVM thread's default: a pattern that recurses per repetition overflows it. */
    public static final long SMALL_STACK = 256 * 1024;

    private LongRuns() {
    }

    /** A unit: one of {@link #UNITS} or 1..6 characters drawn from every class the patterns use. */
    public static Arbitrary<String> units() {
        return Arbitraries.oneOf(Arbitraries.of(UNITS), Arbitraries.chars().with(CLASSES).list().ofMinSize(1).ofMaxSize(6)
                .map(cs -> cs.stream().map(String::valueOf).reduce("", String::concat)));
    }

    /** A run: a unit repeated to one of {@link #LENGTHS}. */
    public static Arbitrary<String> runs() {
        return Combinators.combine(units(), Arbitraries.of(LENGTHS)).as(LongRuns::repeat);
    }

    /** {@code unit} repeated until the text is {@code length} characters long (the last copy may be cut). */
    public static String repeat(String unit, int length) {
        StringBuilder out = new StringBuilder(length + unit.length());
        while (out.length() < length) {
            out.append(unit);
        }
        out.setLength(length);
        return out.toString();
    }

    /**
     * Runs {@code work} on a thread with a {@link #SMALL_STACK} and returns its result; an
     * {@code Error} there (a stack overflow) is rethrown here as an {@code AssertionError} naming it.
     */
    public static <T> T onSmallStack(java.util.function.Supplier<T> work) {
        AtomicReference<T> result = new AtomicReference<>();
        AtomicReference<Throwable> failure = new AtomicReference<>();
        Thread thread = new Thread(null, () -> {
            try {
                result.set(work.get());
            } catch (Throwable t) {
                failure.set(t);
            }
        }, "small-stack", SMALL_STACK);
        thread.start();
        try {
            thread.join();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new AssertionError("interrupted", e);
        }
        Throwable t = failure.get();
        if (t instanceof AssertionError a) {
            throw a;
        }
        if (t instanceof RuntimeException r) {
            throw r;
        }
        if (t != null) {
            throw new AssertionError("scanning failed on a " + SMALL_STACK / 1024 + " KB stack: " + t, t);
        }
        return result.get();
    }
}
