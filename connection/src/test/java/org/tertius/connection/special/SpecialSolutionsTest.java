package org.tertius.connection.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * The classifier, the constant and the algebraic (D7) solutions: every kind reported to exist is built and
 * checked against the equation; every refusal names its condition.
 */
class SpecialSolutionsTest {

    private static SpecialSolutions.Finding finding(ExactParameters p, String kind) {
        for (SpecialSolutions.Finding f : SpecialSolutions.classify(p)) {
            if (f.kind().equals(kind)) {
                return f;
            }
        }
        throw new AssertionError("no finding " + kind);
    }

    @Test
    void classificationOfSomeParameterSets() {
        // (2, 2, 1, -1): alpha + beta = 4 (rational n = 1, mu = 1/2), no 4n + 2, c^2 = -1 constants
        ExactParameters p = ExactParameters.of(2, 2, 1, -1);
        assertTrue(finding(p, "rational").exists());
        assertTrue(finding(p, "rational").explanation().contains("n = 1, mu = 1/2"), finding(p, "rational").toString());
        assertFalse(finding(p, "bessel").exists());
        assertTrue(finding(p, "bessel").explanation().contains("4n + 2"));
        assertEquals(2, finding(p, "constant").count());
        // (1, 1, 1, -1): alpha + beta = 2, a Bessel seed
        p = ExactParameters.of(1, 1, 1, -1);
        assertTrue(finding(p, "bessel").exists());
        assertFalse(finding(p, "rational").exists());
        // generic: nothing
        p = ExactParameters.parse("1/3", "1/5", "1", "-1");
        for (SpecialSolutions.Finding f : SpecialSolutions.classify(p)) {
            assertFalse(f.exists(), f.toString());
        }
        assertTrue(finding(p, "constant").explanation().contains("gamma beta^2 + delta alpha^2 = 0"));
        // D7 with beta^2 / (-4 delta) = 4
        p = ExactParameters.of(1, 4, 0, -1);
        assertTrue(finding(p, "algebraic").exists());
        assertFalse(finding(p, "rational").exists());
        assertTrue(finding(p, "bessel").explanation().contains("gamma delta != 0"));
        // D8: two constants
        p = ExactParameters.of(1, -4, 0, 0);
        assertEquals(2, finding(p, "constant").count());
        // quadrature
        p = ExactParameters.of(0, 1, 0, -1);
        assertTrue(finding(p, "quadrature").exists());
        String report = SpecialSolutions.report(ExactParameters.parse("3", "39/2", "4", "-9"));
        assertTrue(report.contains("rational: yes - n = 2, mu = -3/4"), report);
    }

    /** Everything reported to exist is built and solves the equation (residual at 60 digits). */
    @Test
    void everySolutionReportedToExistSolvesTheEquation() {
        ExactParameters[] sets = {ExactParameters.of(2, 2, 1, -1), ExactParameters.of(1, 1, 1, -1),
            ExactParameters.parse("-2", "3", "4", "-1"), ExactParameters.of(1, 4, 0, -1),
            ExactParameters.parse("6", "1/2", "9", "0"), ExactParameters.of(1, -4, 0, 0),
            ExactParameters.parse("0", "0", "2", "-8"),
            // gamma < 0 < delta: the square roots are imaginary (principal branch on the negative axis)
            ExactParameters.parse("2i", "2i", "-1", "1"), ExactParameters.parse("i", "i", "-1", "1")};
        for (ExactParameters p : sets) {
            List<ClosedFormSolution> built = new ArrayList<>();
            built.addAll(RationalSolution.all(p));
            for (RootChoice f : BesselTypeSolution.families(p)) {
                built.add(BesselTypeSolution.of(p, f, GaussianRational.ONE, GaussianRational.of(1, 1)));
            }
            built.addAll(ConstantSolution.all(p));
            built.addAll(AlgebraicSolution.all(p));
            int reported = 0;
            for (SpecialSolutions.Finding f : SpecialSolutions.classify(p)) {
                reported += f.exists() && !f.kind().equals("quadrature") ? 1 : 0;
            }
            assertTrue(reported > 0 && !built.isEmpty(), "nothing found for " + p);
            for (ClosedFormSolution s : built) {
                for (SurfacePoint q : new SurfacePoint[] {SurfacePoint.of(0.9, 0.7), SurfacePoint.of(-1.3, -0.4, 1)}) {
                    double r = Residuals.relativeResidual(s, q, 60);
                    assertTrue(r < 1e-30, "residual " + r + " at " + q + " of " + s.description());
                }
            }
        }
    }

    /** D7 algebraic solutions (z^(1/3) and a T7 step) against the engine, across sheets. */
    @Test
    void algebraicSolutionsAgreeWithTheEngineAcrossSheets() {
        for (ExactParameters p : new ExactParameters[] {ExactParameters.parse("2", "0", "0", "-3"),
            ExactParameters.of(1, 2, 0, -1)}) {
            AlgebraicSolution s = AlgebraicSolution.of(p, 1);
            SurfacePoint z0 = SurfacePoint.of(1.2, 0.4);
            Painleve3Value v0 = s.evaluate(z0);
            Painleve3Solution e = Painleve3Solution.builder(s.equation()).start(z0.z(), v0.w(), v0.dw()).build();
            for (SurfacePoint q : new SurfacePoint[] {SurfacePoint.of(2, -1), SurfacePoint.of(-1, 0.5, 1),
                SurfacePoint.of(-1, -0.5, -1)}) {
                Painleve3Value a = e.evaluate(q);
                Painleve3Value b = s.evaluate(q);
                double d = a.w().subtract(b.w()).norm();
                assertTrue(d <= a.errW() + b.errW(), "w at " + q + ": " + d + " " + s.description());
            }
        }
    }

    @Test
    void refusalsNameTheFailingCondition() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> AlgebraicSolution.of(ExactParameters.of(1, 3, 0, -1), 0));
        assertTrue(e.getMessage().contains("not the square of an integer"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> ConstantSolution.of(ExactParameters.of(1, 1, 1, 1), 0));
        assertTrue(e.getMessage().contains("gamma beta^2 + delta alpha^2 = 0"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> AlgebraicSolution.of(ExactParameters.of(1, 1, 1, -1), 0));
        assertTrue(e.getMessage().contains("type D7"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> RationalSolution.of(ExactParameters.parse("1/3", "1", "1",
                "-1"), 0));
        assertTrue(e.getMessage().contains("alpha/a + beta/c = 4n (n >= 1) fails") && e.getMessage().contains("1/9"),
                e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> RationalSolution.of(ExactParameters.of(1, 1, 0, -1), 0));
        assertTrue(e.getMessage().contains("gamma delta != 0"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> RationalSolution.of(ExactParameters.of(2, 2, 1, -1), 2));
        assertTrue(e.getMessage().contains("[0, 1]"), e.getMessage());
    }
}
