/**
 * Tertius core: a complex-plane Taylor-Pade integrator for first-order polynomial systems (pole vaulting along
 * selected paths, sheet tracking round a logarithmic branch point, dense output with error estimates), one
 * equation-neutral face of a computed solution above it, and the third Painleve equation as its first instance.
 *
 * <p>Packages, from the bottom up: {@code number} (number types, points of the universal cover, the arithmetics that
 * let code run in double and arbitrary precision alike), {@code equation} (polynomial systems), {@code taylor}
 * (recurrence plans and kernels), {@code pade} (robust Pade approximants, polynomial roots), {@code step} (one
 * Taylor-Pade step with error estimate), {@code path} (path selection), {@code solution} (path trees and dense
 * output), {@code mp} (the same engine in arbitrary precision); {@code face} (what every computed solution
 * presents), {@code region} (grids, pole finding) and {@code highprecision} (the replay of planned paths to many
 * digits) work on the face; {@code piii} (Painleve III) presents it. This package holds the exception family.
 */
package org.tertius.core;
