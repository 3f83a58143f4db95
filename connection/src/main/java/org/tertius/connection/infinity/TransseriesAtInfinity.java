package org.tertius.connection.infinity;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Type;

/**
 * The two-parameter transseries at infinity of the solutions of a D6 equation (gamma delta != 0, DLMF eq. 32.2.3)
 * about a background c (gamma c^4 + delta = 0), and of a D7 equation with gamma = 0 (alpha delta != 0) about
 * c x^(1/3) (alpha c^3 + delta = 0), in double precision (arbitrary precision: {@link PreciseTransseries}). Derived
 * here; the recursion is {@link HarmonicTransseries}.
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
 * drift mu p q comes from [N1]_(3,+-1) = 8 m u_(1,+-1)^2 u_(1,-+1)); at odd n &gt;= 5 it fixes u_(n-2,+-1), which enters
 * [N1]_n through 8 m (u_1)^2 u_(n-2): a 2 x 2 linear system. The coefficients of e^(cu) are built by the
 * recurrence {@code n F_n = sum_j j c u_j F_(n-j)} (harmonics multiplied as Laurent polynomials in E).
 *
 * <p>p = q = 0 is the algebraic expansion about c (in the form log(w/c); compare {@link AlgebraicExpansion}); one
 * amplitude zero is the one-parameter family exponentially close to c where the other exponential decays
 * (Re(mu x) &gt; 0 for q, &lt; 0 for p); both non-zero is the oscillating family on the rays where mu x is imaginary,
 * valid while |Re kappa| &lt; 1/2 (so that |E^k x^(-n/2)| decays with n). For PIII(0, 0, -1, 1) and p = (A/2) e^(i phi),
 * q = conj(p) it is {@link OscillatingExpansion}; for PIII(0, 0, 1, -1), p = 0, q = -lambda sqrt(pi) it is the
 * decaying family {@link DecayingTransseries}. The series in x^(-1/2) is asymptotic; it is truncated at its smallest
 * pair of orders and the error estimate is the next pair plus rounding.
 *
 * <p><b>D7</b> (gamma = 0, derived here). With w = c x^(1/3) e^u (alpha c^3 = -delta) the terms of log(c x^(1/3)) cancel
 * in u'' + u'/x, and with s = x^(2/3) (so that u_xx + u_x/x = (4/9)(u_ss + u_s/s)/s)
 * <pre>  u_ss + u_s/s = A (e^u - e^(-2u)) + (B/s) e^-u,   A = (9/4) alpha c,  B = (9/4) beta/c,</pre>
 * the same structure in the variable s with mu^2 = 3A: E = e^(mu s) s^kappa, amplitudes p, q of s^(-1/2) E^(+-1).
 * D7 with delta = 0 (beta gamma != 0) is the image under w -> 1/w of this case: pass the reciprocal solution.
 * Immutable and thread-safe.
 */
public final class TransseriesAtInfinity {
    private final boolean d7;
    private final Complex c;
    private final Complex p;
    private final Complex q;
    private final HarmonicTransseries<Complex> core;

    private TransseriesAtInfinity(Painleve3 eq, Complex c, Complex p, Complex q, int orders) {
        this.d7 = eq.type() == Painleve3Type.D7;
        this.c = c;
        this.p = p;
        this.q = q;
        if (d7) {
            Complex a = eq.alpha().multiply(c).multiply(2.25);
            this.core = new HarmonicTransseries<>(ComplexArithmetic.INSTANCE, List.of(a, a.negate()), new int[] {1, -2},
                    List.of(eq.beta().divide(c).multiply(2.25)), new int[] {-1}, p, q, orders);
        } else {
            Complex m = eq.gamma().multiply(c).multiply(c);
            this.core = new HarmonicTransseries<>(ComplexArithmetic.INSTANCE, List.of(m, m.negate()), new int[] {2, -2},
                    List.of(eq.alpha().multiply(c), eq.beta().divide(c)), new int[] {1, -1}, p, q, orders);
        }
    }

    /**
     * The backgrounds: c with gamma c^4 + delta = 0 (D6, c_k = c_0 i^k) or alpha c^3 + delta = 0 (D7 with gamma = 0,
     * c_k = c_0 e^(2 pi i k/3)), c_0 the principal root.
     *
     * @throws InvalidInputException for other types (D7 with delta = 0: use the reciprocal solution)
     */
    public static List<Complex> backgrounds(Painleve3 eq) {
        Painleve3Type type = eq.type();
        if (type == Painleve3Type.D6) {
            return AlgebraicExpansion.backgrounds(eq.gamma(), eq.delta());
        }
        if (type == Painleve3Type.D7 && eq.gamma().norm() == 0 && eq.alpha().norm() > 0) {
            Complex c0 = eq.delta().negate().divide(eq.alpha()).pow(1.0 / 3);
            List<Complex> r = new ArrayList<>();
            for (int k = 0; k < 3; k++) {
                r.add(c0.multiply(new Complex(0, 2 * Math.PI * k / 3).exp()));
            }
            return r;
        }
        throw new InvalidInputException("equation", "the transseries at infinity is implemented for D6 (gamma delta"
                + " != 0) and for D7 with gamma = 0 (alpha delta != 0), got " + eq + " (" + type + ")"
                + (type == Painleve3Type.D7 ? "; for delta = 0 pass the reciprocal solution 1/w, a D7 solution with"
                + " gamma = 0" : ""));
    }

