package org.tertius.connection.scan;

import java.util.Locale;
import org.tertius.core.InvalidInputException;

/**
 * What one member of a family does on the positive real axis. Immutable.
 *
 * <ul>
 *   <li>{@code poleFree}: log w is finite on (0, infinity): no zero and no pole of w on the axis.</li>
 *   <li>{@code firstSingularity}: the largest x in the scanned window where w has a zero or a pole
 *       (NaN if none), {@code kind} "zero", "pole" or "none".</li>
 *   <li>{@code atZero}: "power" (w ~ B x^sigma, {@code sigma} its exponent, |sigma| &lt; 1), "logarithmic"
 *       (sigma = +-1 within the error of the invariant), "accumulating" (zeros or poles of w accumulate at 0), or
 *       "undecided" (sigma NaN) when the cross-checks fail: the invariant is not conserved between the points
 *       where it is read, or it would give a power law with |sigma| &gt;= 1.</li>
 *   <li>{@code invariant}: the quantity E of the autonomous limit near 0 whose sign decides the behaviour there,
 *       in the form of w or of 1/w (see {@link DecayingClassifier}).</li>
 * </ul>
 */
public final class Classification implements ScanRow {
    public static final String CSV_HEADER = "index,parameter,pole_free,first_singularity,kind,at_zero,sigma,invariant";
    private final int index;
    private final double parameter;
    private final boolean poleFree;
    private final double firstSingularity;
    private final String kind;
    private final String atZero;
    private final double sigma;
    private final double invariant;

    public Classification(int index, double parameter, boolean poleFree, double firstSingularity, String kind,
                          String atZero, double sigma, double invariant) {
        this.index = index;
        this.parameter = parameter;
        this.poleFree = poleFree;
        this.firstSingularity = firstSingularity;
        this.kind = kind;
        this.atZero = atZero;
        this.sigma = sigma;
        this.invariant = invariant;
    }

    @Override
    public int index() {
        return index;
    }

    public double parameter() {
        return parameter;
    }

    public boolean poleFree() {
        return poleFree;
    }

    public double firstSingularity() {
        return firstSingularity;
    }

    @Override
    public String kind() {
        return kind;
    }

    public String atZero() {
        return atZero;
    }

    public double sigma() {
        return sigma;
    }

    public double invariant() {
        return invariant;
    }

    /** The same classification with another task index. */
    public Classification withIndex(int i) {
        return new Classification(i, parameter, poleFree, firstSingularity, kind, atZero, sigma, invariant);
    }

    @Override
    public String csvRow() {
        return String.format(Locale.ROOT, "%d,%.17g,%b,%.17g,%s,%s,%.17g,%.6e", index, parameter, poleFree,
                firstSingularity, kind, atZero, sigma, invariant);
    }

    /** The parameter and the kind of the first singularity, for progress lines. */
    @Override
    public String summary() {
        return String.format(Locale.ROOT, "lambda=%.6g %s", parameter, kind);
    }

    /**
     * Reads a row written by {@link #csvRow()}.
     *
     * @throws InvalidInputException ("scan file") if it is not such a row
     */
    public static Classification parse(String row) {
        String[] f = row.split(",", -1);
        try {
            if (f.length == 8) {
                return new Classification(Integer.parseInt(f[0]), Double.parseDouble(f[1]),
                        Boolean.parseBoolean(f[2]), Double.parseDouble(f[3]), f[4], f[5], Double.parseDouble(f[6]),
                        Double.parseDouble(f[7]));
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new InvalidInputException("scan file", "malformed row '" + row + "' (expected " + CSV_HEADER + ")");
    }

    @Override
    public String toString() {
        return csvRow();
    }
}
