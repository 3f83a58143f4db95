/**
 * Taylor coefficients of polynomial systems: a recurrence plan compiled once per system (shared products, no
 * numbers) and the double-precision kernel that runs it on primitive arrays.
 *
 * <p>May depend on: {@code equation}.
 */
package org.tertius.core.taylor;
