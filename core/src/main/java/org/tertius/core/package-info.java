/**
 * Tertius core: a complex-plane Taylor-Pade integrator for first-order polynomial systems (pole
 * vaulting along selected paths, sheet tracking round a logarithmic branch point, dense output with
 * error estimates), and the third Painleve equation as its first instance.
 *
 * <p>Packages, from the bottom up: {@code number} (complex helpers, points of the universal cover,
 * and the arithmetics that let code run in double and arbitrary precision alike), {@code equation}
 * (polynomial systems, Painleve III parameters and forms), {@code taylor} (recurrence plans and
 * kernels), {@code pade} (robust Pade approximants, polynomial roots),
 * {@code step} (one Taylor-Pade step with error estimate), {@code path} (path selection),
 * {@code solution} (path trees and dense output), {@code piii} (Painleve III solutions).
 */
package org.tertius.core;
