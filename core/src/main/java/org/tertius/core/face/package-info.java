/**
 * The face of a computed solution: what every solution presents to the layers above the engine, whatever
 * equation it solves. {@link org.tertius.core.face.ComputedSolution} names its equation, its independent variable
 * ({@link org.tertius.core.face.Coordinate}: a Riemann surface of log with sheets, or a plane) and its values (w
 * and w' for Painleve III, q, r, q', r' for a hierarchy member), answers {@link
 * org.tertius.core.face.SolutionValue}s with error estimates, and, when the engine integrates it, says how its
 * values are read off the engine's path tree ({@link org.tertius.core.face.EngineReading}, used by regions and pole
 * finding) and how the same path is replayed in arbitrary precision ({@link
 * org.tertius.core.face.HighPrecisionForm}, used by the high-precision replay).
 *
 * <p>May depend on: {@code number}, {@code equation}, {@code solution} (the engine's path tree). Must not depend on
 * any equation's package ({@code piii}) or on the layers that use it ({@code region}, {@code highprecision}).
 */
package org.tertius.core.face;
