package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ExactNumber;

/**
 * The third Painleve equation
 * <pre>  w'' = w'^2/w - w'/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w </pre>
 * (NIST DLMF eq. 32.2.3) with complex parameters. Immutable. The symmetries are available as functions
 * on parameters here and on solutions in {@link Painleve3Solution}.
 */
public final class Painleve3 {
    private final Complex alpha;
    private final Complex beta;
    private final Complex gamma;
    private final Complex delta;
    /** The parameters as given exactly (decimals, rationals), or null when given as doubles. */
    private final ExactNumber[] exact;

    private Painleve3(Complex alpha, Complex beta, Complex gamma, Complex delta) {
        this(alpha, beta, gamma, delta, null);
    }

    private Painleve3(Complex alpha, Complex beta, Complex gamma, Complex delta, ExactNumber[] exact) {
        this.alpha = check("alpha", alpha);
        this.beta = check("beta", beta);
        this.gamma = check("gamma", gamma);
        this.delta = check("delta", delta);
        this.exact = exact;
    }

    /**
     * The equation with parameters given exactly; the double-precision engine uses their nearest doubles, the
     * high-precision replay the exact values.
     */
    public static Painleve3 of(ExactNumber alpha, ExactNumber beta, ExactNumber gamma, ExactNumber delta) {
        ExactNumber[] e = {alpha, beta, gamma, delta};
        String[] names = {"alpha", "beta", "gamma", "delta"};
        for (int i = 0; i < 4; i++) {
            if (e[i] == null) {
                throw new InvalidInputException(names[i], "is required");
            }
        }
        return new Painleve3(alpha.toComplex(), beta.toComplex(), gamma.toComplex(), delta.toComplex(), e);
    }

    /**
     * The equation with parameters given as exact texts: decimals ({@code -0.5}, {@code 2.5e-3}), rationals
     * ({@code 1/3}) or complex numbers of them ({@code 1/2+1/3i}); see {@link ExactNumber#parse}.
     */
    public static Painleve3 exact(String alpha, String beta, String gamma, String delta) {
        return of(ExactNumber.parse("alpha", alpha), ExactNumber.parse("beta", beta), ExactNumber.parse("gamma", gamma),
                ExactNumber.parse("delta", delta));
    }

    /**
     * The parameters (alpha, beta, gamma, delta) as exact numbers: as given, or the binary values of the doubles
     * (then vouched for to {@link ExactNumber#DOUBLE_DIGITS} digits only).
     */
    public ExactNumber[] exactParameters() {
        if (exact != null) {
            return exact.clone();
        }
        return new ExactNumber[] {ExactNumber.ofDouble("alpha", alpha), ExactNumber.ofDouble("beta", beta),
            ExactNumber.ofDouble("gamma", gamma), ExactNumber.ofDouble("delta", delta)};
    }

    public static Painleve3 of(Complex alpha, Complex beta, Complex gamma, Complex delta) {
        return new Painleve3(alpha, beta, gamma, delta);
    }

    public static Painleve3 of(double alpha, double beta, double gamma, double delta) {
        return new Painleve3(new Complex(alpha), new Complex(beta), new Complex(gamma), new Complex(delta));
    }

    private static Complex check(String name, Complex c) {
        if (c == null || !Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
            throw new InvalidInputException(name, "must be a finite complex number, got " + c);
        }
        return c;
    }

    public Complex alpha() {
        return alpha;
    }

    public Complex beta() {
        return beta;
    }

    public Complex gamma() {
        return gamma;
    }

    public Complex delta() {
        return delta;
    }

    /** The type of the equation (D6, D7, D8, or degenerate). */
    public Painleve3Type type() {
        boolean g = !isZero(gamma);
        boolean d = !isZero(delta);
        boolean a = !isZero(alpha);
        boolean b = !isZero(beta);
        if (g && d) {
            return Painleve3Type.D6;
        }
        if ((!g && !a) || (!d && !b)) {
            return Painleve3Type.QUADRATURE;
        }
        if (g != d) {
            return Painleve3Type.D7;
        }
        return Painleve3Type.D8;
    }

    static boolean isZero(Complex c) {
        return c.getReal() == 0 && c.getImaginary() == 0;
    }

