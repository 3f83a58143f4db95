/**
 * Solutions over regions, for any computed solution: grids of one sheet and strips in log z ({@link
 * org.tertius.core.region.Grid}), the region solver (a tree grown outwards, then every point read from stored
 * approximants on all threads), and poles and zeros of a solution's first value read off the approximants ({@link
 * org.tertius.core.region.PoleFinder}).
 *
 * <p>May depend on: {@code number}, {@code face}, {@code solution}, {@code step}, {@code pade}. Must not depend on
 * any equation's package.
 */
package org.tertius.core.region;
