/**
 * A Taylor integrator for small deviations from a constant background, in any precision, that keeps the relative
 * accuracy of an exponentially small deviation.
 *
 * <p>May depend on: core ({@code number} arithmetics).
 */
package org.tertius.connection.path;
