/**
 * Members of the Painleve III hierarchy defined by a 2x2 isomonodromic Lax pair, generated as polynomial
 * systems for the core engine: {@link org.tertius.hierarchy.HierarchyMember} (equations),
 * {@link org.tertius.hierarchy.MemberSolution} (integration, first integrals, the t_n-flow; it presents the core's
 * equation-neutral face, so members get regions, pole lists and high precision like Painleve III),
 * {@link org.tertius.hierarchy.Member1Map} (member 1 and Painleve III) and {@link org.tertius.hierarchy.NlsCheck}
 * (member 2 and focusing NLS). The convention is documented in hierarchy/README.md.
 *
 * <p>May depend on: core ({@code number}, {@code equation}, {@code solution}, {@code face}, {@code piii} for the map
 * to Painleve III) and {@code hierarchy.algebra}.
 */
package org.tertius.hierarchy;
