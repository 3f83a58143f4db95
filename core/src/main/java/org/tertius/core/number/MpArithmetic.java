package org.tertius.core.number;

/**
 * The field operations of {@link MpComplex} at one working precision ({@link MpContext}): every result rounded to
 * it. For code written once over {@link Arithmetic} that must also run on the high-precision engine's numbers
 * (the hierarchy's polynomials, for instance). Immutable.
 */
public final class MpArithmetic implements Arithmetic<MpComplex> {
    private final MpContext ctx;

    public MpArithmetic(MpContext ctx) {
        this.ctx = ctx;
    }

    /** The working precision. */
    public MpContext context() {
        return ctx;
    }

    @Override
    public MpComplex zero() {
        return MpComplex.ZERO;
    }

    @Override
    public MpComplex one() {
        return ctx.fromLong(1);
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
}
