package org.telltale;

/** A wrong combination of options or values that the parser alone could not catch; exit code 2. */
public class UsageException extends TelltaleException {
    private static final long serialVersionUID = 1L;

    public UsageException(String message) {
        super(message, null, ExitCodes.USAGE);
    }
}
