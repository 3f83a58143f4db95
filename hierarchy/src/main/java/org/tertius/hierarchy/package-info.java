/**
 * Members of the Painleve III hierarchy defined by a 2x2 isomonodromic Lax pair, generated as polynomial
 * systems for the core engine: {@link org.tertius.hierarchy.HierarchyMember} (equations),
 * {@link org.tertius.hierarchy.MemberSolution} (integration, first integrals, the t_n-flow),
 * {@link org.tertius.hierarchy.OriginSolution} (members n >= 2 started at x = t_n = 0 by
 * {@link org.tertius.hierarchy.FrobeniusSeries}, over the (x, t_n) plane), {@link org.tertius.hierarchy.TaylorLine},
 * {@link org.tertius.hierarchy.RealRow} and {@link org.tertius.hierarchy.PlaneGrid} (the real plane),
 * {@link org.tertius.hierarchy.NlsTimeSeries} (member 2 for small t_2 from member 1),
 * {@link org.tertius.hierarchy.Member1Map} (member 1 and Painleve III) and {@link org.tertius.hierarchy.NlsCheck}
 * (member 2 and focusing NLS). Depends on the core only; the sub-package {@code nls} (the near-field profile)
 * depends on this one. The convention is documented in hierarchy/README.md.
 */
package org.tertius.hierarchy;
