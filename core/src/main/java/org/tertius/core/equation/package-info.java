/**
 * First-order polynomial systems (unknowns, terms, the independent variable and invariant-manifold
 * projections): what the engine integrates.
 *
 * <p>May depend on {@code org.tertius.core} (exceptions) and {@code number}.
 */
package org.tertius.core.equation;
