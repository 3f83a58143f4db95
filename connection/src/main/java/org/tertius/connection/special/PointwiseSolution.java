package org.tertius.connection.special;

import java.util.List;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.ExactPoint;

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
}
