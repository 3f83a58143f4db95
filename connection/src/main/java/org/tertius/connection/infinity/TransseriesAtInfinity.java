package org.tertius.connection.infinity;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.piii.Painleve3;

/**
 * The two-parameter transseries at infinity of the solutions of a D6 equation (gamma delta != 0, DLMF eq. 32.2.3)
 * about a background c (gamma c^4 + delta = 0), double precision. Derived here.
 *
 * <p>With w = c e^u the equation becomes
 * <pre>  u'' + u'/x = 2 m sinh 2u + (a e^u + b e^-u)/x,   m = gamma c^2, a = alpha c, b = beta/c</pre>
 * (divide by w: w''/w - w'^2/w^2 = u''; gamma w^2 + delta/w^2 = m (e^2u - e^-2u) because delta = -gamma c^4).
 * The ansatz, with mu = 2 sqrt(m) (principal root; +i sqrt|m| on the negative axis),
 * <pre>  u = sum_(n>=1) x^(-n/2) sum_(|k|&lt;=n, k = n mod 2) u_nk E^k,   E = e^(mu x) x^kappa,
 *   u_(1,1) = p,  u_(1,-1) = q,  kappa = (a - b)/(2 mu) + mu p q,</pre>
 * uses L[x^-s E^k] = x^-s E^k [k^2 mu^2 + k mu (2 k kappa - 2s + 1)/x + (k kappa - s)^2/x^2], L = d^2 + (1/x) d.
 * Collecting x^(-n/2) E^k, with 2m sinh 2u = mu^2 u + N1 and (a e^u + b e^-u)/x = ((a+b) + (a-b) u + N2)/x:
 * <pre>  (k^2-1) mu^2 u_nk + [k mu (2k kappa - n + 3) - (a-b)] u_(n-2)k + (k kappa - (n-4)/2)^2 u_(n-4)k
 *       = [N1]_nk + (a+b) [n = 2, k = 0] + [N2]_(n-2)k.</pre>
 * For k != +-1 this gives u_nk. For k = +-1 it is a condition: at n = 3 it is met by the choice of kappa (the phase
 * drift mu p q comes from [N1]_(3,+-1) = 8 m u_(1,+-1)^2 u_(1,-+1)); at odd n >= 5 it fixes u_(n-2,+-1), which enters
 * [N1]_n through 8 m (u_1)^2 u_(n-2): a 2 x 2 linear system. The coefficients of e^(cu) are built by the
 * recurrence {@code n F_n = sum_j j c u_j F_(n-j)} (harmonics multiplied as Laurent polynomials in E).
 *
 * <p>p = q = 0 is the algebraic expansion about c (in the form log(w/c); compare {@link AlgebraicExpansion}); one
 * amplitude zero is the one-parameter family exponentially close to c where the other exponential decays
 * (Re(mu x) &gt; 0 for q, &lt; 0 for p); both non-zero is the oscillating family on the rays where mu x is imaginary,
 * valid while |Re kappa| &lt; 1/2 (so that |E^k x^(-n/2)| decays with n). For PIII(0, 0, -1, 1) and p = (A/2) e^(i phi),
 * q = conj(p) it is {@link OscillatingExpansion}; for PIII(0, 0, 1, -1), p = 0, q = -lambda sqrt(pi) it is the
 * decaying family {@link DecayingTransseries}. The series in x^(-1/2) is asymptotic; it is truncated at its smallest
 * pair of orders and the error estimate is the next pair plus rounding. Immutable and thread-safe.
 */
public final class TransseriesAtInfinity {
    private static final double EPS = 0x1p-52;
    private final Complex c;
    private final Complex mu;
    private final Complex kappa;
    private final Complex p;
    private final Complex q;
    private final int orders;
    private final int width;
    /** u[n][k + width]. */
    private final Complex[][] u;
    private double driftResidual;

