package org.tertius.core.mp;
import java.math.BigInteger;
import java.util.function.Supplier;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * The Taylor coefficients of every unknown of a system at one point, in the scaled variable s with
 * {@code tau = center + scale * s}, held as fixed-point integers with {@link #fractionBits()} fractional bits
 * (absolute precision, which is what a sum over |s| &lt;= 1 needs). Immutable; the continued fractions built from
 * it are kept with it once built ({@link #fractions}), so that a series which serves several runs (the first series
 * at a node of the path tree, shared by every target beyond that node) builds them once. Thread-safe.
 */
final class TaylorSeries {
    private final MpComplex center;
    private final double scale;
    private final int fractionBits;
    private final BigInteger[][] re;
    private final BigInteger[][] im;
    /** The continued fractions once built; NO_FRACTIONS when they stopped too early. */
    private volatile ContinuedFraction[] fractions;
    private static final ContinuedFraction[] NO_FRACTIONS = new ContinuedFraction[0];

    TaylorSeries(MpComplex center, double scale, int fractionBits, BigInteger[][] re, BigInteger[][] im) {
        this.center = center;
        this.scale = scale;
        this.fractionBits = fractionBits;
        this.re = re;
        this.im = im;
    }

    MpComplex center() {
        return center;
    }

    double scale() {
        return scale;
    }

    int fractionBits() {
        return fractionBits;
    }

    int dimension() {
        return re.length;
    }

    int order() {
        return re[0].length - 1;
    }

    /** log2 |c_ik| (negative infinity for zero). */
    double log2Coefficient(int i, int k) {
        BigInteger r = re[i][k];
        BigInteger m = im[i][k];
        int bits = Math.max(r.bitLength(), m.bitLength());
        if (bits == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        int shift = Math.max(0, bits - 62);
        return Math.log(Math.hypot(r.shiftRight(shift).doubleValue(), m.shiftRight(shift).doubleValue()))
                / Math.log(2) + shift - fractionBits;
    }

    /** Coefficient k of unknown i as a floating value at the precision of ctx. */
    MpComplex coefficient(MpContext ctx, int i, int k) {
        return ctx.fromFixed(re[i][k], im[i][k], fractionBits);
    }

    /** The Taylor polynomials at the scaled point s (Horner's rule in fixed point, exact products). */
    MpComplex[] evaluate(MpContext ctx, MpComplex s) {
        int f = fractionBits;
        BigInteger sr = MpContext.fixedRe(s, f);
        BigInteger si = MpContext.fixedIm(s, f);
        BigInteger ss = sr.add(si);
        MpComplex[] out = new MpComplex[re.length];
        for (int i = 0; i < re.length; i++) {
            int n = re[i].length - 1;
            BigInteger ar = re[i][n];
            BigInteger ai = im[i][n];
            for (int k = n - 1; k >= 0; k--) {
                BigInteger t1 = ar.multiply(sr);
                BigInteger t2 = ai.multiply(si);
                BigInteger t3 = ar.add(ai).multiply(ss);
                ar = MpContext.shiftRound(t1.subtract(t2), f).add(re[i][k]);
                ai = MpContext.shiftRound(t3.subtract(t1).subtract(t2), f).add(im[i][k]);
            }
            out[i] = ctx.fromFixed(ar, ai, f);
        }
        return out;
    }

    /**
     * The continued fractions of the components, built by {@code build} on first use and kept (null: they stopped
     * too early, also kept). The same series gives the same fractions, so keeping them changes no value.
     */
    ContinuedFraction[] fractions(Supplier<ContinuedFraction[]> build) {
        ContinuedFraction[] f = fractions;
        if (f == null) {
            synchronized (this) {
                f = fractions;
                if (f == null) {
                    ContinuedFraction[] built = build.get();
                    f = built == null ? NO_FRACTIONS : built;
                    fractions = f;
                }
            }
        }
        return f == NO_FRACTIONS ? null : f;
    }
}
