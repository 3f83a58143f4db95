package org.tertius.connection.special;

import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Value;

/**
 * A solution of Painleve III known in closed form (or as a Backlund image of one), evaluated directly at any
 * point of the Riemann surface of z, in double precision or to N digits, each value with an error estimate.
 * Implementations are immutable and thread-safe.
 */
public interface SpecialSolution {
    /** Largest number of digits accepted by {@link #evaluate(SurfacePoint, int)}. */
    int MAX_DIGITS = 10000;

    /** The parameters of the equation solved (exact, or exact parts and multiples of square roots). */
    ParameterSet parameters();

    /** The equation solved (parameters rounded to double). */
    default Painleve3 equation() {
        return parameters().equation();
    }

    /** A short name of the kind: rational, bessel, constant, algebraic, backlund. */
    String kind();

    /** A description: the formula, its source, the choices made, the parameters. */
    String description();

    /**
     * w and w' in double precision with estimated absolute errors.
     *
     * @throws org.tertius.core.InvalidInputException at a pole of the solution (within rounding) or where a
     *     Backlund map is singular
     */
    Painleve3Value evaluate(SurfacePoint point);

    /**
     * w and w' to {@code digits} significant digits (more work is spent until the estimate reaches them, within
     * limits; the estimate says how many were reached).
     *
     * @throws org.tertius.core.InvalidInputException as {@link #evaluate(SurfacePoint)}, or for digits outside
     *     [1, {@link #MAX_DIGITS}]
     */
    PreciseValue evaluate(SurfacePoint point, int digits);

    /**
     * As {@link #evaluate(SurfacePoint, int)} at a point given exactly (decimals and rationals as typed: z = 1/3 is
     * one third, not its double); the sheet is that of the point.
     */
    PreciseValue evaluate(ExactPoint point, int digits);
}
