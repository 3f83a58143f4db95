/**
 * The near-field profile of focusing NLS (family name "nearfield"): the member-2 solution analytic at
 * x = t_2 = 0 with s = 2, m = 0 and a_-2(0) = (0, 2i, 2i), Psi(0, 0) = 4, and its relatives under the phase and
 * scaling symmetries of NLS ({@link org.tertius.hierarchy.nls.NearFieldProfile}); its values over the (X, T) plane
 * with error estimates, its mass, its map to Painleve III at T = 0, and its large-X asymptotics at T = 0
 * ({@link org.tertius.hierarchy.nls.FarField}). Depends on {@code org.tertius.hierarchy} and the core only; the
 * derivations are in hierarchy/README.md.
 */
package org.tertius.hierarchy.nls;
