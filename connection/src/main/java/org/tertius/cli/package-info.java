/**
 * The command-line tool: one class per command, shared option groups (the solution of any kind, regions, digits,
 * solver settings, special solutions and Backlund chains, a member selected by its monodromy data), one place that
 * writes value rows ({@link org.tertius.cli.ValueRows}), pole lists ({@link org.tertius.cli.SingularityRows}) and
 * monodromy data ({@link org.tertius.cli.MonodromyRows}), one place that draws fields and point patterns ({@link
 * org.tertius.cli.FieldPainter}) and line plots ({@link org.tertius.cli.LinePlot}), and one that writes the answers
 * of {@code connect} ({@link org.tertius.cli.ConnectionRows}; its options in {@link
 * org.tertius.cli.ConnectionOptions}, its directions in {@link org.tertius.cli.ConnectionReport} and {@link
 * org.tertius.cli.PreciseConnection}). Commands work on the equation-neutral face of a solution.
 *
 * <p>May depend on every module. Commands do not call each other.
 */
package org.tertius.cli;
