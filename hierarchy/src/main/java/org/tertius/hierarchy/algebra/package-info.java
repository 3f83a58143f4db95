/**
 * Exact polynomial algebra (Gaussian-rational coefficients, 2x2 matrices, Laurent series in the spectral
 * parameter) used to generate and check the hierarchy's equations, and their evaluation in the core's
 * arithmetics ({@link org.tertius.hierarchy.algebra.Evaluation}), the high-precision engine's numbers included.
 *
 * <p>May depend on: core {@code number}, Hipparchus fractions.
 */
package org.tertius.hierarchy.algebra;
