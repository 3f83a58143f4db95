/**
 * Closed-form connection formulas between the behaviour at 0 and at infinity: the decaying family of
 * PIII(0, 0, 1, -1) (McCoy, Tracy and Wu) and its continuation, the Bessel-function family of D6, and the bridge
 * between the behaviour of any D6 solution at 0 and the monodromy data of its lambda-equation
 * ({@link org.tertius.connection.closed.ZeroMonodromyBridge}, {@link org.tertius.connection.closed.MonodromyFromZero}),
 * and between the monodromy data and the oscillation at infinity, drift and ratio p/q
 * ({@link org.tertius.connection.closed.InfinityMonodromyBridge}, the ratio in
 * {@link org.tertius.connection.closed.OscillationPhase}; it also uses the transseries of
 * org.tertius.connection.infinity).
 * Depends on the core (Apfloat for Gamma and Bessel functions) and, for the bridge, on the hierarchy's member-1 map
 * and its estimates (org.tertius.hierarchy, org.tertius.hierarchy.monodromy).
 */
package org.tertius.connection.closed;
