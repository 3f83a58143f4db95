/**
 * Monodromy data of the lambda-equation of the hierarchy's Lax pair (hierarchy/README.md): the direct map from a
 * member state to the formal monodromy, Stokes matrices and connection matrix ({@link
 * org.tertius.hierarchy.monodromy.MonodromyMap}, conventions in its class comment), and the inverse map from
 * prescribed data to a member state ({@link org.tertius.hierarchy.monodromy.InverseMonodromy}). Numerics are written
 * once over {@link org.tertius.core.number.AnalyticArithmetic} (double and arbitrary precision).
 *
 * <p>May depend on {@code org.tertius.core} and {@code org.tertius.hierarchy}; nothing in the hierarchy depends on
 * it.
 */
package org.tertius.hierarchy.monodromy;
