package org.tertius.core.mp;
import java.math.BigInteger;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * Runs a {@link RecurrencePlan} (the same compiled recurrence the double-precision kernel runs) in binary
 * fixed-point arithmetic: every Taylor coefficient is an integer multiple of 2^-F held in preallocated limbs
 * ({@link LimbFormat}). Each convolution sum is accumulated exactly in columns and rounded once; a complex
 * product takes four limb products per pair of limbs (three BigInteger products, after Gauss, when the format
 * asks for them); nothing is allocated per product. The integer limbs start small and
 * are doubled when a value outgrows them. Stateless apart from its immutable inputs, so one kernel can serve
 * several threads. The series of the powers of the base are made by {@code BaseSeries}, the root test of the
 * coefficients' growth is {@code CoefficientGrowth}'s.
 */
final class FixedPointKernel {
    /**
     * Limb products (limbs^2 x order) from which the known terms of one order are summed in two threads: about
     * 100 microseconds of work, well above the cost of handing a task to another thread.
     */
    private static final long SPLIT_WORK = 16L * 16 * 40;
    /** Integer limbs beyond which a growing solution is refused (values near 2^1500). */
    private static final int MAX_HEADROOM = 64;
    private final RecurrencePlan plan;
    private final MpContext ctx;
    private final int order;
    private final int f;
    private final BigInteger[] coefRe;
    private final BigInteger[] coefIm;
    /** Groups whose terms are all constants: their series vanish beyond order 0. */
    private final boolean[] constantGroup;

    /**
     * @param plan the compiled recurrence
     * @param coefficients the coefficient values of the system, in its coefficient order, at ctx precision
     * @param order the highest Taylor order N
     * @param ctx the working precision (F = its bit count rounded up to whole limbs)
     */
    FixedPointKernel(RecurrencePlan plan, MpComplex[] coefficients, int order, MpContext ctx) {
        if (coefficients.length != plan.coefficientCount()) {
            throw new InvalidInputException("coefficients", "expected " + plan.coefficientCount() + " values, got "
                    + coefficients.length);
        }
        if (order < 4) {
            throw new InvalidInputException("order", "must be at least 4, got " + order);
        }
        this.plan = plan;
        this.ctx = ctx;
        this.order = order;
        // the working precision (which carries its own guard bits, and lies six digits above the tolerance)
        // rounded up to whole limbs; 16 more bits made one limb more at 100 digits for no measured gain
        this.f = LimbFormat.fractionBits(ctx.bits());
        int nc = coefficients.length;
        coefRe = new BigInteger[nc];
        coefIm = new BigInteger[nc];
        constantGroup = new boolean[plan.groupCount()];
        for (int g = 0; g < constantGroup.length; g++) {
            boolean constant = true;
            for (int t = plan.groupStart(g); t < plan.groupStart(g + 1); t++) {
                constant &= plan.termSeries(t) < 0;
            }
            constantGroup[g] = constant;
        }
        for (int c = 0; c < nc; c++) {
            coefRe[c] = MpContext.fixedRe(coefficients[c], f);
            coefIm[c] = MpContext.fixedIm(coefficients[c], f);
        }
    }

    int order() {
        return order;
    }

    int fractionBits() {
        return f;
    }

    RecurrencePlan plan() {
        return plan;
    }

    /** Number of complex products of series coefficients per expansion (the cost unit). */
    long productsPerExpansion() {
        long convolutions = plan.productCount();
        long single = 0;
        for (int g = 0; g < constantGroup.length; g++) {
            if (plan.groupBaseIndex(g) >= 0) {
                if (constantGroup[g]) {
                    single++;
                } else {
                    convolutions++;
                }
            }
        }
        return convolutions * (long) order * (order + 1) / 2 + single * order;
    }

    /**
     * The Taylor coefficients at tau0 of the solution through y0, in s with tau = tau0 + scale * s. The integer
     * limbs start at one (or at what the start values need); when the coefficients outgrow them the expansion
     * widens its work arrays by the limbs the growth seen calls for and goes on from the order it had reached.
     */
    TaylorSeries expand(MpComplex tau0, MpComplex[] y0, double scale) {
        return expand(tau0, y0, scale, 1);
    }

    /** As above, starting with the given integer limbs (tests: the widening gives the same coefficients). */
    TaylorSeries expand(MpComplex tau0, MpComplex[] y0, double scale, int firstHeadroom) {
        Work work = null;
        for (int headroom = firstHeadroom; work == null; ) {
            try {
                work = new Work(tau0, y0, scale, new LimbFormat(f, headroom));
            } catch (RuntimeException e) {
                if (e != LimbFormat.overflow()) {
                    throw e;
                }
                headroom = widerHeadroom(tau0, headroom, 0);
            }
        }
        return work.run(tau0);
    }

