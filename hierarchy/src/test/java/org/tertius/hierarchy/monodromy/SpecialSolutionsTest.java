package org.tertius.hierarchy.monodromy;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.MemberSolution;

/** Solutions whose monodromy data are known or have a known structure. */
class SpecialSolutionsTest {
    private static final MonodromyMap<Complex> MAP = MonodromyMap.doublePrecision();

    private static void assertVanishes(String what, Estimate<Complex> e) {
        assertTrue(e.value().norm() <= 2 * e.error(), what + " = " + e.value() + " +- " + e.error());
    }

    private static void assertEquals(String what, Complex expected, Estimate<Complex> e) {
        assertTrue(e.value().subtract(expected).norm() <= 2 * e.error() + 1e-15,
                what + " = " + e.value() + " +- " + e.error() + ", expected " + expected);
    }

    /**
     * The NLS near-field profile (member 1, s = 2, m = 0, a_-2(0) = (0, 2i, 2i)): trivial monodromy around lambda = 0
     * (m0 = 0 and both Stokes matrices at 0 trivial), hence, by the cyclic relation with m = 0, trivial Stokes matrices
     * at infinity as well; E11 E22 = 1/2. Derived here: at x = 0 the lambda-equation is Phi' = a_-2 Phi / lambda^2,
     * solved by Phi = exp(-a_-2 / lambda), entire in 1/lambda, so the canonical solutions at 0 are Phi G0 and E = G0
     * with G0 = [[1, -1], [1, 1]] / sqrt(2) for a_-2 = 2i sigma1; isomonodromy carries this to every x. Consistent
     * with the representation of this profile by a Riemann-Hilbert problem whose only jump lies on a circle
     * (D. Bilman, L. Ling, P. D. Miller, Duke Math. J. 169 (2020) 671; from memory).
     */
    @Test
    void nlsProfileHasTrivialMonodromyAroundZeroAtSeveralPoints() {
        MemberSolution profile = Samples.nlsProfile();
        for (SurfacePoint x : new SurfacePoint[] {SurfacePoint.of(0.05, 0, 0), SurfacePoint.of(0.5, 0, 0),
            SurfacePoint.of(2, 0, 0), SurfacePoint.of(-1.5, 0.3, 0), SurfacePoint.of(0.5, 0.2, 1)}) {
            MonodromyData<Complex> d = MAP.compute(profile, x);
            assertTrue(d.checksHold(), d.checks().toString());
            assertVanishes("m0 at " + x, d.exponentAtZero());
            assertVanishes("s^0_1 at " + x, d.stokesAtZero(1));
            assertVanishes("s^0_2 at " + x, d.stokesAtZero(2));
            assertVanishes("s^inf_1 at " + x, d.stokesAtInfinity(1));
            assertVanishes("s^inf_2 at " + x, d.stokesAtInfinity(2));
            assertEquals("E11 E22 at " + x, new Complex(0.5), d.connectionProduct());
            double r = Math.sqrt(0.5);
            assertEquals("E11", new Complex(r), d.connection(1, 1));
            assertEquals("E12", new Complex(-r), d.connection(1, 2));
            assertEquals("E21", new Complex(r), d.connection(2, 1));
        }
    }

    /**
     * Member-1 solutions analytic at x = 0 are single-valued around it (MemberSolutionTest); the sectors at infinity
     * turn by 2 pi with arg x, which conjugates the Stokes multipliers at infinity by exp(2 pi i m sigma3). For
     * generic m both must therefore vanish (derived here; at x = 0 infinity is a regular singular point).
     */
    @Test
    void solutionsAnalyticAtTheOriginHaveTrivialStokesMatricesAtInfinity() {
        Complex a11 = new Complex(0.4, 0.2);
        Complex a12 = new Complex(0.7, -0.1);
        Complex a21 = Complex.ONE.add(a11.multiply(a11)).negate().divide(a12);
        MemberSolution sol = MemberSolution.builder(Samples.MEMBER1).startAtOrigin(a11, a12, a21).build();
        MonodromyData<Complex> first = MAP.compute(sol, SurfacePoint.of(0.5, 0.3, 0));
        for (SurfacePoint x : new SurfacePoint[] {SurfacePoint.of(0.5, 0.3, 0), SurfacePoint.of(0.5, 0.3, 1),
            SurfacePoint.of(-2, 1, 0)}) {
            MonodromyData<Complex> d = MAP.compute(sol, x);
            assertVanishes("s^inf_1 at " + x, d.stokesAtInfinity(1));
            assertVanishes("s^inf_2 at " + x, d.stokesAtInfinity(2));
            // T = 2 m a11 at x = 0, so m0 = T / (2 i s) = -i m a11
            assertEquals("m0", Complex.I.negate().multiply(Samples.MEMBER1.m()).multiply(a11), d.exponentAtZero());
            assertTrue(d.deviationRatio(first) <= 1, "ratio " + d.deviationRatio(first));
        }
    }

