package org.tertius.connection.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Special solutions and Backlund images on the common face, through the library: a Backlund chain applied to the
 * engine's solution agrees with the same chain applied to the closed form; the engine started from a closed form's
 * values reproduces it; poles are unreachable points, not numbers.
 */
class PointwiseSolutionTest {
    /** PIII(1, 1, 1, -1): alpha + beta = 2, the Riccati seed with a = c = 1 (DLMF 32.10(iv)). */
    private static final ExactParameters SEED = ExactParameters.of(1, 1, 1, -1);

    @Test
    void aChainOnTheEngineAgreesWithTheChainOnTheClosedForm() {
        // DLMF 32.7.11 (T1) then 32.7.7 (1/w) on a Bessel-type solution (DLMF 32.10(iv)): once on the closed form,
        // once on the engine's solution started from the closed form's values at z = 1
        BesselTypeSolution bessel = BesselTypeSolution.of(SEED, GaussianRational.ONE, GaussianRational.rational(1, 2));
        BacklundChain chain = BacklundChain.parse("T1 S2");
        SpecialFace closed = SpecialFace.of(bessel, chain);
        Painleve3Solution engine = SpecialFace.of(bessel).integrated(SolverSettings.defaults());
        BacklundImage image = BacklundImage.of(engine, SEED, chain);
        assertEquals(closed.equationDescription(), image.equationDescription());
        assertTrue(image.history().get(0).startsWith("start: alpha = 1, beta = 1"), image.history().toString());
        for (double[] z : new double[][] {{2, 1}, {0.5, -1}, {-1.5, 0.5}, {3, 0}}) {
            SurfacePoint p = SurfacePoint.of(z[0], z[1]);
            SolutionValue a = closed.valueAt(p);
            SolutionValue b = image.valueAt(p);
            // the engine's start data carry the closed form's error (1e-15) into its run: a factor 10 for it
            for (int i = 0; i < 2; i++) {
                double allowed = 10 * (a.error(i) + b.error(i));
                assertTrue(a.value(i).subtract(b.value(i)).norm() <= allowed, p + " value " + i + ": "
                        + a.value(i) + " vs " + b.value(i) + ", allowed " + allowed);
            }
        }
    }

    @Test
    void aPoleOfAClosedFormIsAnUnreachablePoint() {
        // PIII(3, 1, 1, -1): w = z/(z + 1) (n = 1, mu = 1 in Clarkson, J. Phys. A 36 (2003) 9507, Thm 2.1; checked by
        // substitution, from memory): a pole at z = -1
        SpecialFace rational = SpecialFace.of(RationalSolution.of(ExactParameters.of(3, 1, 1, -1), 0));
        assertThrows(UnreachableTargetException.class, () -> rational.valueAt(SurfacePoint.of(-1, 0)));
        SolutionValue v = rational.valueAt(SurfacePoint.of(1, 0));
        assertEquals(0.5, v.value(0).getReal(), 1e-15);
        assertEquals(0.25, v.value(1).getReal(), 1e-15);
        assertThrows(InvalidInputException.class, rational::highPrecisionForm);
    }

    @Test
    void aStepThatDoesNotApplyIsRefusedWithItsCondition() {
        Painleve3Solution engine = SpecialFace.of(BesselTypeSolution.of(SEED, GaussianRational.ONE,
                GaussianRational.ZERO)).integrated(SolverSettings.defaults());
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> BacklundImage.of(engine,
                SEED, BacklundChain.parse("T5")));
        assertTrue(e.getMessage().contains("needs gamma = 0"), e.getMessage());
    }
}
