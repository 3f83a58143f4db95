package org.tertius.hierarchy.nls;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.integration.gauss.GaussIntegrator;
import org.hipparchus.analysis.integration.gauss.GaussIntegratorFactory;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.InvariantCheck;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.NlsCheck;

/**
 * The near-field profile. Published values: Psi(0, 0) = 4 and int |Psi(X, T)|^2 dX = 8 for the rogue wave of
 * infinite order of D. Bilman, L. Ling, P. D. Miller, Duke Math. J. 169 (2020) 671-760 (the paper located with
 * the search tool; the two values themselves from memory). The mass is also derived here: 4 s (1 - cos theta0).
 */
class NearFieldProfileTest {
    private static final NearFieldProfile PROFILE = NearFieldProfile.standard();
    private static final GaussIntegratorFactory GAUSS = new GaussIntegratorFactory();

    /** int_a^b f by 16-point Gauss-Legendre on panels of width <= w (smooth integrands: error far below 1e-12). */
    static double integrate(DoubleUnaryOperator f, double a, double b, double w) {
        int panels = (int) Math.ceil((b - a) / w);
        double s = 0;
        for (int k = 0; k < panels; k++) {
            GaussIntegrator g = GAUSS.legendre(16, a + (b - a) * k / panels, a + (b - a) * (k + 1) / panels);
            s += g.integrate(f::applyAsDouble);
        }
        return s;
    }

    @Test
    void valueAtTheOriginIsFour() {
        // Bilman-Ling-Miller (2020): Psi(0, 0) = 4 (from memory); here from a_-2(0): -2i a12 / (1 + 2m) = 4
        assertEquals(4.0, PROFILE.value(0, 0).psi().getReal(), 1e-15);
        assertEquals(0.0, PROFILE.value(0, 0).psi().getImaginary(), 1e-15);
        // approached along T on X = 0 (t-series) and along X at T = 0 (member 1)
        assertEquals(4.0, PROFILE.value(0, 1e-6).psi().getReal(), 1e-9);
        assertEquals(4.0, PROFILE.value(1e-4, 0).psi().getReal(), 1e-6);
        assertEquals("t-series", PROFILE.value(0, 1e-3).route());
    }

    @Test
    void massOnTheLineIsEight() {
        double length = 12;
        double half = integrate(x -> sq(PROFILE.value(x, 0).psi().norm()), 0, length, 0.5);
        // derived identity (hierarchy/README.md): int_0^L Psi^2 dX = -2i (a(-2)11(L) - a(-2)11(0)) - L Psi(L)^2
        Complex a = PROFILE.solution().memberOne().evaluate(new Complex(length)).state().get(0);
        double psiL = PROFILE.value(length, 0).psi().getReal();
        double identity = a.multiply(new Complex(0, -2)).getReal() - length * psiL * psiL;
        assertEquals(identity, half, 1e-10);
        // tail beyond L from the asymptotic form (independent of the identity): in zeta = 4 sqrt(2X),
        // int Psi^2 dX = int Psi^2 zeta / 16 dzeta, and beyond zeta_max the mean s A^2 / zeta^2
        FarField far = new FarField(2, 0, FarField.closedForm(Math.PI / 2));
        double zetaL = 4 * Math.sqrt(2 * length);
        double zetaMax = 3000;
        double tail = integrate(z -> sq(far.psi(z * z / 32).getReal()) * z / 16, zetaL, zetaMax, 1.0)
                + 2 * sq(far.constants().amplitude()) / zetaMax;
        double mass = 2 * (half + tail);
        // Bilman-Ling-Miller (2020): 8 (from memory); derived: 4 s (1 - cos(pi/2)) = 8. The tail's asymptotic
        // form is good to about 1e-6 here (FarField.error), the remainder estimate to O(1/zeta_max^2)
        assertEquals(8.0, mass, 2e-5);
    }

    @Test
    void massIsConservedInTimeThroughTheFluxAtTheEnds() {
        // d/dT int_{-L}^{L} |Psi|^2 = J(-L) - J(L) = -2 J(L), J = Im(conj Psi Psi_X) (Psi even in X)
        double length = 10;
        double t = 0.6;
        double m0 = 2 * integrate(x -> sq(PROFILE.value(x, 0).psi().norm()), 0, length, 0.5);
        double m1 = 2 * integrate(x -> sq(PROFILE.value(x, t).psi().norm()), 0, length, 0.5);
        GaussIntegrator inT = GAUSS.legendre(12, 0, t);
        double outflow = inT.integrate(s -> 2 * flux(length, s));
        assertEquals(m0, m1 + outflow, 1e-9);
        assertTrue(Math.abs(m1 - m0) > 1e-4, "the check is not trivial: the mass on [-L, L] moves by " + (m1 - m0));
    }

    private static double flux(double x, double t) {
        Complex q = PROFILE.value(x, t).psi();
        return q.conjugate().multiply(PROFILE.derivative(x, t)).getImaginary();
    }

    @Test
    void nlsResidualIsAtTheLevelOfTheFiniteDifferences() {
        for (double[] p : new double[][] {{1.3, 0.7}, {4.0, -1.1}, {0.0, 2.0}}) {
            NlsCheck.Residual coarse = PROFILE.residual(p[0], p[1], 0.02);
            NlsCheck.Residual fine = PROFILE.residual(p[0], p[1], 0.01);
            double ratio = coarse.value().norm() / fine.value().norm();
            // central differences: the residual falls like h^2 (3 to 5 leaves room for the next order)
            assertTrue(ratio > 3 && ratio < 5, "at " + p[0] + ", " + p[1] + ": " + coarse.value().norm() + ", "
                    + fine.value().norm());
            assertTrue(fine.value().norm() < 1e-3 * fine.scale(), "residual " + fine.value().norm());
        }
    }

