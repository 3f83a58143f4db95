package org.tertius.core.number;

import org.hipparchus.complex.Complex;

/**
 * A complex {@link Arithmetic} with conversions, the elementary functions and a working precision: series and
 * recurrences written in it run unchanged in double precision ({@link ComplexArithmetic#INSTANCE}) and in
 * arbitrary precision ({@link ApcomplexArithmetic}).
 *
 * @param <T> the number type
 */
public interface AnalyticArithmetic<T> extends Arithmetic<T> {

    /** re + i im (a double is converted exactly, then rounded to the working precision). */
    T of(double re, double im);

    default T of(double re) {
        return of(re, 0);
    }

    /**
     * The rational p/q at the working precision (in double {@code (double) p / q}, which is p/q rounded once only
     * while |p| and |q| stay below 2^53).
     */
    T ratio(long p, long q);

    @Override
    default T zero() {
        return of(0);
    }

    @Override
    default T one() {
        return of(1);
    }

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

    /** Natural logarithm of the modulus, without overflow ({@code -infinity} for 0). */
    double logAbs(T a);

    Complex toComplex(T a);

    /** Unit roundoff of the arithmetic (2^-53 for double, 10^-precision for arbitrary precision). */
    double epsilon();

    /** Working precision in decimal digits. */
    long digits();
}
