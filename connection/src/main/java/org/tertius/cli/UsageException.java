package org.tertius.cli;

/**
 * A command line that cannot be parsed: unknown option, missing or unusable value. Reported in one line with a
 * pointer to the command's help, exit status 2.
 */
final class UsageException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    UsageException(String message) {
        super(message);
    }
}
