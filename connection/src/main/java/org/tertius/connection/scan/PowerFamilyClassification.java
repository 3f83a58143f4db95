package org.tertius.connection.scan;

import java.util.Locale;
import org.tertius.core.InvalidInputException;

/**
 * What the member w ~ B x^sigma (x -&gt; 0+) of PIII(0, 0, 1, -1) does on the positive axis up to
 * {@link PowerFamilyClassifier#WINDOW_END} (see {@link PowerFamilyClassifier}). Immutable.
 *
 * <ul>
 *   <li>{@code kind}: "pole" or "zero" (the first singularity of w in the window), "none" (neither in the
 *       window), "below" (the power behaviour does not hold at {@link PowerFamilyClassifier#WINDOW_START}: a zero,
 *       a pole or a correction of order one lies below it, not resolved) or "failed" (not computed to the
 *       accuracy).</li>
 *   <li>{@code firstSingularity} and its estimated error (NaN unless pole or zero).</li>
 *   <li>{@code wEnd}: w at the end of the window and its estimated error (NaN unless none); w - 1 &gt; 0 there
 *       heads for a pole, w - 1 &lt; 0 for a zero.</li>
 * </ul>
 */
public final class PowerFamilyClassification implements ScanRow {
    public static final String CSV_HEADER = "index,sigma,b,kind,first_singularity,first_singularity_err,w_end,w_end_err";
    private final int index;
    private final double sigma;
    private final double b;
    private final String kind;
    private final double firstSingularity;
    private final double singularityError;
    private final double wEnd;
    private final double wEndError;

    public PowerFamilyClassification(int index, double sigma, double b, String kind, double firstSingularity,
                                     double singularityError, double wEnd, double wEndError) {
        this.index = index;
        this.sigma = sigma;
        this.b = b;
        this.kind = kind;
        this.firstSingularity = firstSingularity;
        this.singularityError = singularityError;
        this.wEnd = wEnd;
        this.wEndError = wEndError;
    }

    @Override
    public int index() {
        return index;
    }

    public double sigma() {
        return sigma;
    }

    public double b() {
        return b;
    }

    /** "pole", "zero", "none", "below" or "failed". */
    @Override
    public String kind() {
        return kind;
    }

    public double firstSingularity() {
        return firstSingularity;
    }

    public double singularityError() {
        return singularityError;
    }

    public double wEnd() {
        return wEnd;
    }

    public double wEndError() {
        return wEndError;
    }

    @Override
    public String csvRow() {
        return String.format(Locale.ROOT, "%d,%.17g,%.17g,%s,%.17g,%.3e,%.17g,%.3e", index, sigma, b, kind,
                firstSingularity, singularityError, wEnd, wEndError);
    }

    @Override
    public String summary() {
        return String.format(Locale.ROOT, "sigma=%.6g B=%.6g %s", sigma, b, kind);
    }

    /**
     * Reads a row written by {@link #csvRow()}.
     *
     * @throws InvalidInputException ("scan file") if it is not such a row
     */
    public static PowerFamilyClassification parse(String row) {
        String[] f = row.split(",", -1);
        try {
            if (f.length == 8) {
                return new PowerFamilyClassification(Integer.parseInt(f[0]), Double.parseDouble(f[1]),
                        Double.parseDouble(f[2]), f[3], Double.parseDouble(f[4]), Double.parseDouble(f[5]),
                        Double.parseDouble(f[6]), Double.parseDouble(f[7]));
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
