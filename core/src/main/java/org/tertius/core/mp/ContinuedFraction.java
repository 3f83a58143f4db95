package org.tertius.core.mp;

import java.util.ArrayList;
import java.util.List;

/**
 * The corresponding continued fraction of a power series, whose convergents are Pade approximants along a
 * staircase of the Pade table, computed with Viskovatov's algorithm in O(N^2) operations (see G.A. Baker and
 * P. Graves-Morris, "Pade Approximants", 2nd ed., Cambridge 1996, section 4.1; the algorithm is also known as
 * the "Viscovatov" algorithm). With u_0 = 1 and u_1 = f,
 * <pre>  u_{k+1}(s) = (u_k(0) u_{k-1}(s) - u_{k-1}(0) u_k(s)) / s  </pre>
 * gives {@code u_{k-1}/u_k = d_k + a_k s / (u_k/u_{k+1})} with {@code d_k = u_{k-1}(0)/u_k(0)} and
 * {@code a_k = 1/u_k(0)}, so {@code f = 1/(d_1 + a_1 s/(d_2 + a_2 s/(d_3 + ...)))}.
 *
 * <p>When some u_k(0) vanishes (a singular leading minor: a block in the Pade table) or is lost in rounding,
 * the fraction is cut there: its last convergents are still Pade approximants of lower order, and the caller's
 * error estimate, the difference of the last convergents, tells whether they are good enough (otherwise the
 * caller falls back on the Taylor polynomial). Immutable.
 */
final class ContinuedFraction {
    private final MpComplex[] d;
    private final MpComplex[] a;
    private final long productCount;

    private ContinuedFraction(MpComplex[] d, MpComplex[] a, long productCount) {
        this.d = d;
        this.a = a;
        this.productCount = productCount;
    }

    /** Complex products done to build the fraction. */
    long productCount() {
        return productCount;
    }

    /**
     * The fraction of the series with coefficients c[0..N] (c[0] != 0 is needed; otherwise the fraction is
     * empty). Rows whose leading coefficient has lost more than half the working bits to cancellation end it.
     *
     * <p>Each row u_k is held in fixed point relative to its largest coefficient ({@link ScaledRow}): both
     * products of an entry of the next row have the same scale, so their difference is formed exactly and
     * rounded once; the row is then rescaled by whole limbs. Nothing is allocated per operation.
     */
    static ContinuedFraction of(MpContext ctx, MpComplex[] c) {
        int n = c.length;
        List<MpComplex> ds = new ArrayList<>();
        List<MpComplex> as = new ArrayList<>();
        // one limb more than the working bits: a row rescaled by whole limbs keeps all of them
        LimbFormat fmt = new LimbFormat(ctx.bits() + LimbFormat.BITS, 1);
        ScaledRow prev = ScaledRow.unit(fmt, n);
        ScaledRow cur = ScaledRow.of(fmt, c);
        ScaledRow next = new ScaledRow(fmt, n);
        LimbAccumulator acc = new LimbAccumulator(fmt);
        double lossLimit = 0.5 * ctx.bits();
        long count = 0;
        while (cur.length() > 0 && !cur.isZero(0)) {
            MpComplex u0 = cur.value(ctx, 0);
            if (cur.log2Max() - u0.log2Abs() > lossLimit) {
                break;
            }
            ds.add(ctx.divide(prev.value(ctx, 0), u0));
            as.add(ctx.reciprocal(u0));
            int len = Math.min(prev.length(), cur.length()) - 1;
            if (len <= 0) {
                break;
            }
            count += 2L * len;
            next.combine(cur, prev, acc, len);
            ScaledRow t = prev;
            prev = cur;
            cur = next;
            next = t;
        }
        return new ContinuedFraction(ds.toArray(new MpComplex[0]), as.toArray(new MpComplex[0]), count);
    }

    /** Number of levels (the last convergent matches this many series coefficients). */
    int depth() {
        return d.length;
    }

    /**
     * The last three convergents at s (Wallis' forward recurrences), or null when the fraction has fewer than
     * three levels or a denominator vanishes.
     */
    MpComplex[] lastConvergents(MpContext ctx, MpComplex s) {
        int k = d.length;
        if (k < 3) {
            return null;
        }
        // f = 0 + 1/(d_1 + a_1 s/(d_2 + ...)): A_0 = 0, B_0 = 1, A_1 = 1, B_1 = d_1
        MpComplex aPrev = MpComplex.ZERO;
        MpComplex bPrev = ctx.fromLong(1);
        MpComplex aCur = ctx.fromLong(1);
        MpComplex bCur = d[0];
        MpComplex[] conv = new MpComplex[3];
        conv[2] = quotient(ctx, aCur, bCur);
        for (int i = 1; i < k; i++) {
            MpComplex alpha = ctx.multiply(a[i - 1], s);
            MpComplex an = ctx.add(ctx.multiply(d[i], aCur), ctx.multiply(alpha, aPrev));
            MpComplex bn = ctx.add(ctx.multiply(d[i], bCur), ctx.multiply(alpha, bPrev));
            // keep the numbers moderate: rescale both by the same power of two
            int shift = -(int) Math.floor(bn.log2Abs());
            if (bn.isZero()) {
                return null;
            }
            aPrev = aCur.scalb(shift);
            bPrev = bCur.scalb(shift);
            aCur = an.scalb(shift);
            bCur = bn.scalb(shift);
            conv[0] = conv[1];
            conv[1] = conv[2];
            conv[2] = quotient(ctx, aCur, bCur);
            if (conv[2] == null) {
                return null;
            }
        }
        return conv;
    }

    private static MpComplex quotient(MpContext ctx, MpComplex a, MpComplex b) {
        return b.isZero() ? null : ctx.divide(a, b);
    }
}
