package org.tertius.connection.closed;

import java.math.BigDecimal;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ApcomplexArithmetic;

/**
 * Closed-form connection of the decaying family of PIII(0, 0, 1, -1) (McCoy, Tracy and Wu, J. Math. Phys. 18
 * (1977) 1058), in the convention of this project:
 * <pre>  w(x) ~ 1 - 2 lambda K0(2x)  (x -> +infinity),   w(x) ~ B x^sigma  (x -> 0+),
 *   sigma(lambda) = (2/pi) arcsin(pi lambda),
 *   B(lambda)     = 2^(-2 sigma) Gamma((1 - sigma)/2) / Gamma((1 + sigma)/2),     |lambda| &lt; 1/pi,
 *   w(x) ~ -x (log(x/4) + gamma_E)                                     lambda = 1/pi.</pre>
 * The formulas were recalled from memory in the variable theta = 2x of the paper and converted; the
 * numerical matching of this module confirms sigma and B to 1e-14 in double and 30 digits in arbitrary
 * precision (see the module README for the derivation of the logarithmic case as the limit sigma -> 1 of
 * B x^sigma - x^(2 - sigma)/(4 B (1 - sigma)^2)). lambda -> -lambda is w -> 1/w (sigma -> -sigma,
 * B -> 1/B, and the formula has this symmetry), and at lambda = -1/pi w ~ -1/(x (log(x/4) + gamma_E)).
 * Gamma values from Apfloat.
 */
public final class McCoyTracyWu {
    private McCoyTracyWu() {
    }

    /** The edge of the pole-free family, 1/pi. */
    public static final double EDGE = 1 / Math.PI;

    /**
     * sigma and B in {@code digits} decimal digits (lambda given as text, e.g. "0.2", exact decimal).
     *
     * @return {sigma, B}
     * @throws InvalidInputException if |lambda| &gt;= 1/pi (see {@link #requirePowerRange})
     */
    public static Apcomplex[] zeroData(String lambda, long digits) {
        ApcomplexArithmetic ar = new ApcomplexArithmetic(digits + 5);
        FixedPrecisionApcomplexHelper h = ar.helper();
        Apfloat lam = new Apfloat(lambda.trim(), digits + 5);
        Apfloat pi = ApfloatMath.pi(digits + 5);
        requirePowerRange(lam.doubleValue(), ApfloatMath.abs(lam.multiply(pi)).compareTo(new Apfloat(1)) >= 0);
        Apcomplex sigma = h.divide(h.multiply(new Apcomplex(new Apfloat(2)), h.asin(lam.multiply(pi))), pi);
        Apcomplex one = new Apcomplex(new Apfloat(1));
        Apcomplex half = ar.ratio(1, 2);
        Apcomplex g1 = h.gamma(h.multiply(h.subtract(one, sigma), half));
        Apcomplex g2 = h.gamma(h.multiply(h.add(one, sigma), half));
        Apcomplex two = new Apcomplex(new Apfloat(2));
        Apcomplex b = h.divide(h.multiply(h.pow(two, h.multiply(sigma, new Apcomplex(new Apfloat(-2)))), g1), g2);
        FixedPrecisionApcomplexHelper out = new FixedPrecisionApcomplexHelper(digits);
        return new Apcomplex[] {out.valueOf(sigma), out.valueOf(b)};
    }

    /** sigma(lambda) in double precision. */
    public static double sigma(double lambda) {
        requirePowerRange(lambda, !(Math.abs(lambda) < EDGE));
        return 2 / Math.PI * Math.asin(Math.PI * lambda);
    }

    /** B(lambda) in double precision (Gamma values from Apfloat). */
    public static double amplitude(double lambda) {
        return zeroData(new BigDecimal(lambda).toString(), 20)[1].real().doubleValue();
    }

    /** The constant c of w ~ -x (log x + c) at lambda = 1/pi: c = gamma_E - log 4. */
    public static double logarithmicConstant() {
        return 0.57721566490153286 - Math.log(4);
    }

    /**
     * @throws InvalidInputException with what happens instead when outside (-1/pi, 1/pi)
     */
    public static void requirePowerRange(double lambda, boolean outside) {
        InvalidInputException.requireFinite("lambda", lambda);
        if (outside) {
            throw new InvalidInputException("lambda", "must be in (-1/pi, 1/pi) = (-0.3183098861837907,"
                    + " 0.3183098861837907) for the power behaviour w ~ B x^sigma of the pole-free decaying family,"
                    + " got " + lambda + "; at lambda = 1/pi the solution has the logarithmic behaviour"
                    + " w ~ -x (log(x/4) + gamma_E) (at -1/pi its reciprocal), beyond it zeros (lambda > 1/pi) or"
                    + " poles (lambda < -1/pi) of w appear on the positive axis and accumulate at 0");
        }
    }
}
