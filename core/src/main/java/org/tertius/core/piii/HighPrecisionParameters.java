package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * The parameters of Painleve III in arbitrary precision, with the one {@link MpContext} that sets the working
 * precision of every conversion done with them. The values should be exact data rounded once to that context
 * (see {@link MpContext#fromExact}), so that no conversion inherits a shorter precision.
 */
public final class HighPrecisionParameters {
    private final MpContext ctx;
    private final MpComplex alpha;
    private final MpComplex beta;
    private final MpComplex gamma;
    private final MpComplex delta;

    public HighPrecisionParameters(MpContext ctx, MpComplex alpha, MpComplex beta, MpComplex gamma,
                                   MpComplex delta) {
        this.ctx = ctx;
        this.alpha = ctx.round(alpha);
        this.beta = ctx.round(beta);
        this.gamma = ctx.round(gamma);
        this.delta = ctx.round(delta);
    }

    /** The working precision of the conversions. */
    public MpContext context() {
        return ctx;
    }

    public MpComplex alpha() {
        return alpha;
    }

    public MpComplex beta() {
        return beta;
    }

    public MpComplex gamma() {
        return gamma;
    }

    public MpComplex delta() {
        return delta;
    }

    /** The square root of -delta with the sign of the double-precision value {@code c} used by a form. */
    MpComplex c(Complex c) {
        MpComplex r = ctx.sqrt(delta.negate());
        Complex d = r.toComplex();
        double re = d.getReal() - c.getReal();
        double im = d.getImaginary() - c.getImaginary();
        if (ComplexPairs.abs(re, im) > 1e-6 * Math.max(1, c.norm())) {
            r = r.negate();
        }
        return r;
    }

    /** The parameters of 1/w at the same precision. */
    HighPrecisionParameters reciprocal() {
        return new HighPrecisionParameters(ctx, beta.negate(), alpha.negate(), delta.negate(), gamma.negate());
    }
}
