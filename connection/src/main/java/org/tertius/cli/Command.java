package org.tertius.cli;

import java.io.PrintWriter;
import java.util.List;
import org.apache.commons.cli.Options;

/** A command of the tool: its name and description, its options, and what it does with them. */
interface Command extends OptionGroup {
    String name();

    /** One paragraph for the help. */
    String description();

    /** Option groups shared with other commands; their options are declared and read with the command's own. */
    default List<OptionGroup> groups() {
        return List.of();
    }

    /** Does the work once the options are read; returns the exit status (see {@link Main}). */
    int run(PrintWriter out, PrintWriter err) throws Exception;

    /** All options of the command: its groups', its own, --help and --version. */
    default Options options() {
        Options options = new Options();
        for (OptionGroup g : groups()) {
            g.declare(options);
        }
        declare(options);
        OptionKinds.standard(options);
        return options;
    }

    /** Reads the values of all its options. */
    default void readAll(Arguments arguments) {
        for (OptionGroup g : groups()) {
            g.read(arguments);
        }
        read(arguments);
    }
}
