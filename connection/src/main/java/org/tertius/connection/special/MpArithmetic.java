package org.tertius.connection.special;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.mp.MpComplex;
import org.tertius.core.mp.MpContext;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * {@link AnalyticArithmetic} on the core's binary multiprecision complex numbers ({@link MpContext}), the fast
 * arbitrary-precision arithmetic of this package: at 75 digits a complex product costs about 2 microseconds here
 * against about 100 with the Apfloat helper (measured on the root iteration of a degree-66 polynomial), which is
 * what makes root isolation of high degrees take seconds. Results are handed out as Apfloat numbers
 * ({@link MpContext#toApcomplex}, exact).
 */
public final class MpArithmetic implements AnalyticArithmetic<MpComplex> {
    private static final double LN2 = Math.log(2);
    private final MpContext ctx;

    /** An arithmetic of {@code digits} decimal digits (at least 16). */
    public MpArithmetic(long digits) {
        if (digits < 16 || digits > 100000) {
            throw new InvalidInputException("digits", "must be in [16, 100000], got " + digits);
        }
        this.ctx = new MpContext((int) digits);
    }

    public MpContext context() {
        return ctx;
    }

    @Override
    public MpComplex of(double re, double im) {
        return ctx.fromDouble(re, im);
    }

    @Override
    public MpComplex ratio(long p, long q) {
        return ctx.divide(ctx.fromLong(p), ctx.fromLong(q));
    }

    @Override
    public MpComplex add(MpComplex a, MpComplex b) {
        return ctx.add(a, b);
    }

    @Override
    public MpComplex subtract(MpComplex a, MpComplex b) {
        return ctx.subtract(a, b);
    }

    @Override
    public MpComplex multiply(MpComplex a, MpComplex b) {
        return ctx.multiply(a, b);
    }

    @Override
    public MpComplex divide(MpComplex a, MpComplex b) {
        return ctx.divide(a, b);
    }

    @Override
    public MpComplex negate(MpComplex a) {
        return a.negate();
    }

    @Override
    public MpComplex reciprocal(MpComplex a) {
        return ctx.reciprocal(a);
    }

    @Override
    public MpComplex exp(MpComplex a) {
        return ctx.exp(a);
    }

    @Override
    public MpComplex log(MpComplex a) {
        return ctx.log(a);
    }

    @Override
    public MpComplex sqrt(MpComplex a) {
        return ctx.sqrt(a);
    }

    @Override
    public MpComplex pow(MpComplex a, MpComplex b) {
        return ctx.exp(ctx.multiply(b, ctx.log(a)));
    }

    @Override
    public MpComplex pi() {
        return ctx.pi();
    }

    @Override
    public double abs(MpComplex a) {
        return a.abs();
    }

    @Override
    public double logAbs(MpComplex a) {
        return a.log2Abs() * LN2;
    }

    @Override
    public Complex toComplex(MpComplex a) {
        return a.toComplex();
    }

    /** 2^(1 - bits): the mantissas are rounded to nearest, normwise for the pair. */
    @Override
    public double epsilon() {
        return Math.scalb(1.0, 1 - ctx.bits());
    }

    @Override
    public long digits() {
        return ctx.digits();
    }
}
