/**
 * Solutions of polynomial systems with dense output: path trees of Taylor-Pade nodes, and three ways to evaluate
 * them by what a value may depend on (canonical paths from the root, frozen trees, growing trees; see
 * {@link org.tertius.core.solution.Solution}).
 *
 * <p>May depend on {@code org.tertius.core} (exceptions), {@code number}, {@code equation}, {@code taylor},
 * {@code step} and {@code path}; nothing in the core below it depends on it.
 */
package org.tertius.core.solution;
