package org.tertius.connection.match;

import java.util.List;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.PowerSeriesAtZero;
import org.tertius.core.TertiusException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * Reads the parameters (sigma, B) of w ~ B z^sigma off a value (z0, w, w') at a small z0: Newton's method on
 * the two equations "series at z0 = data" (Jacobian by differences), started from sigma = z w'/w,
 * B = w z^-sigma. The error estimate maps the errors of the data and of the series through the inverse
 * Jacobian (first order). Immutable and thread-safe.
 *
 * @param <T> number type
 */
public final class ZeroFit<T> {
    private final AnalyticArithmetic<T> ar;
    private final List<T> parameters;
    private final int degree;

    public ZeroFit(AnalyticArithmetic<T> ar, List<T> parameters, int degree) {
        this.ar = ar;
        this.parameters = List.copyOf(parameters);
        this.degree = degree;
    }

    /** The fitted sigma and B with estimated absolute errors. */
    public static final class Result<T> {
        private final T sigma;
        private final T b;
        private final double errSigma;
        private final double errB;

        Result(T sigma, T b, double errSigma, double errB) {
            this.sigma = sigma;
            this.b = b;
            this.errSigma = errSigma;
            this.errB = errB;
        }

        public T sigma() {
            return sigma;
        }

        public T amplitude() {
            return b;
        }

        public double errSigma() {
            return errSigma;
        }

        public double errAmplitude() {
            return errB;
        }
    }

    /**
     * @throws TertiusException if Newton's method does not converge (the data are not in the region of the
     *     power behaviour: z0 too large, or a logarithmic or oscillatory solution)
     */
    public Result<T> fit(LocalValue<T> data) {
        T z = data.z();
        T sigma = ar.divide(ar.multiply(z, data.dw()), data.w());
        T b = ar.divide(data.w(), ar.pow(z, sigma));
        double hs = Math.sqrt(ar.epsilon());
        T[] r = residual(sigma, b, data);
        double tol = 4 * ar.epsilon();
        double lastSize = Double.POSITIVE_INFINITY;
        for (int it = 0; it < 60; it++) {
            T ds = ar.of(hs);
            T db = ar.multiply(b, ar.of(hs));
            T[] rs = residual(ar.add(sigma, ds), b, data);
            T[] rb = residual(sigma, ar.add(b, db), data);
            T j11 = ar.divide(ar.subtract(rs[0], r[0]), ds);
            T j21 = ar.divide(ar.subtract(rs[1], r[1]), ds);
            T j12 = ar.divide(ar.subtract(rb[0], r[0]), db);
            T j22 = ar.divide(ar.subtract(rb[1], r[1]), db);
            T det = ar.subtract(ar.multiply(j11, j22), ar.multiply(j12, j21));
            T stepS = ar.divide(ar.subtract(ar.multiply(j22, r[0]), ar.multiply(j12, r[1])), det);
            T stepB = ar.divide(ar.subtract(ar.multiply(j11, r[1]), ar.multiply(j21, r[0])), det);
            sigma = ar.subtract(sigma, stepS);
            b = ar.subtract(b, stepB);
            r = residual(sigma, b, data);
            double size = ar.abs(stepS) / (1 + ar.abs(sigma)) + ar.abs(stepB) / ar.abs(b);
            // converged, or stalled at the rounding floor of the data (the step no longer shrinks)
            if (size <= tol || (it >= 3 && size > 0.5 * lastSize && size < 1e-8)) {
                return withErrors(sigma, b, data, new Object[] {j11, j12, j21, j22, det});
            }
            lastSize = size;
        }
        throw new TertiusException("the fit of w ~ B z^sigma at z0 = " + ar.toComplex(z) + " did not converge;"
                + " the data are not in the region of the power behaviour (take z0 smaller)");
    }

    @SuppressWarnings("unchecked")
    private Result<T> withErrors(T sigma, T b, LocalValue<T> data, Object[] jac) {
        LocalValue<T> s = PowerSeriesAtZero.create(ar, parameters, sigma, b, degree).at(data.z());
        double ew = data.errW() + s.errW();
        double ed = data.errDw() + s.errDw();
        double det = ar.abs((T) jac[4]);
        double es = (ar.abs((T) jac[3]) * ew + ar.abs((T) jac[1]) * ed) / det;
        double eb = (ar.abs((T) jac[2]) * ew + ar.abs((T) jac[0]) * ed) / det;
        return new Result<>(sigma, b, es, eb);
    }

    private T[] residual(T sigma, T b, LocalValue<T> data) {
        LocalValue<T> s = PowerSeriesAtZero.create(ar, parameters, sigma, b, degree).at(data.z());
        @SuppressWarnings("unchecked")
        T[] r = (T[]) new Object[] {ar.subtract(s.w(), data.w()), ar.subtract(s.dw(), data.dw())};
        return r;
    }
}
