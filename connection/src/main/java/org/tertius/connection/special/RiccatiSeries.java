package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.fraction.BigFraction;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * A basis (U1, U2) of solutions of the linear equation u'' - ((2 nu - 1)/z) u' + q u = 0, the linearisation of
 * the Riccati equations of NIST DLMF §32.10(iv) (u = z^nu C_nu(sqrt(q) z) with C_nu any Bessel function, DLMF
 * 10.2), by power series in z^2 summed in any arithmetic, on any sheet (z^(2 nu) = exp(2 nu tau) and
 * ln z = tau with tau the log coordinate of the point):
 * <ul>
 *   <li>nu not an integer: U1 = z^(2nu) 0F1(; 1+nu; -q z^2/4), U2 = 0F1(; 1-nu; -q z^2/4) (DLMF 16.2.1; the
 *       coefficients a_k = -q a_{k-1} / (4 k (k + nu)) and d_k = -q d_{k-1} / (4 k (k - nu)) follow from the
 *       equation).</li>
 *   <li>nu = m &gt;= 0 an integer: U1 = z^(2m) 0F1(; 1+m; -q z^2/4) and the Frobenius logarithmic solution
 *       U2 = sum_j d_j z^(2j) + C ln z U1 with d_0 = 1, d_j = -q d_{j-1} / (4 j (j - m)) for j &lt; m,
 *       C = -q d_{m-1} / (2m), d_m = 0 and d_j = -(q d_{j-1} + C (4j - 2m) a_{j-m}) / (4 j (j - m)) for j &gt; m
 *       (for m = 0: d_0 = 0, C = 1); derived for this project by substituting the ansatz into the equation.</li>
 *   <li>nu = -m &lt; 0 an integer: u = z^(2 nu) v with v a solution for nu' = m (same substitution), so
 *       U1 = 0F1(; 1+m; -q z^2/4) and U2 = z^(-2m) times the logarithmic solution for m.</li>
 * </ul>
 * Errors: rounding of each term bounded by (4k + 8) u |t_k| (k products and sums deep), the tail after the
 * last term (ratios below 1/2 and decreasing from there on) by 4 |t_K|, the factor exp(2 nu tau) by
 * (4 + |2 nu tau|) u relative.
 */
final class RiccatiSeries {
    /** Most terms summed (|q| |z|^2 / 4 must stay far below this squared). */
    static final int MAX_TERMS = 200000;

    private RiccatiSeries() {
    }

    /**
     * {U1, U2}, each with its z-derivative and error bounds.
     *
     * @param q q = a c
     * @param nu nu exactly (its integrality decides the basis)
     * @param z the point
     * @param tau its log coordinate ln|z| + i (Arg z + 2 pi sheet)
     */
    static <T> List<Tracked<T>> basis(AnalyticArithmetic<T> ar, T q, GaussianRational nu, T z, T tau) {
        Tracked.Ops<T> ops = new Tracked.Ops<>(ar);
        T nuT = Conversions.of(ar, nu);
        boolean integer = Conversions.isInteger(nu);
        List<Tracked<T>> out = new ArrayList<>(2);
        if (!integer) {
            Tracked<T> s1 = evenSeries(ar, frobenius(ar, q, nuT, 1), z);
            out.add(ops.multiply(power(ar, nuT, z, tau), s1));
            out.add(evenSeries(ar, frobenius(ar, q, nuT, -1), z));
            return out;
        }
        long m = nu.re().getNumerator().longValueExact();
        long am = Math.abs(m);
        T mT = ar.of(am, 0);
        // the regular series for |m| and the logarithmic companion of z^(2|m|) times it
        List<T> a = coefficients(ar, frobenius(ar, q, mT, 1), z);
        Tracked<T> regular = evenSeries(ar, a, z);
        Tracked<T> zPower = ops.exact(integerPower(ar, z, 2 * am));
        zPower = new Tracked<>(zPower.value, ar.multiply(ar.of(2.0 * am, 0), ar.divide(zPower.value, z)),
                Math.log((2 * am + 1) * ar.epsilon()) + ar.logAbs(zPower.value), Double.NEGATIVE_INFINITY);
        Tracked<T> logPart = logCompanion(ar, ops, q, (int) am, a, z, tau);
        if (m >= 0) {
            Tracked<T> u1 = ops.multiply(zPower, regular);
            out.add(u1);
            out.add(logPart);
        } else {
            out.add(regular);
            out.add(ops.divide(logPart, zPower, "z = 0"));
        }
        return out;
    }

