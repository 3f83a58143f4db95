package org.tertius.core.face;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.tertius.core.number.SurfacePoint;

/**
 * A solution of some equation as Tertius computes it, seen from above the engine: its equation and method in one
 * line each, its variable and surface, the names of its values, and its values with error estimates at any point.
 * Painleve III solutions and their images under symmetries, hierarchy members and the families built from
 * connection data all present this face; regions, pole lists, high precision and the command line work on it
 * alone. Implementations are immutable to callers and safe to share between threads.
 */
public interface ComputedSolution {
    /** The equation solved, one line (for headers and titles). */
    String equationDescription();

    /** How the solution is computed (the form integrated, the family, a closed form), one line. */
    String methodDescription();

    /** The independent variable and its surface. */
    Coordinate coordinate();

    /**
     * The names of the values, in the order of {@link SolutionValue}: "w", "dw" (w') for Painleve III; "q", "r",
     * "dq", "dr" for a hierarchy member. The first is the value drawn in pictures and whose poles and zeros are
     * listed.
     */
    List<String> valueNames();

    /**
     * The quantities the solution keeps (first integrals), checked at every value ({@link SolutionValue#checks()});
     * empty when it keeps none.
     */
    default List<String> invariants() {
        return List.of();
    }

    /**
     * The values at a point of the solution's surface.
     *
     * @throws org.tertius.core.UnreachableTargetException if the point cannot be reached to the tolerance
     * @throws org.tertius.core.InvalidInputException if the point is not on the surface (see {@link Coordinate})
     */
    SolutionValue valueAt(SurfacePoint point);

    /** Values at several points, in order. */
    default List<SolutionValue> valuesAt(List<SurfacePoint> points) {
        List<SolutionValue> out = new ArrayList<>(points.size());
        for (SurfacePoint p : points) {
            out.add(valueAt(p));
        }
        return out;
    }

    /** How the values are read off the engine's path tree; empty for a solution not integrated by the engine. */
    Optional<EngineReading> engineReading();

    /**
     * The solution's form for the high-precision replay.
     *
     * @throws org.tertius.core.InvalidInputException (argument "digits") when this solution cannot be computed in
     *     arbitrary precision, saying why
     */
    HighPrecisionForm highPrecisionForm();

    /** Number of nodes of the engine's path tree (0 when not integrated by the engine). */
    default int nodeCount() {
        return engineReading().map(r -> r.tree().nodeCount()).orElse(0);
    }
}
