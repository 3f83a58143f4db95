/**
 * Exact polynomial algebra (Gaussian-rational coefficients, 2x2 matrices, Laurent series in the spectral
 * parameter) used to generate and check the hierarchy's equations.
 */
package org.tertius.hierarchy.algebra;
