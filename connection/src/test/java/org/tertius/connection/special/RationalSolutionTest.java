package org.tertius.connection.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.hipparchus.fraction.BigFraction;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Rational solutions: the closed form against the equation (residual at high precision), against the core
 * engine started from their values (two routes), and their zeros and poles against the values.
 */
class RationalSolutionTest {

    /** w = (z - 1/2)/(z + 1/2) solves PIII(2, 2, 1, -1) (core ExactSolutionsTest, checked there by substitution). */
    @Test
    void firstMemberIsTheKnownMoebiusSolution() {
        RationalSolution s = RationalSolution.normalized(1, SpecialPolynomials.mu(1, 2), 1);
        assertEquals(Painleve3.of(2, 2, 1, -1), s.equation());
        for (SurfacePoint p : new SurfacePoint[] {SurfacePoint.of(0.3, 0.2), SurfacePoint.of(-3, 1, 2),
            SurfacePoint.of(7, -2)}) {
            Painleve3Value v = s.evaluate(p);
            Complex z = p.z();
            Complex w = z.subtract(0.5).divide(z.add(0.5));
            Complex dw = z.add(0.5).multiply(z.add(0.5)).reciprocal();
            assertTrue(v.w().subtract(w).norm() <= v.errW() + 1e-16, "w at " + p);
            assertTrue(v.dw().subtract(dw).norm() <= v.errDw() + 1e-16, "w' at " + p);
            assertTrue(v.errW() < 1e-13 && v.errDw() < 1e-13, "estimate " + v);
        }
    }

    /**
     * The residual z w w'' - z w'^2 + w w' - alpha w^3 - beta w - gamma z w^4 - delta z vanishes to the working
     * precision (w'' by a central difference of w' at step 1e-25, error about 1e-50 relative): the formula
     * of Clarkson's Theorem 2.1 and its rescaling to general gamma, delta checked by substitution.
     */
    @Test
    void residualOfTheEquationVanishesAtHighPrecision() {
        List<RationalSolution> cases = new ArrayList<>();
        cases.add(RationalSolution.normalized(3, SpecialPolynomials.mu(1, 3), 1));
        cases.add(RationalSolution.normalized(4, GaussianRational.of(new BigFraction(1, 5), new BigFraction(2, 3)), -1));
        // gamma = 4, delta = -9: a = 2, c = 3; alpha/2 + beta/3 = 8 with alpha = 3, beta = 39/2 (n = 2)
        cases.addAll(RationalSolution.all(ExactParameters.parse("3", "39/2", "4", "-9")));
        assertEquals(4, cases.size());
        for (RationalSolution s : cases) {
            for (SurfacePoint p : new SurfacePoint[] {SurfacePoint.of(0.7, 0.4), SurfacePoint.of(-2.5, 1.5)}) {
                double r = Residuals.relativeResidual(s, p, 80);
                assertTrue(r < 1e-45, "residual " + r + " at " + p + " for " + s.description());
            }
        }
    }

    /**
     * The engine started from w(z0), w'(z0) reproduces the closed form elsewhere, within both estimates (budget
     * 1e-7 relative: the engine reaches a few 1e-10 round the origin here, with estimates near 1e-8).
     */
    @Test
    void engineStartedFromTheClosedFormAgreesElsewhere() {
        for (RationalSolution s : new RationalSolution[] {RationalSolution.normalized(2, SpecialPolynomials.mu(1, 3), 1),
            RationalSolution.all(ExactParameters.parse("3", "39/2", "4", "-9")).get(1)}) {
            SurfacePoint z0 = SurfacePoint.of(1.5, 0.5);
            Painleve3Value start = s.evaluate(z0);
            Painleve3Solution engine = Painleve3Solution.builder(s.equation()).start(z0.z(), start.w(), start.dw()).build();
            // round the origin the engine's own estimate grows (it refuses beyond 1e-3 near sheet -1 for the second
            // case): points on sheet 0 and one on sheet 1
            for (SurfacePoint p : new SurfacePoint[] {SurfacePoint.of(3, -2), SurfacePoint.of(-1.2, 0.8, 1),
                SurfacePoint.of(-0.4, -1.1), SurfacePoint.of(0.6, 2.5)}) {
                Painleve3Value e = engine.evaluate(p);
                Painleve3Value v = s.evaluate(p);
                double dw = e.w().subtract(v.w()).norm();
                double ddw = e.dw().subtract(v.dw()).norm();
                assertTrue(dw <= e.errW() + v.errW(), "w at " + p + ": " + dw + " vs " + e.errW());
                assertTrue(ddw <= e.errDw() + v.errDw(), "w' at " + p + ": " + ddw + " vs " + e.errDw());
                assertTrue(dw <= 1e-7 * (1 + v.w().norm()), "engine budget at " + p + ": " + dw + " engine estimate " + e.errW() + " w " + v);
            }
        }
    }

