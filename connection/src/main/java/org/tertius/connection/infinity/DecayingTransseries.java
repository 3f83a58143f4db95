package org.tertius.connection.infinity;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The one-parameter family of solutions of PIII(alpha = 0, beta = 0, gamma = 1, delta = -1) that tend to 1 at
 * +infinity (the family of McCoy, Tracy and Wu, J. Math. Phys. 18 (1977) 1058), as a transseries with all its
 * nonlinear corrections. With u = log w the equation is u'' + u'/x = 2 sinh 2u; writing
 * <pre>  u = sum_{k odd} sum_j c_kj E^k x^-j,   E = lambda e^(-2x) x^(-1/2),</pre>
 * the operator L = d^2/dx^2 + (1/x) d/dx - 4 maps E^k x^-j (with m = k/2 + j) to
 * E^k x^-j [(4k^2 - 4) + (4km - 2k)/x + m^2/x^2], and L u = 2 sinh 2u - 4u gives, sector by sector,
 * <pre>  (4k^2 - 4) c_kn + (4k m_{n-1} - 2k) c_{k,n-1} + m_{n-2}^2 c_{k,n-2} = N_kn</pre>
 * with N the coefficients of 2 sinh 2u - 4u from the lower sectors. Sector 1 is -2 K0(2x) (DLMF eq. 10.40.2:
 * c_10 = -sqrt(pi), c_1j = -(j - 1/2)^2 c_1,j-1 / (4j)). Each sector is an asymptotic series in 1/x and is
 * truncated at its smallest term (optimal truncation); the error estimate is the sum of the smallest terms plus
 * the size of the last sector kept. Immutable and thread-safe.
 *
 * @param <T> number type
 */
public final class DecayingTransseries<T> {
    private final AnalyticArithmetic<T> ar;
    private final T lambda;
    private final List<T[]> c;
    private final int sectors;
    private final int terms;

    private DecayingTransseries(AnalyticArithmetic<T> ar, T lambda, int sectors, int terms) {
        this.ar = ar;
        this.lambda = lambda;
        this.sectors = sectors;
        this.terms = terms;
        this.c = coefficients();
    }

    /**
     * The transseries with sectors 1, 3, ..., {@code maxSector} and {@code terms} coefficients per sector.
     *
     * @throws InvalidInputException for maxSector outside [1, 99] or terms outside [4, 2000]
     */
    public static <T> DecayingTransseries<T> create(AnalyticArithmetic<T> ar, T lambda, int maxSector, int terms) {
        if (maxSector < 1 || maxSector > 99) {
            throw new InvalidInputException("maxSector", "must be in [1, 99], got " + maxSector);
        }
        if (terms < 4 || terms > 2000) {
            throw new InvalidInputException("terms", "must be in [4, 2000], got " + terms);
        }
        return new DecayingTransseries<>(ar, lambda, maxSector, terms);
    }

    public T lambda() {
        return lambda;
    }

    /** c_kj (sector k odd). */
    public T coefficient(int k, int j) {
        return c.get(k)[j];
    }

    private List<T[]> coefficients() {
        List<T[]> u = new ArrayList<>();
        List<T[]> p = new ArrayList<>();
        List<T[]> q = new ArrayList<>();
        for (int k = 0; k <= sectors; k++) {
            u.add(zeros());
            p.add(zeros());
            q.add(zeros());
        }
        p.get(0)[0] = ar.one();
        q.get(0)[0] = ar.one();
        T sqrtPi = ar.sqrt(ar.pi());
        u.get(1)[0] = ar.negate(sqrtPi);
        for (int j = 1; j < terms; j++) {
            T h = ar.subtract(ar.of(j), ar.ratio(1, 2));
            u.get(1)[j] = ar.divide(ar.negate(ar.multiply(ar.multiply(h, h), u.get(1)[j - 1])), ar.of(4.0 * j));
        }
        for (int k = 1; k <= sectors; k++) {
            // sector k of exp(2u) and exp(-2u), without the u_k term for odd k >= 3
            T[] pk = p.get(k);
            T[] qk = q.get(k);
            for (int kk = 1; kk <= k; kk++) {
                if (kk % 2 == 0 || (kk == k && k > 1)) {
                    continue;
                }
                T[] prodP = product(u.get(kk), p.get(k - kk));
                T[] prodQ = product(u.get(kk), q.get(k - kk));
                T f = ar.ratio(2L * kk, k);
                for (int j = 0; j < terms; j++) {
                    pk[j] = ar.add(pk[j], ar.multiply(f, prodP[j]));
                    qk[j] = ar.subtract(qk[j], ar.multiply(f, prodQ[j]));
                }
            }
            if (k % 2 == 1 && k >= 3) {
                solveSector(k, u.get(k), pk, qk);
                for (int j = 0; j < terms; j++) {
                    T two = ar.multiply(u.get(k)[j], ar.of(2));
                    pk[j] = ar.add(pk[j], two);
                    qk[j] = ar.subtract(qk[j], two);
                }
            }
        }
        return u;
    }

