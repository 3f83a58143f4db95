package org.tertius.core;

/**
 * Root of the one unchecked exception family of Tertius. Every message says what was wrong and, where
 * possible, what to do instead.
 */
public class TertiusException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public TertiusException(String message) {
        super(message);
    }

    public TertiusException(String message, Throwable cause) {
        super(message, cause);
    }
}
