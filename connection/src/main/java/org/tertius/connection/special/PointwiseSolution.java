package org.tertius.connection.special;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;

/**
 * A solution whose values at a point come from a formula applied at that point: a closed form ({@link SpecialFace})
 * or a Backlund chain applied to the values of another solution ({@link BacklundImage}). It presents the common
 * face (values in double precision with errors; regions evaluate it point by point, since no engine path tree
 * holds it) and computes N digits at a point given exactly, directly, without a path replay.
 */
public interface PointwiseSolution extends ComputedSolution {
    /**
     * w and w' at the point (taken exactly) to {@code digits} significant digits, with estimated errors.
     *
     * @throws org.tertius.core.InvalidInputException at a pole of the solution or where a Backlund map is singular
     */
    PreciseValue evaluate(ExactPoint point, int digits);

    /**
     * The parameter bookkeeping of the Backlund steps applied, one line per entry (the start parameters, then each
     * step with its formula and the parameters reached); empty when no step was applied.
     */
    List<String> history();

    /** The equation solved (parameters rounded to double). */
    Painleve3 equation();

    /**
     * The same solution integrated by the engine: started from its double-precision values w, w' at the first of
     * the points 1, 1+i, 1-i, 2, 1/2, 3i, -3i, 3 (principal sheet) where they are finite, w is not small
     * (|w| &gt;= 1e-3) and their estimated relative error is below 1e-12. A second route to the solution, whose
     * path tree gives poles and zeros like that of any integrated solution.
     *
     * @throws InvalidInputException if no such start point is found
     */
    default Painleve3Solution integrated(SolverSettings settings) {
        double[][] candidates = {{1, 0}, {1, 1}, {1, -1}, {2, 0}, {0.5, 0}, {0, 3}, {0, -3}, {3, 0}};
        for (double[] c : candidates) {
            SurfacePoint p = SurfacePoint.of(c[0], c[1]);
            SolutionValue v;
            try {
                v = valueAt(p);
            } catch (TertiusException e) {
                continue;
            }
            Complex w = v.value(0);
            if (w.norm() >= 1e-3 && Double.isFinite(v.maxRelativeError()) && v.maxRelativeError() <= 1e-12) {
                return Painleve3Solution.builder(equation()).settings(settings).start(p.z(), w, v.value(1))
                        .startComputedBy("the values of " + methodDescription() + " at z = " + p.z()).build();
            }
        }
        throw new InvalidInputException("solution", "no start point for the engine found among 1, 1+i, 1-i, 2, 1/2,"
                + " 3i, -3i, 3 (the values there are poles, zeros or not known to 1e-12)");
    }
}
