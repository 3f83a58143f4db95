package org.tertius.hierarchy.monodromy;

/**
 * A computed number with its estimated absolute error.
 *
 * @param value the value
 * @param error the estimated absolute error (first-order propagation of every error source; see
 *     {@link MonodromyMap})
 * @param <T> number type
 */
public record Estimate<T>(T value, double error) {
}
