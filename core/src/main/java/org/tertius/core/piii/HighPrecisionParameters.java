package org.tertius.core.piii;

import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.tertius.core.InvalidInputException;

/**
 * The parameters of Painleve III in arbitrary precision (Apfloat), with one fixed-precision helper that sets
 * the working precision in one place. Values should be exact (integers, or p/q computed at this precision)
 * or given to at least this precision: Apfloat keeps the precision of each number, and a decimal literal
 * such as "0.3" has only one digit of precision unless it is widened (see {@link #helper()}).
 */
public final class HighPrecisionParameters {
    private final FixedPrecisionApcomplexHelper h;
    private final Apcomplex alpha;
    private final Apcomplex beta;
    private final Apcomplex gamma;
    private final Apcomplex delta;

    public HighPrecisionParameters(long precision, Apcomplex alpha, Apcomplex beta, Apcomplex gamma,
                                   Apcomplex delta) {
        if (precision < 16) {
            throw new InvalidInputException("precision", "must be at least 16 digits, got " + precision);
        }
        this.h = new FixedPrecisionApcomplexHelper(precision);
        this.alpha = h.valueOf(alpha);
        this.beta = h.valueOf(beta);
        this.gamma = h.valueOf(gamma);
        this.delta = h.valueOf(delta);
    }

    public FixedPrecisionApcomplexHelper helper() {
        return h;
    }

    public long precision() {
        return h.precision();
    }

    public Apcomplex alpha() {
        return alpha;
    }

    public Apcomplex beta() {
        return beta;
    }

    public Apcomplex gamma() {
        return gamma;
    }

    public Apcomplex delta() {
        return delta;
    }

    /** The square root of -delta with the sign of the double-precision value {@code c} used by a form. */
    Apcomplex c(org.hipparchus.complex.Complex c) {
        Apcomplex r = h.sqrt(h.negate(delta));
        double re = r.real().doubleValue() - c.getReal();
        double im = r.imag().doubleValue() - c.getImaginary();
        if (org.tertius.core.number.Cx.abs(re, im) > 1e-6 * Math.max(1, c.norm())) {
            r = h.negate(r);
        }
        return r;
    }

    /** The parameters of 1/w at the same precision. */
    HighPrecisionParameters reciprocal() {
        return new HighPrecisionParameters(precision(), h.negate(beta), h.negate(alpha), h.negate(delta),
                h.negate(gamma));
    }

    Apcomplex valueOf(double x) {
        return h.valueOf(new Apcomplex(new org.apfloat.Apfloat(x)));
    }

    static Apcomplex abs(Apcomplex x) {
        return ApcomplexMath.abs(x);
    }
}
