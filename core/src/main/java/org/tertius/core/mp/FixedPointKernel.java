package org.tertius.core.mp;

import java.math.BigInteger;
import java.util.Arrays;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * Runs a {@link RecurrencePlan} (the same compiled recurrence the double-precision kernel runs) in binary
 * fixed-point arithmetic on {@link BigInteger}s: every Taylor coefficient is an integer multiple of 2^-F. Each
 * convolution sum is accumulated exactly and rounded once; complex products use three integer multiplications
 * (Gauss). Stateless apart from its immutable inputs, so one kernel can serve several threads.
 */
final class FixedPointKernel {
    private final RecurrencePlan plan;
    private final MpContext ctx;
    private final int order;
    private final int f;
    private final BigInteger[] coefRe;
    private final BigInteger[] coefIm;
    private final BigInteger[] coefSum;

    /**
     * @param plan the compiled recurrence
     * @param coefficients the coefficient values of the system, in its coefficient order, at ctx precision
     * @param order the highest Taylor order N
     * @param ctx the working precision (F = its bit count plus 16)
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
        this.f = ctx.bits() + 16;
        int nc = coefficients.length;
        coefRe = new BigInteger[nc];
        coefIm = new BigInteger[nc];
        coefSum = new BigInteger[nc];
        for (int c = 0; c < nc; c++) {
            coefRe[c] = MpContext.fixedRe(coefficients[c], f);
            coefIm[c] = MpContext.fixedIm(coefficients[c], f);
            coefSum[c] = coefRe[c].add(coefIm[c]);
        }
    }

    int order() {
        return order;
    }

    RecurrencePlan plan() {
        return plan;
    }

    /** Number of complex products of series coefficients per expansion (the cost unit). */
    long productsPerExpansion() {
        long perOrder = plan.productCount() + plan.baseConvolutionCount();
        return perOrder * (long) order * (order + 1) / 2;
    }

    /**
     * The Taylor coefficients at tau0 of the solution through y0, in s with tau = tau0 + scale * s.
     */
    TaylorSeries expand(MpComplex tau0, MpComplex[] y0, double scale) {
        final int n = plan.dimension();
        final int st = order + 1;
        final int np = plan.productCount();
        final int ng = plan.groupCount();
        Work w = new Work(plan.seriesCount() * st);
        for (int i = 0; i < n; i++) {
            w.set(i * st, MpContext.fixedRe(y0[i], f), MpContext.fixedIm(y0[i], f));
        }
        Work base = baseSeries(tau0, scale);
        BigInteger rFixed = MpContext.fixedRe(ctx.fromDouble(scale, 0), f);
        BigInteger[] fr = new BigInteger[n];
        BigInteger[] fi = new BigInteger[n];
        Acc acc = new Acc();
        for (int k = 0; k < order; k++) {
            for (int p = 0; p < np; p++) {
                acc.clear();
                acc.convolve(w, plan.productFirst(p) * st, w, plan.productSecond(p) * st, k);
                acc.store(w, (n + p) * st + k, f);
            }
            Arrays.fill(fr, BigInteger.ZERO);
            Arrays.fill(fi, BigInteger.ZERO);
            for (int g = 0; g < ng; g++) {
                acc.clear();
                for (int t = plan.groupStart(g); t < plan.groupStart(g + 1); t++) {
                    int s = plan.termSeries(t);
                    int c = plan.termCoefficient(t);
                    if (s < 0) {
                        if (k == 0) {
                            acc.addShifted(coefRe[c], coefIm[c], f);
                        }
                    } else {
                        acc.multiplyAdd(coefRe[c], coefIm[c], coefSum[c], w, s * st + k);
                    }
                }
                int gs = plan.groupSeries(g) * st;
                acc.store(w, gs + k, f);
                int e = plan.groupEquation(g);
                int b = plan.groupBaseIndex(g);
                if (b < 0) {
                    fr[e] = fr[e].add(w.re[gs + k]);
                    fi[e] = fi[e].add(w.im[gs + k]);
                } else {
                    acc.clear();
                    acc.convolve(base, b * st, w, gs, k);
                    fr[e] = fr[e].add(acc.resultRe(f));
                    fi[e] = fi[e].add(acc.resultIm(f));
                }
            }
            BigInteger div = BigInteger.valueOf(k + 1);
            for (int i = 0; i < n; i++) {
                w.set(i * st + k + 1, MpContext.shiftRound(fr[i].multiply(rFixed), f).divide(div),
                        MpContext.shiftRound(fi[i].multiply(rFixed), f).divide(div));
            }
        }
        BigInteger[][] outRe = new BigInteger[n][];
        BigInteger[][] outIm = new BigInteger[n][];
        for (int i = 0; i < n; i++) {
            outRe[i] = Arrays.copyOfRange(w.re, i * st, i * st + st);
            outIm[i] = Arrays.copyOfRange(w.im, i * st, i * st + st);
        }
        return new TaylorSeries(tau0, scale, f, outRe, outIm);
    }

