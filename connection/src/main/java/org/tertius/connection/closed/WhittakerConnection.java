package org.tertius.connection.closed;

import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexGamma;
import org.tertius.core.number.ComplexText;

/**
 * The connection matrix of the confluent hypergeometric (Whittaker) system {@code dY/dmu = (-i sigma3 + C/mu) Y},
 * {@code C = [[mh, c12], [c21, -mh]]} with eigenvalues +-nu (derived here, connection/README.md, "Monodromy data at
 * z = 0"): with {@code P = [[c12, c12], [nu - mh, -nu - mh]]} (columns: eigenvectors of C for nu, -nu), the
 * Fuchsian solution {@code Y_F = P (I + O(mu)) mu^(nu sigma3)} and the canonical solution
 * {@code Y_1 ~ (I + O(1/mu)) mu^(mh sigma3) e^(-i mu sigma3)} in -pi &lt; arg mu &lt; pi are related by
 * {@code Y_1 = Y_F N} with
 * <pre>
 *   N11 = (2i)^(nu - mh) Gamma(-2 nu) / (c12 Gamma(-nu - mh)),   N12 = -(-2i)^(nu + mh) Gamma(-2 nu) / Gamma(1 + mh - nu),
 *   N21 = (2i)^(-nu - mh) Gamma(2 nu) / (c12 Gamma(nu - mh)),    N22 = -(-2i)^(mh - nu) Gamma(2 nu) / Gamma(1 + nu + mh),
 * </pre>
 * powers principal ((2i)^p = 2^p e^(i pi p/2), (-2i)^p = 2^p e^(-i pi p/2)). The first row of Y solves
 * {@code mu^2 y'' + mu y' + (mu^2 + i (1 + 2 mh) mu - nu^2) y = 0}, with solutions
 * {@code mu^(+-nu) e^(-i mu) M(+-nu - mh, 1 +- 2 nu, 2i mu)} at 0 and {@code mu^nu e^(-i mu) U(nu - mh, 1 + 2 nu, 2i mu)
 * ~ (2i)^(mh - nu) mu^mh e^(-i mu)} (recessive on arg mu = -pi/2); the second row likewise with i -> -i, mh -> -mh.
 * U in terms of the two M is DLMF 13.2.42 and U ~ z^(-a) is DLMF 13.7.3 (both from memory; the whole bridge built on
 * them is confirmed numerically, see {@link ZeroMonodromyBridge}). Utility.
 */
final class WhittakerConnection {
    /**
     * Relative rounding of a closed form built from Gamma values: {@link ComplexGamma#RELATIVE_ERROR} for each of the
     * at most 8 Gamma factors (counted with multiplicity) of a closed form of the bridge at 0; the Apfloat arithmetic
     * around them is exact to far below this.
     */
    static final double GAMMA_ROUNDING = 8 * ComplexGamma.RELATIVE_ERROR;

    /** The largest |z| at which a Gamma factor is evaluated (Apfloat's Gamma is slow far out; the values overflow). */
    static final double LARGEST_ARGUMENT = 1e4;

    private WhittakerConnection() {
    }

    /**
     * Gamma(z) carried in the helper's precision: by {@link ComplexGamma} in double precision in the square where its
     * error {@link ComplexGamma#RELATIVE_ERROR} is measured, by Apfloat's Gamma (about 0.1 s a call in 40 digits)
     * outside it. The closed forms are returned in double, and Apfloat's Gamma everywhere made the error propagation,
     * which evaluates them a dozen times, take seconds. {@link #GAMMA_ROUNDING} is its share of the rounding estimate
     * of a closed form.
     */
    static Apcomplex gamma(FixedPrecisionApcomplexHelper h, Apcomplex z) {
        Complex x = new Complex(z.real().doubleValue(), z.imag().doubleValue());
        if (!(x.norm() <= LARGEST_ARGUMENT)) {
            throw new InvalidInputException("data", "the closed form needs Gamma at " + ComplexText.brief(x)
                    + ", beyond |z| = " + LARGEST_ARGUMENT + " (the formal exponents m, m0 or sigma are too large for the"
                    + " double-precision bridge)");
        }
        if (!ComplexGamma.inTestedSquare(x)) {
            try {
                return h.gamma(z);
            } catch (ArithmeticException e) {
                throw new InvalidInputException("data", "a Gamma factor of the closed form has a pole at "
                        + ComplexText.brief(x));
            }
        }
        Complex g = ComplexGamma.gamma(x);
        return new Apcomplex(new Apfloat(g.getReal(), h.precision()), new Apfloat(g.getImaginary(), h.precision()));
    }

