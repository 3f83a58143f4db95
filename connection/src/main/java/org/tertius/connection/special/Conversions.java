package org.tertius.connection.special;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.hipparchus.fraction.BigFraction;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Exact numbers (big integers, Gaussian rationals) in an {@link AnalyticArithmetic}, rounded once to its working
 * precision, and the log-magnitude helpers used by the error bounds.
 */
final class Conversions {
    private static final double LOG2 = Math.log(2);

    private Conversions() {
    }

    /** (re + i im) / den, rounded to the arithmetic's precision (in double: infinite if it overflows). */
    @SuppressWarnings("unchecked")
    static <T> T of(AnalyticArithmetic<T> ar, BigInteger re, BigInteger im, BigInteger den) {
        if (ar instanceof ApcomplexArithmetic) {
            ApcomplexArithmetic ap = (ApcomplexArithmetic) ar;
            long p = ap.digits() + 5;
            Apcomplex num = new Apcomplex(new Apfloat(re, p), new Apfloat(im, p));
            return (T) ap.helper().divide(num, new Apcomplex(new Apfloat(den, p)));
        }
        if (ar instanceof MpArithmetic) {
            MpContext ctx = ((MpArithmetic) ar).context();
            MpComplex num = ctx.fromFixed(re, im, 0);
            return (T) (den.equals(BigInteger.ONE) ? num : ctx.divide(num, ctx.fromFixed(den, BigInteger.ZERO, 0)));
        }
        MathContext mc = new MathContext(20);
        BigDecimal d = new BigDecimal(den);
        double x = new BigDecimal(re).divide(d, mc).doubleValue();
        double y = new BigDecimal(im).divide(d, mc).doubleValue();
        return ar.of(x, y);
    }

    static <T> T of(AnalyticArithmetic<T> ar, GaussianRational x) {
        BigFraction r = x.re();
        BigFraction i = x.im();
        BigInteger den = r.getDenominator().multiply(i.getDenominator());
        return of(ar, r.getNumerator().multiply(i.getDenominator()), i.getNumerator().multiply(r.getDenominator()), den);
    }

    static <T> T of(AnalyticArithmetic<T> ar, long n) {
        return ar.of(n, 0);
    }

    /** The Gaussian rational of an exact number (its digit count is not checked here). */
    static GaussianRational exact(ExactNumber x) {
        return GaussianRational.of(new BigFraction(x.realNumerator(), x.realDenominator()),
                new BigFraction(x.imaginaryNumerator(), x.imaginaryDenominator()));
    }

    /** The exact value of a double complex number. */
    static GaussianRational exact(Complex c) {
        return GaussianRational.of(new BigFraction(c.getReal()), new BigFraction(c.getImaginary()));
    }

    static GaussianRational exact(long n) {
        return GaussianRational.of(n, 0);
    }

    static boolean isInteger(GaussianRational x) {
        return x.im().signum() == 0 && x.re().isInteger();
    }

    /** Natural log of |re + i im| without overflow; -infinity for 0. */
    static double logAbs(BigInteger re, BigInteger im) {
        if (re.signum() == 0 && im.signum() == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        int shift = Math.max(0, Math.max(re.bitLength(), im.bitLength()) - 60);
        double x = re.shiftRight(shift).doubleValue();
        double y = im.shiftRight(shift).doubleValue();
        return Math.log(Math.hypot(x, y)) + shift * LOG2;
    }

    /** Natural log of |x| for a Gaussian rational. */
    static double logAbs(GaussianRational x) {
        BigFraction r = x.re();
        BigFraction i = x.im();
        BigInteger den = r.getDenominator().multiply(i.getDenominator());
        return logAbs(r.getNumerator().multiply(i.getDenominator()), i.getNumerator().multiply(r.getDenominator()))
                - logAbs(den, BigInteger.ZERO);
    }

    /** log(e^a + e^b) without overflow. */
    static double logAdd(double a, double b) {
        if (a == Double.NEGATIVE_INFINITY) {
            return b;
        }
        if (b == Double.NEGATIVE_INFINITY) {
            return a;
        }
        double m = Math.max(a, b);
        return m + Math.log1p(Math.exp(Math.min(a, b) - m));
    }

    /** A value of any arithmetic as an Apcomplex (exact for double). */
    static <T> Apcomplex toApcomplex(AnalyticArithmetic<T> ar, T x) {
        if (ar instanceof ApcomplexArithmetic) {
            return (Apcomplex) x;
        }
        if (ar instanceof MpArithmetic) {
            return ((MpArithmetic) ar).context().toApcomplex((MpComplex) x);
        }
        Complex c = ar.toComplex(x);
        return new Apcomplex(new Apfloat(new BigDecimal(c.getReal())), new Apfloat(new BigDecimal(c.getImaginary())));
    }

    /** A value of one arithmetic in another (exact from double; otherwise through Apcomplex). */
    static <S, T> T convert(AnalyticArithmetic<S> from, S x, AnalyticArithmetic<T> to) {
        if (from instanceof ComplexArithmetic) {
            Complex c = (Complex) x;
            return to.of(c.getReal(), c.getImaginary());
        }
        if (from instanceof MpArithmetic && to instanceof MpArithmetic) {
            @SuppressWarnings("unchecked")
            T r = (T) ((MpArithmetic) to).context().round((MpComplex) x);
            return r;
        }
        return fromApcomplex(to, toApcomplex(from, x));
    }

    /** An Apcomplex value in any arithmetic (rounded to its precision). */
    @SuppressWarnings("unchecked")
    static <T> T fromApcomplex(AnalyticArithmetic<T> ar, Apcomplex x) {
        if (ar instanceof ApcomplexArithmetic) {
            return (T) ((ApcomplexArithmetic) ar).helper().valueOf(x);
        }
        if (ar instanceof MpArithmetic) {
            return (T) ((MpArithmetic) ar).context().fromApcomplex(x);
        }
        return ar.of(x.real().doubleValue(), x.imag().doubleValue());
    }
}