    /**
     * The parameters of 1/w: if w solves this equation, 1/w solves the one with
     * (alpha, beta, gamma, delta) -> (-beta, -alpha, -delta, -gamma).
     */
    public Painleve3 reciprocal() {
        return new Painleve3(beta.negate(), alpha.negate(), delta.negate(), gamma.negate(),
                exact == null ? null : new ExactNumber[] {exact[1].negate(), exact[0].negate(), exact[3].negate(),
                    exact[2].negate()});
    }

    /** The parameters of -w: (alpha, beta, gamma, delta) -> (-alpha, -beta, gamma, delta). */
    public Painleve3 negated() {
        return new Painleve3(alpha.negate(), beta.negate(), gamma, delta,
                exact == null ? null : new ExactNumber[] {exact[0].negate(), exact[1].negate(), exact[2], exact[3]});
    }

    /**
     * The parameters of W(z) = w(lambda z): (lambda alpha, lambda beta, lambda^2 gamma, lambda^2 delta)
     * (direct substitution in the equation).
     */
    public Painleve3 scaledArgument(Complex lambda) {
        requireNonZero("lambda", lambda);
        Complex l2 = lambda.multiply(lambda);
        return new Painleve3(alpha.multiply(lambda), beta.multiply(lambda), gamma.multiply(l2), delta.multiply(l2));
    }

    /**
     * The parameters of W(z) = mu w(z): (alpha/mu, mu beta, gamma/mu^2, mu^2 delta) (direct substitution).
     */
    public Painleve3 scaledValue(Complex mu) {
        requireNonZero("mu", mu);
        Complex m2 = mu.multiply(mu);
        return new Painleve3(alpha.divide(mu), beta.multiply(mu), gamma.divide(m2), delta.multiply(m2));
    }

    private static void requireNonZero(String name, Complex c) {
        check(name, c);
        if (isZero(c)) {
            throw new InvalidInputException(name, "must be non-zero");
        }
    }

    /**
     * The residual of the equation, multiplied by w z to keep it finite at zeros of w:
     * {@code z w w'' - z w'^2 + w w' - alpha w^3 - beta w - gamma z w^4 - delta z}.
     */
    public Complex residual(Complex z, Complex w, Complex dw, Complex d2w) {
        return z.multiply(w).multiply(d2w).subtract(z.multiply(dw).multiply(dw)).add(w.multiply(dw))
                .subtract(alpha.multiply(w.pow(3))).subtract(beta.multiply(w))
                .subtract(gamma.multiply(z).multiply(w.pow(4))).subtract(delta.multiply(z));
    }

    /** w'' from the equation (w != 0). */
    public Complex secondDerivative(Complex z, Complex w, Complex dw) {
        return dw.multiply(dw).divide(w).subtract(dw.divide(z)).add(alpha.multiply(w).multiply(w).add(beta).divide(z))
                .add(gamma.multiply(w.pow(3))).add(delta.divide(w));
    }

    @Override
    public String toString() {
        return "PIII(alpha=" + fmt(alpha) + ", beta=" + fmt(beta) + ", gamma=" + fmt(gamma) + ", delta=" + fmt(delta)
                + ")";
    }

    static String fmt(Complex c) {
        if (c.getImaginary() == 0) {
            return strip(c.getReal());
        }
        return strip(c.getReal()) + (c.getImaginary() < 0 ? "-" : "+") + strip(Math.abs(c.getImaginary())) + "i";
    }

    private static String strip(double x) {
        if (x == Math.rint(x) && Math.abs(x) < 1e15) {
            return Long.toString((long) x);
        }
        return Double.toString(x);
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof Painleve3)) {
            return false;
        }
        Painleve3 p = (Painleve3) o;
        return same(alpha, p.alpha) && same(beta, p.beta) && same(gamma, p.gamma) && same(delta, p.delta);
    }

    /** Numerical equality (0.0 and -0.0 are the same parameter). */
    private static boolean same(Complex a, Complex b) {
        return a.getReal() == b.getReal() && a.getImaginary() == b.getImaginary();
    }

    @Override
    public int hashCode() {
        double[] v = {alpha.getReal(), alpha.getImaginary(), beta.getReal(), beta.getImaginary(), gamma.getReal(),
            gamma.getImaginary(), delta.getReal(), delta.getImaginary()};
        int h = 1;
        for (double x : v) {
            h = 31 * h + Double.hashCode(x + 0.0);
        }
        return h;
    }
}
