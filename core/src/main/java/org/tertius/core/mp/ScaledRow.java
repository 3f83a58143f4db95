package org.tertius.core.mp;
import java.math.BigInteger;
import java.util.Arrays;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

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
        Arrays.fill(r.zero, true);
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
     * Sets this row to (prev_{j+1} - cur_{j+1}) times the first entry of factor, j &lt; len. Each difference is
     * formed limb by limb at the larger exponent of its two entries (the lower limbs of the other, shifted below
     * the last limb, are dropped: at most one unit of that limb, below the entries' own rounding) and multiplied
     * as it is, neither carried nor rounded; the product is rounded once.
     */
    void differenceTimes(ScaledRow prev, ScaledRow cur, ScaledRow factor, LimbAccumulator acc, LimbVector scratch,
                         int len) {
        for (int j = 0; j < len; j++) {
            int e = difference(prev, cur, j + 1, scratch);
            if (e == Integer.MIN_VALUE || factor.zero[0]) {
                setZero(j);
                continue;
            }
            if (format.bigProducts()) {
                // BigInteger products read the value as an integer
                canonical(scratch);
            }
            acc.clear();
            acc.multiplyAdd(scratch, 0, factor.values, 0);
            store(acc, j, e + factor.exponent[0]);
        }
        length = len;
    }

    /** prev_1 - cur_1 rounded to ctx (zero when both entries vanish or cancel exactly). */
    MpComplex leadDifference(ScaledRow prev, ScaledRow cur, LimbVector scratch, MpContext ctx) {
        int e = difference(prev, cur, 1, scratch);
        if (e == Integer.MIN_VALUE) {
            return MpComplex.ZERO;
        }
        canonical(scratch);
        MpComplex d = new MpComplex(scratch.re(0), scratch.im(0), LimbFormat.BITS * e - format.fractionBits());
        return d.isZero() ? MpComplex.ZERO : ctx.round(d);
    }

    /**
     * scratch[0] = prev_i - cur_i at the exponent returned (Integer.MIN_VALUE when both vanish), as limb-by-limb
     * differences in (-2^BITS, 2^BITS), not carried: products take such limbs as they are (their terms keep the
     * bound of {@link LimbAccumulator}); a carry pass makes them canonical where the value is read.
     */
    private int difference(ScaledRow prev, ScaledRow cur, int i, LimbVector scratch) {
        boolean hasA = !prev.zero[i];
        boolean hasB = !cur.zero[i];
        if (!hasA && !hasB) {
            return Integer.MIN_VALUE;
        }
        int ea = prev.exponent[i];
        int eb = cur.exponent[i];
        int e = hasA && hasB ? Math.max(ea, eb) : hasA ? ea : eb;
        int n = values.limbs;
        long[] re = scratch.re;
        long[] im = scratch.im;
        // limb x of the difference: limb x + d of each entry (d its shift to the common exponent; none beyond n)
        int o = i * n;
        int da = hasA ? e - ea : n;
        int db = hasB ? e - eb : n;
        long[] ar = prev.values.re;
        long[] ai = prev.values.im;
        long[] br = cur.values.re;
        long[] bi = cur.values.im;
        for (int x = 0; x < n; x++) {
            boolean a = x + da < n;
            boolean b = x + db < n;
            re[x] = (a ? ar[o + x + da] : 0) - (b ? br[o + x + db] : 0);
            im[x] = (a ? ai[o + x + da] : 0) - (b ? bi[o + x + db] : 0);
        }
        scratch.changed(0);
        return e;
    }

    /** Brings the one value of scratch to canonical limbs (its arrays are exactly its limbs). */
    private void canonical(LimbVector scratch) {
        format.carry(scratch.re, 0);
        format.carry(scratch.im, 0);
        scratch.changed(0);
    }

    /** Sets this row to the entries of src times the first entry of factor, each product rounded once. */
    void scale(ScaledRow src, ScaledRow factor, LimbAccumulator acc) {
        for (int j = 0; j < src.length; j++) {
            if (src.zero[j] || factor.zero[0]) {
                setZero(j);
                continue;
            }
            acc.clear();
            acc.multiplyAdd(src.values, j, factor.values, 0);
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
        Arrays.fill(values.re, o, o + values.limbs, 0);
        Arrays.fill(values.im, o, o + values.limbs, 0);
        values.changed(j);
        zero[j] = true;
        exponent[j] = 0;
    }
}
