package org.tertius.core.number;

/**
 * Moduli: each operation takes the moduli of its operands and gives that of its result, or a bound of it for
 * sums and differences (|a +- b| &lt;= |a| + |b|). Evaluating an expression in it bounds the rounding error
 * of its double evaluation, e.g. sum |c| prod |v|^e for a polynomial.
 */
public final class MagnitudeArithmetic implements Arithmetic<Double> {
    /** The one instance (the class has no state). */
    public static final MagnitudeArithmetic INSTANCE = new MagnitudeArithmetic();

    private MagnitudeArithmetic() {
    }

    @Override
    public Double zero() {
        return 0.0;
    }

    @Override
    public Double one() {
        return 1.0;
    }

    @Override
    public Double add(Double a, Double b) {
        return a + b;
    }

    @Override
    public Double subtract(Double a, Double b) {
        return a + b;
    }

    @Override
    public Double multiply(Double a, Double b) {
        return a * b;
    }

    @Override
    public Double divide(Double a, Double b) {
        return a / b;
    }

    @Override
    public Double negate(Double a) {
        return a;
    }

    @Override
    public Double reciprocal(Double a) {
        return 1 / a;
    }
}
