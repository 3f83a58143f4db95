/**
 * Members of the Painleve III hierarchy defined by a 2x2 isomonodromic Lax pair, generated as polynomial
 * systems for the core engine: {@link org.tertius.hierarchy.HierarchyMember} (equations),
 * {@link org.tertius.hierarchy.MemberSolution} (integration, first integrals, the t_n-flow; it presents the core's
 * equation-neutral face, so members get regions, pole lists and high precision like Painleve III),
 * {@link org.tertius.hierarchy.OriginSolution} (members n &gt;= 2 started at x = t_n = 0 by
 * {@link org.tertius.hierarchy.FrobeniusSeries}, over the (x, t_n) plane), {@link org.tertius.hierarchy.TaylorLine},
 * {@link org.tertius.hierarchy.RealRow} and {@link org.tertius.hierarchy.PlaneGrid} (the real plane),
 * {@link org.tertius.hierarchy.NlsTimeSeries} (member 2 for small t_2 from member 1),
 * {@link org.tertius.hierarchy.Member1Map} (member 1 and Painleve III) and {@link org.tertius.hierarchy.NlsCheck}
 * (member 2 and focusing NLS). The convention is documented in hierarchy/README.md.
 *
 * <p>May depend on: core ({@code number}, {@code equation}, {@code solution}, {@code face}, {@code piii} for the map
 * to Painleve III) and {@code hierarchy.algebra}. The sub-packages {@code nls} (the near-field profile) and
 * {@code monodromy} depend on this one.
 */
package org.tertius.hierarchy;
