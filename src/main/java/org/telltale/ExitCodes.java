package org.telltale;

/**
 * The process exit codes of every Telltale command, defined once and outside the CLI so that core
 * code can name them without importing the CLI library.
 */
public final class ExitCodes {
    /** The command did what it was asked, and no audit gate was crossed. */
    public static final int OK = 0;
    /** The command failed: bad input, an unreachable model, an I/O error. */
    public static final int ERROR = 1;
    /** The command line itself was wrong: unknown option, missing value, conflicting options. */
    public static final int USAGE = 2;
    /** An audit finished and found findings at or above the {@code --fail-on} severity (CI gate). */
    public static final int GATE = 3;

    private ExitCodes() {
    }
}
