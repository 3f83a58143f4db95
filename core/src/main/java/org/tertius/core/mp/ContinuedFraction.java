package org.tertius.core.mp;

import java.util.ArrayList;
import java.util.List;

/**
 * The corresponding continued fraction of a power series, whose convergents are Pade approximants along a
 * staircase of the Pade table, computed with Viskovatov's algorithm in O(N^2) operations (see G.A. Baker and
 * P. Graves-Morris, "Pade Approximants", 2nd ed., Cambridge 1996, section 4.1; the algorithm is also known as
 * the "Viscovatov" algorithm). With u_0 = 1 and u_1 = f,
 * <pre>  u_{k+1}(s) = (u_k(0) u_{k-1}(s) - u_{k-1}(0) u_k(s)) / s  </pre>
 * gives, with e_k = u_k(0) and V_k = e_k u_{k-1} / u_k,
 * <pre>  V_k = e_{k-1} + s e_{k+1} / V_{k+1},   f = e_1 / V_1,  </pre>
 * a fraction whose convergents (Wallis' recurrences) need products only; cutting it at depth m (V_m = e_{m-1})
 * gives the same approximants as the usual form {@code f = 1/(d_1 + a_1 s/(d_2 + ...))} with
 * {@code d_k = e_{k-1}/e_k}, {@code a_k = 1/e_k}, of which it is an equivalence transformation.
 *
 * <p>When some e_k vanishes (a singular leading minor: a block in the Pade table) or is lost in rounding, the
 * fraction is cut there: its last convergents are still Pade approximants of lower order, and the caller's
 * error estimate, the difference of the last convergents, tells whether they are good enough (otherwise the
 * caller falls back on the Taylor polynomial). Immutable.
 */
final class ContinuedFraction {
    /** e_0 = 1, e_1 = f(0), ..., e_depth. */
    private final MpComplex[] e;
    private final long productCount;

    private ContinuedFraction(MpComplex[] e, long productCount) {
        this.e = e;
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
     * <p>The rows are held as floating values with limb-granular exponents ({@link ScaledRow}), normalised to a
     * leading 1: an entry of the next row is a difference of two entries, formed exactly and rounded, times the
     * reciprocal of the leading difference, rounded once more. Nothing is allocated per product.
     */
    static ContinuedFraction of(MpContext ctx, MpComplex[] c) {
        return of(ctx, c, new LimbFormat(rowBits(ctx), 1));
    }

    /** As above, with the way products are formed chosen by the caller (tests). */
    static ContinuedFraction of(MpContext ctx, MpComplex[] c, boolean bigProducts) {
        return of(ctx, c, new LimbFormat(rowBits(ctx), 1, bigProducts));
    }

    /**
     * The fractional bits of the rows: an entry normalised to whole limbs has its leading limb non-zero, so it
     * keeps at least (fraction limbs - 1) BITS + 1 significant bits; one limb beyond the working bits keeps them
     * all (two limbs were used before, one more than needed).
     */
    private static int rowBits(MpContext ctx) {
        return ctx.bits() + LimbFormat.BITS;
    }

    private static ContinuedFraction of(MpContext ctx, MpComplex[] c, LimbFormat fmt) {
        // rows normalised to a leading 1, v_k = u_k / e_k: then u_{k+1} = e_k e_{k-1} (v_{k-1} - v_k) / s, so a
        // row costs one product per entry (the difference d times 1/d_0) instead of two, and
        // e_{k+1} = e_k e_{k-1} d_0 (the leading entry of v_k is 1 and is not stored again)
        int n = c.length;
        List<MpComplex> es = new ArrayList<>();
        es.add(ctx.fromLong(1));
        if (n == 0 || c[0].isZero()) {
            return new ContinuedFraction(es.toArray(new MpComplex[0]), 0);
        }
        // products placed up to L + 2 limbs apart; columns from 3 below the rounding of the larger product
        int l = fmt.limbs();
        LimbAccumulator acc = new LimbAccumulator(fmt, l + 2, (l + 2) + l - 5);
        double lossLimit = 0.5 * ctx.bits();
        ScaledRow vk = ScaledRow.unit(fmt, n);
        ScaledRow diff = ScaledRow.of(fmt, c);
        ScaledRow vNext = new ScaledRow(fmt, n);
        MpComplex lead = c[0];
        long count = 0;
        while (true) {
            // diff holds u_{k+1} up to the factor e_k e_{k-1} (u_1 = f itself), vk holds v_k; lead = diff_0
            if (diff.log2Max() - lead.log2Abs() > lossLimit) {
                break;
            }
            int k = es.size() - 1;
            es.add(k == 0 ? ctx.round(lead) : ctx.multiply(ctx.multiply(es.get(k), es.get(k - 1)), lead));
            count += diff.length();
            vNext.scale(diff, ScaledRow.of(fmt, new MpComplex[] {ctx.reciprocal(lead)}), acc);
            int len = Math.min(vk.length(), vNext.length()) - 1;
            if (len <= 0) {
                break;
            }
            diff.difference(vk, vNext, acc, len);
            ScaledRow t = vk;
            vk = vNext;
            vNext = t;
            if (diff.isZero(0)) {
                break;
            }
            lead = diff.value(ctx, 0);
        }
        return new ContinuedFraction(es.toArray(new MpComplex[0]), count);
    }

    /** Number of levels (the last convergent matches this many series coefficients). */
    int depth() {
        return e.length - 1;
    }

    /**
     * The last three convergents at s (depths k-2, k-1, k), or null when the fraction has fewer than three levels
     * or a convergent is infinite.
     */
    MpComplex[] lastConvergents(MpContext ctx, MpComplex s) {
        int k = depth();
        if (k < 3) {
            return null;
        }
        // Wallis for V_1 = b_0 + a_1/(b_1 + a_2/(b_2 + ...)), b_n = e_n, a_n = s e_{n+1}; the convergent of depth
        // n + 1 is f = e_1 B_n / A_n, with A_{-1} = 1, B_{-1} = 0, A_0 = e_0, B_0 = 1
        MpComplex aPrev = ctx.fromLong(1);
        MpComplex bPrev = MpComplex.ZERO;
        MpComplex aCur = e[0];
        MpComplex bCur = ctx.fromLong(1);
        MpComplex[] conv = new MpComplex[3];
        for (int n = 1; n < k; n++) {
            MpComplex an = ctx.multiply(s, e[n + 1]);
            MpComplex a = ctx.add(ctx.multiply(e[n], aCur), ctx.multiply(an, aPrev));
            MpComplex b = ctx.add(ctx.multiply(e[n], bCur), ctx.multiply(an, bPrev));
            if (a.isZero()) {
                return null;
            }
            // keep the numbers moderate: rescale all four by the same power of two
            int shift = -(int) Math.floor(a.log2Abs());
            aPrev = aCur.scalb(shift);
            bPrev = bCur.scalb(shift);
            aCur = a.scalb(shift);
            bCur = b.scalb(shift);
            if (n >= k - 3) {
                conv[n - (k - 3)] = ctx.divide(ctx.multiply(e[1], bCur), aCur);
            }
        }
        if (k == 3) {
            conv[0] = e[1];
        }
        return conv;
    }
}
