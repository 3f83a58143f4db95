package org.tertius.core.number;

import java.math.BigInteger;
import org.hipparchus.complex.Complex;

/**
 * A complex binary floating-point number {@code (re + i im) * 2^exp} whose two integer mantissas share one
 * exponent (normwise precision, as is usual for complex arithmetic). Immutable; arithmetic and rounding to a
 * working precision live in {@link MpContext}, the one place where precision is set.
 */
public final class MpComplex {
    public static final MpComplex ZERO = new MpComplex(BigInteger.ZERO, BigInteger.ZERO, 0);

    final BigInteger re;
    final BigInteger im;
    final int exp;

    public MpComplex(BigInteger re, BigInteger im, int exp) {
        this.re = re;
        this.im = im;
        this.exp = exp;
    }

    public boolean isZero() {
        return re.signum() == 0 && im.signum() == 0;
    }

    /** The integer mantissa of the real part (the value is {@code (re + i im) * 2^exponent()}). */
    public BigInteger mantissaRe() {
        return re;
    }

    /** The integer mantissa of the imaginary part. */
    public BigInteger mantissaIm() {
        return im;
    }

    /** The binary exponent shared by both mantissas. */
    public int exponent() {
        return exp;
    }

    /** Bit length of the larger mantissa (0 for zero). */
    public int mantissaBits() {
        return Math.max(re.bitLength(), im.bitLength());
    }

    /** log2 of the modulus, to about 1e-15 relative (negative infinity for zero). */
    public double log2Abs() {
        if (isZero()) {
            return Double.NEGATIVE_INFINITY;
        }
        int bits = mantissaBits();
        int shift = Math.max(0, bits - 62);
        double r = re.shiftRight(shift).doubleValue();
        double i = im.shiftRight(shift).doubleValue();
        return Math.log(Math.hypot(r, i)) / Math.log(2) + shift + exp;
    }

    /** The modulus as a double (may overflow to infinity or underflow to 0 for extreme values). */
    public double abs() {
        double l = log2Abs();
        return l == Double.NEGATIVE_INFINITY ? 0 : Math.pow(2, l);
    }

    /** The nearest double-precision complex number (each part may overflow or underflow). */
    public Complex toComplex() {
        return new Complex(part(re), part(im));
    }

    private double part(BigInteger m) {
        int shift = Math.max(0, m.bitLength() - 62);
        return Math.scalb(m.shiftRight(shift).doubleValue(), shift + exp);
    }

    public MpComplex negate() {
        return new MpComplex(re.negate(), im.negate(), exp);
    }

    public MpComplex conjugate() {
        return new MpComplex(re, im.negate(), exp);
    }

    /** this * 2^k, exactly. */
    public MpComplex scalb(int k) {
        return isZero() ? this : new MpComplex(re, im, exp + k);
    }

    @Override
    public String toString() {
        return toComplex().toString();
    }
}
