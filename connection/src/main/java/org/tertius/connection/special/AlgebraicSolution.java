package org.tertius.connection.special;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.piii.Painleve3Type;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Algebraic solutions of Painleve III of type D7. For gamma = 0, alpha delta != 0 and beta = 0,
 * <pre>  w = A z^(1/3),   alpha A^3 + delta = 0 </pre>
 * solves the equation (substitution: w'' = w'^2/w - w'/z holds for every power, and alpha A^2 z^(-1/3)
 * + delta/(A z^(1/3)) = 0 fixes A; checked symbolically for this project); the three cube roots give three
 * solutions, on the Riemann surface of z^(1/3). The transformation T7(c) of NIST DLMF 32.7.16-17 (beta -> beta +
 * 2c, c^2 = -delta) carries them to beta = 2 k c, k = 1, 2, ...: algebraic solutions exist for
 * beta^2 / (-4 delta) = k^2 with k a non-negative integer (the D7 hierarchy; compare Ohyama, Kawamuko, Sakai and
 * Okamoto, J. Math. Sci. Univ. Tokyo 13 (2006) 145, recalled from memory). For delta = 0, beta gamma != 0 the
 * solutions are the reciprocals of those of (-beta, -alpha, 0, -gamma) (DLMF 32.7.9), so the condition reads
 * alpha^2 / (4 gamma) = k^2. Immutable.
 */
public final class AlgebraicSolution extends ClosedFormSolution {
    private final ExactParameters parameters;
    /** The gamma = 0 equation whose solution is built (the reciprocal one when delta = 0). */
    private final ExactParameters base;
    private final boolean reciprocal;
    private final int root;
    private final int steps;
    private final int signC;
    private final BacklundChain chain;

    private AlgebraicSolution(ExactParameters parameters, ExactParameters base, boolean reciprocal, int root,
                              int steps, int signC) {
        this.parameters = parameters;
        this.base = base;
        this.reciprocal = reciprocal;
        this.root = root;
        this.steps = steps;
        this.signC = signC;
        List<BacklundTransformation> list = new ArrayList<>();
        for (int k = 0; k < steps; k++) {
            list.add(BacklundTransformation.gammaZero(signC));
        }
        this.chain = BacklundChain.of(list);
    }

    /** The three algebraic solutions (cube roots j = 0, 1, 2) if the condition holds; empty otherwise. */
    public static List<AlgebraicSolution> all(ExactParameters p) {
        List<AlgebraicSolution> out = new ArrayList<>();
        if (whyNot(p) != null) {
            return out;
        }
        boolean rec = !p.gamma().isZero();
        ExactParameters b = rec ? ExactParameters.of(p.beta().negate(), p.alpha().negate(), GaussianRational.ZERO,
                p.gamma().negate()) : p;
        long k = steps(b);
        int sign = 1;
        if (k > 0) {
            // the sign of c = +-sqrt(-delta) with beta / c = 2k > 0
            sign = b.beta().toComplex().divide(b.delta().negate().toComplex().sqrt()).getReal() > 0 ? 1 : -1;
        }
        for (int j = 0; j < 3; j++) {
            out.add(new AlgebraicSolution(p, b, rec, j, (int) k, sign));
        }
        return out;
    }

    /** k with beta^2 / (-4 delta) = k^2, or -1 (base with gamma = 0). */
    private static long steps(ExactParameters b) {
        GaussianRational k2 = b.beta().multiply(b.beta()).multiply(b.delta().multiply(GaussianRational.of(-4, 0))
                .reciprocal());
        if (!Conversions.isInteger(k2) || k2.re().signum() < 0) {
            return -1;
        }
        BigInteger n = k2.re().getNumerator();
        BigInteger r = n.sqrt();
        return r.multiply(r).equals(n) && r.bitLength() < 20 ? r.longValue() : -1;
    }