    @Test
    void sliceTZeroMapsToPainleveThreeAndAgreesWithTheCoreEngine() {
        Painleve3 eq = PROFILE.painleve3Equation();
        // canonical map (Member1Map): (4m + 2, 2iT/s, 1, -1) with m = 0 and trace integral T = 2 m a11 = 0
        assertEquals(2.0, eq.alpha().getReal(), 1e-15);
        assertEquals(0.0, eq.beta().norm(), 1e-15);
        assertEquals(1.0, eq.gamma().getReal(), 1e-15);
        assertEquals(-1.0, eq.delta().getReal(), 1e-15);
        Painleve3Value start = PROFILE.painleve3(1.0);
        SurfacePoint z0 = start.point();
        assertEquals(4 * Math.sqrt(2), z0.z().getReal(), 1e-14);
        Painleve3Solution core = Painleve3Solution.builder(eq).settings(SolverSettings.defaults())
                .start(z0.z(), start.w(), start.dw()).build();
        for (double x : new double[] {0.3, 2.0, 6.0}) {
            Painleve3Value a = PROFILE.painleve3(x);
            Painleve3Value b = core.evaluate(a.point());
            assertTrue(a.w().subtract(b.w()).norm() <= 2 * (a.errW() + b.errW()) + 1e-12 * (1 + a.w().norm()),
                    "X = " + x + ": member 1 " + a.w() + " +- " + a.errW() + ", core " + b.w() + " +- " + b.errW());
        }
    }

    @Test
    void relativesAreThePhaseAndScaleImages() {
        NearFieldProfile relative = NearFieldProfile.of(1, 0.7, SolverSettings.defaults());
        assertEquals(2.0, relative.valueAtOrigin().norm(), 1e-15);
        Complex rotation = new Complex(Math.cos(0.7), Math.sin(0.7));
        for (double[] p : new double[][] {{1.0, 0.0}, {2.2, 0.8}, {-3.0, -1.2}}) {
            ProfileValue a = relative.value(p[0], p[1]);
            ProfileValue b = PROFILE.value(p[0] / 2, p[1] / 4);
            Complex expected = b.psi().multiply(rotation).multiply(0.5);
            assertTrue(a.psi().subtract(expected).norm() <= a.error() + 0.5 * b.error(), a.psi() + " vs " + expected);
        }
    }

    @Test
    void complexPointsContinueTheRealValues() {
        // Cauchy-Riemann: (Psi(X + ih) - Psi(X - ih)) / (2ih) = Psi_X + O(h^2)
        double h = 0.01;
        Complex t = new Complex(0.5);
        Complex up = PROFILE.value(new Complex(1, h), t).psi();
        Complex down = PROFILE.value(new Complex(1, -h), t).psi();
        Complex slope = up.subtract(down).divide(new Complex(0, 2 * h));
        Complex dx = PROFILE.derivative(1, 0.5);
        assertTrue(slope.subtract(dx).norm() < 1e-3 * (1 + dx.norm()), slope + " vs " + dx);
        assertEquals("path tree", PROFILE.value(new Complex(1, h), t).route());
    }

    @Test
    void tinyTimesAreSummedFromMemberOne() {
        ProfileValue a = PROFILE.value(3, 1e-7);
        assertEquals("small-time series", a.route());
        ProfileValue b = PROFILE.value(3, 0);
        // q_t = i (q_xx / 2 + |q|^2 q) at T = 0: the change over 1e-7 is about 1e-7 |q_t|
        assertTrue(a.psi().subtract(b.psi()).norm() < 1e-6 && a.psi().getImaginary() != 0, a.psi() + " vs "
                + b.psi());
        assertTrue(a.error() < 1e-11, "error " + a.error());
    }

    @Test
    void firstIntegralsAreKeptAsValues() {
        for (double[] p : new double[][] {{2.0, 0.7}, {-3.0, 1.5}, {1.5, 0.0}, {0.0, 0.0}}) {
            List<InvariantCheck> checks = PROFILE.integrals(p[0], p[1]);
            assertTrue(checks.size() >= 3, checks.toString());
            for (InvariantCheck c : checks) {
                assertTrue(c.withinEstimate(), "at " + p[0] + ", " + p[1] + ": " + c);
            }
            // det a_-2 = s^2 = 4 and the trace integral tr(a_-2 a_-1) = 2 m a11 = 0
            assertEquals(4.0, checks.get(0).value().getReal(), 1e-10);
            assertEquals(0.0, checks.get(1).value().norm(), 1e-10);
        }
    }

    @Test
    void badInputIsRefused() {
        assertEquals("s", assertThrows(InvalidInputException.class, () -> NearFieldProfile.of(0, 0,
                SolverSettings.defaults())).argument());
        assertEquals("T", assertThrows(InvalidInputException.class, () -> PROFILE.value(1, Double.NaN)).argument());
        assertEquals("X", assertThrows(InvalidInputException.class, () -> PROFILE.painleve3(-1)).argument());
    }

    private static double sq(double v) {
        return v * v;
    }
}
