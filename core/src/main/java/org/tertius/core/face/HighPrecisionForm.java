package org.tertius.core.face;

import java.util.List;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.solution.Solution;

/**
 * What the high-precision replay needs of a solution integrated by the engine: the double-precision path tree that
 * plans the paths, and the same polynomial system in arbitrary precision from exact data — its coefficients, the
 * start point and start state, and the values from a state — at any working precision.
 *
 * <p>Implementations compute everything from exact data (decimals, rationals) rounded once to the given context, so
 * that a run at D digits inherits no shorter precision from its data; {@link #requireDigits} refuses data known to
 * fewer digits (for example binary doubles for more than 15 digits).
 */
public interface HighPrecisionForm {
    /** The double-precision path tree of the same system, from the same start (plans the paths). */
    Solution planner();

    /** The variable and surface of the solution's points. */
    Coordinate coordinate();

    /** Names of the values returned by {@link #values}, as {@link ComputedSolution#valueNames()}. */
    List<String> valueNames();

    /**
     * Checks that every datum is known to at least that many significant digits.
     *
     * @throws org.tertius.core.InvalidInputException naming the datum that is not
     */
    void requireDigits(int digits);

    /** The coefficient values of the planner's system, in the order of its coefficient list. */
    MpComplex[] coefficients(MpContext ctx);

    /** The engine variable at the start. */
    MpComplex startTau(MpContext ctx);

    /** The state at the start. */
    MpComplex[] startState(MpContext ctx);

    /**
     * The engine variable of the point u on the given sheet: log u + 2 pi i sheet on a logarithmic surface, u in
     * the plane.
     */
    default MpComplex tau(MpContext ctx, MpComplex u, int sheet) {
        return coordinate().tau(ctx, u, sheet);
    }

    /** The point u of the engine variable tau (the inverse of {@link #tau}, sheets aside). */
    default MpComplex coordinateOf(MpContext ctx, MpComplex tau) {
        return coordinate().fromTau(ctx, tau);
    }

    /** The values at the point u from the state there. */
    MpComplex[] values(MpContext ctx, MpComplex u, MpComplex[] state);
}
