package org.tertius.connection.infinity;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;

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
 * Immutable and thread-safe.
 */
final class HarmonicTransseries {
    private static final double EPS = 0x1p-52;
    private final Complex mu;
    private final Complex kappa;
    private final Complex p;
    private final Complex q;
    private final int orders;
    private final int width;
    private final Complex[][] u;
    private double driftResidual;

    HarmonicTransseries(Complex[] a, int[] ca, Complex[] b, int[] db, Complex p, Complex q, int orders) {
        this.p = p;
        this.q = q;
        this.orders = orders;
        Complex mu2 = Complex.ZERO;
        Complex sumA = Complex.ZERO;
        for (int j = 0; j < a.length; j++) {
            mu2 = mu2.add(a[j].multiply(ca[j]));
            sumA = sumA.add(a[j]);
        }
        if (!(sumA.norm() <= 1e-12 * (1 + a[0].norm()))) {
            throw new IllegalArgumentException("u = 0 is not a background: sum A = " + sumA);
        }
        // +0.0 for a signed zero imaginary part: on the negative axis the root is +i sqrt|mu^2|
        this.mu = new Complex(mu2.getReal(), mu2.getImaginary() + 0.0).sqrt();
        int n = orders + 2;
        this.width = n + 2;
        this.u = new Complex[n + 1][2 * width + 1];
        Complex b1 = Complex.ZERO;
        for (int j = 0; j < b.length; j++) {
            b1 = b1.add(b[j].multiply(db[j]));
        }
        this.kappa = build(a, ca, b, db, b1, n);
    }

    Complex mu() {
        return mu;
    }

    Complex kappa() {
        return kappa;
    }

