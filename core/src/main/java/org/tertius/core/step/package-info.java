/**
 * One Taylor-Pade step: the expansion of a polynomial system at a point into a node (Pade approximants of two
 * orders, radius adapted to the tolerance, error vector carried by the flow), and the settings of the integrator.
 *
 * <p>May depend on {@code org.tertius.core} (exceptions), {@code number}, {@code equation}, {@code taylor} and
 * {@code pade}.
 */
package org.tertius.core.step;
