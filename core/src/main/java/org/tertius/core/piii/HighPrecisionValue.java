package org.tertius.core.piii;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import org.apfloat.Apcomplex;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.number.SurfacePoint;

/**
 * A high-precision value of a Painleve III solution at a point: w and w' (binary numbers carrying a few more
 * digits than requested, available as Apfloat numbers and as decimal strings with the requested number of
 * significant digits) and the estimated number of correct significant digits. Immutable.
 */
public final class HighPrecisionValue {
    private final SurfacePoint point;
    private final MpContext ctx;
    private final MpComplex w;
    private final MpComplex dw;
    private final int requestedDigits;
    private final int correctDigits;

    HighPrecisionValue(SurfacePoint point, MpContext ctx, MpComplex w, MpComplex dw, int requestedDigits,
                       int correctDigits) {
        this.point = point;
        this.ctx = ctx;
        this.w = w;
        this.dw = dw;
        this.requestedDigits = requestedDigits;
        this.correctDigits = correctDigits;
    }

    public SurfacePoint point() {
        return point;
    }

    /** w at the point as an Apfloat number (with the working digits of the run that produced it). */
    public Apcomplex w() {
        return ctx.toApcomplex(w);
    }

    /** w' at the point as an Apfloat number. */
    public Apcomplex dw() {
        return ctx.toApcomplex(dw);
    }

    /** w as a+bi with the requested number of significant digits (relative to |w|). */
    public String wText() {
        return format(w, requestedDigits);
    }

    /** w' as a+bi with the requested number of significant digits (relative to |w'|). */
    public String dwText() {
        return format(dw, requestedDigits);
    }

    public int requestedDigits() {
        return requestedDigits;
    }

    /**
     * The estimated number of correct significant digits of both w and w' (the smaller of the two, relative to
     * the modulus of each); at most the requested number.
     */
    public int correctDigits() {
        return correctDigits;
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
        return "w(" + point + ") = " + wText() + ", w' = " + dwText() + " (" + correctDigits + " correct digits)";
    }
}
