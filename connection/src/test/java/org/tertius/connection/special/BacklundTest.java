package org.tertius.connection.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;

/**
 * Backlund transformations (NIST DLMF §32.7(iii)): images of engine solutions against the engine integrating
 * the new parameters from the mapped start data, images of special solutions against the equation (residual at
 * high precision), the parameter bookkeeping, and refusals.
 */
class BacklundTest {
    private static final SurfacePoint Z0 = SurfacePoint.of(1.2, 0.3);
    private static final SurfacePoint[] TARGETS = {SurfacePoint.of(2.5, -1), SurfacePoint.of(0.4, 1.3),
        SurfacePoint.of(-1.5, 0.9), SurfacePoint.of(3.5, 2)};

    /**
     * Two routes to the image: map the source's values at each target, or map only the start data and integrate
     * the image's equation. They agree within the sum of the estimates (the engine's and the propagated ones).
     */
    private static void twoRoutesAgree(ExactParameters source, Complex w0, Complex dw0, BacklundChain chain) {
        ParameterSet p = ParameterSet.of(source);
        Painleve3Solution s = Painleve3Solution.builder(source.equation()).start(Z0.z(), w0, dw0).build();
        Painleve3Value start = chain.apply(p, s.evaluate(Z0));
        Painleve3 image = chain.apply(p).equation();
        Painleve3Solution t = Painleve3Solution.builder(image).start(Z0.z(), start.w(), start.dw()).build();
        for (SurfacePoint q : TARGETS) {
            Painleve3Value mapped = chain.apply(p, s.evaluate(q));
            Painleve3Value integrated = t.evaluate(q);
            double ew = mapped.w().subtract(integrated.w()).norm();
            double edw = mapped.dw().subtract(integrated.dw()).norm();
            // the start data carry the mapped error, which the second route propagates like the engine's own
            double slack = 1e3 * (start.errW() + start.errDw());
            String where = chain + " at " + q + " from " + source;
            assertTrue(ew <= mapped.errW() + integrated.errW() + slack, "w " + ew + " " + mapped + " / " + integrated
                    + " " + where);
            assertTrue(edw <= mapped.errDw() + integrated.errDw() + slack, "w' " + edw + " " + where);
            assertTrue(ew <= 1e-7 * (1 + integrated.w().norm()), "agreement budget " + ew + " " + where);
        }
    }

    @Test
    void d6TransformationsAgreeWithTheEngineOnAGenericSolution() {
        ExactParameters p = ExactParameters.parse("3/10", "-11/10", "1", "-1");
        Complex w0 = new Complex(0.8, -0.3);
        Complex dw0 = new Complex(0.1, 0.4);
        for (String chain : new String[] {"T1", "T2", "T3", "T4", "T1 T3", "S2 T2"}) {
            twoRoutesAgree(p, w0, dw0, BacklundChain.parse(chain));
        }
        // gamma < 0 < delta: sqrt(gamma) and sqrt(-delta) on the cut of the principal root (no signed zeros)
        twoRoutesAgree(ExactParameters.parse("3/10", "-11/10", "-1", "1"), w0, dw0, BacklundChain.parse("T1 T4 T3"));
    }

    @Test
    void rescaledD6TransformationAgreesWithTheEngine() {
        // gamma = 4, delta = -2 (sqrt(-delta) irrational: beta carries a multiple of sqrt(2))
        ExactParameters p = ExactParameters.parse("1/2", "1/3", "4", "-2");
        twoRoutesAgree(p, new Complex(0.6, 0.2), new Complex(-0.3, 0.1), BacklundChain.parse("T(+a,-c)"));
        // sqrt(gamma) = 2 is exact and absorbed; sqrt(-delta) = sqrt(2) stays symbolic
        assertEquals("alpha = 17/2, beta = 1/3 + 4*sqrt(-delta), gamma = 4, delta = -2",
                BacklundChain.parse("T1 T1").apply(ParameterSet.of(p)).text());
        assertEquals("alpha = 1/2, beta = 1/3, gamma = 4, delta = -2",
                BacklundChain.parse("T(-a,-c) T1").apply(ParameterSet.of(p)).text());
    }

