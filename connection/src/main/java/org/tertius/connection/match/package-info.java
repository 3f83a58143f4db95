/**
 * Connects computed solutions with the expansions: the behaviour at 0 ({@link
 * org.tertius.connection.match.ZeroBehaviourFit}) and at infinity along a ray ({@link
 * org.tertius.connection.match.InfinityBehaviourFit}), pole-free sectors ({@link
 * org.tertius.connection.match.PoleFreeSector}), the power behaviour at 0 in arbitrary precision both ways ({@link
 * org.tertius.connection.match.PreciseZeroFit}), the amplitudes at infinity in arbitrary precision ({@link
 * org.tertius.connection.match.PreciseInfinityFit}), and the decaying family's numerical connection. Depends on the
 * core, {@code zero}, {@code infinity} and {@code path}.
 */
package org.tertius.connection.match;
