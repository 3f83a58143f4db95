package org.tertius.hierarchy.algebra;

/**
 * The operations of a number field used to evaluate a {@link Polynomial}: exact Gaussian rationals for
 * checks, double complex numbers for integration, magnitudes for rounding bounds.
 *
 * @param <T> the number type
 */
public interface Arithmetic<T> {
    T one();

    T add(T a, T b);

    T multiply(T a, T b);

    T reciprocal(T a);

    /** The value of an exact coefficient in this field. */
    T coefficient(GaussianRational c);
}
