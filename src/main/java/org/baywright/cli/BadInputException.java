package org.baywright.cli;

/** Input the user must correct; the message names the option, the text and what is allowed. */
public final class BadInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public BadInputException(String message) {
        super(message);
    }

    public BadInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
