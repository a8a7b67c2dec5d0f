package org.telltale;

/**
 * An error a user can act on. Its message is printed as one line on stderr, so it names the place
 * (file and line, batch and document id) and the offending value; the stack trace is shown only
 * with {@code --verbose}.
 */
public class TelltaleException extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final int exitCode;

    public TelltaleException(String message) {
        this(message, null, ExitCodes.ERROR);
    }

    public TelltaleException(String message, Throwable cause) {
        this(message, cause, ExitCodes.ERROR);
    }

    protected TelltaleException(String message, Throwable cause, int exitCode) {
        super(message, cause);
        this.exitCode = exitCode;
    }

    /** The process exit code this error maps to; see {@link ExitCodes}. */
    public int exitCode() {
        return exitCode;
    }
}
