package org.tertius.connection.zero;

import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The expansion at z = 0 of the solutions of Painleve III (DLMF eq. 32.2.3) with w ~ B z^sigma on the strip
 * -1 &lt; Re sigma &lt;= 1, sigma != 1, including the edge Re sigma = 1 where the zeros of w accumulate at 0:
 * <pre>  w = B z^sigma sum_a X^a P_a(Y),  X = z^(1+sigma), Y = z^(1-sigma),  P_a a polynomial of degree 2a+2,</pre>
 * summed by rows (see {@link StripCoefficients} for the recurrence and why the rows are finite). Values are taken at
 * a point of the universal cover given by its log coordinate {@code tau = log|z| + i arg z} (any sheet), so that
 * z^sigma = exp(sigma tau).
 *
 * <p>On the edge Re sigma = 1 the two exponents sigma and 2 - sigma describe the same solution (the row P_0 is
 * {@code 1 + c1 Y + c2 Y^2}, and {@code B c2 z^(2 - sigma)} is the leading term of the other description); both are
 * accepted. For -1 &lt; Re sigma &lt; 0 the rows converge slowly where |X| is not small; {@link ZeroExpansion} uses the
 * image under w -> 1/w there. Immutable and thread-safe.
 *
 * @param <T> number type
 */
public final class StripSeriesAtZero<T> {
    private final AnalyticArithmetic<T> ar;
    private final T sigma;
    private final T b;
    private final StripCoefficients<T> c;

    private StripSeriesAtZero(AnalyticArithmetic<T> ar, T sigma, T b, StripCoefficients<T> c) {
        this.ar = ar;
        this.sigma = sigma;
        this.b = b;
        this.c = c;
    }

    /** Without range checks (callers in this package check). */
    StripSeriesAtZero(AnalyticArithmetic<T> ar, List<T> parameters, T sigma, T b, int rows) {
        this(ar, sigma, b, new StripCoefficients<>(ar, parameters, sigma, b, rows));
    }

    /**
     * The expansion of the solution with w ~ B z^sigma of PIII(alpha, beta, gamma, delta) with rows 0..rows.
     *
     * @throws InvalidInputException if Re sigma is outside (-1, 1], sigma = 1 (logarithmic: {@link LogSeriesAtZero}),
     *     B = 0, or rows outside [1, 200]
     */
    public static <T> StripSeriesAtZero<T> create(AnalyticArithmetic<T> ar, List<T> parameters, T sigma, T b,
                                                  int rows) {
        double re = ar.toComplex(sigma).getReal();
        if (!(re > -1 && re <= 1)) {
            throw new InvalidInputException("sigma", "must have -1 < Re sigma <= 1 for this expansion, got "
                    + ar.toComplex(sigma) + " (for Re sigma <= -1 take 1/w, whose exponent is -sigma; Re sigma > 1"
                    + " is the description by 2 - sigma of a solution with Re sigma < 1 only on the edge)");
        }
        if (ar.abs(ar.subtract(sigma, ar.one())) == 0) {
            throw new InvalidInputException("sigma", "sigma = 1 is the resonant (logarithmic) case w ~ z P(log z);"
                    + " give the logarithmic data (t0, and the branch when beta = 0) instead of B");
        }
        if (!(ar.abs(b) > 0)) {
            throw new InvalidInputException("B", "must be non-zero (w ~ B z^sigma)");
        }
        if (rows < 1 || rows > 200) {
            throw new InvalidInputException("rows", "must be in [1, 200], got " + rows);
        }
        return new StripSeriesAtZero<>(ar, sigma, b, new StripCoefficients<>(ar, parameters, sigma, b, rows));
    }

    public T sigma() {
        return sigma;
    }

    public T amplitude() {
        return b;
    }

    public int rows() {
        return c.rows;
    }

    /** The degree of row a in Y (in Y^2 when alpha = beta = 0). */
    public int band(int a) {
        return c.band(a);
    }

