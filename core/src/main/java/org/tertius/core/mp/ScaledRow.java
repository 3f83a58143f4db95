package org.tertius.core.mp;

import java.math.BigInteger;

/**
 * One row of Viskovatov's algorithm (see {@link ContinuedFraction}): complex numbers X_j 2^-F 2^e with X_j in a
 * {@link LimbFormat} of one integer limb and a common binary exponent e chosen so that the largest entry lies in
 * [2^-BITS, 1). Mutable scratch space of one continued-fraction construction.
 */
final class ScaledRow {
    private final LimbFormat format;
    private final LimbVector values;
    /** the slot after the entries, holding the negated leading entry during {@link #combine} */
    private final int scratch;
    private int length;
    private int exponent;

    ScaledRow(LimbFormat format, int capacity) {
        this.format = format;
        this.values = new LimbVector(format, capacity + 1);
        this.scratch = capacity;
    }

    /** The row 1, 0, 0, ... of the given length. */
    static ScaledRow unit(LimbFormat format, int length) {
        ScaledRow r = new ScaledRow(format, length);
        r.length = length;
        r.values.set(0, BigInteger.ONE.shiftLeft(format.fractionBits() - 1), BigInteger.ZERO);
        r.exponent = 1;
        return r;
    }

    /** The row of the given numbers (exactly as far as the format allows). */
    static ScaledRow of(LimbFormat format, MpComplex[] c) {
        ScaledRow r = new ScaledRow(format, c.length);
        r.length = c.length;
        double top = Double.NEGATIVE_INFINITY;
        for (MpComplex x : c) {
            top = Math.max(top, x.log2Abs());
        }
        r.exponent = top == Double.NEGATIVE_INFINITY ? 0 : (int) Math.floor(top) + 1;
        int f = format.fractionBits() - r.exponent;
        for (int j = 0; j < c.length; j++) {
            r.values.set(j, MpContext.fixedRe(c[j], f), MpContext.fixedIm(c[j], f));
        }
        return r;
    }

    int length() {
        return length;
    }

    boolean isZero(int j) {
        int o = j * values.limbs;
        for (int x = o; x < o + values.limbs; x++) {
            if (values.re[x] != 0 || values.im[x] != 0) {
                return false;
            }
        }
        return true;
    }

    /** Entry j rounded to the precision of ctx. */
    MpComplex value(MpContext ctx, int j) {
        return ctx.round(new MpComplex(values.re(j), values.im(j), exponent - format.fractionBits()));
    }

    /** log2 of the largest modulus of the entries (negative infinity when all vanish). */
    double log2Max() {
        double m = maxModulus();
        return m == 0 ? Double.NEGATIVE_INFINITY : Math.log(m) / Math.log(2) + exponent;
    }

    private double maxModulus() {
        double m = 0;
        for (int j = 0; j < length; j++) {
            int o = j * values.limbs;
            m = Math.max(m, Math.hypot(format.approximate(values.re, o), format.approximate(values.im, o)));
        }
        return m;
    }

    /**
     * Sets this row to the next one after (cur, prev): entry j = (u0 prev_{j+1} - p0 cur_{j+1}) for j < len, with
     * u0 = cur_0 and p0 = prev_0, each rounded once, then rescaled.
     */
    void combine(ScaledRow cur, ScaledRow prev, LimbAccumulator acc, int len) {
        LimbVector pv = prev.values;
        pv.set(prev.scratch, pv.re(0).negate(), pv.im(0).negate());
        for (int j = 0; j < len; j++) {
            acc.clear();
            acc.multiplyAdd(cur.values, 0, pv, j + 1);
            acc.multiplyAdd(pv, prev.scratch, cur.values, j + 1);
            acc.store(values, j);
        }
        length = len;
        exponent = cur.exponent + prev.exponent;
        double m = maxModulus();
        if (m == 0) {
            return;
        }
        // whole limbs that bring the largest entry into [2^-BITS, 1)
        int shift = (int) Math.floor(-Math.log(m) / Math.log(2) / LimbFormat.BITS);
        if (shift != 0) {
            for (int j = 0; j < len; j++) {
                int o = j * values.limbs;
                format.shiftLimbs(values.re, o, shift);
                format.shiftLimbs(values.im, o, shift);
                values.updateSum(j);
            }
            exponent -= LimbFormat.BITS * shift;
        }
    }
}
