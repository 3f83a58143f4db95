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
                + " connection problems and solution scans, with error estimates.")
public final class Main implements Runnable {
    public static final int EXIT_BAD_INPUT = 2;
    public static final int EXIT_UNREACHED = 3;
    public static final int EXIT_INTERRUPTED = 130;

    /**
     * The subcommands in the order of the help text. They are built on demand: picocli reflects over every
     * option of a command it is given, and doing so for all eight costs about 0.3 s of a cold JVM, most of the
     * start-up of a one-point evaluation.
     */
    private static final java.util.Map<String, java.util.function.Supplier<Object>> COMMANDS = commands();

    private static java.util.Map<String, java.util.function.Supplier<Object>> commands() {
        java.util.Map<String, java.util.function.Supplier<Object>> m = new java.util.LinkedHashMap<>();
        m.put("eval", EvalCommand::new);
        m.put("table", TableCommand::new);
        m.put("field", FieldCommand::new);
        m.put("poles", PolesCommand::new);
        m.put("describe", DescribeCommand::new);
        m.put("connect", ConnectCommand::new);
        m.put("scan", ScanCommand::new);
        m.put("demo", DemoCommand::new);
        return java.util.Collections.unmodifiableMap(m);
    }

    @Override
    public void run() {
        CommandLine.usage(this, System.out);
    }

    public static void main(String[] args) {
        System.exit(execute(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs the tool with the given streams (used by tests); returns the exit status. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        CommandLine cl = commandLine(args.length > 0 ? args[0] : null);
        cl.setOut(out);
        cl.setErr(err);
        return cl.execute(args);
    }

    /** The command line with all its subcommands and error handling. */
    public static CommandLine commandLine() {
        return commandLine(null);
    }

    /**
     * The command line with error handling; when {@code first} names a subcommand only that one is built
     * (a run of one command needs no other), otherwise all of them (help text, unknown-command messages).
     */
    static CommandLine commandLine(String first) {
        CommandLine cl = new CommandLine(new Main());
        if (first != null && COMMANDS.containsKey(first)) {
            cl.addSubcommand(COMMANDS.get(first).get());
        } else {
            COMMANDS.values().forEach(c -> cl.addSubcommand(c.get()));
        }
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine where = ex.getCommandLine();
            String help = where.getParent() == null ? "tertius --help" : "tertius " + where.getCommandName() + " --help";
            where.getErr().println("tertius: " + ex.getMessage() + " (see '" + help + "')");
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