    /** Coefficient v_ab (X, Y replaced by their squares when alpha = beta = 0); b up to band(a) + 1. */
    public T coefficient(int a, int bIndex) {
        return c.v[a][bIndex];
    }

    /** The first-order rounding bound of {@link #coefficient}. */
    public double coefficientRoundingBound(int a, int bIndex) {
        return c.err[a][bIndex];
    }

    /**
     * w(z) and w'(z) at the point with log coordinate tau, with truncation and rounding error estimates. The
     * returned value's z is exp(tau).
     */
    public LocalValue<T> at(T tau) {
        T z = ar.exp(tau);
        T xv = ar.exp(ar.multiply(c.px, tau));
        T yv = ar.exp(ar.multiply(c.py, tau));
        T pre = ar.multiply(b, ar.exp(ar.multiply(sigma, tau)));
        double ax = ar.abs(xv);
        double ay = ar.abs(yv);
        T sum = ar.zero();
        T sumD = ar.zero();
        double[] rowSize = new double[c.rows + 1];
        double round = 0;
        double roundD = 0;
        double sumAbs = 0;
        double sumAbsD = 0;
        double maxExponent = 0;
        T xa = ar.one();
        for (int a = 0; a <= c.rows; a++) {
            T term = xa;
            double xPow = Math.pow(ax, a);
            for (int bb = 0; bb < c.v[a].length; bb++) {
                T t = ar.multiply(c.v[a][bb], term);
                T e = ar.add(sigma, ar.add(ar.multiply(c.px, ar.of(a)), ar.multiply(c.py, ar.of(bb))));
                T td = ar.multiply(t, e);
                sum = ar.add(sum, t);
                sumD = ar.add(sumD, td);
                double m = xPow * Math.pow(ay, bb);
                double at = ar.abs(t);
                double ae = ar.abs(e);
                rowSize[a] += at;
                sumAbs += at;
                sumAbsD += at * ae;
                round += c.err[a][bb] * m;
                roundD += c.err[a][bb] * m * ae;
                maxExponent = Math.max(maxExponent, ae);
                term = ar.multiply(term, yv);
            }
            xa = ar.multiply(xa, xv);
        }
        int n = c.rows;
        double trunc = rowSize[n] + (n >= 1 ? rowSize[n - 1] : 0);
        if (n >= 1 && !(rowSize[n] <= 0.5 * rowSize[n - 1])) {
            trunc = Math.max(trunc, sumAbs); // no visible decay: outside the useful disc
        }
        double absPre = ar.abs(pre);
        double absZ = ar.abs(z);
        double eps = ar.epsilon();
        // the last exponent (about n |px|) bounds the derivative factor of the omitted rows
        double grow = maxExponent + ar.abs(c.px);
        double ew = absPre * (trunc + round + 4 * eps * sumAbs);
        double ed = absPre / absZ * (trunc * grow + roundD + 4 * eps * sumAbsD);
        T w = ar.multiply(pre, sum);
        T dw = ar.divide(ar.multiply(pre, sumD), z);
        return new LocalValue<>(z, w, dw, ew, ed);
    }

    /**
     * Start data: the value at the largest |z| = |zMax| 2^-k (k = 0, 1, ..., on the ray and sheet of
     * {@code tauMax}) whose estimated error relative to 1 + |value| is at most {@code tolerance}.
     *
     * @throws InvalidInputException if no such point exists above |z| = 1e-250
     */
    public LocalValue<T> startData(T tauMax, double tolerance) {
        return LocalValue.firstWithin(ar, tauMax, tolerance, this::at)
                .orElseThrow(() -> new InvalidInputException("tolerance",
                        "the expansion at 0 with sigma = " + ar.toComplex(sigma)
                                + " does not reach relative error " + tolerance + " for |z| >= 1e-250 with " + c.rows
                                + " rows; raise the rows or the tolerance"));
    }
}
