/**
 * Benchmarks (JMH and whole-run reports), not tests: coefficient cost, steps, paths, grids, a pole-free segment
 * against a classical integrator, the high-precision layer and the writing of table numbers. The bench module also holds one class in core's
 * {@code mp} package ({@code KernelCost}), which times the kernel's package-private products.
 *
 * <p>May depend on: core.
 */
package org.tertius.bench;
