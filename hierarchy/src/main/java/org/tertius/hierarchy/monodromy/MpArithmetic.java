package org.tertius.hierarchy.monodromy;

import java.math.BigInteger;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * {@link AnalyticArithmetic} on the core's binary arbitrary-precision numbers ({@link MpComplex}, rounded by an
 * {@link MpContext}): the arithmetic of the monodromy map at more than double precision. It is several times faster
 * than Apfloat for the short numbers used here (the map makes millions of operations on numbers of a few dozen
 * digits). Complex numbers are rounded normwise (both parts share one exponent), so the unit roundoff
 * {@link #epsilon()} is relative to the modulus. Immutable, thread-safe.
 */
public final class MpArithmetic implements AnalyticArithmetic<MpComplex> {
    private final MpContext context;

    /** @param digits decimal digits, 16 .. 100000 */
    public MpArithmetic(int digits) {
        if (digits < 16 || digits > 100000) {
            throw new InvalidInputException("digits", "must be in [16, 100000], got " + digits);
        }
        this.context = new MpContext(digits);
    }

    public MpContext context() {
        return context;
    }

    @Override
    public MpComplex of(double re, double im) {
        return context.fromDouble(re, im);
    }

    @Override
    public MpComplex ratio(long p, long q) {
        MpComplex r = context.fromRational(BigInteger.valueOf(Math.abs(p)), BigInteger.valueOf(Math.abs(q)));
        return (p < 0) != (q < 0) ? r.negate() : r;
    }

    @Override
    public MpComplex add(MpComplex a, MpComplex b) {
        return context.add(a, b);
    }

    @Override
    public MpComplex subtract(MpComplex a, MpComplex b) {
        return context.subtract(a, b);
    }

    @Override
    public MpComplex multiply(MpComplex a, MpComplex b) {
        return context.multiply(a, b);
    }

    @Override
    public MpComplex divide(MpComplex a, MpComplex b) {
        return context.divide(a, b);
    }

    @Override
    public MpComplex negate(MpComplex a) {
        return a.negate();
    }

    @Override
    public MpComplex reciprocal(MpComplex a) {
        return context.reciprocal(a);
    }

    @Override
    public MpComplex exp(MpComplex a) {
        return context.exp(a);
    }

    @Override
    public MpComplex log(MpComplex a) {
        return context.log(a);
    }

    @Override
    public MpComplex sqrt(MpComplex a) {
        return context.sqrt(a);
    }

    @Override
    public MpComplex pow(MpComplex a, MpComplex b) {
        return context.exp(context.multiply(b, context.log(a)));
    }

    @Override
    public MpComplex pi() {
        return context.pi();
    }

    @Override
    public double abs(MpComplex a) {
        return a.abs();
    }

    @Override
    public double logAbs(MpComplex a) {
        return a.log2Abs() * Math.log(2);
    }

    @Override
    public Complex toComplex(MpComplex a) {
        return a.toComplex();
    }

    /** 2^(1 - bits): the relative rounding error of one operation, normwise. */
    @Override
    public double epsilon() {
        return Math.scalb(1.0, 1 - context.bits());
    }

    @Override
    public long digits() {
        return context.digits();
    }
}
