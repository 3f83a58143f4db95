package org.tertius.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CancellationException;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;

/**
 * The tertius command-line tool. Exit status: 0 success, 2 bad input (one line on standard error naming the
 * argument), 3 some targets could not be computed to the requested accuracy (reported, never silent),
 * 130 interrupted, 70 an error of the tool itself (reported in one line; the command-line tests make sure none is
 * left).
 */
public final class Main {
    public static final int EXIT_BAD_INPUT = 2;
    public static final int EXIT_UNREACHED = 3;
    public static final int EXIT_INTERRUPTED = 130;
    /** An error of the tool itself (a bug): one line on standard error, never a stack trace. */
    public static final int EXIT_INTERNAL = 70;

    static final String DESCRIPTION = "Painleve III transcendents on their Riemann surface: values, tables, pole"
            + " fields, connection problems and solution scans, with error estimates.";

    /** The commands in the order of the help text. */
    static final List<String> COMMANDS = List.of("eval", "table", "field", "poles", "monodromy", "special", "roots",
            "describe", "connect", "scan", "merge", "demo");

    private Main() {
    }

    /** The command of that name, or null; only the command that runs is built. */
    static Command command(String name) {
        switch (name) {
            case "eval":
                return new EvalCommand();
            case "table":
                return new TableCommand();
            case "field":
                return new FieldCommand();
            case "poles":
                return new PolesCommand();
            case "monodromy":
                return new MonodromyCommand();
            case "special":
                return new SpecialCommand();
            case "roots":
                return new RootsCommand();
            case "describe":
                return new DescribeCommand();
            case "connect":
                return new ConnectCommand();
            case "scan":
                return new ScanCommand();
            case "merge":
                return new MergeCommand();
            case "demo":
                return new DemoCommand();
            default:
                return null;
        }
    }

    public static void main(String[] args) {
        System.exit(execute(args, new PrintWriter(System.out, true), new PrintWriter(System.err, true)));
    }

    /** Runs the tool with the given streams (used by tests); returns the exit status. */
    public static int execute(String[] args, PrintWriter out, PrintWriter err) {
        Command command = args.length > 0 ? command(args[0]) : null;
        try {
            if (command == null) {
                return tool(args, out);
            }
            return run(command, Arrays.copyOfRange(args, 1, args.length), out, err);
        } catch (UsageException e) {
            err.println("tertius: " + e.getMessage() + " (see 'tertius " + (command == null ? "" : command.name() + " ")
                    + "--help')");
            return EXIT_BAD_INPUT;
        } catch (InvalidInputException e) {
            err.println("tertius: " + optionName(e));
            return EXIT_BAD_INPUT;
        } catch (TertiusException e) {
            err.println("tertius: " + e.getMessage());
            return EXIT_UNREACHED;
        } catch (UncheckedIOException | IOException e) {
            err.println("tertius: input/output error: " + e.getMessage());
            return EXIT_BAD_INPUT;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            err.println("tertius: interrupted");
            return EXIT_INTERRUPTED;
        } catch (CancellationException e) {
            err.println("tertius: interrupted");
            return EXIT_INTERRUPTED;
        } catch (OutOfMemoryError e) {
            err.println("tertius: out of memory (" + (Runtime.getRuntime().maxMemory() >> 20) + " MB allowed): ask for"
                    + " fewer points or a smaller region, or raise the JVM's -Xmx");
            return EXIT_INTERNAL;
        } catch (Exception e) {
            // never a stack trace for the user: one line, and a status that tests and scripts can tell apart
            err.println("tertius: internal error (" + e.getClass().getSimpleName() + ": " + e.getMessage()
                    + "); please report it with the command line");
            return EXIT_INTERNAL;
        } finally {
            out.flush();
            err.flush();
        }
    }

    /** One command: parse, help or version, else read the options and run. */
    private static int run(Command command, String[] args, PrintWriter out, PrintWriter err) throws Exception {
        Options options = command.options();
        Arguments arguments = ArgumentParser.parse(options, args);
        if (arguments.has("--help")) {
            Help.command(out, command, options);
            return 0;
        }
        if (arguments.has("--version")) {
            out.println(version());
            return 0;
        }
        arguments.checkRequired();
        command.readAll(arguments);
        return command.run(out, err);
    }

    /** No command: the tool's help (also without arguments) or version, else an unknown command. */
    private static int tool(String[] args, PrintWriter out) {
        if (args.length > 0 && !args[0].startsWith("-")) {
            throw new UsageException("Unknown command: '" + args[0] + "'");
        }
        Options options = new Options();
        OptionKinds.standard(options);
        Arguments arguments = ArgumentParser.parse(options, args);
        if (arguments.has("--version") && !arguments.has("--help")) {
            out.println(version());
        } else {
            List<Command> commands = new ArrayList<>();
            for (String name : COMMANDS) {
                commands.add(command(name));
            }
            Help.tool(out, DESCRIPTION, options, commands);
        }
        return 0;
    }

    /** Version from the jar manifest or the build. */
    static String version() {
        String v = Main.class.getPackage().getImplementationVersion();
        return "tertius " + (v == null ? "0.1.0-SNAPSHOT" : v);
    }

    /** Library argument names and the options that set them. */
    private static final Map<String, String> OPTIONS = Map.ofEntries(
            Map.entry("digits", "--digits"), Map.entry("tolerance", "--tol"),
            Map.entry("order", "--order"), Map.entry("maxSteps", "--max-steps"),
            Map.entry("z", "--z0"), Map.entry("w0", "--w0"), Map.entry("dw0", "--dw0"),
            Map.entry("d3w0", "--d3w0"), Map.entry("alpha", "--alpha"),
            Map.entry("beta", "--beta"), Map.entry("x0", "--family-x0"));

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
}
