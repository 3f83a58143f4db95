package org.tertius.connection.match;

import java.util.List;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.hipparchus.complex.Complex;
import org.tertius.connection.infinity.DecayingTransseries;
import org.tertius.connection.path.DeviationTaylor;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/**
 * The decaying family of PIII(0, 0, 1, -1), w ~ 1 - 2 lambda K0(2x) at +infinity (McCoy, Tracy and Wu,
 * J. Math. Phys. 18 (1977) 1058), connected numerically to its behaviour w ~ B x^sigma at 0:
 * <ol>
 *   <li>the transseries {@link DecayingTransseries} at x = {@link #FAR} (error below 1e-20 relative to w - 1
 *       there),</li>
 *   <li>the deviation w - 1 carried inward to x = {@link #MIDDLE} by {@link DeviationTaylor} with relative
 *       accuracy (where w - 1 is small, an absolute error of w is a large relative error of lambda),</li>
 *   <li>from there to a small x0 by the core engine (double) or by {@link DeviationTaylor} on w itself
 *       (any precision),</li>
 *   <li>(sigma, B) fitted at x0 by {@link ZeroFit}.</li>
 * </ol>
 * Immutable and thread-safe.
 */
public final class DecayingConnection {
    /** Where the transseries is evaluated in double precision (larger in arbitrary precision, see far()). */
    public static final double FAR = 12;
    /** Where the background-relative integration hands over. */
    public static final double MIDDLE = 1;

    private DecayingConnection() {
    }

    /** The equation of the family: alpha = beta = 0, gamma = 1, delta = -1. */
    public static Painleve3 equation() {
        return Painleve3.of(0, 0, 1, -1);
    }

    /** The parameters (0, 0, 1, -1) in the arithmetic {@code ar}. */
    public static <T> List<T> parameters(AnalyticArithmetic<T> ar) {
        return List.of(ar.zero(), ar.zero(), ar.one(), ar.of(-1));
    }

    /** The deviation v = w - 1 and w' at x = MIDDLE for the member lambda, with error estimates. */
    public static <T> LocalValue<T> middleDeviation(AnalyticArithmetic<T> ar, T lambda, double tolerance) {
        int sectors = 1 + 2 * (int) Math.ceil(ar.digits() / 10.0);
        double x = far(ar);
        DecayingTransseries<T> ts = DecayingTransseries.create(ar, lambda, sectors, (int) (4 * x + 20));
        LocalValue<T> far = ts.deviationAt(ar.of(x));
        return DeviationTaylor.create(ar, parameters(ar), ar.one(), order(ar)).integrate(far, ar.of(MIDDLE),
                tolerance);
    }

    /**
     * The start of the transseries: the smallest term of sector 1 is about e^(-4x) relative to it (optimal
     * truncation of the K0 expansion), so x = digits ln(10)/4 + 2, at least {@link #FAR}.
     */
    static <T> double far(AnalyticArithmetic<T> ar) {
        return Math.max(FAR, Math.ceil(ar.digits() * Math.log(10) / 4 + 2));
    }

    private static <T> int order(AnalyticArithmetic<T> ar) {
        return (int) Math.min(400, Math.max(30, 2 * ar.digits()));
    }

    /**
     * w and w' (double) at the hand-over point: x = MIDDLE, or the first point of FAR - 0.5 k (k = 1, 2, ...)
     * where |w - 1| exceeds 0.05 (members with large lambda have zeros of w beyond MIDDLE, which the
     * deviation integrator does not pass; the core engine does).
     */
    public static Painleve3Value middleValue(double lambda) {
        requireFinite(lambda);
        ComplexArithmetic ar = ComplexArithmetic.INSTANCE;
        DecayingTransseries<Complex> ts = DecayingTransseries.create(ar, new Complex(lambda), 7, (int) (4 * FAR + 20));
        LocalValue<Complex> v = ts.deviationAt(new Complex(FAR));
        DeviationTaylor<Complex> taylor = DeviationTaylor.create(ar, parameters(ar), ar.one(), order(ar));
        for (double x = FAR - 0.5; x >= MIDDLE - 1e-12 && v.w().norm() <= 0.05; x -= 0.5) {
            v = taylor.integrate(v, new Complex(x), 1e-16);
        }
        return new Painleve3Value(SurfacePoint.of(v.z().getReal(), 0), v.w().add(1), v.dw(), v.errW(), v.errDw());
    }

