package org.tertius.connection.zero;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The expansion at z = 0 of any Painleve III solution of the classes of {@link ZeroBehaviour}: the power solutions
 * w ~ B z^sigma for -1 &lt;= Re sigma &lt;= 1, sigma != +-1 (the edges Re sigma = +-1 included: zeros of w accumulate
 * at 0 for Re sigma = 1, poles for Re sigma = -1), and the logarithmic ones at sigma = +-1. For Re sigma &gt;= 0 the
 * expansion is {@link StripSeriesAtZero} (or {@link LogSeriesAtZero} at sigma = 1); for Re sigma &lt; 0 it is the
 * reciprocal of the expansion of 1/w, a solution of PIII(-beta, -alpha, -delta, -gamma) with exponent -sigma and
 * amplitude 1/B (the symmetry of DLMF eq. 32.2.3 under w -> 1/w). Values at log coordinates tau (any sheet).
 * Immutable and thread-safe.
 *
 * @param <T> number type
 */
public final class ZeroExpansion<T> {
    private final AnalyticArithmetic<T> ar;
    private final StripSeriesAtZero<T> strip;
    private final LogSeriesAtZero<T> log;
    private final boolean reciprocal;

    private ZeroExpansion(AnalyticArithmetic<T> ar, StripSeriesAtZero<T> strip, LogSeriesAtZero<T> log,
                          boolean reciprocal) {
        this.ar = ar;
        this.strip = strip;
        this.log = log;
        this.reciprocal = reciprocal;
    }

    /** The parameters (alpha, beta, gamma, delta) of 1/w: (-beta, -alpha, -delta, -gamma). */
    public static <T> List<T> reciprocalParameters(AnalyticArithmetic<T> ar, List<T> p) {
        return List.of(ar.negate(p.get(1)), ar.negate(p.get(0)), ar.negate(p.get(3)), ar.negate(p.get(2)));
    }

    /**
     * The power solution w ~ B z^sigma, -1 &lt;= Re sigma &lt;= 1, sigma != +-1, with {@code rows} rows.
     *
     * @throws InvalidInputException for |Re sigma| &gt; 1, sigma = +-1 (then the logarithmic data are needed), B = 0
     */
    public static <T> ZeroExpansion<T> power(AnalyticArithmetic<T> ar, List<T> parameters, T sigma, T b, int rows) {
        requirePowerData(ar.toComplex(sigma), ar.toComplex(b));
        double re = ar.toComplex(sigma).getReal();
        if (re >= 0) {
            return new ZeroExpansion<>(ar, StripSeriesAtZero.create(ar, parameters, sigma, b, rows), null, false);
        }
        StripSeriesAtZero<T> s = StripSeriesAtZero.create(ar, reciprocalParameters(ar, parameters),
                ar.negate(sigma), ar.reciprocal(b), rows);
        return new ZeroExpansion<>(ar, s, null, true);
    }

    /**
     * As {@link #power} but also for 1 &lt; |Re sigma| &lt; 3/2 with sigma not real: for fits whose iterates may step over
     * the edge. There (sigma, B) is the non-canonical description of the solution with exponent 2 - sigma (or
     * -2 - sigma), whose rows are the same polynomials read from the other end.
     *
     * @throws InvalidInputException outside that range, at sigma = +-1, or for B = 0
     */
    public static <T> ZeroExpansion<T> powerFormal(AnalyticArithmetic<T> ar, List<T> parameters, T sigma, T b,
                                                   int rows) {
        Complex s = ar.toComplex(sigma);
        double re = s.getReal();
        if (!(Math.abs(re) < 1.5) || (Math.abs(re) >= 1 && s.getImaginary() == 0)) {
            throw new InvalidInputException("sigma", "must have |Re sigma| < 3/2 and be non-real beyond the edge,"
                    + " got " + s);
        }
        if (!(ar.abs(b) > 0)) {
            throw new InvalidInputException("B", "must be non-zero (w ~ B z^sigma)");
        }
        if (re >= 0) {
            return new ZeroExpansion<>(ar, new StripSeriesAtZero<>(ar, parameters, sigma, b, rows), null, false);
        }
        StripSeriesAtZero<T> strip = new StripSeriesAtZero<>(ar, reciprocalParameters(ar, parameters),
                ar.negate(sigma), ar.reciprocal(b), rows);
        return new ZeroExpansion<>(ar, strip, null, true);
    }

