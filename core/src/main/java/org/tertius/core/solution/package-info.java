/**
 * The engine's solution of a polynomial system: the path tree from a start state, grown on demand along selected
 * paths, with dense output from the stored Pade approximants and error estimates carried along the paths.
 *
 * <p>May depend on: {@code number}, {@code equation}, {@code taylor}, {@code pade}, {@code step}, {@code path}.
 */
package org.tertius.core.solution;
