package org.tertius.core;

/** An argument given by the caller is outside what is allowed; the message names it and the allowed range. */
public class InvalidInputException extends TertiusException {
    private static final long serialVersionUID = 1L;
    private final String argument;

    public InvalidInputException(String argument, String message) {
        super(argument + ": " + message);
        this.argument = argument;
    }

    /** @return the name of the offending argument (an option or parameter name) */
    public String argument() {
        return argument;
    }

    /** Checks that a value is finite. */
    public static double requireFinite(String argument, double value) {
        if (!Double.isFinite(value)) {
            throw new InvalidInputException(argument, "must be a finite number, got " + value);
        }
        return value;
    }
}
