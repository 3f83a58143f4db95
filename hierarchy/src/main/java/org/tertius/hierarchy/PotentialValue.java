package org.tertius.hierarchy;

import org.hipparchus.complex.Complex;

/**
 * The potential q of a member solution at one point x, with its estimated absolute error: the cheap evaluation
 * for grids ({@link MemberSolution#potential}). Immutable.
 *
 * @param x the point
 * @param q the value of q
 * @param error its estimated absolute error
 */
public record PotentialValue(Complex x, Complex q, double error) {
}
