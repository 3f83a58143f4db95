package org.tertius.core.highprecision;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.List;
import org.apfloat.Apcomplex;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * The values of a solution at a point to a requested number of digits: binary numbers carrying a few more digits
 * than requested (available as Apfloat numbers and as decimal strings with the requested number of significant
 * digits), named as the solution's values, and the estimated number of correct significant digits. Immutable.
 */
public final class HighPrecisionValue {
    private final ExactPoint point;
    private final List<String> names;
    private final MpContext ctx;
    private final MpComplex[] values;
    private final int requestedDigits;
    private final int[] correctDigitsEach;
    private final int correctDigits;

    HighPrecisionValue(ExactPoint point, List<String> names, MpContext ctx, MpComplex[] values, int requestedDigits,
                       int[] correctDigitsEach) {
        this.point = point;
        this.names = names;
        this.ctx = ctx;
        this.values = values.clone();
        this.requestedDigits = requestedDigits;
        this.correctDigitsEach = correctDigitsEach.clone();
        int least = requestedDigits;
        for (int d : correctDigitsEach) {
            least = Math.min(least, d);
        }
        this.correctDigits = least;
    }

    /** The point, exactly as given. */
    public ExactPoint point() {
        return point;
    }

    /** The names of the values (those of the solution). */
    public List<String> names() {
        return names;
    }

    public int size() {
        return values.length;
    }

    /** Value i as an Apfloat number (with the working digits of the run that produced it). */
    public Apcomplex value(int i) {
        return ctx.toApcomplex(values[i]);
    }

    /** Value i as a+bi with the requested number of significant digits (relative to its modulus). */
    public String text(int i) {
        return format(values[i], requestedDigits);
    }

    /** Value i as {real part, imaginary part}, each a decimal with the digits of {@link #text(int)}. */
    public String[] parts(int i) {
        BigDecimal[] p = MpContext.exactDecimal(values[i]);
        int top = Math.max(exponent10(p[0]), exponent10(p[1]));
        return new String[] {part(p[0], requestedDigits, top), part(p[1], requestedDigits, top)};
    }

    public int requestedDigits() {
        return requestedDigits;
    }

    /**
     * The estimated number of correct significant digits of every value (the smallest over the values, relative to
     * the modulus of each); at most the requested number.
     */
    public int correctDigits() {
        return correctDigits;
    }

    /**
     * The estimated number of correct significant digits of value i (relative to its modulus), at most the requested
     * number; the smallest of them is {@link #correctDigits()}.
     */
    public int correctDigits(int i) {
        return correctDigitsEach[i];
    }

    /**
     * Formats a complex number with n significant digits relative to its modulus: the smaller part gets fewer
     * digits, so that both are given to the same absolute resolution.
     */
    static String format(MpComplex x, int n) {
        BigDecimal[] parts = MpContext.exactDecimal(x);
        BigDecimal re = parts[0];
        BigDecimal im = parts[1];
        int top = Math.max(exponent10(re), exponent10(im));
        return part(re, n, top) + (im.signum() < 0 ? "-" : "+") + part(im.abs(), n, top) + "i";
    }

    private static int exponent10(BigDecimal d) {
        return d.signum() == 0 ? Integer.MIN_VALUE / 2 : d.precision() - d.scale() - 1;
    }

    private static String part(BigDecimal d, int n, int top) {
        if (d.signum() == 0) {
            return "0";
        }
        int keep = n - (top - exponent10(d));
        if (keep < 1) {
            return "0";
        }
        return d.round(new MathContext(keep, RoundingMode.HALF_EVEN)).toString().replace("E+", "e").replace("E", "e");
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder();
        for (int i = 0; i < values.length; i++) {
            b.append(i == 0 ? "" : ", ").append(names.get(i)).append('(').append(point).append(") = ").append(text(i));
        }
        return b.append(" (").append(correctDigits).append(" correct digits)").toString();
    }
}
