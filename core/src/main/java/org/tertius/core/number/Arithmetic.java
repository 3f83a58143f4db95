package org.tertius.core.number;

/**
 * The field operations of a number type, so that code written once runs in several of them: exact Gaussian
 * rationals, double complex numbers ({@link ComplexArithmetic}), arbitrary precision
 * ({@link ApcomplexArithmetic}), or moduli for rounding bounds ({@link MagnitudeArithmetic}, whose sums and
 * differences are bounds, not values). Implementations are immutable and thread-safe.
 *
 * @param <T> the number type
 */
public interface Arithmetic<T> {
    T zero();

    T one();

    T add(T a, T b);

    T subtract(T a, T b);

    T multiply(T a, T b);

    T divide(T a, T b);

    T negate(T a);

    /** 1 / a. */
    T reciprocal(T a);
}
