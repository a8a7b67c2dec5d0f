package org.telltale.model;

import org.telltale.TelltaleException;

/** A model that could not be reached, or whose answer failed validation. */
public class ClassifierException extends TelltaleException {
    private static final long serialVersionUID = 1L;

    public ClassifierException(String message) {
        super(message);
    }

    public ClassifierException(String message, Throwable cause) {
        super(message, cause);
    }
}