    private TransseriesAtInfinity(Painleve3 eq, Complex c, Complex p, Complex q, int orders) {
        this.c = c;
        this.p = p;
        this.q = q;
        this.orders = orders;
        Complex m0 = eq.gamma().multiply(c).multiply(c);
        // +0.0 for a signed zero imaginary part: on the negative axis the root is +i sqrt|m| for every background
        Complex m = new Complex(m0.getReal(), m0.getImaginary() + 0.0);
        this.mu = m.sqrt().multiply(2);
        Complex a = eq.alpha().multiply(c);
        Complex b = eq.beta().divide(c);
        this.kappa = a.subtract(b).divide(mu.multiply(2)).add(mu.multiply(p).multiply(q));
        int n = orders + 2;
        this.width = n + 2;
        this.u = new Complex[n + 1][2 * width + 1];
        build(m, a, b, n);
    }

    /**
     * The transseries about background c with amplitudes p (of E) and q (of 1/E), orders 1..orders in x^(-1/2).
     *
     * @throws InvalidInputException for an equation that is not D6, c not a background (1e-10 relative), non-finite
     *     amplitudes, orders outside [2, 80]
     */
    public static TransseriesAtInfinity create(Painleve3 eq, Complex c, Complex p, Complex q, int orders) {
        List<Complex> roots = AlgebraicExpansion.backgrounds(eq.gamma(), eq.delta());
        Complex res = eq.gamma().multiply(c.pow(4)).add(eq.delta());
        if (!(res.norm() <= 1e-10 * eq.delta().norm())) {
            throw new InvalidInputException("background", "must satisfy gamma c^4 + delta = 0, got c = " + c
                    + "; the backgrounds are " + roots);
        }
        Complex best = roots.get(0);
        for (Complex r : roots) {
            if (r.subtract(c).norm() < best.subtract(c).norm()) {
                best = r;
            }
        }
        if (!Double.isFinite(p.norm()) || !Double.isFinite(q.norm())) {
            throw new InvalidInputException("amplitude", "must be finite, got p = " + p + ", q = " + q);
        }
        if (orders < 2 || orders > 80) {
            throw new InvalidInputException("orders", "must be in [2, 80], got " + orders);
        }
        return new TransseriesAtInfinity(eq, best, p, q, orders);
    }

    public Complex background() {
        return c;
    }

    /** mu = 2 sqrt(gamma c^2): E = e^(mu x) x^kappa. */
    public Complex mu() {
        return mu;
    }

    /** The exponent kappa = (alpha c - beta/c)/(2 mu) + mu p q; its second part is the phase drift. */
    public Complex kappa() {
        return kappa;
    }

    public Complex amplitudeOfE() {
        return p;
    }

    public Complex amplitudeOfInverseE() {
        return q;
    }

    /** Coefficient u_nk. */
    public Complex coefficient(int n, int k) {
        return Math.abs(k) > width ? Complex.ZERO : u[n][k + width];
    }

    /** The residual of the order-3 condition met by the choice of kappa (a check of the derivation). */
    public double driftResidual() {
        return driftResidual;
    }

    private void build(Complex m, Complex a, Complex b, int n) {
        int[] cs = {2, -2, 1, -1};
        Laurent[][] f = new Laurent[4][n + 1];
        Laurent[] uu = new Laurent[n + 1];
        for (int j = 0; j <= n; j++) {
            uu[j] = new Laurent(width);
        }
        uu[1].set(1, p);
        uu[1].set(-1, q);
        for (int i = 0; i < 4; i++) {
            f[i][0] = new Laurent(width);
            f[i][0].set(0, Complex.ONE);
            f[i][1] = uu[1].scaled(cs[i]);
        }
        Complex amb = a.subtract(b);
        for (int order = 2; order <= n; order++) {
            for (int i = 0; i < 4; i++) {
                f[i][order] = expOrder(f[i], uu, cs[i], order);
            }
            Laurent r = rhs(f, uu, m, a, b, order);
            if (order == 3) {
                for (int k = -1; k <= 1; k += 2) {
                    Complex lhs = linear(k, order, amb).multiply(uu[1].get(k));
                    driftResidual = Math.max(driftResidual, lhs.subtract(r.get(k)).norm() / (1 + r.get(k).norm()));
                }
            }
            if (order >= 5 && order % 2 == 1) {
                Complex[] d = solveFirstHarmonic(r, uu, m, amb, order);
                uu[order - 2].set(1, d[0]);
                uu[order - 2].set(-1, d[1]);
                Laurent delta = new Laurent(width);
                delta.set(1, d[0]);
                delta.set(-1, d[1]);
                for (int i = 0; i < 4; i++) {
                    Laurent cd = delta.scaled(cs[i]);
                    f[i][order - 2].addInPlace(cd, 1);
                    f[i][order - 1].addInPlace(cd.times(f[i][1]), 1);
                    f[i][order].addInPlace(cd.times(f[i][2]), 1);
                }
                r = rhs(f, uu, m, a, b, order);
            }
            for (int k = -order; k <= order; k += 2) {
                if (Math.abs(k) == 1) {
                    continue;
                }
                Complex value = r.get(k).subtract(linear(k, order, amb).multiply(uu[order - 2].get(k)));
                if (order >= 4) {
                    value = value.subtract(secondOrder(k, order).multiply(uu[order - 4].get(k)));
                }
                uu[order].set(k, value.divide(mu.multiply(mu).multiply(k * k - 1)));
            }
            for (int i = 0; i < 4; i++) {
                f[i][order].addInPlace(uu[order], cs[i]);
            }
        }
        for (int j = 0; j <= n; j++) {
            for (int k = -width; k <= width; k++) {
                u[j][k + width] = uu[j].get(k);
            }
        }
    }

