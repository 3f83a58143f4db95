package org.tertius.tests.face;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.Singularity;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;
import org.tertius.core.step.Node;

/**
 * One suite of checks run against every kind of computed solution through its equation-neutral face (after the
 * one-abstract-suite-per-interface pattern, common practice): two paths to a point agree, a path out and back
 * returns the start state, a grid agrees with direct evaluation, the pole list agrees with the values beside each
 * pole, and the high-precision replay agrees with double precision within the estimates (or is refused with a
 * reason). All checks are internal consistency checks of the engine against itself; budgets are the solutions'
 * own error estimates times the safety noted at each check.
 */
abstract class ComputedSolutionChecks {
    /** A new solution of the kind (fresh path tree). */
    abstract ComputedSolution fresh();

    /** A point a few steps from the start, reachable along different paths. */
    abstract SurfacePoint target();

    /** Another point, visited first to make the second path to {@link #target()} differ from the first. */
    abstract SurfacePoint detour();

    /** A small region of the surface with at least one pole or zero of the first value. */
    abstract Grid region();

    /** Digits for the high-precision check, or 0 when the kind refuses the replay. */
    abstract int digits();

    @Test
    void twoPathsToAPointAgreeWithinTheirEstimates() {
        SolutionValue direct = fresh().valueAt(target());
        ComputedSolution other = fresh();
        other.valueAt(detour());
        SolutionValue around = other.valueAt(target());
        for (int i = 0; i < direct.size(); i++) {
            double d = direct.value(i).subtract(around.value(i)).norm();
            // common practice: two estimates of one value differ by at most the sum of their error bounds (x2)
            assertTrue(d <= 2 * (direct.error(i) + around.error(i)) + 1e-14, "value " + i + " differs by " + d
                    + " (estimates " + direct.error(i) + ", " + around.error(i) + ")");
        }
    }

    @Test
    void aPathOutAndBackReturnsTheStartState() {
        ComputedSolution s = fresh();
        EngineReading reading = s.engineReading().orElse(null);
        if (reading == null) {
            return;
        }
        Solution tree = reading.tree();
        Node root = tree.root();
        StateEstimate far = tree.evaluate(reading.tauRe(target()), reading.tauIm(target()));
        int n = far.dimension();
        double[] re = new double[n];
        double[] im = new double[n];
        double[] err = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = far.re(i);
            im[i] = far.im(i);
            err[i] = far.error(i);
        }
        Solution back = Solution.start(tree.system(), tree.settings(), StateProjection.NONE, far.tauRe(), far.tauIm(), re,
                im, err, new double[n]);
        StateEstimate home = back.evaluate(root.tauRe(), root.tauIm());
        for (int i = 0; i < n; i++) {
            double d = Math.hypot(home.re(i) - root.stateRe(i), home.im(i) - root.stateIm(i));
            assertTrue(d <= 2 * home.error(i) + 1e-13 * (1 + Math.hypot(root.stateRe(i), root.stateIm(i))),
                    "component " + i + " returns " + d + " away (estimate " + home.error(i) + ")");
        }
    }

    @Test
    void aGridAgreesWithDirectEvaluation() {
        Grid g = region();
        ComputedSolution s = fresh();
        GridResult r = RegionSolver.solve(s, g, RegionSettings.defaults());
        ComputedSolution other = fresh();
        int checked = 0;
        for (int j = 0; j < g.ny(); j += 3) {
            for (int i = 0; i < g.nx(); i += 3) {
                if (!r.computed(i, j)) {
                    continue;
                }
                SolutionValue direct = other.valueAt(r.point(i, j));
                double d = r.primary(i, j).subtract(direct.value(0)).norm();
                assertTrue(d <= 2 * (r.error(i, j) + direct.error(0)) + 1e-13, "grid and direct differ by " + d
                        + " at " + r.point(i, j));
                checked++;
            }
        }
        assertTrue(checked > 10, "grid points checked: " + checked);
    }

    @Test
    void everyListedPoleOrZeroShowsInTheValuesBesideIt() {
        ComputedSolution s = fresh();
        Grid g = region();
        List<Singularity> found = PoleFinder.find(RegionSolver.solve(s, g, RegionSettings.defaults()));
        assertTrue(!found.isEmpty(), "no pole or zero found in " + g.re0() + ".." + g.re1());
        for (Singularity p : found) {
            double h = 1e-3;
            SurfacePoint beside = s.coordinate().point("test", p.point().re() + h, p.point().im(), p.point().sheet());
            Complex v = s.valueAt(beside).value(0);
            // w ~ c / (u - p) at a pole, w ~ c (u - p) at a zero; the relative deviation of the next order is O(h),
            // plus the position error over h (common practice: leading term of a Laurent or Taylor series)
            Complex expected = p.kind() == Singularity.Kind.POLE ? p.lead().divide(h) : p.lead().multiply(h);
            double rel = v.subtract(expected).norm() / expected.norm();
            assertTrue(rel <= 50 * h + 10 * p.error() / h, p + ": value beside it " + v + ", expected " + expected);
        }
    }

    @Test
    void digitsAgreeWithDoublePrecisionWithinTheEstimates() {
        ComputedSolution s = fresh();
        if (digits() == 0) {
            InvalidInputException e = assertThrows(InvalidInputException.class, () -> HighPrecisionSolution.of(s, 20));
            assertEquals("digits", e.argument(), e.getMessage());
            return;
        }
        HighPrecisionValue hp = HighPrecisionSolution.of(s, digits()).evaluate(target());
        assertTrue(hp.correctDigits() >= digits(), "claimed " + hp.correctDigits());
        SolutionValue v = fresh().valueAt(target());
        for (int i = 0; i < v.size(); i++) {
            Apcomplex a = hp.value(i);
            Complex precise = new Complex(a.real().doubleValue(), a.imag().doubleValue());
            double d = precise.subtract(v.value(i)).norm();
            assertTrue(d <= v.error(i) + 1e-15 * precise.norm(), "value " + i + ": double differs by " + d
                    + ", estimate " + v.error(i));
        }
    }
}
