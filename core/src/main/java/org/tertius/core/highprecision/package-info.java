/**
 * Values of any computed solution to a requested number of digits: the double-precision engine plans the path
 * (its path tree), and the path is replayed in arbitrary precision by the {@code mp} engine with the same recurrence
 * plan, from the solution's {@link org.tertius.core.face.HighPrecisionForm}. Two accuracies give the digit
 * estimate ({@link org.tertius.core.highprecision.DigitEstimate}); the replay ({@link
 * org.tertius.core.highprecision.AccuracyLevel}), the plan ({@link org.tertius.core.highprecision.PlannedPath}),
 * progress and statistics are separate classes.
 *
 * <p>May depend on: {@code number}, {@code face}, {@code solution}, {@code step}, {@code taylor}, {@code mp}.
 * Must not depend on any equation's package ({@code piii}).
 */
package org.tertius.core.highprecision;