    /** k mu (2 k kappa - n + 3) - (a - b). */
    private Complex linear(int k, int n, Complex amb) {
        return mu.multiply(k).multiply(kappa.multiply(2 * k).add(3 - n)).subtract(amb);
    }

    /** (k kappa - (n-4)/2)^2. */
    private Complex secondOrder(int k, int n) {
        Complex s = kappa.multiply(k).subtract((n - 4) / 2.0);
        return s.multiply(s);
    }

    /** The order-n right side: m (F2 - F-2)_n + (a + b)[n = 2] + a (F1 - u)_(n-2) + b (F-1 + u)_(n-2). */
    private Laurent rhs(Laurent[][] f, Laurent[] uu, Complex m, Complex a, Complex b, int n) {
        Laurent r = new Laurent(width);
        r.addInPlace(f[0][n], m);
        r.addInPlace(f[1][n], m.negate());
        if (n == 2) {
            r.set(0, r.get(0).add(a.add(b)));
        }
        if (n - 2 >= 1) {
            r.addInPlace(f[2][n - 2], a);
            r.addInPlace(uu[n - 2], a.negate());
            r.addInPlace(f[3][n - 2], b);
            r.addInPlace(uu[n - 2], b);
        }
        return r;
    }

    /** The 2 x 2 system for u_(n-2, +-1) at order n (odd, >= 5). */
    private Complex[] solveFirstHarmonic(Laurent r, Laurent[] uu, Complex m, Complex amb, int n) {
        Complex rhs1 = r.get(1).subtract(secondOrder(1, n).multiply(uu[n - 4].get(1)));
        Complex rhsm1 = r.get(-1).subtract(secondOrder(-1, n).multiply(uu[n - 4].get(-1)));
        Complex eight = m.multiply(8);
        Complex pq2 = p.multiply(q).multiply(2);
        Complex a11 = linear(1, n, amb).subtract(eight.multiply(pq2));
        Complex a12 = eight.multiply(p.multiply(p)).negate();
        Complex a21 = eight.multiply(q.multiply(q)).negate();
        Complex a22 = linear(-1, n, amb).subtract(eight.multiply(pq2));
        Complex det = a11.multiply(a22).subtract(a12.multiply(a21));
        if (!(det.norm() > 0)) {
            throw new InvalidInputException("amplitude", "the amplitudes p = " + p + ", q = " + q + " hit a resonance of"
                    + " the transseries at order " + n);
        }
        Complex d1 = rhs1.multiply(a22).subtract(a12.multiply(rhsm1)).divide(det);
        Complex dm1 = a11.multiply(rhsm1).subtract(a21.multiply(rhs1)).divide(det);
        return new Complex[] {d1, dm1};
    }

    /** n F_n = sum_(j=1)^(n-1) j c u_j F_(n-j) (u_n still zero). */
    private Laurent expOrder(Laurent[] f, Laurent[] uu, int cc, int n) {
        Laurent s = new Laurent(width);
        for (int j = 1; j < n; j++) {
            s.addInPlace(uu[j].times(f[n - j]), (double) j * cc / n);
        }
        return s;
    }

