package org.tertius.core.mp;
import java.util.ArrayList;
import java.util.List;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

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
 * {@code d_k = e_{k-1}/e_k}, {@code a_k = 1/e_k}, of which it is an equivalence transformation. The fraction is
 * kept in the equivalent normalised form
 * <pre>  f = e_1 / (1 + s g_1 / (1 + s g_2 / (1 + ...))),   g_n = e_{n+1} / (e_n e_{n-1}),  </pre>
 * whose coefficients are of moderate size: the e_k themselves are products along the fraction, and their
 * binary exponents grow without bound (past 2^31 at 100 digits).
 *
 * <p>When some e_k vanishes (a singular leading minor: a block in the Pade table) or is lost in rounding, the
 * fraction is cut there: its last convergents are still Pade approximants of lower order, and the caller's
 * error estimate, the difference of the last convergents, tells whether they are good enough (otherwise the
 * caller falls back on the Taylor polynomial). Immutable.
 */
final class ContinuedFraction {
    /** e_1 = f(0), and g_1 .. g_{depth-1} (index n - 1). */
    private final MpComplex e1;
    private final MpComplex[] g;
    /** The same in double precision with separate exponents, for the screen. */
    private final WideComplex e1Wide;
    private final WideComplex[] gWide;
    private final long productCount;
    /** The precision the fraction was built in, and its convergents are evaluated in. */
    private final MpContext ctx;
    /** log2 of the largest entry of the normalised rows (their leading entry is 1): how far the rows grew. */
    private final double rowGrowth;

    private ContinuedFraction(MpContext ctx, MpComplex e1, MpComplex[] g, long productCount, double rowGrowth) {
        this.ctx = ctx;
        this.e1 = e1;
        this.g = g;
        this.productCount = productCount;
        this.rowGrowth = rowGrowth;
        this.e1Wide = e1 == null ? WideComplex.ZERO : WideComplex.of(e1);
        this.gWide = new WideComplex[g.length];
        for (int n = 0; n < g.length; n++) {
            gWide[n] = WideComplex.of(g[n]);
        }
    }

    /** The precision the fraction was built in, and its convergents are evaluated in. */
    MpContext context() {
        return ctx;
    }

    /**
     * log2 of the largest entry of the rows normalised to a leading 1 (0 for a fraction that kept them below 1).
     * Large rows come from cancellation in their leading entries, and the value of the fraction then loses
     * bits to rounding: measured at 200 and 300 digits, rows of 2^47 to 2^175 went with 46 to 55 bits lost,
     * rows below 2^34 with at most 18.
     */
    double rowGrowth() {
        return rowGrowth;
    }

    /** The same fraction, charged with the products of an earlier build that it replaces. */
    ContinuedFraction replacing(ContinuedFraction earlier) {
        return new ContinuedFraction(ctx, e1, g, productCount + earlier.productCount, rowGrowth);
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
     * leading 1: an entry of the next row is a difference of two entries, formed limb by limb (not rounded), times
     * the reciprocal of the leading difference, rounded once. Nothing is allocated per product.
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
        List<MpComplex> gs = new ArrayList<>();
        if (n == 0 || c[0].isZero()) {
            return new ContinuedFraction(ctx, null, new MpComplex[0], 0, 0);
        }
        // a product of two normalised entries is rounded at column L - 2 or L - 1 (its top lies at 2L - 4 or
        // 2L - 3): columns from three below the lower of the two
        int l = fmt.limbs();
        LimbAccumulator acc = new LimbAccumulator(fmt, l - 5);
        double lossLimit = 0.5 * ctx.bits();
        // v_0 = 1, v_1 = f / f(0); a row whose entries exceed its leading 1 by more than lossLimit bits (the leading
        // entry lost that much to cancellation) ends the fraction before its level is added
        ScaledRow vPrev = ScaledRow.unit(fmt, n);
        ScaledRow vCur = new ScaledRow(fmt, n);
        ScaledRow vNext = new ScaledRow(fmt, n);
        LimbVector scratch = new LimbVector(fmt, 1);
        vCur.scale(ScaledRow.of(fmt, c), reciprocal(ctx, fmt, c[0]), acc);
        long count = n;
        double growth = vCur.log2Max();
        if (growth > lossLimit) {
            return new ContinuedFraction(ctx, null, new MpComplex[0], count, 0);
        }
        MpComplex e1 = ctx.round(c[0]);
        while (true) {
            int len = Math.min(vPrev.length(), vCur.length()) - 1;
            if (len <= 0) {
                break;
            }
            // u_{k+1} = e_k e_{k-1} (v_{k-1} - v_k) / s: its leading entry over e_k e_{k-1} is g_k, and
            // v_{k+1} = (v_{k-1} - v_k) / (s g_k)
            MpComplex lead = vNext.leadDifference(vPrev, vCur, scratch, ctx);
            if (lead.isZero()) {
                break;
            }
            vNext.differenceTimes(vPrev, vCur, reciprocal(ctx, fmt, lead), acc, scratch, len);
            count += len;
            double rowMax = vNext.log2Max();
            if (rowMax > lossLimit) {
                break;
            }
            growth = Math.max(growth, rowMax);
            gs.add(lead);
            ScaledRow t = vPrev;
            vPrev = vCur;
            vCur = vNext;
            vNext = t;
        }
        return new ContinuedFraction(ctx, e1, gs.toArray(new MpComplex[0]), count, growth);
    }

