package org.tertius.cli;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.apache.commons.cli.CommandLine;
import org.apache.commons.cli.DefaultParser;
import org.apache.commons.cli.MissingArgumentException;
import org.apache.commons.cli.Option;
import org.apache.commons.cli.Options;
import org.apache.commons.cli.ParseException;
import org.apache.commons.cli.UnrecognizedOptionException;

/**
 * Parses a command's arguments with Commons CLI, held to the tool's rules: long options by their full name with
 * two dashes (no abbreviation, no single dash), each at most once, no stray arguments. A value may start with '-'
 * ({@code --beta -1/2}, {@code --at -1.5}) or be attached ({@code --at=3+2i}); a flag may be written
 * {@code --flag=true} or {@code --flag=false}. Every failure is a {@link UsageException} naming the argument.
 */
final class ArgumentParser {
    private ArgumentParser() {
    }

    /** The arguments parsed against the options; required ones are checked later ({@link Arguments#checkRequired}). */
    static Arguments parse(Options options, String[] args) {
        CommandLine line;
        try {
            line = DefaultParser.builder().setAllowPartialMatching(false).setStripLeadingAndTrailingQuotes(false).get()
                    .parse(withoutRequired(options), tokens(options, args));
        } catch (MissingArgumentException e) {
            Option o = e.getOption();
            throw new UsageException("Missing required parameter for option '--" + o.getLongOpt() + "' ("
                    + o.getArgName() + ")");
        } catch (UnrecognizedOptionException e) {
            throw unknown(e.getOption());
        } catch (ParseException e) {
            throw new UsageException(e.getMessage());
        }
        Set<String> seen = new HashSet<>();
        for (Option o : line.getOptions()) {
            if (!seen.add(o.getKey())) {
                throw new UsageException("option '--" + o.getLongOpt() + "' should be specified only once");
            }
        }
        List<String> stray = line.getArgList();
        if (!stray.isEmpty()) {
            throw new UsageException("Unmatched argument" + (stray.size() == 1 ? "" : "s") + ": '"
                    + String.join("', '", stray) + "'");
        }
        return new Arguments(line, options);
    }

    /** The arguments with unknown options refused and the flags' =true or =false resolved. */
    private static String[] tokens(Options options, String[] args) {
        List<String> out = new ArrayList<>(args.length);
        for (int i = 0; i < args.length; i++) {
            String t = args[i];
            if (t.equals("--")) {
                out.addAll(List.of(args).subList(i, args.length));
                break;
            }
            if (t.startsWith("--")) {
                int eq = t.indexOf('=');
                String name = eq < 0 ? t : t.substring(0, eq);
                if (!options.hasLongOption(name)) {
                    throw unknown(name);
                }
                Option o = options.getOption(name);
                if (!o.hasArg() && eq >= 0) {
                    if (flag(name, t.substring(eq + 1))) {
                        out.add(name);
                    }
                    continue;
                }
                if (o.hasArg() && eq < 0 && i + 1 < args.length && !isOption(options, args[i + 1])) {
                    // its value, whatever it starts with, attached to it: as a token of its own, a value such as
                    // -s or -summary.csv would be read as an option of the parser library
                    out.add(t + "=" + args[++i]);
                } else {
                    out.add(t);
                }
            } else if (t.length() > 1 && t.startsWith("-") && !standardShort(t)) {
                throw unknown(t);
            } else {
                out.add(t);
            }
        }
        return out.toArray(new String[0]);
    }

    /** Whether the token names one of the options (--name or --name=value): then it is not a value. */
    private static boolean isOption(Options options, String token) {
        if (!token.startsWith("--")) {
            return false;
        }
        int eq = token.indexOf('=');
        return options.hasLongOption(eq < 0 ? token : token.substring(0, eq));
    }

    /** -h, -V or both clustered. */
    private static boolean standardShort(String t) {
        for (int k = 1; k < t.length(); k++) {
            if (t.charAt(k) != 'h' && t.charAt(k) != 'V') {
                return false;
            }
        }
        return true;
    }

    private static boolean flag(String name, String value) {
        if (value.equalsIgnoreCase("true") || value.equalsIgnoreCase("false")) {
            return value.equalsIgnoreCase("true");
        }
        throw new UsageException(name + ": expected true or false, got '" + value + "'");
    }

    private static UsageException unknown(String option) {
        return new UsageException("Unknown option: '" + option + "'");
    }

    /** The options with none required: --help and --version come first. */
    private static Options withoutRequired(Options declared) {
        if (declared.getRequiredOptions().isEmpty()) {
            return declared;
        }
        Options lenient = new Options();
        for (Option o : declared.getOptions()) {
            Option copy = (Option) o.clone();
            copy.setRequired(false);
            lenient.addOption(copy);
        }
        return lenient;
    }
}
