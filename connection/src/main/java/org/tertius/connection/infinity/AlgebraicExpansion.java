package org.tertius.connection.infinity;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;

/**
 * The algebraic expansion at +infinity about a constant background for PIII with gamma delta != 0
 * (DLMF eq. 32.2.3, {@code w'' = w'^2/w - w'/x + (alpha w^2 + beta)/x + gamma w^3 + delta/w}):
 * <pre>  w ~ c + sum_{k &gt;= 1} a_k x^-k,   gamma c^4 + delta = 0 (four backgrounds c).</pre>
 *
 * <p><b>Recurrence</b> (derived here). The equation times w is
 * {@code F = w w'' - w'^2 + w w'/x - (alpha w^3 + beta w)/x - gamma w^4 - delta = 0}. In the variable t = 1/x,
 * with W_0 = c, W_k = a_k, the coefficient of t^j of each term involves W_j only through
 * {@code gamma w^4}, whose t^j coefficient is {@code 4 c^3 W_j + (terms in W_1..W_{j-1})}: w w'' and w w'/x
 * reach W_{j-2}, w'^2 reaches W_{j-3} and (alpha w^3 + beta w)/x reaches W_{j-1}. Hence
 * <pre>  a_j = R_j / (4 gamma c^3),   R_j = [t^j] F evaluated with a_j = 0,</pre>
 * computed with the Cauchy products of w, w^2, w^3, w^4 kept incrementally (O(K^2) for K coefficients). The
 * first one is {@code a_1 = -(alpha c^2 + beta) / (4 gamma c^2)}. The tests check the coefficients by
 * substitution (residual of the truncated series in the equation).
 *
 * <p><b>Which solution this is</b> (derived here). Linearising about c, {@code v = w - c} obeys
 * {@code v'' ~ mu^2 v}, {@code mu^2 = 4 gamma c^2}, so the solutions near the background differ from the
 * expansion by terms of size {@code e^(+-mu x)} times powers of x, and the coefficients a_k grow like
 * {@code (k-1)! / mu^k}. The series is divergent; truncated at its smallest term (optimal truncation) its error
 * is of order {@code e^(-|mu| x)}, which is what {@link #at} reports. The algebraic expansion alone therefore
 * fixes a particular solution only up to exponentially small terms: where Re mu != 0 every solution
 * {@code c + (expansion) + A e^(-mu' x) x^rho (1 + ...)} (Re mu' &gt; 0) has the same expansion, a one-parameter
 * family; the start data of {@link #at} pick the member with "A = 0", which is defined only up to the
 * truncation ambiguity {@code O(e^(-|mu| x))} (on a Stokes line, mu real, the two lateral sums differ by such a
 * term). Different start abscissae therefore give solutions that agree to the error estimates where the
 * expansion is valid and may differ, exponentially amplified, elsewhere. Immutable and thread-safe.
 */
public final class AlgebraicExpansion {
    private static final double EPS = 0x1p-52;
    private final Complex alpha;
    private final Complex beta;
    private final Complex gamma;
    private final Complex delta;
    private final Complex c;
    private final Complex[] a;

    private AlgebraicExpansion(Complex alpha, Complex beta, Complex gamma, Complex delta, Complex c, int terms) {
        this.alpha = alpha;
        this.beta = beta;
        this.gamma = gamma;
        this.delta = delta;
        this.c = c;
        this.a = coefficients(terms);
    }

    /** The four backgrounds: c with gamma c^4 + delta = 0, c_k = c_0 i^k, c_0 the principal fourth root. */
    public static List<Complex> backgrounds(Complex gamma, Complex delta) {
        requireGeneric(gamma, delta);
        Complex c0 = delta.negate().divide(gamma).pow(0.25);
        List<Complex> r = new ArrayList<>();
        Complex rot = Complex.ONE;
        for (int k = 0; k < 4; k++) {
            r.add(c0.multiply(rot));
            rot = rot.multiply(Complex.I);
        }
        return r;
    }