    /** The member lambda as an integrated solution of the core engine, started at x = MIDDLE. */
    public static Painleve3Solution solution(double lambda, SolverSettings settings) {
        Painleve3Value m = middleValue(lambda);
        return Painleve3Solution.builder(equation()).start(m.point().z(), m.w(), m.dw()).startErrors(m.errW(), m.errDw())
                .startComputedBy("the decaying family's transseries at infinity").settings(settings).build();
    }

    /** (sigma, B) of the member lambda in double precision, through the core engine, fitted at x0. */
    public static ZeroFit.Result<Complex> zeroDataByEngine(double lambda, double x0, SolverSettings settings) {
        Painleve3Value m = middleValue(lambda);
        Painleve3Solution s = Painleve3Solution.builder(equation()).start(m.point().z(), m.w(), m.dw())
                .settings(settings).build();
        Painleve3Value at = s.evaluate(SurfacePoint.of(x0, 0));
        // errors of the start data are propagated at most by the growth of w - 1 relative to its size at MIDDLE
        double grow = Math.max(1, at.w().norm() / Math.max(1e-300, m.w().subtract(1).norm()));
        LocalValue<Complex> data = new LocalValue<>(new Complex(x0), at.w(), at.dw(), at.errW() + grow * m.errW(),
                at.errDw() + grow * m.errW() / x0);
        return new ZeroFit<>(ComplexArithmetic.INSTANCE, parameters(ComplexArithmetic.INSTANCE), 40).fit(data);
    }

    /**
     * (sigma, B) of the member lambda in the arithmetic {@code ar} without the core engine: the deviation
     * integrator runs on to x0 on w itself.
     */
    public static <T> ZeroFit.Result<T> zeroData(AnalyticArithmetic<T> ar, T lambda, double x0, int degree) {
        double tol = ar.epsilon() * 10;
        LocalValue<T> mid = middleDeviation(ar, lambda, tol);
        LocalValue<T> w = new LocalValue<>(mid.z(), ar.add(mid.w(), ar.one()), mid.dw(), mid.errW(), mid.errDw());
        LocalValue<T> end = DeviationTaylor.create(ar, parameters(ar), ar.zero(), order(ar)).integrate(w, ar.of(x0),
                tol);
        return new ZeroFit<>(ar, parameters(ar), degree).fit(end);
    }

    /** Largest |sigma| accepted by {@link #lambdaForSigma} (sigma(0.312) = 0.8836...). */
    public static final double SIGMA_MAX = 0.88;

    /**
     * The member lambda whose exponent at 0 is sigma (0 &lt; |sigma| &lt; 1), by Brent's method (Hipparchus) on
     * lambda -> sigma(lambda) - sigma over (-1/pi, 1/pi), sigma(lambda) from {@link #zeroDataByEngine}.
     *
     * @return {lambda, estimated error}
     */
    public static double[] lambdaForSigma(double sigma, double x0, SolverSettings settings) {
        InvalidInputException.requireFinite("sigma", sigma);
        if (!(Math.abs(sigma) <= SIGMA_MAX)) {
            throw new InvalidInputException("sigma", "must be in [-" + SIGMA_MAX + ", " + SIGMA_MAX + "] here, got "
                    + sigma + "; the pole-free family has |sigma| < 1, sigma = +-1 is the logarithmic member"
                    + " lambda = +-1/pi, no member has |sigma| > 1 on the positive axis, and for |sigma| > "
                    + SIGMA_MAX + " the fit at x0 needs x0 below double range");
        }
        double edge = 0.312;
        double err = 0;
        double[] slope = new double[1];
        double lam = new BrentSolver(1e-15, 1e-15).solve(200, l -> {
            ZeroFit.Result<Complex> r = zeroDataByEngine(l, x0, settings);
            return r.sigma().getReal() - sigma;
        }, -edge, edge);
        ZeroFit.Result<Complex> r = zeroDataByEngine(lam, x0, settings);
        ZeroFit.Result<Complex> r2 = zeroDataByEngine(lam + 1e-7, x0, settings);
        slope[0] = (r2.sigma().getReal() - r.sigma().getReal()) / 1e-7;
        err = (r.errSigma() + Math.abs(r.sigma().getReal() - sigma)) / Math.abs(slope[0]) + 1e-15;
        return new double[] {lam, err};
    }

    private static void requireFinite(double lambda) {
        InvalidInputException.requireFinite("lambda", lambda);
    }
}
