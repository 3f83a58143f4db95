/**
 * Expansions of Painleve III solutions at infinity along rays: the two-parameter transseries about a background of
 * a D6 equation ({@link org.tertius.connection.infinity.TransseriesAtInfinity}) and its special cases (algebraic,
 * oscillating, decaying), and the result type {@link org.tertius.connection.infinity.InfinityBehaviour}. Depends on
 * the core and on {@code zero} (for {@code LocalValue}). The transseries recursion is written once over the
 * arithmetic family: double precision ({@link org.tertius.connection.infinity.TransseriesAtInfinity}) and arbitrary
 * precision from exact data ({@link org.tertius.connection.infinity.PreciseTransseries}).
 */
package org.tertius.connection.infinity;
