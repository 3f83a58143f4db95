package org.tertius.core.mp;
import org.tertius.core.number.MpComplex;

/**
 * A complex number in double precision with a separate binary exponent, {@code (re + i im) 2^exp} with
 * max(|re|, |im|) in [1/2, 1): about 16 digits over an exponent range no double has. For cheap estimates of
 * quantities whose size ranges beyond 10^±308 (screening the continued fractions before a full-precision
 * evaluation). Immutable.
 */
final class WideComplex {
    static final WideComplex ZERO = new WideComplex(0, 0, 0);
    static final WideComplex ONE = of(1, 0, 0);

    final double re;
    final double im;
    final long exp;

    private WideComplex(double re, double im, long exp) {
        this.re = re;
        this.im = im;
        this.exp = exp;
    }

    /** (re + i im) 2^exp, normalised. */
    static WideComplex of(double re, double im, long exp) {
        double m = Math.max(Math.abs(re), Math.abs(im));
        if (m == 0) {
            return ZERO;
        }
        if (!Double.isFinite(m)) {
            throw new ArithmeticException("not finite: " + re + " + " + im + "i");
        }
        int k = Math.getExponent(m) + 1;
        return new WideComplex(Math.scalb(re, -k), Math.scalb(im, -k), exp + k);
    }

    /** The value of an arbitrary-precision number, rounded to double precision. */
    static WideComplex of(MpComplex x) {
        if (x.isZero()) {
            return ZERO;
        }
        int shift = Math.max(0, x.mantissaBits() - 62);
        double r = x.mantissaRe().shiftRight(shift).doubleValue();
        double i = x.mantissaIm().shiftRight(shift).doubleValue();
        return of(r, i, (long) shift + x.exponent());
    }

    boolean isZero() {
        return re == 0 && im == 0;
    }

    /** log2 of the modulus (negative infinity for zero). */
    double log2Abs() {
        return isZero() ? Double.NEGATIVE_INFINITY : Math.log(Math.hypot(re, im)) / Math.log(2) + exp;
    }

    WideComplex multiply(WideComplex b) {
        if (isZero() || b.isZero()) {
            return ZERO;
        }
        return of(re * b.re - im * b.im, re * b.im + im * b.re, exp + b.exp);
    }

    /** this / b; b must not be zero. */
    WideComplex divide(WideComplex b) {
        double d = b.re * b.re + b.im * b.im;
        return of((re * b.re + im * b.im) / d, (im * b.re - re * b.im) / d, exp - b.exp);
    }

    WideComplex add(WideComplex b) {
        if (isZero()) {
            return b;
        }
        if (b.isZero()) {
            return this;
        }
        if (b.exp > exp) {
            return b.add(this);
        }
        // b is the smaller in exponent: scaled down to this one's (to zero when far below)
        long d = exp - b.exp;
        if (d > 1100) {
            return this;
        }
        int s = (int) -d;
        return of(re + Math.scalb(b.re, s), im + Math.scalb(b.im, s), exp);
    }

    WideComplex negate() {
        return new WideComplex(-re, -im, exp);
    }
}
