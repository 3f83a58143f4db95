/**
 * Robust Pade approximants from Taylor coefficients and roots of their denominators. Works on arrays of
 * doubles; stateless.
 *
 * <p>May depend on {@code number} only.
 */
package org.tertius.core.pade;
