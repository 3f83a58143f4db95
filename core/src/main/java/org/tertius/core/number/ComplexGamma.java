package org.tertius.core.number;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/**
 * The Gamma function of a complex argument in double precision, to {@link #RELATIVE_ERROR} relative in the square
 * {@link #inTestedSquare} (measured against Apfloat's Gamma in the tests; the worst of 3000 random points was 1.2e-14
 * for |Re z|, |Im z| &lt;= 8 and 2.0e-14 up to 20; outside the square the error is not measured): the logarithm by Stirling's series (NIST DLMF eq. 5.11.1, with the Bernoulli
 * numbers B_2 .. B_20 of DLMF table 24.2.1) at |z| &gt;= 15 after moving Re z up with the recurrence
 * Gamma(z + 1) = z Gamma(z) (DLMF eq. 5.5.1), and the reflection formula Gamma(z) Gamma(1 - z) = pi / sin(pi z)
 * (DLMF eq. 5.5.3) for Re z &lt; 1/2. Hipparchus has the real Gamma function only; Apfloat's complex one takes
 * about 0.1 s in 40 digits, far too slow for the error propagation of closed forms. Utility, thread-safe.
 */
public final class ComplexGamma {
    /** B_2k / (2k (2k - 1)), k = 1..10 (DLMF 5.11.1 with B_2k from DLMF table 24.2.1). */
    private static final double[] STIRLING = {
        1.0 / 12, -1.0 / 360, 1.0 / 1260, -1.0 / 1680, 1.0 / 1188, -691.0 / 360360, 1.0 / 156, -3617.0 / 122400,
        43867.0 / 244188, -174611.0 / 125400};
    /** Where Stirling's series is summed: |z| at least this (its 11th term is then below 1e-19 relative). */
    private static final double STIRLING_RADIUS = 15;
    private static final double HALF_LOG_TWO_PI = 0.5 * Math.log(2 * Math.PI);
    /** Half the side of the square about 0 in which the relative error is measured. */
    public static final double TESTED_HALF_SIDE = 20;
    /** The relative error bound in the tested square, as the tests assert it (measured worst 2.0e-14). */
    public static final double RELATIVE_ERROR = 3e-14;

    private ComplexGamma() {
    }

    /** Whether z lies in the square |Re z|, |Im z| &lt;= {@link #TESTED_HALF_SIDE} where {@link #RELATIVE_ERROR} holds. */
    public static boolean inTestedSquare(Complex z) {
        return Math.abs(z.getReal()) <= TESTED_HALF_SIDE && Math.abs(z.getImaginary()) <= TESTED_HALF_SIDE;
    }

    /**
     * Gamma(z); beyond Re z of about 171 it overflows to infinity, as the real Gamma does.
     *
     * @throws InvalidInputException at the poles z = 0, -1, -2, ... (to 1e-14) or for a non-finite z
     */
    public static Complex gamma(Complex z) {
        check(z);
        if (z.getReal() < 0.5) {
            // reflection: Gamma(z) = pi / (sin(pi z) Gamma(1 - z))
            // sin(pi z) = (-1)^n sin(pi (z - n)): z - n is exact near an integer n, where pi z would lose digits
            double n = Math.rint(z.getReal());
            Complex s = new Complex(z.getReal() - n, z.getImaginary()).multiply(Math.PI).sin();
            if (Math.abs(n % 2) == 1) {
                s = s.negate();
            }
            return new Complex(Math.PI).divide(s.multiply(gamma(Complex.ONE.subtract(z))));
        }
        // move to |w| >= STIRLING_RADIUS: Gamma(z) = Gamma(z + n) / (z (z + 1) ... (z + n - 1))
        Complex product = Complex.ONE;
        Complex w = z;
        while (w.norm() < STIRLING_RADIUS) {
            product = product.multiply(w);
            w = w.add(1);
        }
        return stirling(w).exp().divide(product);
    }

    /** Stirling's series for log Gamma(w), |w| &gt;= STIRLING_RADIUS, Re w &gt; 0 (DLMF 5.11.1). */
    private static Complex stirling(Complex w) {
        Complex inverse = w.reciprocal();
        Complex inverseSquare = inverse.multiply(inverse);
        Complex sum = Complex.ZERO;
        for (int k = STIRLING.length - 1; k >= 0; k--) {
            sum = sum.multiply(inverseSquare).add(STIRLING[k]);
        }
        return w.subtract(0.5).multiply(w.log()).subtract(w).add(HALF_LOG_TWO_PI).add(sum.multiply(inverse));
    }

    private static void check(Complex z) {
        if (!Double.isFinite(z.getReal()) || !Double.isFinite(z.getImaginary())) {
            throw new InvalidInputException("z", "Gamma needs a finite argument, got " + z);
        }
        double n = Math.rint(z.getReal());
        if (n <= 0 && Math.abs(z.getReal() - n) <= 1e-14 * Math.max(1, -n) && Math.abs(z.getImaginary()) <= 1e-14) {
            throw new InvalidInputException("z", "Gamma has a pole at " + z);
        }
    }
}
