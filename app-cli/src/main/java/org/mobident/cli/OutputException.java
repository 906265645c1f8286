package org.mobident.cli;

/** An output file could not be written; the message says which and why. */
final class OutputException extends Exception {
    private static final long serialVersionUID = 1L;

    OutputException(String message, Throwable cause) {
        super(message, cause);
    }
}
