package org.tertius.connection.match;

import java.math.MathContext;
import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleConsumer;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.connection.zero.ZeroExpansion;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;

/**
 * The power behaviour w ~ B z^sigma at 0 (|Re sigma| &lt; 1) in arbitrary precision, both ways:
 * <ul>
 *   <li>{@link #expansion}, {@link #startData}: w and w' at a point from exact (sigma, B), the series at 0
 *       ({@link ZeroExpansion});</li>
 *   <li>{@link #fit}: (sigma, B) of a solution given by exact start data: the solution is replayed to D digits
 *       ({@link HighPrecisionSolution}) to a point z0 near 0 on the ray, and the two equations "series at z0 = value"
 *       are solved by Newton's method ({@link ZeroFit}, started from z w'/w), the degree of the series chosen from
 *       the double-precision sigma so that its truncation at z0 is below the digits asked for. The errors are those
 *       of the replayed value and of the series, mapped through the inverse Jacobian.</li>
 * </ul>
 * Thread-safe (no state).
 */
public final class PreciseZeroFit {
    /** Where the replayed solution is read: |z0| (small enough for the series, large enough for a short replay). */
    public static final double FIT_RADIUS = 1e-3;
    private static final int MAX_DEGREE = 400;
    private static final int MAX_ROWS = 64;

    private PreciseZeroFit() {
    }

    /** The equation's parameters (alpha, beta, gamma, delta) to the working precision of {@code ar}, exactly read. */
    public static List<Apcomplex> parameters(ApcomplexArithmetic ar, Painleve3 eq, int digits) {
        ExactNumber[] p = eq.exactParameters();
        if (p == null) {
            throw new InvalidInputException("equation", "the parameters must be exact (decimals or p/q) for digits");
        }
        List<Apcomplex> out = new ArrayList<>();
        for (ExactNumber x : p) {
            out.add(exact(ar, x, digits));
        }
        return out;
    }

    /** An exact number to {@code digits} (plus guard digits) as an Apcomplex. */
    public static Apcomplex exact(ApcomplexArithmetic ar, ExactNumber x, int digits) {
        MathContext mc = new MathContext(digits + 10);
        return new Apcomplex(new Apfloat(x.realPart(mc), digits + 10), new Apfloat(x.imaginaryPart(mc), digits + 10));
    }

    /**
     * The series at 0 of exact power data with {@code rows} rows (its cost grows fast with the rows: in 50 digits
     * about 6 s for 16 rows, 16 s for 32, over a minute for 48); evaluate it with {@link ZeroExpansion#at}, whose
     * error estimates say how far it reaches.
     *
     * @throws InvalidInputException for data that are not of the power kind with |Re sigma| &lt; 1, rows outside
     *     [4, 64]
     */
    public static ZeroExpansion<Apcomplex> expansion(ApcomplexArithmetic ar, List<Apcomplex> parameters,
                                                     Apcomplex sigma, Apcomplex b, int rows) {
        ZeroBehaviour check = ZeroBehaviour.power(ar.toComplex(sigma), ar.toComplex(b));
        if (check.kind() != ZeroBehaviour.Kind.POWER) {
            throw new InvalidInputException("sigma", "digits are available for |Re sigma| < 1 only, got " + check.sigma());
        }
        if (rows < 4 || rows > MAX_ROWS) {
            throw new InvalidInputException("rows", "must be in [4, " + MAX_ROWS + "], got " + rows);
        }
        return ZeroExpansion.power(ar, parameters, sigma, b, rows);
    }

    /**
     * Start data on the ray Im tau = phase: the value at the largest |z| = 2^-k/4 (k = 2..60) where the series reaches
     * relative accuracy 10^-digits (relative to 1 + |value|), or the last tried (its errors say how far it got).
     */
    public static LocalValue<Apcomplex> startData(ApcomplexArithmetic ar, ZeroExpansion<Apcomplex> series,
                                                  Apcomplex phase, int digits) {
        double target = Math.pow(10, -digits);
        LocalValue<Apcomplex> v = null;
        Apcomplex log2 = ar.log(ar.ratio(2, 1));
        for (int k = 2; k <= 60; k++) {
            v = series.at(ar.add(ar.negate(ar.multiply(ar.ratio(k, 1), log2)), phase));
            if (v.errW() <= target * (1 + ar.abs(v.w())) && v.errDw() <= target * (1 + ar.abs(v.dw()))) {
                return v;
            }
        }
        return v;
    }

