package org.tertius.connection.num;

import org.hipparchus.complex.Complex;

/**
 * The complex arithmetic the series and recurrences of this module are written in, so that one code path
 * serves double precision ({@link #DOUBLE}) and arbitrary precision ({@link ApcomplexArith}). Implementations
 * are immutable and thread-safe.
 *
 * @param <T> the number type
 */
public interface Arith<T> {

    /** Double-precision complex arithmetic (Hipparchus {@link Complex}). */
    Arith<Complex> DOUBLE = new ComplexArith();

    T of(double re, double im);

    default T of(double re) {
        return of(re, 0);
    }

    /** An exact rational p/q at the working precision. */
    T ratio(long p, long q);

    T add(T a, T b);

    T sub(T a, T b);

    T mul(T a, T b);

    T div(T a, T b);

    T neg(T a);

    T exp(T a);

    /** Principal logarithm. */
    T log(T a);

    T sqrt(T a);

    /** a^b = exp(b log a) with the principal logarithm. */
    T pow(T a, T b);

    /** pi at the working precision. */
    T pi();

    /** Modulus as a double (0 and huge values are fine: the result saturates, it does not throw). */
    double abs(T a);

    Complex toComplex(T a);

    /** Natural logarithm of the modulus, without overflow ({@code -infinity} for 0). */
    double logAbs(T a);

    /** Unit roundoff of the arithmetic (2^-53 for double, 10^-precision for arbitrary precision). */
    double epsilon();

    /** Working precision in decimal digits. */
    long digits();

    default T zero() {
        return of(0);
    }

    default T one() {
        return of(1);
    }

    default T mul(T a, long k) {
        return mul(a, ratio(k, 1));
    }

    default T scale(T a, double s) {
        return mul(a, of(s));
    }
}
