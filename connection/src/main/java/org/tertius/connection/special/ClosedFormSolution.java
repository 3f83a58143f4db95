package org.tertius.connection.special;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * The evaluation plan shared by the special solutions: each kind computes w, w' and bounds of their errors once,
 * over any arithmetic ({@link #compute}); this class runs it in double precision, and falls back to the core's
 * multiprecision arithmetic when double overflows or its error estimate exceeds {@link #DOUBLE_TOLERANCE}
 * relative (the value is then rounded to double, with that rounding added to the estimate); for N digits it
 * runs at N + 10 digits and widens the precision by the digits found missing, at most {@link #TRIES} times.
 */
abstract class ClosedFormSolution implements SpecialSolution {
    /** Relative error estimate above which a double evaluation is redone in multiprecision. */
    static final double DOUBLE_TOLERANCE = 1e-12;
    /** Attempts at growing precision. */
    static final int TRIES = 4;
    private static final double LN10 = Math.log(10);

    /**
     * w and w' at the point z of sheet {@code sheet} (arg z in (-pi, pi] + 2 pi sheet, as {@link SurfacePoint};
     * z is taken exactly as given in the arithmetic) with natural logs of bounds (estimates where so documented)
     * of their absolute errors.
     *
     * @throws InvalidInputException where the solution is not defined (a pole within rounding)
     */
    abstract <T> Estimate<T> compute(AnalyticArithmetic<T> ar, T z, int sheet);

    /** {@link #compute(AnalyticArithmetic, Object, int)} at a point of the surface. */
    <T> Estimate<T> compute(AnalyticArithmetic<T> ar, SurfacePoint point) {
        return compute(ar, ar.of(point.re(), point.im()), point.sheet());
    }

    @Override
    public Painleve3Value evaluate(SurfacePoint point) {
        ComplexArithmetic dbl = ComplexArithmetic.INSTANCE;
        Estimate<Complex> e = null;
        try {
            e = compute(dbl, point);
        } catch (ArithmeticException overflow) {
            e = null;
        }
        if (e != null && e.finite(dbl) && e.relativeError(dbl) <= DOUBLE_TOLERANCE) {
            return new Painleve3Value(point, e.w(), e.dw(), Math.exp(e.logErrorW()), Math.exp(e.logErrorDw()));
        }
        long digits = 30;
        if (e != null && e.finite(dbl)) {
            digits += (long) Math.ceil(Math.log10(e.relativeError(dbl) / DOUBLE_TOLERANCE));
        }
        PreciseValue v = evaluate(point, (int) Math.min(MAX_DIGITS, Math.max(20, digits)));
        Complex w = v.wDouble();
        Complex dw = v.dwDouble();
        double u = 0x1p-53;
        return new Painleve3Value(point, w, dw, Math.pow(10, v.log10ErrorW()) + u * w.norm(),
                Math.pow(10, v.log10ErrorDw()) + u * dw.norm());
    }

    @Override
    public PreciseValue evaluate(SurfacePoint point, int digits) {
        return precise(point, null, digits);
    }

    @Override
    public PreciseValue evaluate(ExactPoint point, int digits) {
        return precise(point.toSurfacePoint(), Conversions.exact(point.z()), digits);
    }

    /** N digits at a point, z taken exactly from {@code exactZ} when it is given, else from the double point. */
    private PreciseValue precise(SurfacePoint point, GaussianRational exactZ, int digits) {
        if (digits < 1 || digits > MAX_DIGITS) {
            throw new InvalidInputException("digits", "must be in [1, " + MAX_DIGITS + "], got " + digits);
        }
        long precision = digits + 10L;
        PreciseValue best = null;
        for (int attempt = 0; attempt < TRIES; attempt++) {
            MpArithmetic mp = new MpArithmetic(Math.min(100000, Math.max(20, precision)));
            Estimate<MpComplex> e = exactZ == null ? compute(mp, point)
                    : compute(mp, Conversions.of(mp, exactZ), point.sheet());
            PreciseValue v = new PreciseValue(point, mp.context().toApcomplex(e.w()), mp.context().toApcomplex(e.dw()),
                    e.logErrorW() / LN10, e.logErrorDw() / LN10);
            best = v;
            long reached = Math.min(v.correctDigitsW(), v.correctDigitsDw());
            boolean zeroDerivative = e.dw() != null && mp.abs(e.dw()) == 0;
            if (reached >= digits || (zeroDerivative && v.correctDigitsW() >= digits)) {
                return v;
            }
            long missing = digits - (zeroDerivative ? v.correctDigitsW() : reached);
            precision += missing + 10;
        }
        return best;
    }

    /**
     * A computed value: w, w' and natural logs of their absolute error bounds.
     *
     * @param <T> the number type
     */
    record Estimate<T>(T w, T dw, double logErrorW, double logErrorDw) {

        boolean finite(AnalyticArithmetic<T> ar) {
            double a = ar.abs(w);
            double b = ar.abs(dw);
            return Double.isFinite(a) && Double.isFinite(b) && !Double.isNaN(logErrorW) && !Double.isNaN(logErrorDw)
                    && logErrorW < 700 && logErrorDw < 700;
        }

        /** The larger of the two errors relative to the moduli (1 + |.| guards zero values). */
        double relativeError(AnalyticArithmetic<T> ar) {
            return Math.max(Math.exp(logErrorW) / Math.max(ar.abs(w), 1e-300),
                    Math.exp(logErrorDw) / Math.max(ar.abs(dw), 1e-300));
        }
    }
}
