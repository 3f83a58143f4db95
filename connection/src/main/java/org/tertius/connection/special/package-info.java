/**
 * Special solutions of Painleve III as solution kinds of their own: the rational solutions built from the
 * special polynomials S_n(z; mu) (generated exactly; their roots, the zeros and poles of the solution, to any
 * number of digits with a certified count), the Bessel-type (Riccati) solutions, constant and algebraic
 * solutions, the Backlund transformations acting on values of any solution with error propagation, and a
 * classifier that lists which of these exist for given parameters and why. They present the common face of
 * computed solutions ({@link org.tertius.connection.special.SpecialFace}), as does a Backlund chain applied to any
 * Painleve III solution ({@link org.tertius.connection.special.BacklundImage}); both are
 * {@link org.tertius.connection.special.PointwiseSolution}s: N digits directly at exactly given points, and the
 * engine started from their values as a second route (for poles and zeros).
 *
 * <p>Sources: NIST DLMF §32.7 (Backlund transformations), §32.8 (rational solutions), §32.10 (special function
 * solutions); P. A. Clarkson, J. Phys. A 36 (2003) 9507 (the special polynomials and their recurrence). Each
 * formula is cited where it is used.
 *
 * <p>Values come in double precision as {@link org.tertius.core.piii.Painleve3Value} (with absolute error
 * estimates) and to N digits as {@link org.tertius.connection.special.PreciseValue}; code that computes values is
 * written once over {@link org.tertius.core.number.AnalyticArithmetic}.
 *
 * <p>May depend on core ({@code number}, {@code piii}, {@code mp}, {@code face}, {@code highprecision}, {@code step}), on hierarchy ({@code algebra}, exact Gaussian
 * rationals), on Apfloat and Hipparchus; nothing in core or hierarchy depends on it.
 */
package org.tertius.connection.special;
