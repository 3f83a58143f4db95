package org.tertius.connection.scan;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;

/**
 * The values of one swept parameter: {@code count} values from {@code from} to {@code to} (both included),
 * equally spaced or, for a positive parameter that acts as a scale, in geometric progression. Written
 * {@code A:B:N}; {@link #toString()} gives the shortest text that reads back to the same doubles. Immutable.
 */
public final class ParameterRange {
    /** Largest number of values of one parameter. */
    public static final int MAX_COUNT = 1_000_000;
    private final double from;
    private final double to;
    private final int count;
    private final boolean geometric;

    private ParameterRange(double from, double to, int count, boolean geometric) {
        this.from = from;
        this.to = to;
        this.count = count;
        this.geometric = geometric;
    }

    /** Equally spaced values; {@code argument} names the parameter in the error message. */
    public static ParameterRange linear(String argument, double from, double to, int count) {
        check(argument, from, to, count);
        return new ParameterRange(from, to, count, false);
    }

    /** Values in geometric progression, 0 &lt; from, 0 &lt; to. */
    public static ParameterRange geometric(String argument, double from, double to, int count) {
        check(argument, from, to, count);
        if (!(from > 0 && to > 0)) {
            throw new InvalidInputException(argument, "the values are spaced geometrically and must be > 0, got "
                    + from + " to " + to);
        }
        return new ParameterRange(from, to, count, true);
    }

    /**
     * Reads {@code A:B:N} (real numbers as decimals or p/q, N an integer).
     *
     * @throws InvalidInputException naming {@code argument} for anything else
     */
    public static ParameterRange parse(String argument, String text, boolean geometric) {
        String[] p = text == null ? new String[0] : text.trim().split(":", -1);
        if (p.length != 3) {
            throw new InvalidInputException(argument, "expected A:B:N (from A to B, N >= 2 values), got '" + text + "'");
        }
        double a = real(argument, p[0]);
        double b = real(argument, p[1]);
        int n;
        try {
            n = Integer.parseInt(p[2].trim());
        } catch (NumberFormatException e) {
            throw new InvalidInputException(argument, "the count N of A:B:N must be an integer in [2, " + MAX_COUNT
                    + "], got '" + p[2] + "'");
        }
        return geometric ? geometric(argument, a, b, n) : linear(argument, a, b, n);
    }

    private static double real(String argument, String text) {
        Complex c = ComplexText.parse(argument, text);
        if (c.getImaginary() != 0) {
            throw new InvalidInputException(argument, "expected a real number, got '" + text + "'");
        }
        return c.getReal();
    }

    private static void check(String argument, double from, double to, int count) {
        if (!Double.isFinite(from) || !Double.isFinite(to)) {
            throw new InvalidInputException(argument, "the ends must be finite, got " + from + " and " + to);
        }
        if (count < 2 || count > MAX_COUNT) {
            throw new InvalidInputException(argument, "the count must be an integer in [2, " + MAX_COUNT + "], got "
                    + count);
        }
        if (from == to) {
            throw new InvalidInputException(argument, "empty range: both ends are " + from);
        }
    }

    /** Value {@code i}, 0 &lt;= i &lt; count; the ends are exact. */
    public double value(int i) {
        if (i == 0) {
            return from;
        }
        if (i == count - 1) {
            return to;
        }
        if (geometric) {
            return from * Math.pow(to / from, (double) i / (count - 1));
        }
        return from + (to - from) * i / (count - 1);
    }

    public double from() {
        return from;
    }

    public double to() {
        return to;
    }

    public int count() {
        return count;
    }

    public boolean isGeometric() {
        return geometric;
    }

    /** {@code A:B:N} with the shortest decimals that read back to the same doubles. */
    @Override
    public String toString() {
        return from + ":" + to + ":" + count;
    }
}