    /** N as {{N11, N12}, {N21, N22}} for the given mh, nu and c12 (2 nu not an integer). */
    static Apcomplex[][] matrix(FixedPrecisionApcomplexHelper h, Apcomplex mh, Apcomplex nu, Apcomplex c12) {
        Apcomplex one = h.valueOf(Apcomplex.ONE);
        Apcomplex twoNu = h.add(nu, nu);
        Apcomplex n11 = h.divide(h.multiply(power(h, 1, h.subtract(nu, mh)), gamma(h, h.negate(twoNu))),
                h.multiply(c12, gamma(h, h.negate(h.add(nu, mh)))));
        Apcomplex n21 = h.divide(h.multiply(power(h, 1, h.negate(h.add(nu, mh))), gamma(h, twoNu)),
                h.multiply(c12, gamma(h, h.subtract(nu, mh))));
        Apcomplex n12 = h.negate(h.divide(h.multiply(power(h, -1, h.add(nu, mh)), gamma(h, h.negate(twoNu))),
                gamma(h, h.add(one, h.subtract(mh, nu)))));
        Apcomplex n22 = h.negate(h.divide(h.multiply(power(h, -1, h.subtract(mh, nu)), gamma(h, twoNu)),
                gamma(h, h.add(one, h.add(nu, mh)))));
        return new Apcomplex[][] {{n11, n12}, {n21, n22}};
    }

    /** (2i)^p for sign = 1, (-2i)^p for sign = -1: 2^p e^(sign i pi p / 2). */
    static Apcomplex power(FixedPrecisionApcomplexHelper h, int sign, Apcomplex p) {
        long precision = h.precision();
        Apfloat two = new Apfloat(2, precision);
        Apfloat halfPi = ApfloatMath.pi(precision).divide(two);
        Apcomplex logOfBase = new Apcomplex(ApfloatMath.log(two), halfPi.multiply(new Apfloat(sign, precision)));
        return h.exp(h.multiply(p, logOfBase));
    }

    static Apcomplex[][] multiply(FixedPrecisionApcomplexHelper h, Apcomplex[][] a, Apcomplex[][] b) {
        Apcomplex[][] c = new Apcomplex[2][2];
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                c[i][j] = h.add(h.multiply(a[i][0], b[0][j]), h.multiply(a[i][1], b[1][j]));
            }
        }
        return c;
    }

    static Apcomplex determinant(FixedPrecisionApcomplexHelper h, Apcomplex[][] a) {
        return h.subtract(h.multiply(a[0][0], a[1][1]), h.multiply(a[0][1], a[1][0]));
    }

    static Apcomplex[][] inverse(FixedPrecisionApcomplexHelper h, Apcomplex[][] a) {
        Apcomplex d = determinant(h, a);
        return new Apcomplex[][] {{h.divide(a[1][1], d), h.negate(h.divide(a[0][1], d))},
            {h.negate(h.divide(a[1][0], d)), h.divide(a[0][0], d)}};
    }

    /** diag(e^(2 pi i p), e^(-2 pi i p)) as a pair. */
    static Apcomplex[] turn(FixedPrecisionApcomplexHelper h, Apcomplex p) {
        Apcomplex twoPiI = new Apcomplex(Apfloat.ZERO, ApfloatMath.pi(h.precision()).multiply(
                new Apfloat(2, h.precision())));
        Apcomplex e = h.exp(h.multiply(twoPiI, p));
        return new Apcomplex[] {e, h.divide(h.valueOf(Apcomplex.ONE), e)};
    }
}