    /**
     * Degree 36 over 28 (n = 8): far from the origin Horner's rule on the monomial coefficients loses digits and
     * the double values come from the product over the roots ({@link ProductForm}); both that form and the value
     * returned must agree with 30-digit values within their estimates, which must stay near 1e-13.
     */
    @Test
    void doubleValuesFarOutAgreeWithManyDigitValues() {
        RationalSolution s = RationalSolution.normalized(8, SpecialPolynomials.mu(1, 3), 1);
        ProductForm form = ProductForm.of(s.polynomials().toArray(new SpecialPolynomial[0]));
        for (int k = 0; k < 8; k++) {
            double t = 2 * Math.PI * k / 8 + 0.1;
            SurfacePoint p = SurfacePoint.of(9.1 * Math.cos(t), 9.1 * Math.sin(t));
            PreciseValue ref = s.evaluate(p, 30);
            for (Painleve3Value v : new Painleve3Value[] {s.evaluate(p), form.evaluate(p, s)}) {
                double ew = v.w().subtract(ref.wDouble()).norm();
                double edw = v.dw().subtract(ref.dwDouble()).norm();
                assertTrue(ew <= v.errW() + 1e-16 * v.w().norm(), "w at " + p + ": " + ew + " vs " + v.errW());
                assertTrue(edw <= v.errDw() + 1e-16 * v.dw().norm(), "w' at " + p + ": " + edw + " vs " + v.errDw());
                assertTrue(v.errW() <= 1e-12 * v.w().norm() && v.errDw() <= 1e-12 * v.dw().norm(), "estimate " + v);
            }
        }
    }

    @Test
    void zerosAndPolesAreWhereTheValuesVanishAndBlowUp() {
        RationalSolution s = RationalSolution.all(ExactParameters.parse("3", "39/2", "4", "-9")).get(0);
        assertTrue(s.zerosAndPolesProvedDistinct());
        List<CertifiedRoot> zeros = s.zeros(30);
        List<CertifiedRoot> poles = s.poles(30);
        assertEquals(s.polynomials().get(0).degree() + s.polynomials().get(1).degree(), count(zeros));
        assertEquals(s.polynomials().get(2).degree() + s.polynomials().get(3).degree(), count(poles));
        for (CertifiedRoot r : zeros) {
            assertTrue(r.correctDigits() >= 30, "digits of " + r);
            Complex z = r.toComplex();
            PreciseValue v = s.evaluate(SurfacePoint.of(z, 0), 20);
            // w vanishes at the (double-rounded) zero up to |w'| times the rounding of z
            double bound = v.dwDouble().norm() * 4e-16 * z.norm();
            assertTrue(v.wDouble().norm() <= bound, "w = " + v.wDouble() + " at zero " + r);
        }
        for (CertifiedRoot r : poles) {
            Complex z = r.toComplex();
            InvalidInputException e = assertThrows(InvalidInputException.class,
                    () -> s.evaluate(SurfacePoint.of(z.getReal(), z.getImaginary())));
            assertTrue(e.getMessage().contains("pole"), e.getMessage());
        }
    }

    @Test
    void integerMuCancelsTheCommonRootsAtZero() {
        // mu = 2, n = 3: S_3(z; 1) = z^3 (...), S_2(z; 2) has no root at 0, S_3(z; 2) = z (...), S_2(z; 1) = z^0 ...
        RationalSolution s = RationalSolution.normalized(3, SpecialPolynomials.mu(2, 1), 1);
        int zeroAtOrigin = 0;
        for (CertifiedRoot r : s.zeros(20)) {
            if (r.value().equals(Apcomplex.ZERO)) {
                zeroAtOrigin = r.multiplicity();
            }
        }
        int orders = s.polynomials().get(0).scaled().zeroRootMultiplicity()
                + s.polynomials().get(1).scaled().zeroRootMultiplicity()
                - s.polynomials().get(2).scaled().zeroRootMultiplicity()
                - s.polynomials().get(3).scaled().zeroRootMultiplicity();
        assertEquals(Math.max(0, orders), zeroAtOrigin);
    }

    private static int count(List<CertifiedRoot> roots) {
        int c = 0;
        for (CertifiedRoot r : roots) {
            c += r.multiplicity();
        }
        return c;
    }
}
