package org.tertius.cli;

import org.apache.commons.cli.Option;
import org.apache.commons.cli.Options;

/**
 * The kinds of option the tool has, as Commons CLI options: long options written with their dashes
 * ({@code "--alpha"}), with a value label for the help, or flags; -h/--help and -V/--version are the only short ones.
 */
final class OptionKinds {
    private OptionKinds() {
    }

    /** An option with a value, e.g. {@code value("--alpha", "A", "alpha (complex a+bi or p/q)")}. */
    static Option value(String name, String label, String description) {
        return Option.builder().longOpt(name.substring(2)).hasArg().argName(label).desc(description).build();
    }

    /** An option with a value that must be given (checked after --help and --version). */
    static Option required(String name, String label, String description) {
        return Option.builder().longOpt(name.substring(2)).hasArg().argName(label).desc(description).required()
                .build();
    }

    /** An option without a value; {@code --name=true} and {@code --name=false} are accepted too. */
    static Option flag(String name, String description) {
        return Option.builder().longOpt(name.substring(2)).desc(description).build();
    }

    /** Adds -h/--help and -V/--version. */
    static void standard(Options options) {
        options.addOption(Option.builder("h").longOpt("help").desc("describe this command and its options, then stop")
                .build());
        options.addOption(Option.builder("V").longOpt("version").desc("name the version of tertius, then stop")
                .build());
    }
}
