package org.tertius.cli;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.apache.commons.cli.HelpFormatter;
import org.apache.commons.cli.Option;
import org.apache.commons.cli.Options;

/**
 * The help texts in 80 columns: usage line, description, options in alphabetical order with their descriptions
 * in a column (a long option and label on a line of its own), for the tool also its commands. Lines are wrapped
 * by Commons CLI's classic HelpFormatter (its successor prints options as a table with column headings).
 */
@SuppressWarnings("deprecation")
final class Help {
    private static final int WIDTH = 80;
    /** The widest option and label that shares its line with the description. */
    private static final int NAME = 30;

    private Help() {
    }

    /** The help of one command. */
    static void command(PrintWriter out, Command command, Options options) {
        HelpFormatter f = formatter();
        f.printUsage(out, WIDTH, "tertius " + command.name(), options);
        f.printWrapped(out, WIDTH, command.description());
        options(out, f, options);
        out.flush();
    }

    /** The help of the tool: usage, description, its options and its commands. */
    static void tool(PrintWriter out, String description, Options options, List<Command> commands) {
        HelpFormatter f = formatter();
        out.println("Usage: tertius [-h] [-V] [COMMAND [OPTIONS]]");
        f.printWrapped(out, WIDTH, description);
        options(out, f, options);
        out.println("Commands:");
        for (Command c : commands) {
            f.printWrapped(out, WIDTH, 12, column("  " + c.name(), 12) + c.description());
        }
        out.println("See 'tertius COMMAND --help' for the options of a command.");
        out.flush();
    }

    private static void options(PrintWriter out, HelpFormatter f, Options options) {
        List<Option> list = new ArrayList<>(options.getOptions());
        list.sort(Comparator.comparing(Option::getKey, String.CASE_INSENSITIVE_ORDER));
        int width = 0;
        for (Option o : list) {
            width = Math.max(width, Math.min(name(o).length(), NAME));
        }
        int at = width + 2;
        for (Option o : list) {
            String name = name(o);
            if (name.length() > width) {
                out.println(name);
                name = "";
            }
            f.printWrapped(out, WIDTH, at, column(name, at) + o.getDescription());
        }
    }

    /** "  -h, --help" or "      --alpha <A>". */
    private static String name(Option o) {
        return (o.getOpt() != null ? "  -" + o.getOpt() + ", " : "      ") + "--" + o.getLongOpt()
                + (o.hasArg() ? " <" + o.getArgName() + ">" : "");
    }

    private static String column(String text, int width) {
        StringBuilder sb = new StringBuilder(text);
        while (sb.length() < width) {
            sb.append(' ');
        }
        return sb.toString();
    }

    private static HelpFormatter formatter() {
        HelpFormatter f = new HelpFormatter();
        f.setSyntaxPrefix("Usage: ");
        return f;
    }
}
