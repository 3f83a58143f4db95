package org.tertius.cli;

import java.io.PrintWriter;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/**
 * The tertius command-line tool. Exit status: 0 success, 2 bad input (one line on standard error naming the
 * argument), 3 some targets could not be computed to the requested accuracy (reported, never silent),
 * 130 interrupted.
 */
@Command(name = "tertius", mixinStandardHelpOptions = true, versionProvider = Main.Version.class,
        description = "Painleve III transcendents on their Riemann surface: values, tables, pole fields,"
                + " connection problems and solution scans, with error estimates.",
        subcommands = {EvalCommand.class, TableCommand.class, FieldCommand.class, PolesCommand.class,
            DescribeCommand.class, ConnectCommand.class, ScanCommand.class, DemoCommand.class})
public final class Main implements Runnable {
    public static final int EXIT_BAD_INPUT = 2;
    public static final int EXIT_UNREACHED = 3;
    public static final int EXIT_INTERRUPTED = 130;

    @Override
    public void run() {
        CommandLine.usage(this, System.out);
    }

    public static void main(String[] args) {
        System.exit(execute(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs the tool with the given streams (used by tests); returns the exit status. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = commandLine();
        cl.setOut(out);
        cl.setErr(err);
        return cl.execute(args);
    }

    /** The command line with its subcommands and error handling. */
    public static CommandLine commandLine() {
        CommandLine cl = new CommandLine(new Main());
        cl.setParameterExceptionHandler((ex, args) -> {
            ex.getCommandLine().getErr().println("tertius: " + ex.getMessage()
                    + " (see 'tertius " + ex.getCommandLine().getCommandName() + " --help')");
            return EXIT_BAD_INPUT;
        });
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            Throwable t = ex;
            if (t instanceof InvalidInputException) {
                commandLine.getErr().println("tertius: " + optionName((InvalidInputException) t));
                return EXIT_BAD_INPUT;
            }
            if (t instanceof TertiusException) {
                commandLine.getErr().println("tertius: " + t.getMessage());
                return EXIT_UNREACHED;
            }
            if (t instanceof java.io.UncheckedIOException || t instanceof java.io.IOException) {
                commandLine.getErr().println("tertius: input/output error: " + t.getMessage());
                return EXIT_BAD_INPUT;
            }
            throw ex;
        });
        return cl;
    }

    /** Library argument names and the options that set them. */
    private static final java.util.Map<String, String> OPTIONS = java.util.Map.ofEntries(
            java.util.Map.entry("digits", "--digits"), java.util.Map.entry("tolerance", "--tol"),
            java.util.Map.entry("order", "--order"), java.util.Map.entry("maxSteps", "--max-steps"),
            java.util.Map.entry("z", "--z0"), java.util.Map.entry("w0", "--w0"), java.util.Map.entry("dw0", "--dw0"),
            java.util.Map.entry("d3w0", "--d3w0"), java.util.Map.entry("alpha", "--alpha"),
            java.util.Map.entry("beta", "--beta"), java.util.Map.entry("x0", "--family-x0"));

    /** The message with the library's argument name replaced by the option that sets it. */
    static String optionName(InvalidInputException e) {
        String arg = e.argument();
        String option = OPTIONS.get(arg);
        String msg = e.getMessage();
        if (option != null && msg.startsWith(arg + ":")) {
            return option + msg.substring(arg.length());
        }
        return msg;
    }

    /** Version from the jar manifest or the build. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = Main.class.getPackage().getImplementationVersion();
            return new String[] {"tertius " + (v == null ? "0.1.0-SNAPSHOT" : v)};
        }
    }
}
