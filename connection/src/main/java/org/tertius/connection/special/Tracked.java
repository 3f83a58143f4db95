package org.tertius.connection.special;

import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * A value along a solution with its z-derivative and bounds of the absolute errors of both (first-order error
 * propagation: the errors of the inputs and one rounding of unit u per operation, propagated through each
 * operation by the triangle inequality; common practice, Higham, Accuracy and Stability of Numerical
 * Algorithms, §3.3). Errors are kept as natural logarithms so that they reach far below the double range.
 * The operations of a formula written with these give its value, its derivative (the chain rule on
 * dual numbers) and both error bounds at once. Immutable.
 *
 * @param <T> the number type
 */
final class Tracked<T> {
    final T value;
    final T derivative;
    final double logErrValue;
    final double logErrDerivative;

    Tracked(T value, T derivative, double logErrValue, double logErrDerivative) {
        this.value = value;
        this.derivative = derivative;
        this.logErrValue = logErrValue;
        this.logErrDerivative = logErrDerivative;
    }

    /** Operations on tracked values in one arithmetic. */
    static final class Ops<T> {
        final AnalyticArithmetic<T> ar;
        private final double logU;

        Ops(AnalyticArithmetic<T> ar) {
            this.ar = ar;
            this.logU = Math.log(ar.epsilon());
        }

        /** A constant known to within one rounding (derivative 0, exact). */
        Tracked<T> constant(T c) {
            return new Tracked<>(c, ar.zero(), logU + ar.logAbs(c), Double.NEGATIVE_INFINITY);
        }

        /** An exact constant (an integer, or a value whose error is accounted for elsewhere). */
        Tracked<T> exact(T c) {
            return new Tracked<>(c, ar.zero(), Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY);
        }

        /** The independent variable z: derivative 1, exact. */
        Tracked<T> variable(T z) {
            return new Tracked<>(z, ar.one(), Double.NEGATIVE_INFINITY, Double.NEGATIVE_INFINITY);
        }

        Tracked<T> add(Tracked<T> a, Tracked<T> b) {
            T v = ar.add(a.value, b.value);
            T d = ar.add(a.derivative, b.derivative);
            return new Tracked<>(v, d, sum(a.logErrValue, b.logErrValue, logU + ar.logAbs(v)),
                    sum(a.logErrDerivative, b.logErrDerivative, logU + ar.logAbs(d)));
        }

        Tracked<T> subtract(Tracked<T> a, Tracked<T> b) {
            return add(a, negate(b));
        }

        Tracked<T> negate(Tracked<T> a) {
            return new Tracked<>(ar.negate(a.value), ar.negate(a.derivative), a.logErrValue, a.logErrDerivative);
        }

        Tracked<T> multiply(Tracked<T> a, Tracked<T> b) {
            T v = ar.multiply(a.value, b.value);
            T d1 = ar.multiply(a.derivative, b.value);
            T d2 = ar.multiply(a.value, b.derivative);
            T d = ar.add(d1, d2);
            double la = ar.logAbs(a.value);
            double lb = ar.logAbs(b.value);
            double lda = ar.logAbs(a.derivative);
            double ldb = ar.logAbs(b.derivative);
            double ev = sum(la + b.logErrValue, lb + a.logErrValue, logU + la + lb);
            double ed = sum(sum(lda + b.logErrValue, lb + a.logErrDerivative),
                    sum(la + b.logErrDerivative, ldb + a.logErrValue),
                    Math.log(2) + logU + Conversions.logAdd(lda + lb, la + ldb));
            return new Tracked<>(v, d, ev, ed);
        }

        /**
         * a / b.
         *
         * @throws InvalidInputException if |b| is not at least twice its error bound (a singular point of the
         *     formula: {@code where} names it in the message)
         */
        Tracked<T> divide(Tracked<T> a, Tracked<T> b, String where) {
            double lb = ar.logAbs(b.value);
            if (!(lb > Math.log(2) + b.logErrValue)) {
                throw new InvalidInputException("z", where);
            }
            T q = ar.divide(a.value, b.value);
            // (a/b)' = (a' - q b') / b
            T d = ar.divide(ar.subtract(a.derivative, ar.multiply(q, b.derivative)), b.value);
            double lq = ar.logAbs(q);
            double ld = ar.logAbs(d);
            double eq = sum(a.logErrValue - lb, lq + b.logErrValue - lb, logU + lq);
            double ldb = ar.logAbs(b.derivative);
            double ed = sum(sum(a.logErrDerivative - lb, lq + b.logErrDerivative - lb),
                    sum(ldb + eq - lb, ld + b.logErrValue - lb),
                    sum(Math.log(3) + logU + ld,
                            Math.log(2) + logU + Conversions.logAdd(ar.logAbs(a.derivative), lq + ldb) - lb));
            return new Tracked<>(q, d, eq, ed);
        }

        private static double sum(double a, double b) {
            return Conversions.logAdd(a, b);
        }

        private static double sum(double a, double b, double c) {
            return Conversions.logAdd(Conversions.logAdd(a, b), c);
        }
    }
}
