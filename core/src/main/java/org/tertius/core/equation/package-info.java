/**
 * First-order polynomial systems as the engine takes them: {@link org.tertius.core.equation.PolynomialSystem}
 * (structure and coefficient values kept apart, so that one structure runs in several precisions), its terms, the
 * independent variable (plain, or logarithmic for a branch point at 0) and projections onto invariant manifolds.
 *
 * <p>May depend on: {@code number}. Knows no equation in particular.
 */
package org.tertius.core.equation;
