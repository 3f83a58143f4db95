package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.piii.Painleve3Type;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * A Bessel-type (Riccati) solution of Painleve III (type D6), NIST DLMF §32.10(iv). If
 * <pre>  z w' = a z w^2 + b w + c z,   a^2 = gamma, c^2 = -delta, </pre>
 * then w solves PIII with alpha = a (b + 1), beta = c (1 - b) (substitution; checked symbolically for this
 * project), i.e. alpha/a + beta/c = 2. With w = -u'/(a u) the Riccati equation becomes
 * u'' - (b/z) u' + a c u = 0, solved by u = A U1 + B U2 ({@link RiccatiSeries}, nu = (1 + b)/2 = alpha/(2a)):
 * Bessel functions of order nu in the variable sqrt(a c) z (DLMF 10.2). The parameters with
 * alpha/a + beta/c = 4n + 2 are reached from the seed with alpha/a + beta/c = 2 by n steps of the Backlund
 * transformation T(a, c) ({@link BacklundTransformation}, DLMF 32.7.11-14), so their Bessel-type solutions are
 * those images; DLMF 32.10(iv) states that for gamma = 1, delta = -1 such solutions exist exactly when
 * alpha + epsilon beta = 4n + 2. Multivalued: the sheet of the point enters through z^(2 nu) and ln z.
 */
public final class BesselTypeSolution extends ClosedFormSolution {
    private final ExactParameters parameters;
    private final RootChoice choice;
    private final int n;
    private final GaussianRational coefficientA;
    private final GaussianRational coefficientB;
    private final ParameterSet seed;
    private final GaussianRational nu;
    private final BacklundChain chain;

    private BesselTypeSolution(ExactParameters parameters, RootChoice choice, GaussianRational coefficientA,
                               GaussianRational coefficientB) {
        if (coefficientA.isZero() && coefficientB.isZero()) {
            throw new InvalidInputException("A", "A and B must not both be zero (u = A U1 + B U2 would vanish)");
        }
        this.parameters = parameters;
        this.choice = choice;
        this.n = (int) ((choice.sum() - 2) / 4);
        this.coefficientA = coefficientA;
        this.coefficientB = coefficientB;
        this.seed = ParameterSet.of(parameters).shifted(-n * choice.signA(), -n * choice.signC());
        GaussianRational x0 = choice.x().subtract(GaussianRational.of(2L * n, 0));
        this.nu = RiccatiSeries.nu(x0);
        List<BacklundTransformation> steps = new ArrayList<>();
        for (int k = 0; k < n; k++) {
            steps.add(BacklundTransformation.d6(choice.signA(), choice.signC()));
        }
        this.chain = BacklundChain.of(steps);
    }

    /**
     * The families of Bessel-type solutions of the equation: the sign choices of a, c with
     * alpha/a + beta/c = 4n + 2, n &gt;= 0. Empty unless the type is D6 and the condition holds.
     */
    public static List<RootChoice> families(ExactParameters p) {
        if (p.type() != Painleve3Type.D6) {
            return new ArrayList<>();
        }
        return RootChoice.find(p, m -> m > 0 && m % 4 == 2 && m < 4L * 100000);
    }

    /**
     * The member u = A U1 + B U2 of a family (see {@link #families}).
     *
     * @throws InvalidInputException if A = B = 0
     */
    public static BesselTypeSolution of(ExactParameters p, RootChoice family, GaussianRational coefficientA,
                                        GaussianRational coefficientB) {
        return new BesselTypeSolution(p, family, coefficientA, coefficientB);
    }

    /**
     * The member u = A U1 + B U2 of the first family.
     *
     * @throws InvalidInputException saying which condition fails if the equation has no Bessel-type solution
     */
    public static BesselTypeSolution of(ExactParameters p, GaussianRational coefficientA, GaussianRational coefficientB) {
        List<RootChoice> f = families(p);
        if (f.isEmpty()) {
            throw new InvalidInputException("family", "no Bessel-type solution: " + whyNot(p));
        }
        return new BesselTypeSolution(p, f.get(0), coefficientA, coefficientB);
    }