    /**
     * The expansion about background {@code c} with {@code terms} coefficients a_1..a_terms.
     *
     * @throws InvalidInputException if gamma delta = 0 or gamma c^4 + delta is not 0 (to 1e-10 relative)
     */
    public static AlgebraicExpansion create(Complex alpha, Complex beta, Complex gamma, Complex delta, Complex c,
                                            int terms) {
        requireGeneric(gamma, delta);
        Complex res = gamma.multiply(c.pow(4)).add(delta);
        if (!(res.norm() <= 1e-10 * delta.norm())) {
            throw new InvalidInputException("background", "must satisfy gamma c^4 + delta = 0, got c = " + c
                    + " (gamma c^4 + delta = " + res + "); the backgrounds are " + backgrounds(gamma, delta));
        }
        // polish the root by one Newton step so that the background is exact to rounding
        Complex cc = c.subtract(res.divide(gamma.multiply(c.pow(3)).multiply(4)));
        return new AlgebraicExpansion(alpha, beta, gamma, delta, cc, Math.max(2, terms));
    }

    private static void requireGeneric(Complex gamma, Complex delta) {
        if (gamma.norm() == 0 || delta.norm() == 0 || gamma.isNaN() || delta.isNaN()) {
            throw new InvalidInputException("family", "the algebraic expansion at infinity about a constant"
                    + " background needs gamma delta != 0, got gamma = " + gamma + ", delta = " + delta
                    + " (for gamma delta = 0 the solutions grow or decay like powers of x instead)");
        }
    }

    private Complex[] coefficients(int k) {
        Complex[] w = new Complex[k + 1];
        Complex[] p2 = new Complex[k + 1];
        Complex[] p3 = new Complex[k + 1];
        Complex[] p4 = new Complex[k + 1];
        w[0] = c;
        p2[0] = c.multiply(c);
        p3[0] = p2[0].multiply(c);
        p4[0] = p3[0].multiply(c);
        Complex denom = gamma.multiply(p3[0]).multiply(4);
        for (int j = 1; j <= k; j++) {
            w[j] = Complex.ZERO;
            p2[j] = conv(w, w, j);
            p3[j] = conv(p2, w, j);
            p4[j] = conv(p3, w, j);
            Complex r = Complex.ZERO;
            // w w'': (w'')_m = (m-2)(m-1) W_{m-2}
            for (int m = 2; m <= j; m++) {
                r = r.add(w[j - m].multiply(w[m - 2]).multiply((double) (m - 2) * (m - 1)));
            }
            // - w'^2: (w')_m = -(m-1) W_{m-1}
            for (int m = 2; m <= j - 2; m++) {
                r = r.subtract(w[m - 1].multiply(w[j - m - 1]).multiply((double) (m - 1) * (j - m - 1)));
            }
            // + w w'/x: coefficient of t^j is sum_i W_i (w')_{j-1-i}
            for (int m = 2; m <= j - 1; m++) {
                r = r.subtract(w[j - 1 - m].multiply(w[m - 1]).multiply(m - 1));
            }
            r = r.subtract(alpha.multiply(p3[j - 1])).subtract(beta.multiply(w[j - 1]));
            r = r.subtract(gamma.multiply(p4[j]));
            w[j] = r.divide(denom);
            p2[j] = p2[j].add(w[j].multiply(c).multiply(2));
            p3[j] = p3[j].add(w[j].multiply(p2[0]).multiply(3));
            p4[j] = p4[j].add(w[j].multiply(p3[0]).multiply(4));
        }
        return w;
    }

    private static Complex conv(Complex[] x, Complex[] y, int j) {
        Complex s = Complex.ZERO;
        for (int i = 0; i <= j; i++) {
            s = s.add(x[i].multiply(y[j - i]));
        }
        return s;
    }

    /** The background c. */
    public Complex background() {
        return c;
    }

    /** The exponent of the exponentially small corrections, mu = 2 sqrt(gamma) c (mu^2 = 4 gamma c^2). */
    public Complex mu() {
        return gamma.sqrt().multiply(c).multiply(2);
    }

