package org.tertius.core.mp;

import java.math.BigInteger;

/**
 * One row of Viskovatov's algorithm (see {@link ContinuedFraction}): complex floating values X_j 2^-F 2^(BITS e_j),
 * with X_j in a {@link LimbFormat} of one integer limb and an exponent per entry in whole limbs, normalised so
 * that the leading limb of the fraction is non-zero (at least (L - 2) BITS significant bits). Mutable scratch
 * space of one continued-fraction construction.
 */
final class ScaledRow {
    private final LimbFormat format;
    private final LimbVector values;
    private final int[] exponent;
    private final boolean[] zero;
    private int length;

    ScaledRow(LimbFormat format, int capacity) {
        this.format = format;
        this.values = new LimbVector(format, capacity);
        this.exponent = new int[capacity];
        this.zero = new boolean[capacity];
    }

    /** The row 1, 0, 0, ... of the given length. */
    static ScaledRow unit(LimbFormat format, int length) {
        ScaledRow r = new ScaledRow(format, length);
        r.length = length;
        java.util.Arrays.fill(r.zero, true);
        r.set(0, new MpComplex(BigInteger.ONE, BigInteger.ZERO, 0));
        return r;
    }

    /** The row of the given numbers (rounded to the format). */
    static ScaledRow of(LimbFormat format, MpComplex[] c) {
        ScaledRow r = new ScaledRow(format, c.length);
        r.length = c.length;
        for (int j = 0; j < c.length; j++) {
            r.set(j, c[j]);
        }
        return r;
    }

    private void set(int j, MpComplex x) {
        zero[j] = x.isZero();
        if (zero[j]) {
            values.set(j, BigInteger.ZERO, BigInteger.ZERO);
            return;
        }
        // |x| / 2^(BITS e) in [2^-BITS, 1)
        int e = (int) Math.floor(x.log2Abs() / LimbFormat.BITS) + 1;
        int f = format.fractionBits() - LimbFormat.BITS * e;
        values.set(j, MpContext.fixedRe(x, f), MpContext.fixedIm(x, f));
        exponent[j] = e;
    }

    int length() {
        return length;
    }

    boolean isZero(int j) {
        return zero[j];
    }

    /** Entry j rounded to the precision of ctx. */
    MpComplex value(MpContext ctx, int j) {
        if (zero[j]) {
            return MpComplex.ZERO;
        }
        return ctx.round(new MpComplex(values.re(j), values.im(j),
                LimbFormat.BITS * exponent[j] - format.fractionBits()));
    }

    /** log2 of the largest modulus of the entries (negative infinity when all vanish). */
    double log2Max() {
        double m = Double.NEGATIVE_INFINITY;
        for (int j = 0; j < length; j++) {
            if (!zero[j]) {
                int o = j * values.limbs;
                double a = Math.hypot(format.approximate(values.re, o), format.approximate(values.im, o));
                m = Math.max(m, Math.log(a) / Math.log(2) + LimbFormat.BITS * exponent[j]);
            }
        }
        return m;
    }

    /**
     * Sets this row to the differences prev_{j+1} - cur_{j+1}, j < len, each formed exactly (the two entries placed
     * by their exponents) and rounded once. An entry more than L + 2 limbs below the other is below the rounding
     * and is left out.
     */
    void difference(ScaledRow prev, ScaledRow cur, LimbAccumulator acc, int len) {
        int reach = values.limbs + 2;
        for (int j = 0; j < len; j++) {
            boolean hasA = !prev.zero[j + 1];
            boolean hasB = !cur.zero[j + 1];
            if (!hasA && !hasB) {
                setZero(j);
                continue;
            }
            int ea = prev.exponent[j + 1];
            int eb = cur.exponent[j + 1];
            int e = hasA && hasB ? Math.max(ea, eb) : hasA ? ea : eb;
            acc.clear();
            if (hasA && ea - e >= -reach) {
                acc.addShifted(prev.values, j + 1, ea - e, false);
            }
            if (hasB && eb - e >= -reach) {
                acc.addShifted(cur.values, j + 1, eb - e, true);
            }
            store(acc, j, e);
        }
        length = len;
    }

    /** Sets this row to the entries of src times the first entry of factor, each product rounded once. */
    void scale(ScaledRow src, ScaledRow factor, LimbAccumulator acc) {
        for (int j = 0; j < src.length; j++) {
            if (src.zero[j] || factor.zero[0]) {
                setZero(j);
                continue;
            }
            acc.clear();
            acc.multiplyAdd(src.values, j, factor.values, 0, 0);
            store(acc, j, src.exponent[j] + factor.exponent[0]);
        }
        length = src.length;
    }

    private void store(LimbAccumulator acc, int j, int e) {
        int shift = acc.storeNormalized(values, j);
        zero[j] = shift == Integer.MIN_VALUE;
        exponent[j] = zero[j] ? 0 : e + shift;
    }

    private void setZero(int j) {
        int o = j * values.limbs;
        java.util.Arrays.fill(values.re, o, o + values.limbs, 0);
        java.util.Arrays.fill(values.im, o, o + values.limbs, 0);
        values.changed(j);
        zero[j] = true;
        exponent[j] = 0;
    }
}