    /**
     * Bessel-type (Riccati) solutions of PIII: z w' = z w^2 + b w + z solves PIII(b + 1, 1 - b, 1, -1) (NIST DLMF
     * §32.10(iii); every value w(z0) starts one). Their monodromy is reducible: here every Stokes matrix and E are
     * upper triangular (s^inf_1 = s^0_2 = E21 = 0), the exponents agree (m = m0 = (b - 1)/4), and the data do not
     * depend on the point.
     */
    @Test
    void riccatiSolutionsHaveReducibleMonodromy() {
        for (double b : new double[] {0.3, -0.7}) {
            Painleve3 eq = Painleve3.of(new Complex(b + 1), new Complex(1 - b), Complex.ONE, new Complex(-1));
            MonodromyData<Complex> first = null;
            for (double[] zw : new double[][] {{1, 0.5}, {1.7, -0.3}}) {
                Complex z = new Complex(zw[0], 0.2);
                Complex w = new Complex(zw[1], 0.1);
                Complex dw = w.multiply(w).add(w.multiply(b).divide(z)).add(1);
                MonodromyData<Complex> d = MAP.compute(LaxMatrix.ofPainleve3(eq,
                        new Painleve3Value(SurfacePoint.of(z, 0), w, dw, 0, 0), new Complex(0.25)));
                assertTrue(d.checksHold(), d.checks().toString());
                assertVanishes("s^inf_1", d.stokesAtInfinity(1));
                assertVanishes("s^0_2", d.stokesAtZero(2));
                assertVanishes("E21", d.connection(2, 1));
                assertEquals("m", new Complex((b - 1) / 4), d.exponentAtInfinity());
                assertEquals("m0", new Complex((b - 1) / 4), d.exponentAtZero());
                assertTrue(Math.abs(d.stokesAtInfinity(2).value().norm()) > 0.1, "a non-trivial multiplier remains");
                if (first == null) {
                    first = d;
                }
            }
        }
    }

    /**
     * The constant (rational) solution w = 1 of PIII(alpha, -alpha, 1, -1): E11 = 0 (the solution recessive at 0 and
     * at infinity along arg lambda = pi/2 is the same), found here and guarded; its Stokes matrices are not trivial
     * in these conventions (m = (alpha - 2)/4 and m0 = alpha/4 are not integers).
     */
    @Test
    void constantSolutionHasAVanishingConnectionEntry() {
        for (double a : new double[] {0.6, -1.3}) {
            Painleve3 eq = Painleve3.of(new Complex(a), new Complex(-a), Complex.ONE, new Complex(-1));
            for (double z : new double[] {1, 2.5}) {
                MonodromyData<Complex> d = MAP.compute(LaxMatrix.ofPainleve3(eq, new Painleve3Value(
                        SurfacePoint.of(new Complex(z, 0.3), 0), Complex.ONE, Complex.ZERO, 0, 0), new Complex(0.25)));
                assertTrue(d.checksHold(), d.checks().toString());
                assertVanishes("E11", d.connection(1, 1));
                assertEquals("m", new Complex((a - 2) / 4), d.exponentAtInfinity());
                assertEquals("m0", new Complex(a / 4), d.exponentAtZero());
            }
        }
    }

    /** The PIII parameters enter through member 1: alpha = 4m + 2, beta = -4 m0 (canonical map, gamma = 1, delta = -1). */
    @Test
    void painleveParametersAreTheFormalExponents() {
        Painleve3 eq = Painleve3.of(new Complex(0.7, 0.2), new Complex(-0.4, 0.1), Complex.ONE, new Complex(-1));
        MonodromyData<Complex> d = MAP.compute(LaxMatrix.ofPainleve3(eq, new Painleve3Value(SurfacePoint.of(1.2, 0.3,
                0), new Complex(0.8, -0.2), new Complex(0.3, 0.4), 0, 0), new Complex(0.5)));
        assertEquals("m", new Complex(0.7, 0.2).subtract(2).divide(4), d.exponentAtInfinity());
        assertEquals("m0", new Complex(-0.4, 0.1).divide(-4), d.exponentAtZero());
    }
}
