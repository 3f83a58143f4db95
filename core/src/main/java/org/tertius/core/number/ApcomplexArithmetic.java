package org.tertius.core.number;

import java.math.BigDecimal;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/** {@link AnalyticArithmetic} in arbitrary precision (Apfloat) at a fixed number of decimal digits. */
public final class ApcomplexArithmetic implements AnalyticArithmetic<Apcomplex> {
    private final FixedPrecisionApcomplexHelper h;

    public ApcomplexArithmetic(long digits) {
        if (digits < 16 || digits > 100000) {
            throw new InvalidInputException("digits", "must be in [16, 100000], got " + digits);
        }
        this.h = new FixedPrecisionApcomplexHelper(digits);
    }

    /** The helper that fixes the precision (for functions not in {@link AnalyticArithmetic}: Gamma, Bessel, pi). */
    public FixedPrecisionApcomplexHelper helper() {
        return h;
    }

    @Override
    public Apcomplex of(double re, double im) {
        return h.valueOf(new Apcomplex(exact(re), exact(im)));
    }

    private static Apfloat exact(double x) {
        // a double is a binary fraction; BigDecimal(double) is its exact value
        return new Apfloat(new BigDecimal(x));
    }

    /** A decimal number given as text, read to the working precision. */
    public Apcomplex parse(String text) {
        return h.valueOf(new Apcomplex(new Apfloat(text, h.precision())));
    }

    @Override
    public Apcomplex ratio(long p, long q) {
        return h.divide(new Apcomplex(new Apfloat(p)), new Apcomplex(new Apfloat(q)));
    }

    @Override
    public Apcomplex add(Apcomplex a, Apcomplex b) {
        return h.add(a, b);
    }

    @Override
    public Apcomplex subtract(Apcomplex a, Apcomplex b) {
        return h.subtract(a, b);
    }

    @Override
    public Apcomplex multiply(Apcomplex a, Apcomplex b) {
        return h.multiply(a, b);
    }

    @Override
    public Apcomplex divide(Apcomplex a, Apcomplex b) {
        return h.divide(a, b);
    }

    @Override
    public Apcomplex negate(Apcomplex a) {
        return h.negate(a);
    }

    @Override
    public Apcomplex reciprocal(Apcomplex a) {
        return h.divide(one(), a);
    }

    @Override
    public Apcomplex exp(Apcomplex a) {
        return h.exp(a);
    }

    @Override
    public Apcomplex log(Apcomplex a) {
        return h.log(a);
    }

    @Override
    public Apcomplex sqrt(Apcomplex a) {
        return h.sqrt(a);
    }

    @Override
    public Apcomplex pow(Apcomplex a, Apcomplex b) {
        return h.exp(h.multiply(b, h.log(a)));
    }

    @Override
    public double abs(Apcomplex a) {
        Apfloat m = h.abs(a);
        if (m.signum() == 0) {
            return 0;
        }
        long scale = m.scale();
        if (scale < -300) {
            return 0;
        }
        if (scale > 300) {
            return Double.POSITIVE_INFINITY;
        }
        return m.doubleValue();
    }

    @Override
    public double logAbs(Apcomplex a) {
        Apfloat m = h.abs(a);
        if (m.signum() == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        long scale = m.scale();
        Apfloat mantissa = ApfloatMath.scale(m, -scale);
        return Math.log(mantissa.doubleValue()) + scale * Math.log(10);
    }

    @Override
    public Complex toComplex(Apcomplex a) {
        return new Complex(a.real().doubleValue(), a.imag().doubleValue());
    }

    @Override
    public double epsilon() {
        return Math.pow(10, -h.precision());
    }

    @Override
    public long digits() {
        return h.precision();
    }

    @Override
    public Apcomplex pi() {
        return new Apcomplex(ApfloatMath.pi(h.precision()));
    }
}