    /**
     * The other description of an edge solution: for Re sigma = 1 the solution w ~ z (B z^-k + beta/k^2 + B' z^k),
     * k = 1 - sigma, is also w ~ B' z^(2 - sigma) (...) with {@code B' = (beta^2 + delta k^2) / (4 B k^4)} (the
     * coefficient of Y^2 in row 0, times B); for Re sigma = -1 the same for 1/w (parameters -beta, -alpha, -delta,
     * -gamma): exponent -2 - sigma. Derived here; confirmed by fits on other sheets, which return the other
     * description. Returns null where B' = 0 (no other description).
     *
     * @return {sigma', B'}
     */
    public static Complex[] edgeAlternate(Complex alpha, Complex beta, Complex gamma, Complex delta, Complex sigma,
                                          Complex b) {
        boolean upper = sigma.getReal() >= 0;
        Complex s = upper ? sigma : sigma.negate();
        Complex bb = upper ? b : b.reciprocal();
        Complex be = upper ? beta : alpha.negate();
        Complex de = upper ? delta : gamma.negate();
        Complex k = Complex.ONE.subtract(s);
        Complex k2 = k.multiply(k);
        Complex other = be.multiply(be).add(de.multiply(k2)).divide(bb.multiply(k2.multiply(k2)).multiply(4));
        if (!(other.norm() > 0) || !Double.isFinite(other.norm())) {
            return null;
        }
        Complex s2 = Complex.ONE.add(k);
        return upper ? new Complex[] {s2, other} : new Complex[] {s2.negate(), other.reciprocal()};
    }

    /**
     * Checks power data: |Re sigma| &lt;= 1, sigma != +-1, B != 0.
     *
     * @throws InvalidInputException naming what is wrong
     */
    public static void requirePowerData(Complex sigma, Complex b) {
        double re = sigma.getReal();
        if (!(Math.abs(re) <= 1) || !Double.isFinite(sigma.getImaginary())) {
            throw new InvalidInputException("sigma", "must have |Re sigma| <= 1, got " + sigma
                    + "; a solution w ~ B z^sigma with Re sigma > 1 exists only as the description by 2 - sigma of an"
                    + " edge solution (Re sigma = 1), give that one");
        }
        if (sigma.getImaginary() == 0 && Math.abs(re) == 1) {
            throw new InvalidInputException("sigma", "sigma = " + re + " is on the resonance set sigma = +-1, where"
                    + " the solutions are logarithmic (w ~ z P(log z - t0) for sigma = 1, its reciprocal for -1):"
                    + " give the logarithmic data t0 (and the branch +-1 when the relevant beta is 0), not B");
        }
        if (!(b.norm() > 0) || !Double.isFinite(b.norm())) {
            throw new InvalidInputException("B", "must be finite and non-zero (w ~ B z^sigma), got " + b);
        }
    }

    /**
     * The logarithmic solution at sigma = side (+1: w ~ z P(log z - t0), -1: w ~ 1/(z P(log z - t0)) with P the
     * polynomial of the reciprocal equation); see {@link LogSeriesAtZero} for P and the branch.
     *
     * @throws InvalidInputException for side not +-1 and as {@link LogSeriesAtZero#create}
     */
    public static <T> ZeroExpansion<T> logarithmic(AnalyticArithmetic<T> ar, List<T> parameters, int side, T t0,
                                                   int branch, int orders) {
        if (side != 1 && side != -1) {
            throw new InvalidInputException("sigma", "the logarithmic solutions sit at sigma = 1 or sigma = -1, got "
                    + side);
        }
        List<T> p = side == 1 ? parameters : reciprocalParameters(ar, parameters);
        return new ZeroExpansion<>(ar, null, LogSeriesAtZero.create(ar, p, t0, branch, orders), side == -1);
    }

    /** True for the logarithmic solutions. */
    public boolean isLogarithmic() {
        return log != null;
    }

    /** The series behind (of 1/w when {@link #viaReciprocal()}); null for logarithmic solutions. */
    public StripSeriesAtZero<T> strip() {
        return strip;
    }

    /** The logarithmic series behind (of 1/w when {@link #viaReciprocal()}); null for power solutions. */
    public LogSeriesAtZero<T> logSeries() {
        return log;
    }

    /** True when the values are reciprocals of an expansion of 1/w. */
    public boolean viaReciprocal() {
        return reciprocal;
    }

    /** w and w' at the log coordinate tau with error estimates (the value's z is exp(tau)). */
    public LocalValue<T> at(T tau) {
        LocalValue<T> v = log != null ? log.at(tau) : strip.at(tau);
        return reciprocal ? invert(ar, v) : v;
    }

    /**
     * Start data: the value at the largest |z| = |zMax| 2^-k on the ray and sheet of tauMax whose estimated error
     * relative to 1 + |value| is at most {@code tolerance}.
     *
     * @throws InvalidInputException if there is none above |z| = 1e-250
     */
    public LocalValue<T> startData(T tauMax, double tolerance) {
        return LocalValue.firstWithin(ar, tauMax, tolerance, this::at)
                .orElseThrow(() -> new InvalidInputException("tolerance",
                        "the expansion at 0 does not reach relative error " + tolerance
                                + " for |z| >= 1e-250; raise the rows or the tolerance"));
    }

    /** 1/W with first-order error propagation. */
    static <T> LocalValue<T> invert(AnalyticArithmetic<T> ar, LocalValue<T> v) {
        T w = v.w();
        double m = ar.abs(w);
        T iw = ar.reciprocal(w);
        T idw = ar.negate(ar.divide(v.dw(), ar.multiply(w, w)));
        double ew = v.errW() / (m * m);
        double edw = v.errDw() / (m * m) + 2 * ar.abs(v.dw()) * v.errW() / (m * m * m);
        return new LocalValue<>(v.z(), iw, idw, ew, edw);
    }
}