    /** A fit in arbitrary precision: sigma and B with absolute errors, and the point where they were read. */
    public static final class Result {
        private final ZeroFit.Result<Apcomplex> fit;
        private final ExactPoint point;
        private final int degree;

        Result(ZeroFit.Result<Apcomplex> fit, ExactPoint point, int degree) {
            this.fit = fit;
            this.point = point;
            this.degree = degree;
        }

        public Apcomplex sigma() {
            return fit.sigma();
        }

        public Apcomplex amplitude() {
            return fit.amplitude();
        }

        public double sigmaError() {
            return fit.errSigma();
        }

        public double amplitudeError() {
            return fit.errAmplitude();
        }

        public ExactPoint point() {
            return point;
        }

        public int degree() {
            return degree;
        }
    }

    /**
     * sigma and B of {@code solution} (exact start data) to about {@code digits} digits, read at |z| =
     * {@link #FIT_RADIUS} on the ray arg z = angle of the principal sheet (sheet must be 0).
     *
     * @param estimate the double-precision behaviour at 0 on that ray ({@link ZeroBehaviourFit}); must be of the
     *     power kind
     * @throws InvalidInputException for another kind, or start data not exact
     * @throws TertiusException if Newton's method does not converge
     */
    public static Result fit(Painleve3Solution solution, ZeroBehaviour estimate, double angle, int sheet, int digits,
                             DoubleConsumer progress) {
        if (estimate.kind() != ZeroBehaviour.Kind.POWER) {
            throw new InvalidInputException("digits", "the fit at 0 in arbitrary precision is available for the power"
                    + " behaviour |Re sigma| < 1 only; the double-precision fit gives " + estimate.kind()
                    + (estimate.note().isEmpty() ? "" : " (" + estimate.note() + ")"));
        }
        HighPrecisionSolution.checkDigits(digits);
        if (sheet != 0 || !(angle > -Math.PI && angle <= Math.PI)) {
            throw new InvalidInputException("sheet", "the fit at 0 in arbitrary precision reads the principal sheet"
                    + " (angle in (-pi, pi], sheet 0), got angle " + angle + " on sheet " + sheet);
        }
        Complex z0 = new Complex(Math.cos(angle), Math.sin(angle)).multiply(FIT_RADIUS);
        ExactPoint point = ExactPoint.of(ExactNumber.ofDouble("angle", z0), sheet);
        HighPrecisionSolution hp = HighPrecisionSolution.of(solution, digits + 5, progress);
        HighPrecisionValue v = hp.evaluate(point);
        ApcomplexArithmetic ar = new ApcomplexArithmetic(digits + 10);
        double gap = 1 - Math.abs(estimate.sigma().getReal()) - 3 * estimate.sigmaError();
        int degree = (int) Math.ceil(digits * Math.log(10) / (Math.max(gap, 0.05) * Math.log(1 / FIT_RADIUS))) + 6;
        if (degree > MAX_DEGREE) {
            throw new InvalidInputException("digits", "sigma = " + estimate.sigma() + " is too close to the edge |Re"
                    + " sigma| = 1 for " + digits + " digits at |z| = " + FIT_RADIUS + " (the series would need "
                    + degree + " terms, at most " + MAX_DEGREE + ")");
        }
        Apcomplex w = v.value(0);
        Apcomplex dw = v.value(1);
        double rel = Math.pow(10, -v.correctDigits());
        Apcomplex z = exact(ar, point.z(), digits);
        // the principal sheet: the series' z^sigma is the principal power there
        LocalValue<Apcomplex> data = new LocalValue<>(z, w, dw, rel * ar.abs(w), rel * ar.abs(dw));
        ZeroFit<Apcomplex> fit = new ZeroFit<>(ar, parameters(ar, solution.equation(), digits), degree);
        return new Result(fit.fit(data), point, degree);
    }
}
