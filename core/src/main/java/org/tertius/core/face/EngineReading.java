package org.tertius.core.face;

import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;

/**
 * How the values of a solution are read off the engine's path tree: the map between the solution's points and
 * the engine variable tau (tau = log u + const on a logarithmic surface, tau = u in the plane), the values from an
 * engine state, and which state component carries the first value — so that regions (read from stored Pade
 * approximants) and the poles and zeros of that value (roots of those approximants) are found for any equation.
 *
 * <p>The first value is {@code f(p) * y_c} or {@code f(p) / y_c} with {@code c = }{@link #primaryComponent()},
 * the reciprocal when {@link #primaryReciprocal()}, and {@code f = }{@link #primaryFactor}: a pole of y_c is then
 * a pole (or, reciprocal, a zero) of the first value.
 */
public interface EngineReading {
    /** The engine's path tree. */
    Solution tree();

    /** Real part of the engine variable at a point. */
    double tauRe(SurfacePoint p);

    /** Imaginary part of the engine variable at a point. */
    double tauIm(SurfacePoint p);

    /** The point at engine variable tau. */
    SurfacePoint point(double tauRe, double tauIm);

    /** d u / d tau at a point (u the solution's variable): u on a logarithmic surface, 1 in the plane. */
    Complex coordinateDerivative(SurfacePoint p);

    /** The values at a point from an engine estimate at tau(p). */
    SolutionValue read(SurfacePoint p, StateEstimate state);

    /** The state component that carries the first value (or its reciprocal). */
    int primaryComponent();

    /** Whether the first value is f / y_c rather than f y_c. */
    boolean primaryReciprocal();

    /** The factor f(p) of the first value (see the class comment). */
    Complex primaryFactor(SurfacePoint p);
}
