/**
 * Closed-form connection formulas from the literature (McCoy, Tracy and Wu for the decaying family), with their
 * sources and the checks against the numerical connection in the class comments.
 *
 * <p>May depend on: core, Apfloat.
 */
package org.tertius.connection.closed;
