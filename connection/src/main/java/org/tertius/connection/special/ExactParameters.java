package org.tertius.connection.special;

import java.math.BigInteger;
import org.hipparchus.complex.Complex;
import org.hipparchus.fraction.BigFraction;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Type;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * The parameters alpha, beta, gamma, delta of Painleve III held exactly (Gaussian rationals), so that the
 * equalities that decide which special solutions exist are tested exactly. Text input (decimals, p/q, a+bi) is
 * exact; a double is taken at its exact binary value (0.1 is then not 1/10: give such values as text). Immutable.
 */
public final class ExactParameters {
    private final GaussianRational alpha;
    private final GaussianRational beta;
    private final GaussianRational gamma;
    private final GaussianRational delta;

    private ExactParameters(GaussianRational alpha, GaussianRational beta, GaussianRational gamma,
                            GaussianRational delta) {
        this.alpha = alpha;
        this.beta = beta;
        this.gamma = gamma;
        this.delta = delta;
    }

    public static ExactParameters of(GaussianRational alpha, GaussianRational beta, GaussianRational gamma,
                                     GaussianRational delta) {
        return new ExactParameters(alpha, beta, gamma, delta);
    }

    /** From exact numbers (as parsed from the command line by {@link ExactNumber#parse}). */
    public static ExactParameters of(ExactNumber alpha, ExactNumber beta, ExactNumber gamma, ExactNumber delta) {
        return new ExactParameters(Conversions.exact(alpha), Conversions.exact(beta), Conversions.exact(gamma),
                Conversions.exact(delta));
    }

    /**
     * From text such as {@code 1/3}, {@code -0.5}, {@code 2+i}.
     *
     * @throws org.tertius.core.InvalidInputException naming the parameter that cannot be read
     */
    public static ExactParameters parse(String alpha, String beta, String gamma, String delta) {
        return of(ExactNumber.parse("alpha", alpha), ExactNumber.parse("beta", beta),
                ExactNumber.parse("gamma", gamma), ExactNumber.parse("delta", delta));
    }

    /** The exact binary values of an equation's double parameters. */
    public static ExactParameters of(Painleve3 equation) {
        return new ExactParameters(Conversions.exact(equation.alpha()), Conversions.exact(equation.beta()),
                Conversions.exact(equation.gamma()), Conversions.exact(equation.delta()));
    }

    public static ExactParameters of(long alpha, long beta, long gamma, long delta) {
        return new ExactParameters(GaussianRational.of(alpha, 0), GaussianRational.of(beta, 0),
                GaussianRational.of(gamma, 0), GaussianRational.of(delta, 0));
    }

    public GaussianRational alpha() {
        return alpha;
    }

    public GaussianRational beta() {
        return beta;
    }

    public GaussianRational gamma() {
        return gamma;
    }

    public GaussianRational delta() {
        return delta;
    }

    /** The equation with these parameters rounded to double. */
    public Painleve3 equation() {
        return Painleve3.of(alpha.toComplex(), beta.toComplex(), gamma.toComplex(), delta.toComplex());
    }

    /** The type, decided exactly (same rules as {@link Painleve3#type()}). */
    public Painleve3Type type() {
        boolean g = !gamma.isZero();
        boolean d = !delta.isZero();
        if (g && d) {
            return Painleve3Type.D6;
        }
        if ((!g && alpha.isZero()) || (!d && beta.isZero())) {
            return Painleve3Type.QUADRATURE;
        }
        return g != d ? Painleve3Type.D7 : Painleve3Type.D8;
    }

    /** alpha^2 / gamma (gamma != 0): the square of alpha/a for either root a of a^2 = gamma. */
    GaussianRational alphaInvariant() {
        return alpha.multiply(alpha).multiply(gamma.reciprocal());
    }

    /** -beta^2 / delta (delta != 0): the square of beta/c for either root c of c^2 = -delta. */
    GaussianRational betaInvariant() {
        return beta.multiply(beta).multiply(delta.negate().reciprocal());
    }

    /**
     * The exact square root of a Gaussian rational, principal (real part positive, or zero with imaginary part
     * non-negative), or null if it is not the square of a Gaussian rational.
     */
    static GaussianRational sqrt(GaussianRational x) {
        if (x.isZero()) {
            return x;
        }
        BigFraction p = x.re();
        BigFraction q = x.im();
        BigFraction r;
        if (q.signum() == 0) {
            r = p.abs();
        } else {
            r = sqrt(p.multiply(p).add(q.multiply(q)));
            if (r == null) {
                return null;
            }
        }
        // x = (u + i v)^2 with u^2 = (r + p)/2, v^2 = (r - p)/2, 2 u v = q
        BigFraction u = sqrt(r.add(p).divide(2));
        BigFraction v = sqrt(r.subtract(p).divide(2));
        if (u == null || v == null) {
            return null;
        }
        if (q.signum() < 0) {
            v = v.negate();
        }
        return GaussianRational.of(u, v);
    }

    /** The non-negative rational square root of a non-negative rational, or null. */
    private static BigFraction sqrt(BigFraction f) {
        if (f.signum() < 0) {
            return null;
        }
        BigInteger n = f.getNumerator().sqrt();
        BigInteger d = f.getDenominator().sqrt();
        if (!n.multiply(n).equals(f.getNumerator()) || !d.multiply(d).equals(f.getDenominator())) {
            return null;
        }
        return new BigFraction(n, d);
    }

    /** Principal square root in double (Hipparchus convention: real part &gt;= 0). */
    static Complex sqrt(Complex c) {
        return c.sqrt();
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof ExactParameters)) {
            return false;
        }
        ExactParameters p = (ExactParameters) o;
        return alpha.equals(p.alpha) && beta.equals(p.beta) && gamma.equals(p.gamma) && delta.equals(p.delta);
    }

    @Override
    public int hashCode() {
        return ((alpha.hashCode() * 31 + beta.hashCode()) * 31 + gamma.hashCode()) * 31 + delta.hashCode();
    }

    @Override
    public String toString() {
        return "alpha = " + alpha + ", beta = " + beta + ", gamma = " + gamma + ", delta = " + delta;
    }
}