    /**
     * Series in s of b^j for each distinct power j of the base: for tau = log z, e^{j tau0} (j r)^k / k!; for the
     * plain variable, x0^j binom(j, k) (r / x0)^k. Both are c_k = c_{k-1} * m * a_k / k with a_k = 1 or j-k+1.
     */
    private Work baseSeries(MpComplex tau0, double scale) {
        final int st = order + 1;
        int q = plan.basePowerCount();
        Work base = new Work(q * st);
        boolean log = plan.variable() == IndependentVariable.LOG;
        MpComplex b0 = log ? ctx.exp(tau0) : tau0;
        for (int qi = 0; qi < q; qi++) {
            int j = plan.basePower(qi);
            MpComplex c0 = power(b0, j);
            MpComplex m = log ? ctx.fromDouble(j * scale, 0) : ctx.divide(ctx.fromDouble(scale, 0), b0);
            BigInteger mr = MpContext.fixedRe(m, f);
            BigInteger mi = MpContext.fixedIm(m, f);
            BigInteger ms = mr.add(mi);
            int o = qi * st;
            base.set(o, MpContext.fixedRe(c0, f), MpContext.fixedIm(c0, f));
            for (int k = 1; k <= order; k++) {
                BigInteger ar = base.re[o + k - 1];
                BigInteger ai = base.im[o + k - 1];
                BigInteger t1 = ar.multiply(mr);
                BigInteger t2 = ai.multiply(mi);
                BigInteger t3 = ar.add(ai).multiply(ms);
                BigInteger pr = t1.subtract(t2);
                BigInteger pi = t3.subtract(t1).subtract(t2);
                long a = log ? 1 : j - k + 1;
                BigInteger d = BigInteger.valueOf(k);
                BigInteger am = BigInteger.valueOf(a);
                base.set(o + k, MpContext.shiftRound(pr.multiply(am), f).divide(d),
                        MpContext.shiftRound(pi.multiply(am), f).divide(d));
            }
        }
        return base;
    }

    private MpComplex power(MpComplex b, int j) {
        MpComplex r = ctx.fromLong(1);
        for (int i = 0; i < Math.abs(j); i++) {
            r = ctx.multiply(r, b);
        }
        return j < 0 ? ctx.reciprocal(r) : r;
    }

    /** Work arrays of fixed-point coefficients, with re + im kept for three-multiplication products. */
    private static final class Work {
        final BigInteger[] re;
        final BigInteger[] im;
        final BigInteger[] sum;

        Work(int size) {
            re = new BigInteger[size];
            im = new BigInteger[size];
            sum = new BigInteger[size];
            Arrays.fill(re, BigInteger.ZERO);
            Arrays.fill(im, BigInteger.ZERO);
            Arrays.fill(sum, BigInteger.ZERO);
        }

        void set(int i, BigInteger r, BigInteger m) {
            re[i] = r;
            im[i] = m;
            sum[i] = r.add(m);
        }
    }

    /** An exact accumulator of complex products at scale 2^-2F: t1 = sum ar br, t2 = sum ai bi, t3 = sum (ar+ai)(br+bi). */
    private static final class Acc {
        BigInteger t1;
        BigInteger t2;
        BigInteger t3;

        void clear() {
            t1 = BigInteger.ZERO;
            t2 = BigInteger.ZERO;
            t3 = BigInteger.ZERO;
        }

        /** Adds sum_{i=0..k} a[i] b[k-i]. */
        void convolve(Work a, int ao, Work b, int bo, int k) {
            BigInteger s1 = t1;
            BigInteger s2 = t2;
            BigInteger s3 = t3;
            for (int i = 0; i <= k; i++) {
                BigInteger as = a.sum[ao + i];
                BigInteger ar = a.re[ao + i];
                BigInteger ai = a.im[ao + i];
                if (ar.signum() == 0 && ai.signum() == 0) {
                    continue;
                }
                int j = bo + k - i;
                BigInteger br = b.re[j];
                BigInteger bi = b.im[j];
                if (br.signum() == 0 && bi.signum() == 0) {
                    continue;
                }
                s1 = s1.add(ar.multiply(br));
                s2 = s2.add(ai.multiply(bi));
                s3 = s3.add(as.multiply(b.sum[j]));
            }
            t1 = s1;
            t2 = s2;
            t3 = s3;
        }

        void multiplyAdd(BigInteger cr, BigInteger ci, BigInteger cs, Work b, int j) {
            t1 = t1.add(cr.multiply(b.re[j]));
            t2 = t2.add(ci.multiply(b.im[j]));
            t3 = t3.add(cs.multiply(b.sum[j]));
        }

        /** Adds the fixed-point value (r, m) at scale 2^-F. */
        void addShifted(BigInteger r, BigInteger m, int f) {
            // as t1 - t2 = re, t3 - t1 - t2 = im: put re in t1 and im in t3 (with the re part compensated)
            BigInteger rs = r.shiftLeft(f);
            BigInteger ms = m.shiftLeft(f);
            t1 = t1.add(rs);
            t3 = t3.add(ms).add(rs);
        }

        BigInteger resultRe(int f) {
            return MpContext.shiftRound(t1.subtract(t2), f);
        }

        BigInteger resultIm(int f) {
            return MpContext.shiftRound(t3.subtract(t1).subtract(t2), f);
        }

        void store(Work w, int i, int f) {
            w.set(i, resultRe(f), resultIm(f));
        }
    }
}