    /** z^(2 nu) = exp(2 nu tau) with its derivative 2 nu z^(2nu) / z. */
    private static <T> Tracked<T> power(AnalyticArithmetic<T> ar, T nu, T z, T tau) {
        T twoNu = ar.multiply(ar.of(2, 0), nu);
        T p = ar.exp(ar.multiply(twoNu, tau));
        T dp = ar.divide(ar.multiply(twoNu, p), z);
        double rel = (4 + ar.abs(ar.multiply(twoNu, tau))) * ar.epsilon();
        return new Tracked<>(p, dp, Math.log(rel) + ar.logAbs(p), Math.log(rel + 2 * ar.epsilon()) + ar.logAbs(dp));
    }

    private static <T> T integerPower(AnalyticArithmetic<T> ar, T z, long k) {
        T r = ar.one();
        for (long i = 0; i < k; i++) {
            r = ar.multiply(r, z);
        }
        return r;
    }

    /** The coefficient recurrence c_k = -q c_{k-1} / (4 k (k + s nu)), c_0 = 1. */
    private static <T> Coefficients<T> frobenius(AnalyticArithmetic<T> ar, T q, T nu, int s) {
        return (k, previous) -> {
            T kk = ar.of(k, 0);
            T den = ar.multiply(ar.of(4.0 * k, 0), s > 0 ? ar.add(kk, nu) : ar.subtract(kk, nu));
            return ar.divide(ar.negate(ar.multiply(q, previous)), den);
        };
    }

    /** Coefficients until the terms are negligible (see {@link #evenSeries}). */
    private static <T> List<T> coefficients(AnalyticArithmetic<T> ar, Coefficients<T> next, T z) {
        List<T> c = new ArrayList<>();
        c.add(ar.one());
        double logZ2 = 2 * ar.logAbs(z);
        double max = 0;
        double logU = Math.log(ar.epsilon());
        for (int k = 1; k < MAX_TERMS; k++) {
            T ck = next.next(k, c.get(k - 1));
            c.add(ck);
            double term = ar.logAbs(ck) + k * logZ2;
            double ratio = term - (ar.logAbs(c.get(k - 1)) + (k - 1) * logZ2);
            max = Math.max(max, term);
            if (term < max + logU - 25 && ratio < Math.log(0.5)) {
                break;
            }
        }
        return c;
    }

    private static <T> Tracked<T> evenSeries(AnalyticArithmetic<T> ar, Coefficients<T> next, T z) {
        return evenSeries(ar, coefficients(ar, next, z), z);
    }

    /** sum_k c_k z^(2k) and its derivative with rounding and tail bounds. */
    private static <T> Tracked<T> evenSeries(AnalyticArithmetic<T> ar, List<T> c, T z) {
        T z2 = ar.multiply(z, z);
        T power = ar.one();
        T value = ar.zero();
        T derivative = ar.zero();
        double u = ar.epsilon();
        double errV = Double.NEGATIVE_INFINITY;
        double errD = Double.NEGATIVE_INFINITY;
        double logZ = ar.logAbs(z);
        double lastTerm = 0;
        for (int k = 0; k < c.size(); k++) {
            T term = ar.multiply(c.get(k), power);
            value = ar.add(value, term);
            double lt = ar.logAbs(term);
            errV = Conversions.logAdd(errV, Math.log((4.0 * k + 8) * u) + lt);
            if (k > 0) {
                T dterm = ar.divide(ar.multiply(ar.of(2.0 * k, 0), term), z);
                derivative = ar.add(derivative, dterm);
                errD = Conversions.logAdd(errD, Math.log((4.0 * k + 10) * u) + ar.logAbs(dterm));
            }
            lastTerm = lt;
            power = ar.multiply(power, z2);
        }
        int k = c.size();
        errV = Conversions.logAdd(errV, Math.log(4) + lastTerm);
        errD = Conversions.logAdd(errD, Math.log(8.0 * k) + lastTerm - logZ);
        return new Tracked<>(value, derivative, errV, errD);
    }