    /** The condition that fails, in words; null if algebraic solutions of this kind exist. */
    static String whyNot(ExactParameters p) {
        if (p.type() != Painleve3Type.D7) {
            return "the z^(1/3) hierarchy belongs to type D7 (gamma = 0, alpha delta != 0, or delta = 0, beta gamma"
                    + " != 0), got " + p.type().describe();
        }
        if (p.gamma().isZero()) {
            return steps(p) >= 0 ? null : "beta^2 / (-4 delta) = " + p.beta().multiply(p.beta()).multiply(
                    p.delta().multiply(GaussianRational.of(-4, 0)).reciprocal()) + " is not the square of an integer"
                    + " k < 2^19 (beta = 2k sqrt(-delta) needed)";
        }
        ExactParameters b = ExactParameters.of(p.beta().negate(), p.alpha().negate(), GaussianRational.ZERO,
                p.gamma().negate());
        return steps(b) >= 0 ? null : "alpha^2 / (4 gamma) = " + p.alpha().multiply(p.alpha()).multiply(
                p.gamma().multiply(GaussianRational.of(4, 0)).reciprocal()) + " is not the square of an integer"
                + " k < 2^19 (alpha = 2k sqrt(gamma) needed, delta = 0)";
    }

    /**
     * The solution with cube root j (0, 1, 2).
     *
     * @throws InvalidInputException if there is none (the message says which condition fails) or j is out of range
     */
    public static AlgebraicSolution of(ExactParameters p, int j) {
        String why = whyNot(p);
        if (why != null) {
            throw new InvalidInputException("family", "no algebraic solution: " + why);
        }
        if (j < 0 || j > 2) {
            throw new InvalidInputException("root", "the cube root index must be 0, 1 or 2, got " + j);
        }
        return all(p).get(j);
    }

    @Override
    public ParameterSet parameters() {
        return ParameterSet.of(parameters);
    }

    @Override
    public String kind() {
        return "algebraic";
    }

    @Override
    public String description() {
        String text = "algebraic solution of PIII(" + parameters + "): " + (reciprocal ? "1/" : "") + "W with W = A z^(1/3)"
                + ", A = omega^" + root + " (-delta/alpha)^(1/3) (principal cube root, omega = exp(2 pi i/3)) for "
                + "PIII(" + base.alpha() + ", 0, 0, " + base.delta() + ")";
        if (steps > 0) {
            text += ", then " + steps + " step" + (steps > 1 ? "s" : "") + " of " + chain.steps().get(0).description();
        }
        return text;
    }

    @Override
    <T> Estimate<T> compute(AnalyticArithmetic<T> ar, T z, int sheet) {
        Tracked.Ops<T> ops = new Tracked.Ops<>(ar);
        T twoPi = ar.multiply(ar.of(2, 0), ar.pi());
        T tau = ar.add(ar.log(z), ar.multiply(ar.of(0, sheet), twoPi));
        // -delta/alpha exactly, so that its principal logarithm is the same in every arithmetic (no signed zeros)
        T ratio = Conversions.of(ar, base.delta().negate().multiply(base.alpha().reciprocal()));
        T third = ar.ratio(1, 3);
        T a = ar.exp(ar.multiply(third, ar.log(ratio)));
        if (root > 0) {
            a = ar.multiply(a, ar.exp(ar.multiply(ar.of(0, root), ar.multiply(third, twoPi))));
        }
        T w = ar.multiply(a, ar.exp(ar.multiply(third, tau)));
        T dw = ar.divide(ar.multiply(third, w), z);
        double rel = (16 + ar.abs(tau)) * ar.epsilon();
        Tracked<T> seed = new Tracked<>(w, dw, Math.log(rel) + ar.logAbs(w), Math.log(rel) + ar.logAbs(dw));
        ParameterSet start = ParameterSet.of(ExactParameters.of(base.alpha(), GaussianRational.ZERO,
                GaussianRational.ZERO, base.delta()));
        Tracked<T> r = steps == 0 ? seed : chain.map(ops, start, z, seed);
        if (reciprocal) {
            r = BacklundTransformation.reciprocal().map(ops, chain.apply(start), z, r);
        }
        return new Estimate<>(r.value, r.derivative, r.logErrValue, r.logErrDerivative);
    }
}
