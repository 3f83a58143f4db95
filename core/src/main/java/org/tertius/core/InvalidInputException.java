package org.tertius.core;

/** An argument given by the caller is outside what is allowed; the message names it and the allowed range. */
public class InvalidInputException extends TertiusException {
    private static final long serialVersionUID = 1L;
    private final String argument;
    private final String reason;

    public InvalidInputException(String argument, String message) {
        super(argument + ": " + message);
        this.argument = argument;
        this.reason = message;
    }

    /** @return the name of the offending argument (an option or parameter name) */
    public String argument() {
        return argument;
    }

    /** @return the message without the argument's name: what is wrong and what is allowed */
    public String reason() {
        return reason;
    }

    /**
     * The same refusal named by another argument: for example the command-line option that sets the library
     * parameter named here.
     */
    public InvalidInputException renamed(String otherArgument) {
        return new InvalidInputException(otherArgument, reason);
    }

    /** Checks that a value is finite. */
    public static double requireFinite(String argument, double value) {
        if (!Double.isFinite(value)) {
            throw new InvalidInputException(argument, "must be a finite number, got " + value);
        }
        return value;
    }
}
