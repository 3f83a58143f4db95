package org.tertius.hierarchy.nls;

import org.hipparchus.complex.Complex;

/**
 * Psi at one point of the (X, T) plane with its estimated absolute error and the route that computed it
 * ("member 1" at T = 0, "t-series" or "t-flow" on X = 0, "line" for the x-flow from X = 0, "small-time series"
 * from member 1 for tiny |T|, "path tree" for the core engine at complex points). Immutable.
 *
 * @param x X (real part for complex points)
 * @param t T
 * @param psi the value
 * @param error its estimated absolute error
 * @param route how it was computed
 */
public record ProfileValue(Complex x, Complex t, Complex psi, double error, String route) {
}