    /** A Laurent polynomial in E with harmonics -width..width, stored as real and imaginary parts. */
    private static final class Laurent {
        final int width;
        final double[] re;
        final double[] im;
        int lo;
        int hi;

        Laurent(int width) {
            this.width = width;
            this.re = new double[2 * width + 1];
            this.im = new double[2 * width + 1];
            this.lo = 1;
            this.hi = -1;
        }

        Complex get(int k) {
            return Math.abs(k) > width ? Complex.ZERO : new Complex(re[k + width], im[k + width]);
        }

        void set(int k, Complex v) {
            re[k + width] = v.getReal();
            im[k + width] = v.getImaginary();
            widen(k);
        }

        private void widen(int k) {
            if (lo > hi) {
                lo = k;
                hi = k;
            } else {
                lo = Math.min(lo, k);
                hi = Math.max(hi, k);
            }
        }

        Laurent scaled(double s) {
            Laurent r = new Laurent(width);
            for (int k = lo; k <= hi; k++) {
                r.re[k + width] = s * re[k + width];
                r.im[k + width] = s * im[k + width];
            }
            r.lo = lo;
            r.hi = hi;
            return r;
        }

        void addInPlace(Laurent x, double s) {
            for (int k = x.lo; k <= x.hi; k++) {
                re[k + width] += s * x.re[k + width];
                im[k + width] += s * x.im[k + width];
            }
            if (x.lo <= x.hi) {
                widen(x.lo);
                widen(x.hi);
            }
        }

        void addInPlace(Laurent x, Complex s) {
            double sr = s.getReal();
            double si = s.getImaginary();
            for (int k = x.lo; k <= x.hi; k++) {
                double xr = x.re[k + width];
                double xi = x.im[k + width];
                re[k + width] += sr * xr - si * xi;
                im[k + width] += sr * xi + si * xr;
            }
            if (x.lo <= x.hi) {
                widen(x.lo);
                widen(x.hi);
            }
        }

        Laurent times(Laurent y) {
            Laurent r = new Laurent(width);
            for (int i = lo; i <= hi; i++) {
                double xr = re[i + width];
                double xi = im[i + width];
                if (xr == 0 && xi == 0) {
                    continue;
                }
                for (int j = y.lo; j <= y.hi; j++) {
                    int k = i + j;
                    if (Math.abs(k) > width) {
                        continue;
                    }
                    double yr = y.re[j + width];
                    double yi = y.im[j + width];
                    r.re[k + width] += xr * yr - xi * yi;
                    r.im[k + width] += xr * yi + xi * yr;
                }
            }
            if (lo <= hi && y.lo <= y.hi) {
                r.lo = Math.max(-width, lo + y.lo);
                r.hi = Math.min(width, hi + y.hi);
            }
            return r;
        }
    }

    /**
     * w and w' at x (log coordinate tau = log x on the wanted sheet, used for x^kappa and x^(-1/2)), optimally
     * truncated, with error estimates.
     */
    public LocalValue<Complex> at(Complex tau) {
        LocalValue<Complex> l = logAt(tau);
        Complex w = c.multiply(l.w().exp());
        Complex dw = w.multiply(l.dw());
        double aw = w.norm();
        return new LocalValue<>(l.z(), w, dw, aw * l.errW(), aw * (l.errDw() + l.dw().norm() * l.errW()));
    }

    /**
     * u = log(w/c) and u' at the log coordinate tau (the value's w() is u, dw() is u'), with error estimates: the
     * form that keeps the relative accuracy of an exponentially small deviation.
     */
    public LocalValue<Complex> logAt(Complex tau) {
        Complex x = tau.exp();
        Complex e = mu.multiply(x).add(kappa.multiply(tau)).exp();
        Complex einv = e.reciprocal();
        double ae = e.norm();
        Complex root = tau.multiply(-0.5).exp();
        double ar = root.norm();
        double[] size = new double[orders + 1];
        double[] sizeD = new double[orders + 1];
        Complex[] term = new Complex[orders + 1];
        Complex[] dterm = new Complex[orders + 1];
        Complex pow = Complex.ONE;
        Complex xinv = x.reciprocal();
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
                Complex factor = mu.multiply(k).add(kappa.multiply(k).subtract(n / 2.0).multiply(xinv));
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
        return new LocalValue<>(x, uu, du, errU, errDu);
    }
}