    private void solveSector(int k, T[] uk, T[] pk, T[] qk) {
        T lead = ar.of(4.0 * k * k - 4);
        for (int n = 0; n < terms; n++) {
            T r = ar.subtract(pk[n], qk[n]);
            if (n >= 1) {
                T m = ar.add(ar.ratio(k, 2), ar.of(n - 1));
                T f = ar.subtract(ar.multiply(ar.of(4.0 * k), m), ar.of(2.0 * k));
                r = ar.subtract(r, ar.multiply(f, uk[n - 1]));
            }
            if (n >= 2) {
                T m = ar.add(ar.ratio(k, 2), ar.of(n - 2));
                r = ar.subtract(r, ar.multiply(ar.multiply(m, m), uk[n - 2]));
            }
            uk[n] = ar.divide(r, lead);
        }
    }

    @SuppressWarnings("unchecked")
    private T[] zeros() {
        Object[] r = new Object[terms];
        Arrays.fill(r, ar.zero());
        return (T[]) r;
    }

    private T[] product(T[] x, T[] y) {
        T[] r = zeros();
        for (int i = 0; i < terms; i++) {
            if (ar.abs(x[i]) == 0) {
                continue;
            }
            for (int j = 0; i + j < terms; j++) {
                r[i + j] = ar.add(r[i + j], ar.multiply(x[i], y[j]));
            }
        }
        return r;
    }

    /**
     * w = e^u and w' at x (Re x &gt; 0), each sector truncated at its smallest term.
     *
     * @throws InvalidInputException if Re x &lt;= 0
     */
    public LocalValue<T> at(T x) {
        return value(x, false);
    }

    /**
     * The deviation from the background: v = w - 1 (computed as expm1(u), so its relative accuracy is kept)
     * and w', with error estimates; the start data of {@link org.tertius.connection.path.DeviationTaylor}.
     */
    public LocalValue<T> deviationAt(T x) {
        return value(x, true);
    }

    @SuppressWarnings("unchecked")
    private LocalValue<T> value(T x, boolean deviation) {
        Object[] r = series(x);
        T u = (T) r[0];
        T du = (T) r[1];
        double[] e = (double[]) r[2];
        T w = ar.exp(u);
        T dw = ar.multiply(du, w);
        double aw = ar.abs(w);
        double eps = ar.epsilon();
        T v = deviation ? expm1(u) : w;
        double ev = deviation ? aw * e[0] + eps * ar.abs(v) : aw * (e[0] + 2 * eps);
        return new LocalValue<>(x, v, dw, ev, aw * (e[1] + e[0] * ar.abs(du)) + eps * ar.abs(dw));
    }

    private Object[] series(T x) {
        if (!(ar.toComplex(x).getReal() > 0)) {
            throw new InvalidInputException("x", "the expansion at infinity needs Re x > 0, got " + ar.toComplex(x));
        }
        T s = ar.divide(ar.one(), x);
        T e = ar.multiply(lambda, ar.divide(ar.exp(ar.multiply(x, ar.of(-2))), ar.sqrt(x)));
        double as = ar.abs(s);
        double ae = ar.abs(e);
        T u = ar.zero();
        T du = ar.zero();
        double err = 0;
        double errD = 0;
        T ek = e;
        T e2 = ar.multiply(e, e);
        for (int k = 1; k <= sectors; k += 2) {
            T[] ck = c.get(k);
            T su = ar.zero();
            T sd = ar.zero();
            T sj = ar.one();
            double best = Double.POSITIVE_INFINITY;
            double bestD = 0;
            double sectorSize = 0;
            for (int j = 0; j < terms; j++) {
                double mag = ar.abs(ck[j]) * Math.pow(as, j);
                if (mag > best && j > 1) {
                    break;
                }
                T t = ar.multiply(ck[j], sj);
                T factor = ar.subtract(ar.of(-2.0 * k), ar.multiply(ar.add(ar.ratio(k, 2), ar.of(j)), s));
                su = ar.add(su, t);
                sd = ar.add(sd, ar.multiply(t, factor));
                best = mag;
                bestD = mag * ar.abs(factor);
                sectorSize = Math.max(sectorSize, mag);
                sj = ar.multiply(sj, s);
            }
            double ak = Math.pow(ae, k);
            err += ak * best;
            errD += ak * bestD;
            if (k + 2 > sectors) {
                // the first sector left out is about |E|^2 times smaller than this one
                err += ak * sectorSize * ae * ae;
                errD += ak * sectorSize * ae * ae * (2 * k + 4);
            }
            u = ar.add(u, ar.multiply(ek, su));
            du = ar.add(du, ar.multiply(ek, sd));
            ek = ar.multiply(ek, e2);
        }
        return new Object[] {u, du, new double[] {err, errD}};
    }

    /** exp(u) - 1 without cancellation for small u. */
    private T expm1(T u) {
        if (ar.abs(u) > 0.1) {
            return ar.subtract(ar.exp(u), ar.one());
        }
        T sum = u;
        T term = u;
        for (int n = 2; n < 400 && ar.abs(term) > ar.epsilon() * ar.abs(sum); n++) {
            term = ar.divide(ar.multiply(term, u), ar.of(n));
            sum = ar.add(sum, term);
        }
        return sum;
    }
}
