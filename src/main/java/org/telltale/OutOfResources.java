package org.telltale;

import java.util.function.Supplier;

/**
 * Turns the JVM running out of stack or memory while working on one piece of input into a
 * {@link TelltaleException} that names that piece. Every scan Telltale itself makes of document
 * text is linear and bounded in stack, but a custom analyzer's pattern, a huge document or a small
 * {@code -Xss}/{@code -Xmx} can still exhaust the JVM; the user then needs to know which document
 * did it, in one line, and work already journaled must stay usable.
 *
 * <p>Catching these two errors is safe here: the work that failed is abandoned whole, and what it
 * allocated becomes garbage as the stack unwinds. Other errors are left alone.
 */
public final class OutOfResources {
    private OutOfResources() {
    }

    /**
     * Runs {@code work}; a {@link StackOverflowError} or {@link OutOfMemoryError} becomes a
     * {@link TelltaleException} whose message starts with {@code what} (say, "document 'd17' while
     * explaining") and ends with {@code next}, what the user can do now (empty for nothing).
     */
    public static <T> T naming(String what, String next, Supplier<T> work) {
        String then = next.isEmpty() ? "" : "; " + next;
        try {
            return work.get();
        } catch (StackOverflowError e) {
            throw new TelltaleException(what + ": the JVM ran out of stack (StackOverflowError)" + then, e);
        } catch (OutOfMemoryError e) {
            throw new TelltaleException(what + ": the JVM ran out of memory (OutOfMemoryError; -Xmx raises the limit)"
                    + then, e);
        }
    }

    /** {@link #naming(String, String, Supplier)} for work without a result. */
    public static void naming(String what, String next, Runnable work) {
        naming(what, next, () -> {
            work.run();
            return null;
        });
    }
}
