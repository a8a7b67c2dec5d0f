package org.telltale.json;

import org.telltale.TelltaleException;

/**
 * A JSON document that breaks its contract: its message names the source (a file, a file and
 * line, "the request body"), the path inside it ({@code findings[3].support}) and what was found.
 */
public final class ContractException extends TelltaleException {
    private static final long serialVersionUID = 1L;

    ContractException(String message) {
        super(message);
    }
}
