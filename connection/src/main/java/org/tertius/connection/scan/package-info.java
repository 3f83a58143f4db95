/**
 * Sweeps over families of solutions, each member classified: the decaying family over lambda
 * ({@link org.tertius.connection.scan.DecayingSweep}, {@link org.tertius.connection.scan.DecayingClassifier}, with
 * cross-checks that leave a member "undecided" rather than give it a label it cannot have) and the power family over
 * a rectangle of (sigma, B) ({@link org.tertius.connection.scan.PowerFamilySweep},
 * {@link org.tertius.connection.scan.PowerFamilyClassifier}); critical values by bisection or root finding; the
 * runner (threads, rows streamed in task order, resume), shards and their merge (the file format in
 * {@link org.tertius.connection.scan.SweepFile}), and the pictures (a plot over lambda, a map over sigma and B).
 *
 * <p>May depend on core, the other connection packages (family, match, closed), Hipparchus and the JDK (Java2D
 * for the pictures); not on the command line.
 */
package org.tertius.connection.scan;
