package org.tertius.connection.special;

import java.util.Optional;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.piii.Painleve3;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Parameters of Painleve III as they come out of Backlund transformations: gamma and delta exact, and
 * <pre>  alpha = alphaBase + 2 j sqrt(gamma),   beta = betaBase + 2 k sqrt(-delta)   (principal roots, j, k integers), </pre>
 * which the transformations of NIST DLMF §32.7(iii) keep in this form (they add +-2 sqrt(gamma) to alpha and
 * +-2 sqrt(-delta) to beta; w -> -w and w -> 1/w permute the four parameters). Exact whenever j = k = 0 or the
 * roots are Gaussian rationals; otherwise evaluated in any arithmetic from the exact parts. Immutable.
 */
public final class ParameterSet {
    private final GaussianRational alphaBase;
    private final GaussianRational betaBase;
    private final GaussianRational gamma;
    private final GaussianRational delta;
    private final int alphaRoots;
    private final int betaRoots;

    private ParameterSet(GaussianRational alphaBase, int alphaRoots, GaussianRational betaBase, int betaRoots,
                         GaussianRational gamma, GaussianRational delta) {
        GaussianRational rootGamma = alphaRoots == 0 ? null : ExactParameters.sqrt(gamma);
        GaussianRational rootDelta = betaRoots == 0 ? null : ExactParameters.sqrt(delta.negate());
        if (rootGamma != null) {
            alphaBase = alphaBase.add(rootGamma.multiply(GaussianRational.of(2L * alphaRoots, 0)));
            alphaRoots = 0;
        }
        if (rootDelta != null) {
            betaBase = betaBase.add(rootDelta.multiply(GaussianRational.of(2L * betaRoots, 0)));
            betaRoots = 0;
        }
        this.alphaBase = alphaBase;
        this.betaBase = betaBase;
        this.gamma = gamma;
        this.delta = delta;
        this.alphaRoots = alphaRoots;
        this.betaRoots = betaRoots;
    }

    public static ParameterSet of(ExactParameters p) {
        return new ParameterSet(p.alpha(), 0, p.beta(), 0, p.gamma(), p.delta());
    }

    /** The parameters exactly, if they are Gaussian rationals. */
    public Optional<ExactParameters> exact() {
        if (alphaRoots != 0 || betaRoots != 0) {
            return Optional.empty();
        }
        return Optional.of(ExactParameters.of(alphaBase, betaBase, gamma, delta));
    }

    public GaussianRational gamma() {
        return gamma;
    }

    public GaussianRational delta() {
        return delta;
    }

    <T> T alpha(AnalyticArithmetic<T> ar) {
        T base = Conversions.of(ar, alphaBase);
        if (alphaRoots == 0) {
            return base;
        }
        return ar.add(base, ar.multiply(ar.of(2.0 * alphaRoots, 0), ar.sqrt(Conversions.of(ar, gamma))));
    }

    <T> T beta(AnalyticArithmetic<T> ar) {
        T base = Conversions.of(ar, betaBase);
        if (betaRoots == 0) {
            return base;
        }
        return ar.add(base, ar.multiply(ar.of(2.0 * betaRoots, 0), ar.sqrt(Conversions.of(ar, delta.negate()))));
    }

    <T> T gamma(AnalyticArithmetic<T> ar) {
        return Conversions.of(ar, gamma);
    }

    <T> T delta(AnalyticArithmetic<T> ar) {
        return Conversions.of(ar, delta);
    }

    /**
     * -delta converted from the exact value (negating a converted delta would give -0 imaginary parts in double,
     * which moves the principal square root of a negative number to the other side of the cut).
     */
    <T> T minusDelta(AnalyticArithmetic<T> ar) {
        return Conversions.of(ar, delta.negate());
    }

    /** The equation with the parameters rounded to double. */
    public Painleve3 equation() {
        Complex a = alphaRoots == 0 ? alphaBase.toComplex()
                : alphaBase.toComplex().add(gamma.toComplex().sqrt().multiply(2.0 * alphaRoots));
        Complex b = betaRoots == 0 ? betaBase.toComplex()
                : betaBase.toComplex().add(delta.negate().toComplex().sqrt().multiply(2.0 * betaRoots));
        return Painleve3.of(a, b, gamma.toComplex(), delta.toComplex());
    }

    /** alpha + 2 s sqrt(gamma), beta + 2 t sqrt(-delta) (s, t integers; the Backlund shifts). */
    ParameterSet shifted(int s, int t) {
        return new ParameterSet(alphaBase, alphaRoots + s, betaBase, betaRoots + t, gamma, delta);
    }

    /** The parameters of -w: (-alpha, -beta, gamma, delta) (DLMF 32.7.6). */
    ParameterSet negated() {
        return new ParameterSet(alphaBase.negate(), -alphaRoots, betaBase.negate(), -betaRoots, gamma, delta);
    }

    /**
     * The parameters of 1/w: (-beta, -alpha, -delta, -gamma) (DLMF 32.7.7); sqrt(new gamma) = sqrt(-delta) and
     * sqrt(-new delta) = sqrt(gamma), so the root multiples swap with their parts.
     */
    ParameterSet reciprocal() {
        return new ParameterSet(betaBase.negate(), -betaRoots, alphaBase.negate(), -alphaRoots, delta.negate(),
                gamma.negate());
    }

    /** Readable parameters, exact where possible, e.g. {@code alpha = 3 + 2*2*sqrt(2), beta = 1, gamma = 2, ...}. */
    public String text() {
        return "alpha = " + part(alphaBase, alphaRoots, "sqrt(gamma)") + ", beta = "
                + part(betaBase, betaRoots, "sqrt(-delta)") + ", gamma = " + gamma + ", delta = " + delta;
    }

    private static String part(GaussianRational base, int roots, String root) {
        if (roots == 0) {
            return base.toString();
        }
        String multiple = (roots < 0 ? "- " : "+ ") + (2 * Math.abs(roots)) + "*" + root;
        return base.isZero() ? (roots < 0 ? "-" : "") + (2 * Math.abs(roots)) + "*" + root : base + " " + multiple;
    }

    @Override
    public String toString() {
        return text();
    }
}