    /** Coefficient a_k (a_0 = c). */
    public Complex coefficient(int k) {
        return a[k];
    }

    /** Number of coefficients a_1..a_K computed. */
    public int terms() {
        return a.length - 1;
    }

    /**
     * w and w' at x (Re x &gt; 0), each series truncated before its smallest term (the smallest of consecutive
     * pairs, so that isolated zero coefficients do not stop the sum early). Error estimate: that smallest term
     * plus a rounding bound eps sum (4k + 4)|term_k| (the recurrence's relative error grows about linearly in k).
     */
    public LocalValue<Complex> at(Complex x) {
        Complex t = x.reciprocal();
        int n = a.length;
        Complex[] tw = new Complex[n];
        Complex[] td = new Complex[n];
        Complex p = Complex.ONE;
        for (int k = 0; k < n; k++) {
            tw[k] = a[k].multiply(p);
            td[k] = a[k].multiply(p).multiply(t).multiply(-k);
            p = p.multiply(t);
        }
        double[] w = truncate(tw, 0);
        double[] d = truncate(td, 1);
        Complex sw = sum(tw, (int) w[0]);
        Complex sd = sum(td, (int) d[0]);
        return new LocalValue<>(x, sw, sd, w[1], d[1]);
    }

    /** {index N of the first omitted term, error estimate}. */
    private static double[] truncate(Complex[] terms, int first) {
        int n = terms.length;
        int best = n - 1;
        double bestSize = terms[n - 1].norm();
        for (int k = Math.max(1, first); k < n - 1; k++) {
            double s = Math.max(terms[k].norm(), terms[k + 1].norm());
            if (s < bestSize) {
                best = k;
                bestSize = s;
            }
        }
        double round = 0;
        for (int k = 0; k < best; k++) {
            round += (4.0 * k + 4) * terms[k].norm();
        }
        return new double[] {best, bestSize + EPS * round};
    }

    private static Complex sum(Complex[] terms, int n) {
        Complex s = Complex.ZERO;
        for (int k = n - 1; k >= 0; k--) {
            s = s.add(terms[k]);
        }
        return s;
    }

    /** The residual of the equation (DLMF 32.2.3 form, not multiplied by w) for the truncated series at x. */
    public Complex residual(Complex x, int n) {
        Complex w = Complex.ZERO;
        Complex d1 = Complex.ZERO;
        Complex d2 = Complex.ZERO;
        Complex t = x.reciprocal();
        for (int k = 0; k <= n; k++) {
            Complex tk = t.pow(k);
            w = w.add(a[k].multiply(tk));
            d1 = d1.subtract(a[k].multiply(tk).multiply(t).multiply(k));
            d2 = d2.add(a[k].multiply(tk).multiply(t).multiply(t).multiply((double) k * (k + 1)));
        }
        Complex rhs = d1.multiply(d1).divide(w).subtract(d1.divide(x))
                .add(alpha.multiply(w).multiply(w).add(beta).divide(x))
                .add(gamma.multiply(w.pow(3))).add(delta.divide(w));
        return d2.subtract(rhs);
    }

    /**
     * Start data at the smallest x among {@code 4, 4.5, 5, ..., 400} where the error estimate of w and w' is
     * below {@code tolerance} relative to 1 + |value|.
     *
     * @throws InvalidInputException if no such x is found (the terms do not become that small)
     */
    public LocalValue<Complex> startData(double tolerance) {
        for (double x = 4; x <= 400; x += 0.5) {
            LocalValue<Complex> v = at(new Complex(x));
            if (v.errW() <= tolerance * (1 + v.w().norm()) && v.errDw() <= tolerance * (1 + v.dw().norm())) {
                return v;
            }
        }
        throw new InvalidInputException("x0", "the algebraic expansion about c = " + c + " does not reach the"
                + " relative error " + tolerance + " for x <= 400 (|mu| = " + mu().norm() + " too small)");
    }
}