    Complex coefficient(int n, int k) {
        return Math.abs(k) > width ? Complex.ZERO : u[n][k + width];
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

    private Complex build(Complex[] a, int[] ca, Complex[] b, int[] db, Complex b1, int n) {
        List<Integer> cs = exponents(ca, db);
        State st = new State(cs, n, new Terms(a, ca, b, db, b1, cs), b1);
        st.uu[1].set(1, p);
        st.uu[1].set(-1, q);
        for (int i = 0; i < cs.size(); i++) {
            st.f[i][1] = st.uu[1].scaled(cs.get(i));
        }
        st.kappa = b1.divide(mu.multiply(2));
        for (int order = 2; order <= n; order++) {
            if (order >= 5 && order % 2 == 1) {
                // u_(order-2, +-1) from the k = +-1 conditions of this order; they enter R_order directly and through
                // u_(order-1) (a quadratic nonlinearity couples them), both linearly: the residual at zero and the
                // linear response give the 2 x 2 system
                Complex[] r0 = st.trial(order, Complex.ZERO, Complex.ZERO);
                Complex[] r1 = st.response(order, Complex.ONE, Complex.ZERO);
                Complex[] r2 = st.response(order, Complex.ZERO, Complex.ONE);
                Complex a11 = r1[0];
                Complex a21 = r1[1];
                Complex a12 = r2[0];
                Complex a22 = r2[1];
                Complex det = a11.multiply(a22).subtract(a12.multiply(a21));
                if (!(det.norm() > 0)) {
                    throw new InvalidInputException("amplitude", "the amplitudes p = " + p + ", q = " + q
                            + " hit a resonance of the transseries at order " + order);
                }
                Complex d1 = a12.multiply(r0[1]).subtract(a22.multiply(r0[0])).divide(det);
                Complex dm1 = a21.multiply(r0[0]).subtract(a11.multiply(r0[1])).divide(det);
                st.trial(order, d1, dm1);
                st.finish(order);
            } else {
                st.computeF(order);
                Laurent r = st.terms.rhs(st.f, st.uu, order);
                if (order == 3) {
                    st.kappa = drift(r, b1, st.kappa);
                }
                st.solveOthers(order, r);
                st.finish(order);
            }
        }
        for (int j = 0; j <= n; j++) {
            for (int k = -width; k <= width; k++) {
                u[j][k + width] = st.uu[j].get(k);
            }
        }
        return st.kappa;
    }

    /** The coefficients of u and of e^(c u) being built, order by order. */
    private final class State {
        final List<Integer> cs;
        final Laurent[][] f;
        final Laurent[] uu;
        final Terms terms;
        final Complex b1;
        Complex kappa;

        State(List<Integer> cs, int n, Terms terms, Complex b1) {
            this.cs = cs;
            this.terms = terms;
            this.b1 = b1;
            this.f = new Laurent[cs.size()][n + 1];
            this.uu = new Laurent[n + 1];
            for (int j = 0; j <= n; j++) {
                uu[j] = new Laurent(width);
            }
            for (int i = 0; i < cs.size(); i++) {
                f[i][0] = new Laurent(width);
                f[i][0].set(0, Complex.ONE);
            }
        }

        /** F^(c)_order from u_1 .. u_(order-1) (u_order taken as zero). */
        void computeF(int order) {
            for (int i = 0; i < cs.size(); i++) {
                f[i][order] = expOrder(f[i], uu, cs.get(i), order);
            }
        }

        /** u_(order,k) for k != +-1 from the right side r. */
        void solveOthers(int order, Laurent r) {
            for (int k = -order; k <= order; k += 2) {
                if (Math.abs(k) == 1) {
                    continue;
                }
                Complex value = r.get(k).subtract(linear(k, order, b1, kappa).multiply(uu[order - 2].get(k)));
                if (order >= 4) {
                    value = value.subtract(secondOrder(k, order, kappa).multiply(uu[order - 4].get(k)));
                }
                uu[order].set(k, value.divide(mu.multiply(mu).multiply(k * k - 1)));
            }
        }

        /** Adds the linear part c u_order to F^(c)_order. */
        void finish(int order) {
            for (int i = 0; i < cs.size(); i++) {
                f[i][order].addInPlace(uu[order], cs.get(i));
            }
        }

        /**
         * The change of the k = +-1 residuals of {@link #trial} when u_(order-2, +-1) change by (d1, dm1) (exactly
         * linear): delta F^(c)_(order-2) = c delta, delta u_(order-1) = (sum_j A_j delta F^(c_j)_(order-1))_k /
         * ((k^2-1) mu^2), delta F^(c)_(order-1) = c (delta F_1 + delta u_(order-1)), delta F^(c)_order = c (delta F_2 +
         * delta u_(order-1) F_1), from delta e^(cu) = c (delta u) e^(cu).
         */
        Complex[] response(int order, Complex d1, Complex dm1) {
            Laurent delta = new Laurent(width);
            delta.set(1, d1);
            delta.set(-1, dm1);
            Laurent dr1 = new Laurent(width);
            for (int j = 0; j < terms.a.length; j++) {
                int i = terms.ia[j];
                dr1.addInPlace(delta.times(f[i][1]).scaled(cs.get(i)), terms.a[j]);
            }
            Laurent du1 = new Laurent(width);
            for (int k = -(order - 1); k <= order - 1; k += 2) {
                du1.set(k, dr1.get(k).divide(mu.multiply(mu).multiply(k * k - 1)));
            }
            Laurent dr = new Laurent(width);
            for (int j = 0; j < terms.a.length; j++) {
                int i = terms.ia[j];
                Laurent df = delta.times(f[i][2]);
                df.addInPlace(du1.times(f[i][1]), 1);
                dr.addInPlace(df.scaled(cs.get(i)), terms.a[j]);
            }
            return new Complex[] {linear(1, order, b1, kappa).multiply(d1).subtract(dr.get(1)),
                linear(-1, order, b1, kappa).multiply(dm1).subtract(dr.get(-1))};
        }

        /**
         * With u_(order-2, 1) = d1 and u_(order-2, -1) = dm1: recomputes F_(order-2), the order order-1 and the right
         * side of this order, solves its k != +-1 parts, and returns the residuals of the k = +-1 conditions.
         */
        Complex[] trial(int order, Complex d1, Complex dm1) {
            int m2 = order - 2;
            uu[m2].set(1, d1);
            uu[m2].set(-1, dm1);
            for (int i = 0; i < cs.size(); i++) {
                f[i][m2] = expOrder(f[i], uu, cs.get(i), m2);
                f[i][m2].addInPlace(uu[m2], cs.get(i));
            }
            computeF(order - 1);
            Laurent r1 = terms.rhs(f, uu, order - 1);
            uu[order - 1] = new Laurent(width);
            solveOthers(order - 1, r1);
            finish(order - 1);
            uu[order] = new Laurent(width);
            computeF(order);
            Laurent r = terms.rhs(f, uu, order);
            solveOthers(order, r);
            Complex[] res = new Complex[2];
            int[] ks = {1, -1};
            for (int i = 0; i < 2; i++) {
                int k = ks[i];
                res[i] = linear(k, order, b1, kappa).multiply(uu[m2].get(k))
                        .add(secondOrder(k, order, kappa).multiply(uu[order - 4].get(k))).subtract(r.get(k));
            }
            return res;
        }
    }

    /** kappa from the order-3 conditions [k mu 2k kappa - b1] u_(1,k) = R_(3,k) (k = 1 if p != 0, else -1). */
    private Complex drift(Laurent r, Complex b1, Complex fallback) {
        Complex kp = p.norm() > 0 ? b1.add(r.get(1).divide(p)).divide(mu.multiply(2)) : null;
        Complex kq = q.norm() > 0 ? b1.add(r.get(-1).divide(q)).divide(mu.multiply(2)) : null;
        if (kp != null && kq != null) {
            driftResidual = kp.subtract(kq).norm() / (1 + kp.norm());
        }
        return kp != null ? kp : (kq != null ? kq : fallback);
    }

    /** k mu (2 k kappa - n + 3) - b1. */
    private Complex linear(int k, int n, Complex b1, Complex kap) {
        return mu.multiply(k).multiply(kap.multiply(2 * k).add(3 - n)).subtract(b1);
    }

    /** (k kappa - (n-4)/2)^2. */
    private static Complex secondOrder(int k, int n, Complex kap) {
        Complex s = kap.multiply(k).subtract((n - 4) / 2.0);
        return s.multiply(s);
    }

    /** The right side and the coupling G of the orders. */
    private final class Terms {
        final Complex[] a;
        final int[] ia;
        private final int[] ca;
        private final Complex[] b;
        private final int[] ib;
        private final Complex b1;

        Terms(Complex[] a, int[] ca, Complex[] b, int[] db, Complex b1, List<Integer> cs) {
            this.a = a;
            this.ca = ca;
            this.b = b;
            this.b1 = b1;
            this.ia = new int[a.length];
            this.ib = new int[b.length];
            for (int j = 0; j < a.length; j++) {
                ia[j] = cs.indexOf(ca[j]);
            }
            for (int j = 0; j < b.length; j++) {
                ib[j] = cs.indexOf(db[j]);
            }
        }

        Laurent rhs(Laurent[][] f, Laurent[] uu, int n) {
            Laurent r = new Laurent(width);
            for (int j = 0; j < a.length; j++) {
                r.addInPlace(f[ia[j]][n], a[j]);
            }
            for (int j = 0; j < b.length; j++) {
                r.addInPlace(f[ib[j]][n - 2], b[j]);
            }
            r.addInPlace(uu[n - 2], b1.negate());
            return r;
        }
    }

    /** n F_n = sum_(j=1)^(n-1) j c u_j F_(n-j) (u_n still zero). */
    private Laurent expOrder(Laurent[] f, Laurent[] uu, int cc, int n) {
        Laurent s = new Laurent(width);
        for (int j = 1; j < n; j++) {
            s.addInPlace(uu[j].times(f[n - j]), (double) j * cc / n);
        }
        return s;
    }

    /**
     * u and du/dy at y = exp(tauY) (tauY the log coordinate of y, used for y^kappa and y^(-1/2)), truncated at the
     * smallest pair of orders, with error estimates (the next pair, plus rounding). The value's z is y.
     */
    LocalValue<Complex> at(Complex tauY) {
        Complex y = tauY.exp();
        Complex e = mu.multiply(y).add(kappa.multiply(tauY)).exp();
        Complex einv = e.reciprocal();
        double ae = e.norm();
        Complex root = tauY.multiply(-0.5).exp();
        double ar = root.norm();
        double[] size = new double[orders + 1];
        double[] sizeD = new double[orders + 1];
        Complex[] term = new Complex[orders + 1];
        Complex[] dterm = new Complex[orders + 1];
        Complex pow = Complex.ONE;
        Complex yinv = y.reciprocal();
        for (int n = 1; n <= orders; n++) {
            pow = pow.multiply(root);
            Complex s = Complex.ZERO;
            Complex ds = Complex.ZERO;
            for (int k = -n; k <= n; k += 2) {
                Complex coef = u[n][k + width];
                if (coef.getReal() == 0 && coef.getImaginary() == 0) {
                    continue;
                }
                Complex ek = k >= 0 ? e.pow(k) : einv.pow(-k);
                Complex t = coef.multiply(ek);
                s = s.add(t);
                Complex factor = mu.multiply(k).add(kappa.multiply(k).subtract(n / 2.0).multiply(yinv));
                ds = ds.add(t.multiply(factor));
                size[n] += coef.norm() * Math.pow(ae, k);
                sizeD[n] += coef.norm() * Math.pow(ae, k) * factor.norm();
            }
            size[n] *= Math.pow(ar, n);
            sizeD[n] *= Math.pow(ar, n);
            term[n] = s.multiply(pow);
            dterm[n] = ds.multiply(pow);
        }
        int stop = orders - 2;
        double bestPair = Double.POSITIVE_INFINITY;
        for (int n = 2; n <= orders - 2; n++) {
            double pair = size[n + 1] + size[n + 2];
            if (pair < bestPair) {
                bestPair = pair;
                stop = n;
            }
        }
        Complex uu = Complex.ZERO;
        Complex du = Complex.ZERO;
        double abs = 0;
        double absD = 0;
        for (int n = 1; n <= stop; n++) {
            uu = uu.add(term[n]);
            du = du.add(dterm[n]);
            abs += size[n];
            absD += dterm[n].norm();
        }
        double errU = bestPair + 8 * EPS * abs * (stop + 1);
        double errDu = sizeD[stop + 1] + sizeD[stop + 2] + 8 * EPS * absD * (stop + 1);
        return new LocalValue<>(y, uu, du, errU, errDu);
    }
}
