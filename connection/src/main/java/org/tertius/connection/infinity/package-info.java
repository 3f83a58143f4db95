/**
 * Expansions at infinity: the decaying transseries, algebraic expansions about a constant background and the
 * oscillating two-parameter expansion, each optimally truncated with an error estimate.
 *
 * <p>May depend on: core ({@code number} arithmetics).
 */
package org.tertius.connection.infinity;
