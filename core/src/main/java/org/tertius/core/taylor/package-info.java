/**
 * Taylor coefficients of the solutions of polynomial systems: recurrence plans compiled once per system, and
 * the double-precision kernel that runs them.
 *
 * <p>May depend on {@code number} and {@code equation}.
 */
package org.tertius.core.taylor;