    /** The condition that fails, in words (for parameters without a Bessel-type solution). */
    static String whyNot(ExactParameters p) {
        if (p.type() != Painleve3Type.D6) {
            return "the Riccati reduction needs gamma delta != 0 (type D6), got " + p.type().describe();
        }
        return "alpha/a + beta/c = 4n + 2 (n >= 0) fails for every a = +-sqrt(gamma), c = +-sqrt(-delta) (DLMF"
                + " 32.10(iv): alpha + epsilon beta = 4n + 2 when gamma = 1, delta = -1); here alpha^2/gamma = "
                + p.alphaInvariant() + " and -beta^2/delta = " + p.betaInvariant();
    }

    @Override
    public ParameterSet parameters() {
        return ParameterSet.of(parameters);
    }

    @Override
    public String kind() {
        return "bessel";
    }

    /** nu, the Bessel order of the seed (exact). */
    public GaussianRational order() {
        return nu;
    }

    /** The number of Backlund steps from the seed. */
    public int steps() {
        return n;
    }

    @Override
    public String description() {
        String basis = Conversions.isInteger(nu)
                ? "U1 the regular and U2 the logarithmic solution (integer order, see RiccatiSeries)"
                : "U1 = z^(2nu) 0F1(;1+nu;-a c z^2/4), U2 = 0F1(;1-nu;-a c z^2/4)";
        String text = "Bessel-type solution (DLMF 32.10(iv)) of PIII(" + parameters + "): seed z w' = a z w^2 + b w"
                + " + c z with " + choice.text() + ", b = " + nu.multiply(GaussianRational.of(2, 0))
                .subtract(GaussianRational.ONE) + ", w = -u'/(a u), u = A U1 + B U2, A = " + coefficientA + ", B = "
                + coefficientB + ", Bessel order nu = " + nu + "; " + basis;
        if (n > 0) {
            text += "; then " + n + " step" + (n > 1 ? "s" : "") + " of " + chain.steps().get(0).description()
                    + "; seed parameters " + seed.text();
        }
        return text;
    }

    @Override
    <T> Estimate<T> compute(AnalyticArithmetic<T> ar, T z, int sheet) {
        Tracked.Ops<T> ops = new Tracked.Ops<>(ar);
        T twoPi = ar.multiply(ar.of(2, 0), ar.pi());
        T tau = ar.add(ar.log(z), ar.multiply(ar.of(0, sheet), twoPi));
        T a = choice.a(ar, parameters);
        T c = choice.c(ar, parameters);
        List<Tracked<T>> basis = RiccatiSeries.basis(ar, ar.add(ar.multiply(a, c), ar.zero()), nu, z, tau);
        Tracked<T> u = ops.add(ops.multiply(ops.constant(Conversions.of(ar, coefficientA)), basis.get(0)),
                ops.multiply(ops.constant(Conversions.of(ar, coefficientB)), basis.get(1)));
        // scalars: u and u' with their errors
        Tracked<T> us = new Tracked<>(u.value, ar.zero(), u.logErrValue, Double.NEGATIVE_INFINITY);
        Tracked<T> dus = new Tracked<>(u.derivative, ar.zero(), u.logErrDerivative, Double.NEGATIVE_INFINITY);
        Tracked<T> at = ops.constant(a);
        String pole = "z = " + ar.toComplex(z) + " is a pole of the Bessel-type solution (u = 0 within its error)";
        Tracked<T> w = ops.negate(ops.divide(dus, ops.multiply(at, us), pole));
        // w' from the Riccati equation: (a z w^2 + b w + c z) / z, b = 2 nu - 1
        T b = ar.subtract(ar.multiply(ar.of(2, 0), Conversions.of(ar, nu)), ar.one());
        Tracked<T> zt = ops.exact(z);
        Tracked<T> rhs = ops.add(ops.add(ops.multiply(at, ops.multiply(zt, ops.multiply(w, w))),
                ops.multiply(ops.constant(b), w)), ops.multiply(ops.constant(c), zt));
        Tracked<T> dw = ops.divide(rhs, zt, "z = 0");
        Tracked<T> data = new Tracked<>(w.value, dw.value, w.logErrValue, dw.logErrValue);
        Tracked<T> r = n == 0 ? data : chain.map(ops, seed, z, data);
        return new Estimate<>(r.value, r.derivative, r.logErrValue, r.logErrDerivative);
    }
}
