/**
 * Solutions from connection data instead of start data ({@link org.tertius.connection.family.Families}): the
 * decaying, power, analytic, algebraic and oscillating families, each handed to the engine as start data with an
 * error estimate.
 *
 * <p>May depend on: core and the other connection packages.
 */
package org.tertius.connection.family;
