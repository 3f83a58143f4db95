package org.tertius.core.mp;
import java.math.BigInteger;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * The series of the distinct powers of the base that the term groups of a {@link RecurrencePlan} carry (the base
 * is z = e^tau when the integration variable is tau = log z, else the variable itself), in the limbs of the
 * {@link FixedPointKernel}; made once per expansion, outside the loop over the orders.
 */
final class BaseSeries {
    private BaseSeries() {
    }

    /**
     * Series in s of b^j for each distinct power j of the base: for tau = log z, e^{j tau0} (j r)^k / k!; for the
     * plain variable, x0^j binom(j, k) (r / x0)^k. Both are c_k = c_{k-1} * m * a_k / k with a_k = 1 or j-k+1.
     */
    static LimbVector of(RecurrencePlan plan, MpContext ctx, int order, int f, MpComplex tau0, double scale,
                         LimbFormat fmt) {
        final int st = order + 1;
        int q = plan.basePowerCount();
        LimbVector base = new LimbVector(fmt, q * st);
        boolean log = plan.variable() == IndependentVariable.LOG;
        MpComplex b0 = log ? ctx.exp(tau0) : tau0;
        for (int qi = 0; qi < q; qi++) {
            int j = plan.basePower(qi);
            MpComplex c0 = power(ctx, b0, j);
            MpComplex m = log ? ctx.fromDouble(j * scale, 0) : ctx.divide(ctx.fromDouble(scale, 0), b0);
            BigInteger mr = MpContext.fixedRe(m, f);
            BigInteger mi = MpContext.fixedIm(m, f);
            BigInteger ms = mr.add(mi);
            int o = qi * st;
            BigInteger ar = MpContext.fixedRe(c0, f);
            BigInteger ai = MpContext.fixedIm(c0, f);
            base.set(o, ar, ai);
            for (int k = 1; k <= order; k++) {
                BigInteger t1 = ar.multiply(mr);
                BigInteger t2 = ai.multiply(mi);
                BigInteger t3 = ar.add(ai).multiply(ms);
                BigInteger pr = t1.subtract(t2);
                BigInteger pi = t3.subtract(t1).subtract(t2);
                long a = log ? 1 : j - k + 1;
                BigInteger d = BigInteger.valueOf(k);
                BigInteger am = BigInteger.valueOf(a);
                ar = MpContext.shiftRound(pr.multiply(am), f).divide(d);
                ai = MpContext.shiftRound(pi.multiply(am), f).divide(d);
                base.set(o + k, ar, ai);
            }
        }
        return base;
    }

    private static MpComplex power(MpContext ctx, MpComplex b, int j) {
        MpComplex r = ctx.fromLong(1);
        for (int i = 0; i < Math.abs(j); i++) {
            r = ctx.multiply(r, b);
        }
        return j < 0 ? ctx.reciprocal(r) : r;
    }
}
