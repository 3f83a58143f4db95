/**
 * The choice of the next step towards a target (Fornberg-Weideman path selection, avoiding the poles of every
 * component). Stateless.
 *
 * <p>May depend on {@code number} and {@code step}.
 */
package org.tertius.core.path;
