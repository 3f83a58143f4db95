package org.tertius.cli;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import java.util.Set;
import java.util.TreeSet;
import org.tertius.core.InvalidInputException;

/**
 * A problem file: "key = value" lines ('#' starts a comment), so that a run can be repeated. Keys: alpha, beta,
 * gamma, delta, z0, w0, dw0, d3w0, sheet, at, line, grid, tolerance, order, digits, family and the family
 * parameters (e.g. lambda), member, times, s, m, x0, state, origin, special, special-index, bessel-coefficients,
 * backlund. Options given on the command line win over the file.
 */
final class ProblemFile {
    static final Set<String> KEYS = Set.of("alpha", "beta", "gamma", "delta", "z0", "w0", "dw0", "d3w0", "sheet",
            "at", "line", "grid", "tolerance", "order", "digits", "family", "lambda", "sigma", "b", "w00",
            "member", "times", "s", "m", "x0", "state", "origin", "title", "background", "amplitude-infinity", "phase", "family-x0",
            "special", "special-index", "bessel-coefficients", "backlund");
    private final Properties props;
    private final String name;

    private ProblemFile(Properties props, String name) {
        this.props = props;
        this.name = name;
    }

    static ProblemFile empty() {
        return new ProblemFile(new Properties(), "(none)");
    }

    static ProblemFile read(Path path) {
        if (path == null) {
            return empty();
        }
        Properties p = new Properties();
        try (Reader r = Files.newBufferedReader(path, StandardCharsets.UTF_8)) {
            p.load(r);
        } catch (IOException e) {
            throw new InvalidInputException("--problem", "cannot read " + path + ": " + e.getMessage());
        }
        for (String k : p.stringPropertyNames()) {
            if (!KEYS.contains(k)) {
                throw new InvalidInputException("--problem", "unknown key '" + k + "' in " + path + "; known keys: "
                        + new TreeSet<>(KEYS));
            }
        }
        return new ProblemFile(p, path.toString());
    }

    boolean has(String key) {
        return props.getProperty(key) != null && !props.getProperty(key).isBlank();
    }

    String get(String key) {
        String v = props.getProperty(key);
        return v == null ? null : v.trim();
    }

    String fill(String current, String key) {
        return current != null ? current : get(key);
    }

    double doubleValue(String key) {
        try {
            return Double.parseDouble(get(key));
        } catch (NumberFormatException e) {
            throw new InvalidInputException(key, "in " + name + ": not a number: " + get(key));
        }
    }

    int intValue(String key) {
        try {
            return Integer.parseInt(get(key));
        } catch (NumberFormatException e) {
            throw new InvalidInputException(key, "in " + name + ": not an integer: " + get(key));
        }
    }
}
