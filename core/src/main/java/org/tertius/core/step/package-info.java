/**
 * One Taylor-Pade step: the settings, the immutable node (state, disk, approximants of two orders, error
 * propagation, singularities found) and the thread-confined stepper that makes nodes.
 *
 * <p>May depend on: {@code number}, {@code equation}, {@code taylor}, {@code pade}.
 */
package org.tertius.core.step;