    /**
     * The logarithmic solution for nu = m &gt;= 0: sum_j d_j z^(2j) + C tau z^(2m) sum_k a_k z^(2k), with its
     * derivative (the a_k given).
     */
    private static <T> Tracked<T> logCompanion(AnalyticArithmetic<T> ar, Tracked.Ops<T> ops, T q, int m, List<T> a,
                                               T z, T tau) {
        List<T> d = new ArrayList<>();
        T cLog;
        if (m == 0) {
            d.add(ar.zero());
            cLog = ar.one();
        } else {
            d.add(ar.one());
            for (int j = 1; j < m; j++) {
                T den = ar.of(4.0 * j * (j - m), 0);
                d.add(ar.divide(ar.negate(ar.multiply(q, d.get(j - 1))), den));
            }
            cLog = ar.divide(ar.negate(ar.multiply(q, d.get(m - 1))), ar.of(2.0 * m, 0));
            d.add(ar.zero());
        }
        double logZ2 = 2 * ar.logAbs(z);
        double max = 0;
        double logU = Math.log(ar.epsilon());
        List<T> aa = new ArrayList<>(a);
        for (int j = m + 1; j < MAX_TERMS; j++) {
            while (aa.size() <= j - m) {
                int k = aa.size();
                T kk = ar.of(k, 0);
                T den = ar.multiply(ar.of(4.0 * k, 0), ar.add(kk, ar.of(m, 0)));
                aa.add(ar.divide(ar.negate(ar.multiply(q, aa.get(k - 1))), den));
            }
            T coupling = ar.multiply(cLog, ar.multiply(ar.of(4.0 * j - 2.0 * m, 0), aa.get(j - m)));
            T num = ar.add(ar.multiply(q, d.get(j - 1)), coupling);
            d.add(ar.divide(ar.negate(num), ar.of(4.0 * j * (j - m), 0)));
            double term = ar.logAbs(d.get(j)) + j * logZ2;
            max = Math.max(max, term);
            if (j > m + 2 && term < max + logU - 25 && term < ar.logAbs(d.get(j - 1)) + (j - 1) * logZ2 + Math.log(0.5)) {
                break;
            }
        }
        Tracked<T> series = evenSeries(ar, d, z);
        // C tau z^(2m) A(z) with A = sum a_k z^(2k): derivative C (z^(2m) A / z + tau (z^(2m) A)')
        Tracked<T> regular = evenSeries(ar, aa, z);
        T zp = integerPower(ar, z, 2L * m);
        Tracked<T> zPow = new Tracked<>(zp, ar.divide(ar.multiply(ar.of(2.0 * m, 0), zp), z),
                Math.log((2 * m + 1) * ar.epsilon()) + ar.logAbs(zp), Double.NEGATIVE_INFINITY);
        Tracked<T> r = ops.multiply(zPow, regular);
        Tracked<T> tauT = new Tracked<>(tau, ar.reciprocal(z), Math.log(4 * ar.epsilon()) + ar.logAbs(tau),
                Math.log(2 * ar.epsilon()) - ar.logAbs(z));
        Tracked<T> logTerm = ops.multiply(ops.constant(cLog), ops.multiply(tauT, r));
        return ops.add(series, logTerm);
    }

    /** The coefficient c_k from c_{k-1}. */
    private interface Coefficients<T> {
        T next(int k, T previous);
    }

    /** nu = alpha/(2a) as an exact value, from x = alpha/a. */
    static GaussianRational nu(GaussianRational x) {
        return x.multiply(GaussianRational.of(new BigFraction(1, 2), BigFraction.ZERO));
    }
}