    /**
     * The transseries about background c with amplitudes p (of E) and q (of 1/E), orders 1..orders in x^(-1/2)
     * (in s^(-1/2), s = x^(2/3), for D7).
     *
     * @throws InvalidInputException for an equation of another type, c not a background (1e-10 relative), non-finite
     *     amplitudes, orders outside [2, 80]
     */
    public static TransseriesAtInfinity create(Painleve3 eq, Complex c, Complex p, Complex q, int orders) {
        List<Complex> roots = backgrounds(eq);
        Complex best = roots.get(0);
        for (Complex r : roots) {
            if (r.subtract(c).norm() < best.subtract(c).norm()) {
                best = r;
            }
        }
        if (!(best.subtract(c).norm() <= 1e-10 * best.norm())) {
            throw new InvalidInputException("background", "must be one of " + roots + " (" + (eq.type()
                    == Painleve3Type.D7 ? "alpha c^3 + delta = 0" : "gamma c^4 + delta = 0") + "), got c = " + c);
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

    /** True for D7 (variable s = x^(2/3), background c x^(1/3)). */
    public boolean isD7() {
        return d7;
    }

    /** mu: E = e^(mu x) x^kappa (D6, mu = 2 sqrt(gamma c^2)) or e^(mu s) s^kappa (D7, mu = sqrt(27 alpha c/4)). */
    public Complex mu() {
        return core.mu();
    }

    /**
     * The exponent kappa; for D6 kappa = (alpha c - beta/c)/(2 mu) + mu p q, the second part being the phase drift
     * (for D7 it also carries the quadratic part of the nonlinearity: computed from the order-3 condition).
     */
    public Complex kappa() {
        return core.kappa();
    }

    public Complex amplitudeOfE() {
        return p;
    }

    public Complex amplitudeOfInverseE() {
        return q;
    }

    /** Coefficient u_nk. */
    public Complex coefficient(int n, int k) {
        return core.coefficient(n, k);
    }

    /** The difference of kappa from the two order-3 conditions (both amplitudes non-zero; a check). */
    public double driftResidual() {
        return core.driftResidual();
    }

    /** arg(mu x) (D6) or arg(mu s) (D7) along the ray with log-coordinate phase (arg x + 2 pi sheet). */
    public double direction(double phase) {
        return mu().getArgument() + (d7 ? 2.0 / 3 : 1) * phase;
    }

    /** The factor of the phase in {@link #direction}: 1 (D6) or 2/3 (D7). */
    public double phaseFactor() {
        return d7 ? 2.0 / 3 : 1;
    }

    /**
     * w and w' at x (log coordinate tau = log x on the wanted sheet), optimally truncated, with error estimates.
     */
    public LocalValue<Complex> at(Complex tau) {
        LocalValue<Complex> l = logAt(tau);
        Complex w = reference(tau).multiply(l.w().exp());
        Complex dw = w.multiply(l.dw().add(referenceSlope(tau)));
        double aw = w.norm();
        return new LocalValue<>(l.z(), w, dw, aw * l.errW(), aw * (l.errDw() + l.dw().add(referenceSlope(tau)).norm()
                * l.errW()));
    }

    /** The background value c (D6) or c x^(1/3) (D7) at tau. */
    private Complex reference(Complex tau) {
        return d7 ? c.multiply(tau.divide(3).exp()) : c;
    }

    /** d log(reference)/dx: 0 (D6) or 1/(3x) (D7). */
    private Complex referenceSlope(Complex tau) {
        return d7 ? tau.negate().exp().divide(3) : Complex.ZERO;
    }

    /**
     * u = log(w/reference) and du/dx at the log coordinate tau (the value's w() is u, dw() is du/dx; z() is x), with
     * error estimates: the form that keeps the relative accuracy of an exponentially small deviation.
     */
    public LocalValue<Complex> logAt(Complex tau) {
        if (!d7) {
            return core.at(tau);
        }
        LocalValue<Complex> l = core.at(tau.multiply(2.0 / 3));
        // du/dx = du/ds ds/dx, ds/dx = (2/3) x^(-1/3)
        Complex ds = tau.divide(-3).exp().multiply(2.0 / 3);
        return new LocalValue<>(tau.exp(), l.w(), l.dw().multiply(ds), l.errW(), l.errDw() * ds.norm());
    }

    /** {u, du/dx} of computed values (w, w') at tau: u = log(w/reference) (principal log), du/dx = w'/w - slope. */
    public Complex[] logOf(Complex tau, Complex w, Complex dw) {
        return new Complex[] {w.divide(reference(tau)).log(), dw.divide(w).subtract(referenceSlope(tau))};
    }
}
