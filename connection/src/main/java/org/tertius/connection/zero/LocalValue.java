package org.tertius.connection.zero;

import java.util.Optional;
import java.util.function.Function;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * A value of a local expansion: the point z, w(z), w'(z) and estimated absolute errors of w and w' (truncation
 * plus propagated rounding). Immutable.
 *
 * @param <T> the number type
 */
public final class LocalValue<T> {
    private final T z;
    private final T w;
    private final T dw;
    private final double errW;
    private final double errDw;

    public LocalValue(T z, T w, T dw, double errW, double errDw) {
        this.z = z;
        this.w = w;
        this.dw = dw;
        this.errW = errW;
        this.errDw = errDw;
    }

    public T z() {
        return z;
    }

    public T w() {
        return w;
    }

    public T dw() {
        return dw;
    }

    public double errW() {
        return errW;
    }

    public double errDw() {
        return errDw;
    }

    /** The larger error estimate relative to 1 + |value|. */
    public double relativeError(AnalyticArithmetic<T> a) {
        return Math.max(errW / (1 + a.abs(w)), errDw / (1 + a.abs(dw)));
    }

    /** The values in double precision: {z, w, w'}. */
    public Complex[] toComplex(AnalyticArithmetic<T> a) {
        return new Complex[] {a.toComplex(z), a.toComplex(w), a.toComplex(dw)};
    }

    @Override
    public String toString() {
        return "z = " + z + ": w = " + w + " +- " + errW + ", w' = " + dw + " +- " + errDw;
    }

    /**
     * The first value within {@code tolerance} (error relative to 1 + |value|) along the ray of {@code tauMax},
     * tau = log z, at |z| = |zMax| 2^-k for k = 0, 1, ... while |z| stays above 1e-250; empty if there is none.
     * The start-data search of the expansions at 0.
     */
    static <T> Optional<LocalValue<T>> firstWithin(AnalyticArithmetic<T> ar, T tauMax, double tolerance,
            Function<T, LocalValue<T>> at) {
        T tau = tauMax;
        T halving = ar.negate(ar.log(ar.of(2)));
        while (ar.toComplex(tau).getReal() > -575) {
            LocalValue<T> val = at.apply(tau);
            if (val.relativeError(ar) <= tolerance) {
                return Optional.of(val);
            }
            tau = ar.add(tau, halving);
        }
        return Optional.empty();
    }
}