    @Test
    void d7TransformationsAgreeWithTheEngine() {
        // gamma = 0, alpha = 1, delta = -1 (DLMF 32.7.16-17) and the delta = 0 counterpart
        twoRoutesAgree(ExactParameters.parse("1", "3/10", "0", "-1"), new Complex(0.7, 0.2), new Complex(0.3, -0.2),
                BacklundChain.parse("T5 T5"));
        twoRoutesAgree(ExactParameters.parse("1", "3/10", "0", "-1"), new Complex(0.7, 0.2), new Complex(0.3, -0.2),
                BacklundChain.parse("T6"));
        twoRoutesAgree(ExactParameters.parse("2/5", "1", "1", "0"), new Complex(0.7, 0.2), new Complex(0.3, -0.2),
                BacklundChain.parse("T7'(-a)"));
    }

    @Test
    void imagesOfSpecialSolutionsSolveTheirEquationsAtHighPrecision() {
        SpecialSolution rational = RationalSolution.normalized(2, SpecialPolynomials.mu(1, 3), 1);
        for (String chain : new String[] {"T1", "T2 T3", "S2 T4", "S1"}) {
            ClosedFormSolution image = (ClosedFormSolution) BacklundChain.parse(chain).image(rational);
            for (SurfacePoint q : new SurfacePoint[] {SurfacePoint.of(0.9, 0.6), SurfacePoint.of(-2.2, -0.7)}) {
                double r = Residuals.relativeResidual(image, q, 80);
                assertTrue(r < 1e-40, "residual " + r + " of " + chain + " at " + q);
                PreciseValue v = image.evaluate(q, 50);
                assertTrue(v.correctDigitsW() >= 50 && v.correctDigitsDw() >= 50, "digits " + v);
            }
        }
    }

    @Test
    void inverseStepsRestoreTheValues() {
        ExactParameters p = ExactParameters.parse("3/10", "-11/10", "1", "-1");
        Painleve3Solution s = Painleve3Solution.builder(p.equation()).start(Z0.z(), new Complex(0.8, -0.3),
                new Complex(0.1, 0.4)).build();
        Painleve3Value v = s.evaluate(TARGETS[0]);
        for (String chain : new String[] {"S2 S2", "S1 S1", "T1 T4", "T2 T3"}) {
            Painleve3Value back = BacklundChain.parse(chain).apply(ParameterSet.of(p), v);
            assertTrue(back.w().subtract(v.w()).norm() <= back.errW(), chain + ": " + back + " vs " + v);
            assertTrue(back.dw().subtract(v.dw()).norm() <= back.errDw(), chain + ": " + back + " vs " + v);
        }
    }

    @Test
    void singularPointsAndMismatchedTypesAreRefused() {
        RationalSolution rational = RationalSolution.normalized(1, SpecialPolynomials.mu(1, 2), 1);
        // w = (z - 1/2)/(z + 1/2) vanishes at z = 1/2: every map but -w divides by w
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> BacklundChain.parse("T1").image(rational).evaluate(SurfacePoint.of(0.5, 0)));
        assertTrue(e.getMessage().contains("singular"), e.getMessage());
        ParameterSet d7 = ParameterSet.of(ExactParameters.parse("1", "1/3", "0", "-1"));
        e = assertThrows(InvalidInputException.class, () -> BacklundChain.parse("T5 T1").apply(d7));
        assertTrue(e.getMessage().contains("step 2 of 2") && e.getMessage().contains("gamma delta != 0"),
                e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> BacklundChain.parse("T1 T9"));
        assertTrue(e.getMessage().contains("unknown transformation 'T9'"), e.getMessage());
    }
}
