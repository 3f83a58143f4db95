/**
 * The third Painleve equation on the engine: its parameters and symmetries ({@link
 * org.tertius.core.piii.Painleve3}), its polynomial forms (Hamiltonian, reciprocal, augmented) with their
 * conversions in double and arbitrary precision, and its solutions ({@link org.tertius.core.piii.Painleve3Solution},
 * symmetry images), which present the equation-neutral face ({@code face}).
 *
 * <p>May depend on: {@code number}, {@code equation}, {@code step}, {@code solution}, {@code face}. Nothing in core
 * depends on it but its own tests: regions and high precision see only the face.
 */
package org.tertius.core.piii;
