package org.kinduct.cli;

/** A user's input is wrong; the message says what and where. Maps to exit code 1. */
final class BadInputException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    BadInputException(String message) {
        super(message);
    }
}
