package org.tertius.hierarchy.algebra;

import java.math.BigInteger;
import org.hipparchus.complex.Complex;
import org.hipparchus.fraction.BigFraction;

/**
 * An exact complex rational number p + i q (p, q rational). Immutable. Used for the coefficients of the
 * generated hierarchy equations, so that they can be checked exactly.
 */
public final class GaussianRational {
    public static final GaussianRational ZERO = new GaussianRational(BigFraction.ZERO, BigFraction.ZERO);
    public static final GaussianRational ONE = new GaussianRational(BigFraction.ONE, BigFraction.ZERO);
    public static final GaussianRational I = new GaussianRational(BigFraction.ZERO, BigFraction.ONE);

    private final BigFraction re;
    private final BigFraction im;

    private GaussianRational(BigFraction re, BigFraction im) {
        this.re = re;
        this.im = im;
    }

    public static GaussianRational of(BigFraction re, BigFraction im) {
        return new GaussianRational(re, im);
    }

    public static GaussianRational of(long re, long im) {
        return new GaussianRational(new BigFraction(re), new BigFraction(im));
    }

    /** The rational number num / den. */
    public static GaussianRational rational(long num, long den) {
        return new GaussianRational(new BigFraction(BigInteger.valueOf(num), BigInteger.valueOf(den)),
                BigFraction.ZERO);
    }

    public BigFraction re() {
        return re;
    }

    public BigFraction im() {
        return im;
    }

    public boolean isZero() {
        return re.getNumerator().signum() == 0 && im.getNumerator().signum() == 0;
    }

    public GaussianRational add(GaussianRational o) {
        return new GaussianRational(re.add(o.re), im.add(o.im));
    }

    public GaussianRational subtract(GaussianRational o) {
        return new GaussianRational(re.subtract(o.re), im.subtract(o.im));
    }

    public GaussianRational negate() {
        return new GaussianRational(re.negate(), im.negate());
    }

    public GaussianRational multiply(GaussianRational o) {
        return new GaussianRational(re.multiply(o.re).subtract(im.multiply(o.im)),
                re.multiply(o.im).add(im.multiply(o.re)));
    }

    /** 1 / this; the value must not be zero. */
    public GaussianRational reciprocal() {
        if (isZero()) {
            throw new ArithmeticException("reciprocal of zero");
        }
        BigFraction norm = re.multiply(re).add(im.multiply(im));
        return new GaussianRational(re.divide(norm), im.negate().divide(norm));
    }

    public Complex toComplex() {
        return new Complex(re.doubleValue(), im.doubleValue());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof GaussianRational && ((GaussianRational) o).re.equals(re)
                && ((GaussianRational) o).im.equals(im);
    }

    @Override
    public int hashCode() {
        return re.hashCode() * 31 + im.hashCode();
    }

    /** Text such as {@code 3/2}, {@code -2i} or {@code (1+2i)}. */
    @Override
    public String toString() {
        boolean r = re.getNumerator().signum() != 0;
        boolean i = im.getNumerator().signum() != 0;
        if (!i) {
            return text(re);
        }
        String mag = text(im);
        if (mag.contains("/")) {
            mag = mag.startsWith("-") ? "-(" + mag.substring(1) + ")" : "(" + mag + ")";
        }
        String imText = (im.equals(BigFraction.ONE) ? "" : im.equals(BigFraction.MINUS_ONE) ? "-" : mag) + "i";
        if (!r) {
            return imText;
        }
        return "(" + text(re) + (im.getNumerator().signum() > 0 ? "+" : "") + imText + ")";
    }

    private static String text(BigFraction f) {
        return f.getDenominator().equals(BigInteger.ONE) ? f.getNumerator().toString()
                : f.getNumerator() + "/" + f.getDenominator();
    }
}
