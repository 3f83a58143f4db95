/**
 * Sweeps over families of solutions: classification of each member on the positive axis and at 0 (with
 * cross-checks that leave a member "undecided" rather than give it a label it cannot have), the runner that
 * streams and resumes sweeps, critical parameter values and the plot of a sweep.
 *
 * <p>May depend on {@code org.tertius.core} and {@code org.tertius.connection.match}.
 */
package org.tertius.connection.scan;
