/**
 * Expansions at z = 0: the convergent power series w = B z^sigma V(z^(1+sigma), z^(1-sigma)) and the logarithmic
 * member of the decaying family, as start data with error estimates.
 *
 * <p>May depend on: core ({@code number} arithmetics).
 */
package org.tertius.connection.zero;