    /**
     * The headroom asked for (at least twice the current one), capped at MAX_HEADROOM; refused when the current
     * one is the cap already.
     */
    private static int widerHeadroom(MpComplex tau0, int current, int wanted) {
        if (current >= MAX_HEADROOM) {
            throw new UnreachableTargetException("the high-precision Taylor coefficients near tau = "
                    + tau0.toComplex() + " exceed 2^" + (LimbFormat.BITS * current) + ": the solution is too"
                    + " large there");
        }
        return Math.min(MAX_HEADROOM, Math.max(2 * current, wanted));
    }

    /**
     * The work arrays of one expansion in one limb format, and the loop over the orders; widened in place of a
     * fresh start when a value outgrows the integer limbs.
     */
    private final class Work {
        private final int n = plan.dimension();
        private final int st = order + 1;
        private final double scale;
        private final double[] log2Start;
        private LimbFormat fmt;
        private LimbVector w;
        private LimbVector coef;
        private LimbVector base;
        /** slot 0: the scale r; slot 1: F_k of one equation */
        private LimbVector aux;
        private LimbAccumulator acc;
        private LimbAccumulator[] rhs;
        /** the known sums of each order, the second half the other thread's partial sums (null: no split) */
        private LimbAccumulator[] known;
        private int splitFrom;

        Work(MpComplex tau0, MpComplex[] y0, double scale, LimbFormat fmt) {
            this.scale = scale;
            this.fmt = fmt;
            w = new LimbVector(fmt, plan.seriesCount() * st);
            for (int i = 0; i < n; i++) {
                w.set(i * st, MpContext.fixedRe(y0[i], f), MpContext.fixedIm(y0[i], f));
            }
            coef = new LimbVector(fmt, coefRe.length);
            for (int c = 0; c < coefRe.length; c++) {
                coef.set(c, coefRe[c], coefIm[c]);
            }
            base = BaseSeries.of(plan, ctx, order, f, tau0, scale, fmt);
            aux = new LimbVector(fmt, 2);
            aux.set(0, MpContext.fixedRe(ctx.fromDouble(scale, 0), f), BigInteger.ZERO);
            log2Start = new double[n];
            for (int i = 0; i < n; i++) {
                double l = y0[i].log2Abs();
                log2Start[i] = l == Double.NEGATIVE_INFINITY ? 0 : Math.max(0, l)
                        + Math.log1p(Math.pow(2, -Math.abs(l))) / Math.log(2);
            }
            accumulators();
        }

        /**
         * The accumulators of the format. When an order is worth two threads (BigInteger products, or limb
         * products of high order) the terms of every convolution whose factors are known before order k are
         * summed in two threads first; the one or two terms with an order-k factor follow in order.
         */
        private void accumulators() {
            acc = new LimbAccumulator(fmt);
            rhs = new LimbAccumulator[n];
            for (int i = 0; i < n; i++) {
                rhs[i] = new LimbAccumulator(fmt);
            }
            long perOrder = (long) fmt.limbs() * fmt.limbs();
            splitFrom = fmt.bigProducts() ? 1
                    : (int) Math.max(1, Math.min(order, (SPLIT_WORK + perOrder - 1) / perOrder));
            known = null;
            if (Workers.PARALLEL && splitFrom <= order / 2) {
                known = new LimbAccumulator[2 * (plan.productCount() + plan.groupCount())];
                for (int t = 0; t < known.length; t++) {
                    known[t] = new LimbAccumulator(fmt);
                }
            }
        }

        TaylorSeries run(MpComplex tau0) {
            int k = 0;
            while (true) {
                LockstepPartner partner = null;
                try {
                    for (; k < order; k++) {
                        boolean split = known != null && k >= splitFrom;
                        if (split && partner == null) {
                            // the other thread's share of the known terms of every order from here on
                            LimbVector ws = w;
                            LimbVector bs = base;
                            LimbAccumulator[] ks = known;
                            partner = new LockstepPartner(r -> partialKnownTerms(ws, bs, ks, ks.length / 2, r, 1));
                        }
                        expandOrder(k, w, base, coef, aux, acc, rhs, known, split ? partner : null);
                        int m = k + 1;
                        if (m >= 16 && m < order && (m & (m - 1)) == 0) {
                            CoefficientGrowth.check(w, fmt, n, st, m, log2Start);
                        }
                    }
                    break;
                } catch (RuntimeException e) {
                    if (e != LimbFormat.overflow()) {
                        throw e;
                    }
                    // the growth seen at the last complete order, carried to the full order, plus a margin; order
                    // k is done again (its stores overwrite whatever it had written)
                    double g = k >= 4 ? Math.max(0, CoefficientGrowth.growthBits(w, fmt, n, st, k, log2Start)) : 1;
                    if (partner != null) {
                        partner.close();
                        partner = null;
                    }
                    widen(widerHeadroom(tau0, fmt.limbs() - fmt.fractionLimbs(),
                            (int) Math.ceil((g * order + 2.0 * LimbFormat.BITS) / LimbFormat.BITS) + 1));
                } finally {
                    if (partner != null) {
                        partner.close();
                    }
                }
            }
            BigInteger[][] outRe = new BigInteger[n][st];
            BigInteger[][] outIm = new BigInteger[n][st];
            for (int i = 0; i < n; i++) {
                for (int j = 0; j < st; j++) {
                    outRe[i][j] = w.re(i * st + j);
                    outIm[i][j] = w.im(i * st + j);
                }
            }
            return new TaylorSeries(tau0, scale, f, outRe, outIm);
        }

