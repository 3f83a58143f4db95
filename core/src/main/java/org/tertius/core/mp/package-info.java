/**
 * The arbitrary-precision engine for any polynomial system: the fixed-point Taylor kernel that runs the same
 * recurrence plan as the double-precision engine (28-bit limbs, exact column sums), continued-fraction Pade steps,
 * {@link org.tertius.core.mp.SegmentIntegrator} (order and step from the digits, pole vaulting, dense output along
 * planned waypoints), and the worker threads of its parallel parts.
 *
 * <p>May depend on: {@code number}, {@code taylor}, {@code equation}. Knows no equation in particular and nothing
 * of how paths are planned (that is {@code highprecision}'s job).
 */
package org.tertius.core.mp;
