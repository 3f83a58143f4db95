/**
 * Members of the Painleve III hierarchy defined by a 2x2 isomonodromic Lax pair, generated as polynomial
 * systems for the core engine: {@link org.tertius.hierarchy.HierarchyMember} (equations),
 * {@link org.tertius.hierarchy.MemberSolution} (integration, first integrals, the t_n-flow),
 * {@link org.tertius.hierarchy.Member1Map} (member 1 and Painleve III) and {@link org.tertius.hierarchy.NlsCheck}
 * (member 2 and focusing NLS). The convention is documented in hierarchy/README.md.
 */
package org.tertius.hierarchy;