        /** The same values in a format with the given integer limbs. */
        private void widen(int headroom) {
            LimbFormat wider = new LimbFormat(f, headroom);
            w = w.widened(wider);
            coef = coef.widened(wider);
            base = base.widened(wider);
            aux = aux.widened(wider);
            fmt = wider;
            accumulators();
        }
    }

    /** One order of the recurrence: the products, the term groups and y_{k+1} of every component. */
    private void expandOrder(int k, LimbVector w, LimbVector base, LimbVector coef, LimbVector aux,
                             LimbAccumulator acc, LimbAccumulator[] rhs, LimbAccumulator[] known,
                             LockstepPartner partner) {
        final int n = plan.dimension();
        final int st = order + 1;
        final int np = plan.productCount();
        final int ng = plan.groupCount();
        boolean splitHere = partner != null;
        if (splitHere) {
            knownTerms(w, base, known, k, partner);
        }
        for (int p = 0; p < np; p++) {
            int a = plan.productFirst(p) * st;
            int b = plan.productSecond(p) * st;
            LimbAccumulator sum = acc;
            if (splitHere) {
                sum = known[p];
                sum.multiplyAdd(w, a, w, b + k);
                sum.multiplyAdd(w, a + k, w, b);
            } else {
                acc.clear();
                acc.convolve(w, a, w, b, k);
            }
            sum.store(w, (n + p) * st + k);
        }
        for (int i = 0; i < n; i++) {
            rhs[i].clear();
        }
        for (int g = 0; g < ng; g++) {
            acc.clear();
            for (int t = plan.groupStart(g); t < plan.groupStart(g + 1); t++) {
                int s = plan.termSeries(t);
                int c = plan.termCoefficient(t);
                if (s < 0) {
                    if (k == 0) {
                        acc.add(coef, c);
                    }
                } else {
                    acc.multiplyAdd(coef, c, w, s * st + k);
                }
            }
            int gs = plan.groupSeries(g) * st;
            acc.store(w, gs + k);
            LimbAccumulator r = rhs[plan.groupEquation(g)];
            int b = plan.groupBaseIndex(g);
            if (b < 0) {
                r.add(w, gs + k);
            } else if (constantGroup[g]) {
                r.multiplyAdd(base, b * st + k, w, gs);
            } else if (splitHere) {
                r.addSum(known[np + g]);
                r.multiplyAdd(base, b * st, w, gs + k);
            } else {
                r.convolve(base, b * st, w, gs, k);
            }
        }
        for (int i = 0; i < n; i++) {
            // y_{k+1} = r F_k / (k + 1)
            rhs[i].store(aux, 1);
            acc.clear();
            acc.multiplyAdd(aux, 0, aux, 1);
            acc.store(w, i * st + k + 1);
            w.divide(i * st + k + 1, k + 1);
        }
    }

    /**
     * For order k &gt;= 1, in two threads: known[p] = sum_{i=1..k-1} of the products of product p, and
     * known[np + g] = sum_{i=0..k-1} base_{k-i} g_i for the groups with a base convolution (all factors of
     * order below k). Every sum is split by the parity of i between this thread and the lockstep partner (whose
     * partial sums go to the second half of {@code known} and are added in at the end): the terms of a sum cost
     * alike, except those of the base series, whose high orders are small (factorial decay) and cheap, so a split
     * by whole sums would leave one thread idle.
     */
    private void knownTerms(LimbVector w, LimbVector base, LimbAccumulator[] known, int k, LockstepPartner partner) {
        final int half = known.length / 2;
        partner.round(k, () -> partialKnownTerms(w, base, known, 0, k, 0));
        for (int t = 0; t < half; t++) {
            known[t].addSum(known[half + t]);
        }
    }

    /** The terms of the known sums of order k whose index i has the given parity, into known[into + t]. */
    private void partialKnownTerms(LimbVector w, LimbVector base, LimbAccumulator[] known, int into, int k,
                                   int parity) {
        final int st = order + 1;
        final int np = plan.productCount();
        for (int p = 0; p < np; p++) {
            int a = plan.productFirst(p) * st;
            int b = plan.productSecond(p) * st;
            LimbAccumulator sum = known[into + p];
            sum.clear();
            for (int i = 2 - parity; i < k; i += 2) {
                sum.multiplyAdd(w, a + i, w, b + k - i);
            }
        }
        for (int g = 0; g < plan.groupCount(); g++) {
            LimbAccumulator sum = known[into + np + g];
            sum.clear();
            if (plan.groupBaseIndex(g) >= 0 && !constantGroup[g]) {
                int b = plan.groupBaseIndex(g) * st;
                int gs = plan.groupSeries(g) * st;
                for (int i = parity; i < k; i += 2) {
                    sum.multiplyAdd(base, b + k - i, w, gs + i);
                }
            }
        }
    }
}
