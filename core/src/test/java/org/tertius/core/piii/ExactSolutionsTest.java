package org.tertius.core.piii;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;

/**
 * Constant and rational solutions, whose values are known in closed form.
 *
 * <p>Constant solutions: w = c solves PIII iff alpha c^2 + beta = 0 and gamma c^4 + delta = 0 (from the
 * equation itself with w' = w'' = 0). Rational solution: w = (z - 1/2)/(z + 1/2) solves PIII with
 * (alpha, beta, gamma, delta) = (2, 2, 1, -1); it is the image of the constant solution w = 1 of
 * (alpha, -alpha, 1, -1) under a Backlund transformation (DLMF §32.7(iii)) and was checked for this project by
 * substitution. It has a pole at -1/2 and a zero at +1/2 with w' = 1 = sqrt(-delta), single-valued round 0.
 * Budget: 1e-12 relative (double precision with a few dozen steps; the estimate must bound the error).
 */
class ExactSolutionsTest {
    private static final double BUDGET = 1e-12;

    @Test
    void constantSolutionStaysConstantOnEverySheet() {
        // c = 1 + i: c^2 = 2i, c^4 = -4: alpha = 1, beta = -2i, gamma = 1, delta = 4
        Complex c = new Complex(1, 1);
        Painleve3 eq = Painleve3.of(Complex.ONE, new Complex(0, -2), Complex.ONE, new Complex(4));
        Painleve3Solution s = Painleve3Solution.builder(eq).start(new Complex(0.7, -0.2), c, Complex.ZERO).build();
        for (SurfacePoint p : new SurfacePoint[] {SurfacePoint.of(2, 1), SurfacePoint.of(-1, 0.5, 1),
            SurfacePoint.of(-1, -0.5, -1), SurfacePoint.of(1e-7, 0)}) {
            Painleve3Value v = s.evaluate(p);
            assertEquals(0, v.w().subtract(c).norm(), BUDGET * 2, "w at " + p);
            assertEquals(0, v.dw().norm(), dwBudget(p, c, Complex.ZERO), "w' at " + p);
            assertTrue(v.dw().norm() <= v.errDw(), "w' error above its estimate at " + p);
        }
    }

    /**
     * Budget for w': w' = (2 w^2 p + B w + C z) / z comes from the momentum p; next to a pole it loses |w| more
     * digits, and next to z = 0 an absolute error e of the state moves the solution to a neighbour whose w'
     * differs by about e/|z| (the linearised flow in log z is not contracting there), which no formulation
     * avoids in double precision: the budget has a term 1e-12/|z|.
     */
    static double dwBudget(SurfacePoint p, Complex w, Complex dw) {
        double scale = (1 + w.norm()) * (1 + w.norm());
        return BUDGET * scale * (1 + dw.norm()) + 1e-12 * scale / p.z().norm();
    }

    static Complex rational(Complex z) {
        return z.subtract(0.5).divide(z.add(0.5));
    }

    static Complex rationalDerivative(Complex z) {
        Complex d = z.add(0.5);
        return d.multiply(d).reciprocal();
    }

    private static void checkRational(Painleve3Solution s, double sign) {
        for (SurfacePoint p : new SurfacePoint[] {SurfacePoint.of(-0.9, 0.05), SurfacePoint.of(-0.9, -0.05, -1),
            SurfacePoint.of(0.52, 0.01), SurfacePoint.of(3, -4), SurfacePoint.of(-1, 0.3, 1),
            SurfacePoint.of(-0.5, 0.06, 2), SurfacePoint.of(2e-8, -1e-8)}) {
            Painleve3Value v = s.evaluate(p);
            Complex w = rational(p.z()).multiply(sign);
            Complex dw = rationalDerivative(p.z()).multiply(sign);
            double e = v.w().subtract(w).norm();
            double ed = v.dw().subtract(dw).norm();
            assertTrue(e <= v.errW(), "error of w " + e + " above estimate " + v.errW() + " at " + p);
            assertTrue(ed <= v.errDw(), "error of w' " + ed + " above estimate " + v.errDw() + " at " + p);
            // next to a simple pole an error d in its position gives a relative error d |w| / |residue|, so the
            // relative budget grows with |w| there
            double scale = (1 + w.norm()) * (1 + w.norm());
            // near z = 0 the error of w grows linearly along the ~18 units of log z travelled (the linearised flow
            // is nilpotent there for this solution), measured: 4e-12 at |z| = 2e-8
            double wBudget = BUDGET * scale * (p.z().norm() < 1e-6 ? 10 : 1);
            assertTrue(e <= wBudget, "error of w " + e + " at " + p);
            assertTrue(ed <= dwBudget(p, w, dw), "error of w' " + ed + " at " + p);
        }
    }

    @Test
    void rationalSolutionThroughItsPoleAndZeroOnSeveralSheets() {
        Painleve3 eq = Painleve3.of(2, 2, 1, -1);
        Complex z0 = new Complex(2, 1);
        Painleve3Solution s = Painleve3Solution.builder(eq).start(z0, rational(z0), rationalDerivative(z0)).build();
        checkRational(s, 1);
    }

    @Test
    void rationalSolutionStartedAtItsZero() {
        // at z0 = 1/2: w = 0, w' = 1, w''' = 6 (z + 1/2)^-4 = 6
        Painleve3 eq = Painleve3.of(2, 2, 1, -1);
        Painleve3Solution s = Painleve3Solution.builder(eq).start(new Complex(0.5), Complex.ZERO, Complex.ONE)
                .thirdDerivativeAtZero(new Complex(6)).build();
        checkRational(s, 1);
    }

    @Test
    void negatedRationalSolutionCrossesZerosWhereTheMomentumHasDoublePoles() {
        // -w solves (-alpha, -beta, gamma, delta); its zero at 1/2 has w' = -1 = -sqrt(-delta)
        Painleve3 eq = Painleve3.of(-2, -2, 1, -1);
        Complex z0 = new Complex(2, 1);
        Painleve3Solution s = Painleve3Solution.builder(eq).start(z0, rational(z0).negate(),
                rationalDerivative(z0).negate()).build();
        checkRational(s, -1);
    }
}
