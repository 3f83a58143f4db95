/**
 * Robust Pade approximants of Taylor series (rank-revealing QR, degree reduction, defect against every known
 * coefficient) and polynomial roots, in double precision.
 *
 * <p>May depend on: {@code number}.
 */
package org.tertius.core.pade;
