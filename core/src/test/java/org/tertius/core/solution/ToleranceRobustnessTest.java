package org.tertius.core.solution;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.SolverSettings;

/**
 * Tighter tolerances never turn a success into a failure, and a point reachable alone is reachable in any batch.
 * The case of the issue: at tolerance 1e-15 the batch 4, 5, 6 failed at 6 after 20000 steps (tolerances below
 * the rounding level of double precision shrank the steps after noise), while 6 alone succeeded.
 */
class ToleranceRobustnessTest {
    private static final long SEED = 20260517L;
    private static final double[] TOLERANCES = {1e-13, 1e-14, 1e-15, 1e-16};

    private static double[] tau(double re, double im) {
        SurfacePoint p = SurfacePoint.of(re, im, 0);
        return new double[] {p.logRe(), p.logIm()};
    }

    @Test
    void theBatchFourFiveSixSucceedsAtEveryToleranceAndAgreesWithinTheEstimates() {
        double[][] reference = new double[3][];
        for (double tol : TOLERANCES) {
            Solution s = DemoSolutions.demo(SolverSettings.builder().tolerance(tol).build());
            for (int k = 0; k < 3; k++) {
                double[] t = tau(4 + k, 0);
                StateEstimate e = s.evaluate(t[0], t[1]);
                StateEstimate c = s.evaluateCanonical(t[0], t[1]);
                // a few hundred steps at most (the failing run spent 20000)
                assertTrue(e.newSteps() < 500 && c.newSteps() < 500, "steps " + e.newSteps() + ", " + c.newSteps());
                double[] v = {e.re(0), e.im(0), e.error(0)};
                if (reference[k] == null) {
                    reference[k] = v;
                } else {
                    double d = Math.hypot(v[0] - reference[k][0], v[1] - reference[k][1]);
                    assertTrue(d <= v[2] + reference[k][2], "w(" + (4 + k) + ") at tolerance " + tol + " differs by "
                            + d + " from the default's, beyond both estimates");
                }
            }
        }
    }

    @Test
    void aPointReachableAloneIsReachableInAnyBatchAtAnyTolerance() {
        qt().withFixedSeed(SEED).withExamples(8)
                .forAll(longs().all(), integers().between(0, TOLERANCES.length - 1))
                .checkAssert((seed, t) -> {
                    SolverSettings settings = SolverSettings.builder().tolerance(TOLERANCES[t]).build();
                    List<double[]> points = DemoSolutions.randomPoints(new Random(seed), 5);
                    Solution batch = DemoSolutions.demo(settings);
                    for (double[] p : points) {
                        boolean alone = reachable(DemoSolutions.demo(settings), p);
                        boolean inBatch = reachable(batch, p);
                        assertTrue(!alone || inBatch, "reachable alone, not in the batch: " + p[0] + "," + p[1]);
                    }
                });
    }

    private static boolean reachable(Solution s, double[] p) {
        try {
            s.evaluate(p[0], p[1]);
            return true;
        } catch (UnreachableTargetException e) {
            return false;
        }
    }

    @Test
    void theAdviceDoesNotAskForATighterToleranceAtTheRoundingLevel() {
        for (double tol : new double[] {1e-10, 1e-15}) {
            // a bound on the carried error that the first step already exceeds
            Solution s = DemoSolutions.demo(SolverSettings.builder().tolerance(tol).maxError(1e-30).build());
            double[] t = tau(3, 2);
            UnreachableTargetException e = assertThrows(UnreachableTargetException.class,
                    () -> s.evaluate(t[0], t[1]));
            if (tol > PathTracer.ROUNDING_TOLERANCE) {
                assertTrue(e.getMessage().contains("tighten the tolerance"), e.getMessage());
            } else {
                assertFalse(e.getMessage().contains("tighten"), e.getMessage());
                assertTrue(e.getMessage().contains("more digits"), e.getMessage());
            }
        }
    }
}