    /** 1/x as a one-entry row. */
    private static ScaledRow reciprocal(MpContext ctx, LimbFormat fmt, MpComplex x) {
        return ScaledRow.of(fmt, new MpComplex[] {ctx.reciprocal(x)});
    }

    /** Number of levels (the last convergent matches this many series coefficients). */
    int depth() {
        return e1 == null ? 0 : g.length + 1;
    }

    /**
     * A double-precision estimate of what {@link #valueWithin} tests at s: log2 of
     * max(|c_k - c_{k-1}|, |c_k - c_{k-2}|) / (1 + |c_k|) for the last three convergents; positive infinity when
     * the fraction is too short or a convergent is infinite. It costs a few double operations per level (no
     * arbitrary-precision product), so trial lengths can be screened before one is evaluated in full.
     *
     * <p>With P_n the denominators of Wallis' recurrences for the normalised form (below), R_n = P_n / P_{n-1}
     * and T_n = (a_1 ... a_n) / (P_n P_{n-1}), a_n = s g_n:
     * <pre>  R_n = 1 + s g_n / R_{n-1},   T_n = T_{n-1} s g_n / (R_n R_{n-1}),   R_0 = T_0 = 1,  </pre>
     * and the convergents differ by c_{n+1} - c_n = e_1 (-1)^n T_n (the determinant formula of continued
     * fractions: P_n Q_{n-1} - P_{n-1} Q_n = (-1)^{n+1} a_1 ... a_n; W.B. Jones and W.J. Thron, "Continued
     * Fractions", Addison-Wesley 1980, section 2.1), so c_{n+1} = e_1 (1 + sum_{j &lt;= n} (-1)^j T_j). All the
     * factors are of moderate size; the products are tracked with a separate exponent.
     */
    double screenLog2Error(MpComplex s) {
        int k = depth();
        if (k < 3) {
            return Double.POSITIVE_INFINITY;
        }
        try {
            return screen(WideComplex.of(s), k);
        } catch (ArithmeticException e) {
            // not expected (the factors stay normalised); the full evaluation then decides
            return Double.NEGATIVE_INFINITY;
        }
    }

    private double screen(WideComplex sw, int k) {
        WideComplex r = WideComplex.ONE;
        WideComplex t = WideComplex.ONE;
        WideComplex tPrev = WideComplex.ONE;
        WideComplex sum = WideComplex.ONE;
        for (int n = 1; n < k; n++) {
            WideComplex a = sw.multiply(gWide[n - 1]);
            WideComplex rn = WideComplex.ONE.add(a.divide(r));
            if (rn.isZero()) {
                return Double.POSITIVE_INFINITY;
            }
            tPrev = t;
            t = t.multiply(a).divide(rn.multiply(r));
            sum = sum.add((n & 1) == 0 ? t : t.negate());
            r = rn;
        }
        double log2E = e1Wide.log2Abs() + Math.max(t.log2Abs(), t.add(tPrev.negate()).log2Abs());
        return log2E - MpContext.log2OnePlus(e1Wide.multiply(sum).log2Abs());
    }

    /**
     * The last convergent at s when it differs from the two before by at most 2^log2Tol (1 + |value|), compared as
     * base-2 logarithms (the tolerance may lie far below the double range); null otherwise. In the precision of
     * the fraction.
     */
    MpComplex valueWithin(MpComplex s, double log2Tol) {
        MpComplex[] c = lastConvergents(s);
        if (c == null) {
            return null;
        }
        double log2E = Math.max(ctx.subtract(c[2], c[1]).log2Abs(), ctx.subtract(c[2], c[0]).log2Abs());
        return log2E <= log2Tol + MpContext.log2OnePlus(c[2].log2Abs()) ? c[2] : null;
    }

    /**
     * The last three convergents at s (depths k-2, k-1, k) in the precision of the fraction, or null when the
     * fraction has fewer than three levels or a convergent is infinite.
     */
    MpComplex[] lastConvergents(MpComplex s) {
        int k = depth();
        if (k < 3) {
            return null;
        }
        // Wallis for K = 1 + a_1/(1 + a_2/(1 + ...)), a_n = s g_n: P_n = P_{n-1} + a_n P_{n-2}, Q_n likewise, with
        // P_{-1} = 1, Q_{-1} = 0, P_0 = Q_0 = 1; the convergent of depth n + 1 is f = e_1 Q_n / P_n
        MpComplex aPrev = ctx.fromLong(1);
        MpComplex bPrev = MpComplex.ZERO;
        MpComplex aCur = ctx.fromLong(1);
        MpComplex bCur = ctx.fromLong(1);
        MpComplex[] conv = new MpComplex[3];
        for (int n = 1; n < k; n++) {
            MpComplex an = ctx.multiply(s, g[n - 1]);
            MpComplex a = ctx.add(aCur, ctx.multiply(an, aPrev));
            MpComplex b = ctx.add(bCur, ctx.multiply(an, bPrev));
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
                conv[n - (k - 3)] = ctx.divide(ctx.multiply(e1, bCur), aCur);
            }
        }
        if (k == 3) {
            conv[0] = e1;
        }
        return conv;
    }
}
