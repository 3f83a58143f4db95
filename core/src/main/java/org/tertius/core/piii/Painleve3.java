package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

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

    private Painleve3(Complex alpha, Complex beta, Complex gamma, Complex delta) {
        this.alpha = check("alpha", alpha);
        this.beta = check("beta", beta);
        this.gamma = check("gamma", gamma);
        this.delta = check("delta", delta);
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
        return new Painleve3(beta.negate(), alpha.negate(), delta.negate(), gamma.negate());
    }

    /** The parameters of -w: (alpha, beta, gamma, delta) -> (-alpha, -beta, gamma, delta). */
    public Painleve3 negated() {
        return new Painleve3(alpha.negate(), beta.negate(), gamma, delta);
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
