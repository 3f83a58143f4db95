package org.tertius.core.number;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;

/**
 * ComplexGamma against Apfloat's Gamma in 40 digits (an independent implementation) at random points of
 * [-20, 20] x [-20, 20] and along the real axis, and against exact values: Gamma(n) = (n - 1)!, Gamma(1/2) = sqrt(pi)
 * (DLMF 5.4.6), |Gamma(i y)|^2 = pi / (y sinh(pi y)) (DLMF 5.4.3).
 */
class ComplexGammaTest {
    private static double relativeError(Complex z) {
        Apcomplex exact = ApcomplexMath.gamma(new Apcomplex(new Apfloat(z.getReal(), 40), new Apfloat(z.getImaginary(),
                40)));
        Complex got = ComplexGamma.gamma(z);
        Complex e = new Complex(exact.real().doubleValue(), exact.imag().doubleValue());
        return got.subtract(e).norm() / e.norm();
    }

    @Test
    void agreesWithApfloatAt40Digits() {
        Random random = new Random(20261205L);
        double worst = 0;
        for (int i = 0; i < 120; i++) {
            double side = ComplexGamma.TESTED_HALF_SIDE;
            Complex z = new Complex(side * (2 * random.nextDouble() - 1), side * (2 * random.nextDouble() - 1));
            worst = Math.max(worst, relativeError(z));
        }
        for (int i = 0; i < 40; i++) {
            // the real axis, poles excluded by at least 1e-3
            double x = -15 + 30 * random.nextDouble();
            if (Math.abs(x - Math.rint(x)) > 1e-3 || x > 0.5) {
                worst = Math.max(worst, relativeError(new Complex(x)));
            }
        }
        assertTrue(worst < ComplexGamma.RELATIVE_ERROR, "largest relative error " + worst);
    }

    @Test
    void exactValues() {
        double factorial = 1;
        for (int n = 1; n <= 20; n++) {
            assertEquals(factorial, ComplexGamma.gamma(new Complex(n)).getReal(), 1e-14 * factorial, "Gamma(" + n + ")");
            assertEquals(0, ComplexGamma.gamma(new Complex(n)).getImaginary(), 1e-14 * factorial);
            factorial *= n;
        }
        assertEquals(Math.sqrt(Math.PI), ComplexGamma.gamma(new Complex(0.5)).getReal(), 1e-15);
        for (double y : new double[] {0.1, 1, 3, 10}) {
            double modulus = ComplexGamma.gamma(new Complex(0, y)).norm();
            double exact = Math.PI / (y * Math.sinh(Math.PI * y));
            assertEquals(exact, modulus * modulus, 3e-14 * exact, "|Gamma(" + y + "i)|^2");
        }
    }

    @Test
    void polesAreRefused() {
        for (int n = 0; n >= -5; n--) {
            Complex z = new Complex(n);
            assertThrows(InvalidInputException.class, () -> ComplexGamma.gamma(z));
        }
        assertThrows(InvalidInputException.class, () -> ComplexGamma.gamma(new Complex(Double.NaN, 0)));
    }
}
