package org.tertius.connection.special;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;

/**
 * The value of a solution at a point to many digits: w and w' as Apfloat numbers with log10 of their estimated
 * absolute errors (logs, so that errors far below the double range are kept). Immutable.
 *
 * @param point the point of the surface
 * @param w the value
 * @param dw the derivative
 * @param log10ErrorW log10 of the estimated absolute error of w
 * @param log10ErrorDw log10 of the estimated absolute error of w'
 */
public record PreciseValue(SurfacePoint point, Apcomplex w, Apcomplex dw, double log10ErrorW, double log10ErrorDw) {

    /** Estimated correct significant digits of w: floor(log10 |w| - log10 error), at least 0. */
    public long correctDigitsW() {
        return correctDigits(w, log10ErrorW);
    }

    /** Estimated correct significant digits of w'. */
    public long correctDigitsDw() {
        return correctDigits(dw, log10ErrorDw);
    }

    /** w written with as many significant digits as are estimated correct (at most the precision held). */
    public String textW() {
        return text(w, Math.max(1, correctDigitsW()));
    }

    /** w' written with as many significant digits as are estimated correct. */
    public String textDw() {
        return text(dw, Math.max(1, correctDigitsDw()));
    }

    /** w and w' rounded to double (the errors as doubles: 0 when below the double range). */
    public Complex wDouble() {
        return new Complex(w.real().doubleValue(), w.imag().doubleValue());
    }

    public Complex dwDouble() {
        return new Complex(dw.real().doubleValue(), dw.imag().doubleValue());
    }

    static long correctDigits(Apcomplex x, double log10Error) {
        if (x.real().signum() == 0 && x.imag().signum() == 0) {
            return 0;
        }
        double lg = log10Abs(x);
        double d = Math.floor(lg - log10Error);
        long cap = x.precision() == Apfloat.INFINITE ? 1000000 : x.precision();
        return (long) Math.max(0, Math.min(cap, d));
    }

    /** log10 |x| for any magnitude. */
    static double log10Abs(Apcomplex x) {
        double a = log10Abs(x.real());
        double b = log10Abs(x.imag());
        double m = Math.max(a, b);
        if (m == Double.NEGATIVE_INFINITY) {
            return m;
        }
        return m + 0.5 * Math.log10(Math.pow(10, 2 * (a - m)) + Math.pow(10, 2 * (b - m)));
    }

    private static double log10Abs(Apfloat x) {
        if (x.signum() == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        long scale = x.scale();
        Apfloat mantissa = ApfloatMath.scale(x.precision(Math.min(x.precision(), 20)), -scale);
        return Math.log10(Math.abs(mantissa.doubleValue())) + scale;
    }

    /**
     * A complex number with {@code digits} significant digits (relative to its modulus) as re+imi, each part in
     * plain or scientific notation as Apfloat writes it.
     */
    public static String text(Apcomplex x, long digits) {
        double lg = log10Abs(x);
        if (lg == Double.NEGATIVE_INFINITY) {
            return "0";
        }
        long exponent = (long) Math.floor(lg);
        String re = part(x.real(), digits, exponent);
        String im = part(x.imag(), digits, exponent);
        return re + (im.startsWith("-") ? im : "+" + im) + "i";
    }

    /**
     * The real and imaginary parts of x with {@code digits} significant digits relative to its modulus (both to
     * the same absolute resolution), as plain decimals or in scientific notation as Apfloat writes them.
     */
    public static String[] parts(Apcomplex x, long digits) {
        double lg = log10Abs(x);
        if (lg == Double.NEGATIVE_INFINITY) {
            return new String[] {"0", "0"};
        }
        long exponent = (long) Math.floor(lg);
        return new String[] {decimal(x.real(), digits, exponent), decimal(x.imag(), digits, exponent)};
    }

    /** A part rounded to the absolute position 10^(exponent - digits + 1), trailing zeros kept (BigDecimal text). */
    private static String decimal(Apfloat v, long digits, long exponent) {
        if (v.signum() == 0) {
            return "0";
        }
        long keep = digits - (exponent - (v.scale() - 1));
        if (keep < 1) {
            return "0";
        }
        int n = (int) Math.min(keep, 1000000);
        BigDecimal r = new BigDecimal(v.toString(true)).round(new MathContext(n, RoundingMode.HALF_EVEN));
        if (r.precision() < n) {
            r = r.setScale(r.scale() + n - r.precision());
        }
        return r.toString().replace("E+", "e").replace("E", "e");
    }

    /**
     * The estimated correct significant digits of the pair (the smaller of w's and w''s; an exactly known zero
     * w', as for a constant solution, does not count).
     */
    public long correctDigits() {
        boolean exactZero = dw.real().signum() == 0 && dw.imag().signum() == 0
                && log10ErrorDw == Double.NEGATIVE_INFINITY;
        return exactZero ? correctDigitsW() : Math.min(correctDigitsW(), correctDigitsDw());
    }

    /** A part rounded to the absolute position 10^(exponent - digits + 1). */
    private static String part(Apfloat v, long digits, long exponent) {
        if (v.signum() == 0) {
            return "0";
        }
        long own = v.scale() - 1;
        long keep = digits - (exponent - own);
        if (keep < 1) {
            return "0";
        }
        Apfloat r = ApfloatMath.round(v, Math.min(keep, v.precision()), RoundingMode.HALF_EVEN);
        return r.toString(false);
    }
}
