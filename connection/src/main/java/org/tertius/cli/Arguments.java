package org.tertius.cli;

import java.nio.file.InvalidPathException;
import java.nio.file.Path;
import org.apache.commons.cli.CommandLine;
import org.apache.commons.cli.Option;
import org.apache.commons.cli.Options;

/**
 * The parsed options of one command with typed access, by option name ({@code "--digits"}). A value of the wrong
 * type is a {@link UsageException} naming the option and what it accepts; ranges are checked where the values are
 * used (problem files supply values too). Absent options give {@code null}.
 */
final class Arguments {
    private final CommandLine line;
    private final Options declared;

    Arguments(CommandLine line, Options declared) {
        this.line = line;
        this.declared = declared;
    }

    boolean has(String name) {
        return line.hasOption(name);
    }

    String text(String name) {
        return line.getOptionValue(name);
    }

    /** An integer (decimal, optional sign); {@code expected} says what is allowed, e.g. "an integer in [1, 8]". */
    Integer integer(String name, String expected) {
        String v = text(name);
        try {
            return v == null ? null : Integer.valueOf(v);
        } catch (NumberFormatException e) {
            throw invalid(name, expected == null ? "an integer" : expected, v);
        }
    }

    /** A floating-point number, as Java reads it; {@code expected} as for {@link #integer}. */
    Double number(String name, String expected) {
        String v = text(name);
        try {
            return v == null ? null : Double.valueOf(v);
        } catch (NumberFormatException e) {
            throw invalid(name, expected == null ? "a number" : expected, v);
        }
    }

    Path path(String name) {
        String v = text(name);
        try {
            return v == null ? null : Path.of(v);
        } catch (InvalidPathException e) {
            throw invalid(name, "a file name", v);
        }
    }

    /** One of the allowed words, or the first of them when the option is absent. */
    String choice(String name, String... allowed) {
        String v = text(name);
        if (v == null) {
            return allowed[0];
        }
        for (String a : allowed) {
            if (a.equals(v)) {
                return v;
            }
        }
        throw new UsageException(name + ": must be " + String.join(" or ", allowed) + ", got '" + v + "'");
    }

    /** Refuses a command line without one of the required options. */
    void checkRequired() {
        for (Option o : declared.getOptions()) {
            if (o.isRequired() && !line.hasOption(o.getLongOpt())) {
                throw new UsageException("Missing required option: '--" + o.getLongOpt() + "=" + o.getArgName() + "'");
            }
        }
    }

    private static UsageException invalid(String name, String expected, String value) {
        return new UsageException(name + ": expected " + expected + ", got '" + value + "'");
    }
}
