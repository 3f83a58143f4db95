package org.tertius.connection.infinity;

import java.util.ArrayList;
import java.util.List;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The two-parameter transseries at y = infinity of {@code u'' + u'/y = sum_j A_j e^(c_j u) + (1/y) sum_j B_j e^(d_j u)}
 * with {@code sum_j A_j = 0} (u = 0 is the background), derived here:
 * <pre>  u = sum_(n>=1) y^(-n/2) sum_(|k|&lt;=n, k = n mod 2) u_nk E^k,  E = e^(mu y) y^kappa,  u_(1,1) = p, u_(1,-1) = q,
 *   mu^2 = sum A_j c_j,  b0 = sum B_j,  b1 = sum B_j d_j.</pre>
 * With L[y^-s E^k] = y^-s E^k [k^2 mu^2 + k mu (2k kappa - 2s + 1)/y + (k kappa - s)^2/y^2] (L = d^2 + (1/y) d) the
 * order y^(-n/2) E^k reads
 * <pre>  (k^2-1) mu^2 u_nk + [k mu (2k kappa - n + 3) - b1] u_(n-2)k + (k kappa - (n-4)/2)^2 u_(n-4)k = R_nk,
 *   R_n = sum_j A_j [e^(c_j u)]_n (without its linear part) + sum_j B_j [e^(d_j u)]_(n-2) - b1 u_(n-2),</pre>
 * solved for k != +-1; the k = +-1 equations are conditions: at n = 3 they fix kappa (R_3 depends on orders 1 and 2
 * only, which do not involve kappa; both conditions agree, their difference is {@link #driftResidual()}); at odd
 * n &gt;= 5 they fix u_(n-2,+-1), which enters R_n linearly, directly and (when the nonlinearity has a quadratic part)
 * through u_(n-1): the 2 x 2 system is the linear response of the two conditions (see State#response).
 * The coefficients of e^(cu) follow from {@code n F_n = sum_j j c u_j F_(n-j)}. With A = (m, -m) at c = (2, -2) and
 * B = (alpha c, beta/c) at d = (1, -1) this is D6 ({@link TransseriesAtInfinity}); with A = (A7, -A7) at (1, -2) and
 * B at -1 it is D7 in the variable y = x^(2/3). mu is the principal root of mu^2 (+i sqrt|mu^2| on the negative axis).
 *
 * <p>Written once over the arithmetic family: double precision for the fits, arbitrary precision for
 * {@link PreciseTransseries}. Immutable and thread-safe.
 *
 * @param <T> the number type
 */
final class HarmonicTransseries<T> {
    private final AnalyticArithmetic<T> ar;
    private final T mu;
    private final T kappa;
    private final T p;
    private final T q;
    private final int orders;
    private final int width;
    private final List<List<T>> u;
    private double driftResidual;

    HarmonicTransseries(AnalyticArithmetic<T> ar, List<T> a, int[] ca, List<T> b, int[] db, T p, T q, int orders) {
        this.ar = ar;
        this.p = p;
        this.q = q;
        this.orders = orders;
        T mu2 = ar.zero();
        T sumA = ar.zero();
        for (int j = 0; j < a.size(); j++) {
            mu2 = ar.add(mu2, ar.multiply(a.get(j), ar.of(ca[j])));
            sumA = ar.add(sumA, a.get(j));
        }
        if (!(ar.abs(sumA) <= 1e-12 * (1 + ar.abs(a.get(0))))) {
            throw new IllegalArgumentException("u = 0 is not a background: sum A = " + ar.toComplex(sumA));
        }
        // adding zero turns a signed zero imaginary part (double) into +0: on the negative axis the root is
        // +i sqrt|mu^2|
        this.mu = ar.sqrt(ar.add(mu2, ar.zero()));
        int n = orders + 2;
        this.width = n + 2;
        this.u = new ArrayList<>();
        T b1 = ar.zero();
        for (int j = 0; j < b.size(); j++) {
            b1 = ar.add(b1, ar.multiply(b.get(j), ar.of(db[j])));
        }
        this.kappa = build(a, ca, b, db, b1, n);
    }

    T mu() {
        return mu;
    }

    T kappa() {
        return kappa;
    }

    int orders() {
        return orders;
    }

    T coefficient(int n, int k) {
        return Math.abs(k) > width ? ar.zero() : u.get(n).get(k + width);
    }

    double driftResidual() {
        return driftResidual;
    }

    /** Exponents used (distinct), and for each term its index among them. */
    private static List<Integer> exponents(int[] ca, int[] db) {
        List<Integer> e = new ArrayList<>();
        for (int c : ca) {
            if (!e.contains(c)) {
                e.add(c);
            }
        }
        for (int d : db) {
            if (!e.contains(d)) {
                e.add(d);
            }
        }
        return e;
    }

    private T build(List<T> a, int[] ca, List<T> b, int[] db, T b1, int n) {
        List<Integer> cs = exponents(ca, db);
        State st = new State(cs, n, new Terms(a, ca, b, db, b1, cs), b1);
        st.uu.get(1).set(1, p);
        st.uu.get(1).set(-1, q);
        for (int i = 0; i < cs.size(); i++) {
            st.f.get(i).set(1, st.uu.get(1).scaled(cs.get(i)));
        }
        st.kappa = ar.divide(b1, ar.multiply(mu, ar.of(2)));
        for (int order = 2; order <= n; order++) {
            if (order >= 5 && order % 2 == 1) {
                // u_(order-2, +-1) from the k = +-1 conditions of this order; they enter R_order directly and through
                // u_(order-1) (a quadratic nonlinearity couples them), both linearly: the residual at zero and the
                // linear response give the 2 x 2 system
                List<T> r0 = st.trial(order, ar.zero(), ar.zero());
                List<T> r1 = st.response(order, ar.one(), ar.zero());
                List<T> r2 = st.response(order, ar.zero(), ar.one());
                T a11 = r1.get(0);
                T a21 = r1.get(1);
                T a12 = r2.get(0);
                T a22 = r2.get(1);
                T det = ar.subtract(ar.multiply(a11, a22), ar.multiply(a12, a21));
                if (!(ar.abs(det) > 0)) {
                    throw new InvalidInputException("amplitude", "the amplitudes p = " + ar.toComplex(p) + ", q = "
                            + ar.toComplex(q) + " hit a resonance of the transseries at order " + order);
                }
                T d1 = ar.divide(ar.subtract(ar.multiply(a12, r0.get(1)), ar.multiply(a22, r0.get(0))), det);
                T dm1 = ar.divide(ar.subtract(ar.multiply(a21, r0.get(0)), ar.multiply(a11, r0.get(1))), det);
                st.trial(order, d1, dm1);
                st.finish(order);
            } else {
                st.computeF(order);
                Laurent<T> r = st.terms.rhs(st.f, st.uu, order);
                if (order == 3) {
                    st.kappa = drift(r, b1, st.kappa);
                }
                st.solveOthers(order, r);
                st.finish(order);
            }
        }
        for (int j = 0; j <= n; j++) {
            List<T> row = new ArrayList<>();
            for (int k = -width; k <= width; k++) {
                row.add(st.uu.get(j).get(k));
            }
            u.add(row);
        }
        return st.kappa;
    }

    /** The coefficients of u and of e^(c u) being built, order by order. */
    private final class State {
        final List<Integer> cs;
        final List<List<Laurent<T>>> f;
        final List<Laurent<T>> uu;
        final Terms terms;
        final T b1;
        T kappa;

        State(List<Integer> cs, int n, Terms terms, T b1) {
            this.cs = cs;
            this.terms = terms;
            this.b1 = b1;
            this.f = new ArrayList<>();
            this.uu = new ArrayList<>();
            for (int j = 0; j <= n; j++) {
                uu.add(Laurent.of(ar, width));
            }
            for (int i = 0; i < cs.size(); i++) {
                List<Laurent<T>> fi = new ArrayList<>();
                for (int j = 0; j <= n; j++) {
                    fi.add(null);
                }
                Laurent<T> one = Laurent.of(ar, width);
                one.set(0, ar.one());
                fi.set(0, one);
                f.add(fi);
            }
        }

        /** F^(c)_order from u_1 .. u_(order-1) (u_order taken as zero). */
        void computeF(int order) {
            for (int i = 0; i < cs.size(); i++) {
                f.get(i).set(order, expOrder(f.get(i), uu, cs.get(i), order));
            }
        }

        /** u_(order,k) for k != +-1 from the right side r. */
        void solveOthers(int order, Laurent<T> r) {
            T mu2 = ar.multiply(mu, mu);
            for (int k = -order; k <= order; k += 2) {
                if (Math.abs(k) == 1) {
                    continue;
                }
                T value = ar.subtract(r.get(k), ar.multiply(linear(k, order, b1, kappa), uu.get(order - 2).get(k)));
                if (order >= 4) {
                    value = ar.subtract(value, ar.multiply(secondOrder(k, order, kappa), uu.get(order - 4).get(k)));
                }
                uu.get(order).set(k, ar.divide(value, ar.multiply(mu2, ar.of(k * k - 1))));
            }
        }

        /** Adds the linear part c u_order to F^(c)_order. */
        void finish(int order) {
            for (int i = 0; i < cs.size(); i++) {
                f.get(i).get(order).addInPlace(uu.get(order), cs.get(i));
            }
        }

        /**
         * The change of the k = +-1 residuals of {@link #trial} when u_(order-2, +-1) change by (d1, dm1) (exactly
         * linear): delta F^(c)_(order-2) = c delta, delta u_(order-1) = (sum_j A_j delta F^(c_j)_(order-1))_k /
         * ((k^2-1) mu^2), delta F^(c)_(order-1) = c (delta F_1 + delta u_(order-1)), delta F^(c)_order = c (delta F_2 +
         * delta u_(order-1) F_1), from delta e^(cu) = c (delta u) e^(cu).
         */
        List<T> response(int order, T d1, T dm1) {
            Laurent<T> delta = Laurent.of(ar, width);
            delta.set(1, d1);
            delta.set(-1, dm1);
            Laurent<T> dr1 = Laurent.of(ar, width);
            for (int j = 0; j < terms.a.size(); j++) {
                int i = terms.ia[j];
                dr1.addInPlace(delta.times(f.get(i).get(1)).scaled(cs.get(i)), terms.a.get(j));
            }
            Laurent<T> du1 = Laurent.of(ar, width);
            T mu2 = ar.multiply(mu, mu);
            for (int k = -(order - 1); k <= order - 1; k += 2) {
                du1.set(k, ar.divide(dr1.get(k), ar.multiply(mu2, ar.of(k * k - 1))));
            }
            Laurent<T> dr = Laurent.of(ar, width);
            for (int j = 0; j < terms.a.size(); j++) {
                int i = terms.ia[j];
                Laurent<T> df = delta.times(f.get(i).get(2));
                df.addInPlace(du1.times(f.get(i).get(1)), 1);
                dr.addInPlace(df.scaled(cs.get(i)), terms.a.get(j));
            }
            return List.of(ar.subtract(ar.multiply(linear(1, order, b1, kappa), d1), dr.get(1)),
                    ar.subtract(ar.multiply(linear(-1, order, b1, kappa), dm1), dr.get(-1)));
        }

        /**
         * With u_(order-2, 1) = d1 and u_(order-2, -1) = dm1: recomputes F_(order-2), the order order-1 and the right
         * side of this order, solves its k != +-1 parts, and returns the residuals of the k = +-1 conditions.
         */
        List<T> trial(int order, T d1, T dm1) {
            int m2 = order - 2;
            uu.get(m2).set(1, d1);
            uu.get(m2).set(-1, dm1);
            for (int i = 0; i < cs.size(); i++) {
                Laurent<T> fm = expOrder(f.get(i), uu, cs.get(i), m2);
                fm.addInPlace(uu.get(m2), cs.get(i));
                f.get(i).set(m2, fm);
            }
            computeF(order - 1);
            Laurent<T> r1 = terms.rhs(f, uu, order - 1);
            uu.set(order - 1, Laurent.of(ar, width));
            solveOthers(order - 1, r1);
            finish(order - 1);
            uu.set(order, Laurent.of(ar, width));
            computeF(order);
            Laurent<T> r = terms.rhs(f, uu, order);
            solveOthers(order, r);
            List<T> res = new ArrayList<>();
            for (int k : new int[] {1, -1}) {
                res.add(ar.subtract(ar.add(ar.multiply(linear(k, order, b1, kappa), uu.get(m2).get(k)),
                        ar.multiply(secondOrder(k, order, kappa), uu.get(order - 4).get(k))), r.get(k)));
            }
            return res;
        }
    }

    /** kappa from the order-3 conditions [k mu 2k kappa - b1] u_(1,k) = R_(3,k) (k = 1 if p != 0, else -1). */
    private T drift(Laurent<T> r, T b1, T fallback) {
        T twoMu = ar.multiply(mu, ar.of(2));
        T kp = ar.abs(p) > 0 ? ar.divide(ar.add(b1, ar.divide(r.get(1), p)), twoMu) : null;
        T kq = ar.abs(q) > 0 ? ar.divide(ar.add(b1, ar.divide(r.get(-1), q)), twoMu) : null;
        if (kp != null && kq != null) {
            driftResidual = ar.abs(ar.subtract(kp, kq)) / (1 + ar.abs(kp));
        }
        return kp != null ? kp : (kq != null ? kq : fallback);
    }

    /** k mu (2 k kappa - n + 3) - b1. */
    private T linear(int k, int n, T b1, T kap) {
        return ar.subtract(ar.multiply(ar.multiply(mu, ar.of(k)), ar.add(ar.multiply(kap, ar.of(2 * k)),
                ar.of(3 - n))), b1);
    }

    /** (k kappa - (n-4)/2)^2. */
    private T secondOrder(int k, int n, T kap) {
        T s = ar.subtract(ar.multiply(kap, ar.of(k)), ar.ratio(n - 4, 2));
        return ar.multiply(s, s);
    }

    /** The right side and the coupling G of the orders. */
    private final class Terms {
        final List<T> a;
        final int[] ia;
        private final List<T> b;
        private final int[] ib;
        private final T minusB1;

        Terms(List<T> a, int[] ca, List<T> b, int[] db, T b1, List<Integer> cs) {
            this.a = a;
            this.b = b;
            this.minusB1 = ar.negate(b1);
            this.ia = new int[a.size()];
            this.ib = new int[b.size()];
            for (int j = 0; j < a.size(); j++) {
                ia[j] = cs.indexOf(ca[j]);
            }
            for (int j = 0; j < b.size(); j++) {
                ib[j] = cs.indexOf(db[j]);
            }
        }

        Laurent<T> rhs(List<List<Laurent<T>>> f, List<Laurent<T>> uu, int n) {
            Laurent<T> r = Laurent.of(ar, width);
            for (int j = 0; j < a.size(); j++) {
                r.addInPlace(f.get(ia[j]).get(n), a.get(j));
            }
            for (int j = 0; j < b.size(); j++) {
                r.addInPlace(f.get(ib[j]).get(n - 2), b.get(j));
            }
            r.addInPlace(uu.get(n - 2), minusB1);
            return r;
        }
    }

    /** n F_n = sum_(j=1)^(n-1) j c u_j F_(n-j) (u_n still zero). */
    private Laurent<T> expOrder(List<Laurent<T>> f, List<Laurent<T>> uu, int cc, int n) {
        Laurent<T> s = Laurent.of(ar, width);
        for (int j = 1; j < n; j++) {
            s.addInPlace(uu.get(j).times(f.get(n - j)), ar.ratio((long) j * cc, n));
        }
        return s;
    }

    /**
     * u and du/dy at y = exp(tauY) (tauY the log coordinate of y, used for y^kappa and y^(-1/2)), truncated at the
     * smallest pair of orders, with error estimates (the next pair, plus rounding). The value's z is y.
     */
    LocalValue<T> at(T tauY) {
        return at(tauY, orders, 1);
    }

    /**
     * As {@link #at(Object)} with the orders limited to {@code use} (at most the orders built; the truncation is
     * sought among orders 2..use-2) and the rounding estimate multiplied by {@code rounding} (the amplification of
     * rounding by the recursion, where it was measured). Summed by {@link TransseriesSum}.
     */
    LocalValue<T> at(T tauY, int use, double rounding) {
        return TransseriesSum.at(this, tauY, use, rounding);
    }

    AnalyticArithmetic<T> arithmetic() {
        return ar;
    }
}
