package org.tertius.core.pade;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The robust Pade algorithm on functions whose approximants are known in closed form. */
class RobustPadeTest {

    private static double[] taylorOfRational(double a, int n) {
        // 1 / (1 - s/a) = sum (s/a)^k
        double[] c = new double[n + 1];
        for (int k = 0; k <= n; k++) {
            c[k] = Math.pow(1 / a, k);
        }
        return c;
    }

    @Test
    void rationalFunctionIsRecoveredWithItsDegreesReduced() {
        // a [0/1] function asked for as [10/10]: the rank test (Gonnet-Guttel-Trefethen, SIAM Rev. 55 (2013))
        // must reduce the degrees to [0/1] instead of creating spurious pole-zero pairs
        double[] c = taylorOfRational(0.7, 20);
        PadeApproximant p = RobustPade.approximate(c, new double[21], 10, 10, 1e-14);
        assertEquals(0, p.numeratorDegree());
        assertEquals(1, p.denominatorDegree());
        double[] out = new double[4];
        p.evaluate(0.5, 0.3, out);
        // exact: 1/(1 - s/0.7) at s = 0.5+0.3i
        double dr = 1 - 0.5 / 0.7;
        double di = -0.3 / 0.7;
        double d = dr * dr + di * di;
        assertEquals(dr / d, out[0], 1e-14);
        assertEquals(-di / d, out[1], 1e-14);
    }

    @Test
    void poleOfTheApproximantIsWhereTheFunctionHasItsPole() {
        double[] c = taylorOfRational(0.7, 20);
        PadeApproximant p = RobustPade.approximate(c, new double[21], 10, 10, 1e-14);
        double[][] r = PolynomialRoots.roots(p.denominatorRe(), p.denominatorIm());
        assertEquals(1, r[0].length);
        assertEquals(0.7, r[0][0], 1e-14);
        assertEquals(0, r[1][0], 1e-14);
    }

    @Test
    void expDefectIsZeroWhenNoReductionHappens() {
        // e^s: every diagonal approximant exists (a classical fact, common practice); [4/4] at s = 1 is
        // 2.7182817182817... (from memory; it differs from e by 1.1e-7)
        double[] c = new double[13];
        double f = 1;
        for (int k = 0; k < 13; k++) {
            c[k] = 1 / f;
            f *= k + 1;
        }
        PadeApproximant p = RobustPade.approximate(c, new double[13], 4, 4, 1e-14, 12);
        double[] out = new double[5];
        p.evaluate(1, 0, out);
        assertEquals(2.718281718281718, out[0], 1e-14);
        // the defect against all 13 known coefficients estimates the error: same order as the true error
        double err = Math.abs(out[0] - Math.E);
        assertTrue(out[3] >= 0.1 * err && out[3] <= 100 * err, "defect " + out[3] + " vs error " + err);
    }

    @Test
    void rootsOfAPolynomialWithKnownRoots() {
        // (s - 1)(s + 2)(s - i) = s^3 + (1 - i) s^2 + (-2 - i) s + 2i
        double[] re = {0, -2, 1, 1};
        double[] im = {2, -1, -1, 0};
        double[][] r = PolynomialRoots.roots(re, im);
        double[][] expect = {{1, 0}, {-2, 0}, {0, 1}};
        for (double[] e : expect) {
            double best = Double.POSITIVE_INFINITY;
            for (int j = 0; j < 3; j++) {
                best = Math.min(best, Math.hypot(r[0][j] - e[0], r[1][j] - e[1]));
            }
            assertTrue(best < 1e-13, "root " + e[0] + "+" + e[1] + "i missing");
        }
    }
}
