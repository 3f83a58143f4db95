package org.tertius.connection.zero;

import org.hipparchus.complex.Complex;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.core.InvalidInputException;

/**
 * The resonant (logarithmic) member lambda = 1/pi of the decaying family of PIII(0, 0, 1, -1) near x = 0,
 * {@code w ~ -x (log(x/4) + gamma_E)} (the limiting case of McCoy, Tracy and Wu, J. Math. Phys. 18 (1977) 1058;
 * constant {@link McCoyTracyWu#logarithmicConstant()}), with its first correction, as start data for the core
 * engine at small x.
 *
 * <p><b>Series</b> (derived here). With u = log w, t = log x, D = x d/dx the equation is
 * {@code D^2 u = x^2 e^(2u) - x^2 e^(-2u)}. The Liouville part {@code D^2 u = -x^2 e^(-2u)} is solved exactly by
 * {@code u_0 = log x + log(-s)}, {@code s = log x + kappa}, kappa = gamma_E - log 4. Writing u = u_0 + x^4 f(s),
 * the terms of order x^4 give {@code f'' + 8 f' + 16 f - 2 f / s^2 = s^2}, whose solution without the
 * homogeneous parts (those are e^(-4t) times powers of s, i.e. changes of the order-1 data) follows from the
 * recurrence {@code 16 F_p + 8 (p+1) F_(p+1) + p (p+3) F_(p+2) = [p = 2]} for the coefficients of s^p, which
 * terminates:
 * <pre>  f(s) = s^2/16 - s/16 + 1/32 - 1/(128 s).</pre>
 * Hence {@code w = -x s exp(x^4 f(s) + O(x^8 s^4))}. The next order solves
 * {@code g'' + 16 g' + 64 g - 2 g / s^2 = 2 s^2 f + O(f^2/s^2) ~ s^4/8}, so {@code g ~ s^4/512}; the error estimate
 * for u is taken as {@code x^8 s^4 / 8} (four times that, for the omitted lower powers of s) plus rounding. The
 * test compares with the family integrated in from +infinity ({@code DecayingConnection}).
 */
public final class LogarithmicAtZero {
    /** Largest x accepted: beyond it the omitted x^8 terms are not small (|x^8 s^4| ~ 1e-5 at x = 0.2). */
    public static final double MAX_X = 0.2;
    private static final double EPS = 0x1p-52;

    private LogarithmicAtZero() {
    }

    /** The exponent of the first correction, f(s) = s^2/16 - s/16 + 1/32 - 1/(128 s). */
    static double f(double s) {
        return s * s / 16 - s / 16 + 1.0 / 32 - 1 / (128 * s);
    }

    /** f'(s). */
    static double df(double s) {
        return s / 8 - 1.0 / 16 + 1 / (128 * s * s);
    }

    /**
     * w and w' of the member lambda = 1/pi at 0 &lt; x &lt;= {@link #MAX_X} with error estimates.
     *
     * @throws InvalidInputException for x outside (0, MAX_X]
     */
    public static LocalValue<Complex> at(double x) {
        if (!(x > 0 && x <= MAX_X)) {
            throw new InvalidInputException("x0", "the logarithmic series at 0 is used for 0 < x <= " + MAX_X
                    + ", got " + x);
        }
        double kappa = McCoyTracyWu.logarithmicConstant();
        double s = Math.log(x) + kappa;
        double x4 = x * x * x * x;
        double u1 = x4 * f(s);
        double w = -x * s * Math.exp(u1);
        // u' = 1/x + 1/(x s) + 4 x^3 f(s) + x^3 f'(s)
        double du = 1 / x + 1 / (x * s) + 4 * x * x * x * f(s) + x * x * x * df(s);
        double dw = w * du;
        double s4 = s * s * s * s;
        double truncU = x4 * x4 * s4 / 2;
        double truncDu = 8 * truncU / x * (1 + 1 / Math.abs(s));
        // rounding: kappa and log x to a few ulps of |s|, i.e. relative error ~ 4 eps in s, hence in w and u' s
        double roundW = 8 * EPS * Math.abs(w);
        double roundDu = 8 * EPS * (1 / x) * (1 + 1 / Math.abs(s));
        double errW = Math.abs(w) * truncU + roundW;
        double errDw = Math.abs(w) * (truncDu + roundDu) + errW * Math.abs(du);
        return new LocalValue<>(new Complex(x), new Complex(w), new Complex(dw), errW, errDw);
    }
}
