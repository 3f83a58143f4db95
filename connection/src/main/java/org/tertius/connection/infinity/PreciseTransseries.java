package org.tertius.connection.infinity;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.RoundingMode;
import java.util.List;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Type;

/**
 * The transseries at infinity of {@link TransseriesAtInfinity} in arbitrary precision: the same recursion
 * ({@link HarmonicTransseries}, written once over the arithmetic family) run on the engine's binary numbers
 * ({@link MpArithmetic}) from exact data (the equation's parameters, the amplitudes p, q as typed), about the
 * background c_k given by its index (D6: c_k = c_0 i^k, c_0 = (-delta/gamma)^(1/4); D7 with gamma = 0: c_k = c_0
 * e^(2 pi i k/3), c_0 = (-delta/alpha)^(1/3); principal roots, the order of {@link TransseriesAtInfinity#backgrounds}).
 *
 * <p><b>Truncation.</b> The series in x^(-1/2) is asymptotic: it is cut at its smallest pair of orders (among the
 * orders built), and the next pair is the truncation estimate. Its smallest term at |x| = r is about
 * e^(-|mu| r) (the coefficients grow like Gamma(n/2) / |mu|^(n/2)) and is reached at about 2 |mu| r orders; with N
 * orders the terms still decay at r when N &lt; 2 |mu| r, so D digits need r of about D ln 10 / |mu| with
 * 4.6 D orders, or somewhat further out with fewer ({@link #ordersFor}). {@link #reach} finds the radius.
 *
 * <p><b>Rounding.</b> The recursion runs with {@link #GUARD} guard digits. How much it amplifies rounding is
 * measured, not assumed: the same coefficients are built in double precision and their relative deviation from the
 * precise ones, in units of the double's rounding, is the amplification ({@link #roundingAmplification}); the
 * rounding estimate of every value is that amplification times the working precision's unit roundoff times the sum of
 * the moduli of the terms. Immutable and thread-safe.
 */
public final class PreciseTransseries {
    /** Guard digits of the working precision above the digits asked for. */
    public static final int GUARD = 12;
    /** The most orders built (the cost grows like the fourth power of the orders on an oscillating ray). */
    public static final int MAX_ORDERS = 160;

    private final MpArithmetic ar;
    private final boolean d7;
    private final MpComplex c;
    private final HarmonicTransseries<MpComplex> core;
    private final double amplification;
    private final int digits;

    private PreciseTransseries(MpArithmetic ar, boolean d7, MpComplex c, HarmonicTransseries<MpComplex> core,
                               double amplification, int digits) {
        this.ar = ar;
        this.d7 = d7;
        this.c = c;
        this.core = core;
        this.amplification = amplification;
        this.digits = digits;
    }

    /** The orders built for D digits: 2 D + 24, at most {@link #MAX_ORDERS}. */
    public static int ordersFor(int digits) {
        return Math.min(MAX_ORDERS, 2 * digits + 24);
    }

    /**
     * The transseries of PIII with exact parameters about the background of index {@code background}, amplitudes p of
     * E and q of 1/E, {@code orders} orders in x^(-1/2) (s^(-1/2) for D7), at {@code digits} digits plus guard digits.
     *
     * @param parameters alpha, beta, gamma, delta (exact numbers; each must be vouched for to {@code digits} digits)
     * @throws InvalidInputException for an equation that is not D6 or D7 with gamma = 0, a background index out of
     *     range, data known to fewer digits than asked, orders outside [4, {@link #MAX_ORDERS}]
     */
    public static PreciseTransseries create(Painleve3 eq, ExactNumber[] parameters, int background, ExactNumber p,
                                            ExactNumber q, int digits, int orders) {
        int count = TransseriesAtInfinity.backgrounds(eq).size();
        if (background < 0 || background >= count) {
            throw new InvalidInputException("background", "the index must be in [0, " + (count - 1) + "], got "
                    + background);
        }
        if (orders < 4 || orders > MAX_ORDERS) {
            throw new InvalidInputException("orders", "must be in [4, " + MAX_ORDERS + "], got " + orders);
        }
        String[] names = {"alpha", "beta", "gamma", "delta"};
        for (int i = 0; i < 4; i++) {
            requireDigits(names[i], parameters[i], digits);
        }
        requireDigits("p", p, digits);
        requireDigits("q", q, digits);
        MpArithmetic ar = new MpArithmetic(digits + GUARD);
        return build(eq, parameters, background, ar, ar.context().fromExact(p), ar.context().fromExact(q), digits,
                orders);
    }

    /**
     * As {@link #create(Painleve3, ExactNumber[], int, ExactNumber, ExactNumber, int, int)} with amplitudes given as
     * numbers (for example iterates of a fit), taken as they are at the working precision.
     */
    public static PreciseTransseries create(Painleve3 eq, ExactNumber[] parameters, int background, Apcomplex p,
                                            Apcomplex q, int digits, int orders) {
        int count = TransseriesAtInfinity.backgrounds(eq).size();
        if (background < 0 || background >= count || orders < 4 || orders > MAX_ORDERS) {
            throw new InvalidInputException("orders", "background index " + background + " must be in [0, "
                    + (count - 1) + "], orders " + orders + " in [4, " + MAX_ORDERS + "]");
        }
        String[] names = {"alpha", "beta", "gamma", "delta"};
        for (int i = 0; i < 4; i++) {
            requireDigits(names[i], parameters[i], digits);
        }
        MpArithmetic ar = new MpArithmetic(digits + GUARD);
        return build(eq, parameters, background, ar, ar.context().fromApcomplex(p), ar.context().fromApcomplex(q),
                digits, orders);
    }

    private static PreciseTransseries build(Painleve3 eq, ExactNumber[] parameters, int background, MpArithmetic ar,
                                            MpComplex pp, MpComplex qq, int digits, int orders) {
        MpContext ctx = ar.context();
        MpComplex alpha = ctx.fromExact(parameters[0]);
        MpComplex beta = ctx.fromExact(parameters[1]);
        MpComplex gamma = ctx.fromExact(parameters[2]);
        MpComplex delta = ctx.fromExact(parameters[3]);
        boolean d7 = eq.type() == Painleve3Type.D7;
        MpComplex c;
        if (d7) {
            MpComplex c0 = ar.pow(ar.negate(ar.divide(delta, alpha)), ar.ratio(1, 3));
            MpComplex turn = ar.exp(ar.multiply(ar.of(0, 1), ar.multiply(ar.pi(), ar.ratio(2L * background, 3))));
            c = background == 0 ? c0 : ar.multiply(c0, turn);
        } else {
            MpComplex rot = ar.one();
            for (int k = 0; k < background; k++) {
                rot = ar.multiply(rot, ar.of(0, 1));
            }
            c = ar.multiply(ar.pow(ar.negate(ar.divide(delta, gamma)), ar.ratio(1, 4)), rot);
        }
        HarmonicTransseries<MpComplex> core = core(ar, d7, alpha, beta, gamma, c, pp, qq, orders);
        HarmonicTransseries<Complex> check = core(ComplexArithmetic.INSTANCE, d7, alpha.toComplex(),
                beta.toComplex(), gamma.toComplex(), c.toComplex(), pp.toComplex(), qq.toComplex(), orders);
        return new PreciseTransseries(ar, d7, c, core, amplification(core, check, orders), digits);
    }

    /**
     * The recursion of the equation about c: D6 with A = (gamma c^2, -gamma c^2) at (2, -2), B = (alpha c, beta/c) at
     * (1, -1); D7 (variable s = x^(2/3)) with A = (9/4) alpha c (1, -1) at (1, -2), B = (9/4) beta/c at -1.
     */
    private static <T> HarmonicTransseries<T> core(AnalyticArithmetic<T> ar, boolean d7, T alpha, T beta, T gamma,
                                                   T c, T p, T q, int orders) {
        if (d7) {
            T a = ar.multiply(ar.multiply(alpha, c), ar.ratio(9, 4));
            T b = ar.multiply(ar.divide(beta, c), ar.ratio(9, 4));
            return new HarmonicTransseries<>(ar, List.of(a, ar.negate(a)), new int[] {1, -2}, List.of(b),
                    new int[] {-1}, p, q, orders);
        }
        T m = ar.multiply(gamma, ar.multiply(c, c));
        return new HarmonicTransseries<>(ar, List.of(m, ar.negate(m)), new int[] {2, -2},
                List.of(ar.multiply(alpha, c), ar.divide(beta, c)), new int[] {1, -1}, p, q, orders);
    }

    /**
     * The smallest radius of {@code radii} (increasing) on the ray of log-coordinate phase {@code phase} where the
     * truncation estimate of {@link #ordersFor}(digits) orders is below a tenth of 10^-digits, from the recursion
     * in double precision (fast: it decides whether the digits can be reached before the precise build), or -1.
     *
     * @param c the background (a root, as {@link TransseriesAtInfinity#backgrounds} gives it)
     */
    public static double plannedRadius(Painleve3 eq, Complex c, Complex p, Complex q, int digits, double[] radii,
                                       double phase) {
        boolean d7 = eq.type() == Painleve3Type.D7;
        int orders = ordersFor(digits);
        HarmonicTransseries<Complex> t = core(ComplexArithmetic.INSTANCE, d7, eq.alpha(), eq.beta(), eq.gamma(), c, p,
                q, orders);
        double target = 0.1 * Math.pow(10, -digits);
        for (double r : radii) {
            double y = d7 ? Math.pow(r, 2.0 / 3) : r;
            LocalValue<Complex> v = t.at(new Complex(Math.log(y), (d7 ? 2.0 / 3 : 1) * phase), orders, 0);
            if (v.errW() <= target && v.errDw() <= target * (1 + v.dw().norm())) {
                return r;
            }
        }
        return -1;
    }

    /**
     * The fewest orders (even, in [8, maxOrders]) whose truncation estimate at |x| = {@code radius} on the
     * ray of log-coordinate phase {@code phase} is below {@code target} (absolute, in u = log(w/c)), from the
     * recursion in double precision with the given amplitudes; -1 if none.
     */
    public static int ordersAt(Painleve3 eq, Complex c, Complex p, Complex q, double target, double radius,
                               double phase, int maxOrders) {
        int most = Math.min(maxOrders, MAX_ORDERS);
        boolean d7 = eq.type() == Painleve3Type.D7;
        HarmonicTransseries<Complex> t = core(ComplexArithmetic.INSTANCE, d7, eq.alpha(), eq.beta(), eq.gamma(), c, p,
                q, most);
        double y = d7 ? Math.pow(radius, 2.0 / 3) : radius;
        Complex tau = new Complex(Math.log(y), (d7 ? 2.0 / 3 : 1) * phase);
        for (int n = 8; n <= most; n += 2) {
            LocalValue<Complex> v = t.at(tau, n, 0);
            if (v.errW() <= target && v.errDw() <= target * (1 + v.dw().norm())) {
                return n;
            }
        }
        return -1;
    }

    /**
     * The truncation estimate (absolute, in u = log(w/c)) of {@code orders} orders at |x| = {@code radius} on the ray
     * of log-coordinate phase {@code phase}, from the recursion in double precision with the given amplitudes.
     */
    public static double truncationAt(Painleve3 eq, Complex c, Complex p, Complex q, int orders, double radius,
                                      double phase) {
        boolean d7 = eq.type() == Painleve3Type.D7;
        HarmonicTransseries<Complex> t = core(ComplexArithmetic.INSTANCE, d7, eq.alpha(), eq.beta(), eq.gamma(), c, p,
                q, orders);
        double y = d7 ? Math.pow(radius, 2.0 / 3) : radius;
        return t.at(new Complex(Math.log(y), (d7 ? 2.0 / 3 : 1) * phase), orders, 0).errW();
    }

    private static void requireDigits(String name, ExactNumber x, int digits) {
        if (x.significantDigits() < digits) {
            throw new InvalidInputException(name, "is known to about " + x.significantDigits() + " significant digits"
                    + " only (a double), so " + digits + " digits cannot be vouched for; give it exactly (decimals or"
                    + " p/q)");
        }
    }

    /**
     * The largest relative deviation of an order's double-precision coefficients from the precise ones, in units of
     * the double's rounding (at least 1): how much the recursion amplifies rounding.
     */
    private static double amplification(HarmonicTransseries<MpComplex> precise, HarmonicTransseries<Complex> dbl,
                                        int orders) {
        double amp = 1;
        for (int n = 1; n <= orders; n++) {
            double dev = 0;
            double size = 0;
            for (int k = -n; k <= n; k += 2) {
                Complex exact = precise.coefficient(n, k).toComplex();
                dev += exact.subtract(dbl.coefficient(n, k)).norm();
                size += exact.norm();
            }
            if (size > 0) {
                double a = dev / (size * 0x1p-53);
                amp = Math.max(amp, Double.isFinite(a) ? a : Double.POSITIVE_INFINITY);
            }
        }
        return amp;
    }

    /** The arithmetic of the values (digits asked plus {@link #GUARD}). */
    public MpArithmetic arithmetic() {
        return ar;
    }

    /** The digits asked for. */
    public int digits() {
        return digits;
    }

    public int orders() {
        return core.orders();
    }

    public MpComplex background() {
        return c;
    }

    public MpComplex mu() {
        return core.mu();
    }

    public MpComplex kappa() {
        return core.kappa();
    }

    /** Coefficient u_nk. */
    public MpComplex coefficient(int n, int k) {
        return core.coefficient(n, k);
    }

    /** The measured rounding amplification of the recursion (see the class comment). */
    public double roundingAmplification() {
        return amplification;
    }

    /**
     * u = log(w/reference) and du/dx at x = exp(tau) (tau = log x on the wanted sheet), with truncation and rounding
     * estimates (reference: c, or c x^(1/3) for D7).
     */
    public LocalValue<MpComplex> logAt(MpComplex tau) {
        if (!d7) {
            return core.at(tau, core.orders(), amplification);
        }
        LocalValue<MpComplex> l = core.at(ar.multiply(tau, ar.ratio(2, 3)), core.orders(), amplification);
        // du/dx = du/ds ds/dx, ds/dx = (2/3) x^(-1/3)
        MpComplex ds = ar.multiply(ar.exp(ar.multiply(tau, ar.ratio(-1, 3))), ar.ratio(2, 3));
        return new LocalValue<>(ar.exp(tau), l.w(), ar.multiply(l.dw(), ds), l.errW(), l.errDw() * ar.abs(ds));
    }

    /** w and w' at x = exp(tau), with error estimates (the value's z is x). */
    public LocalValue<MpComplex> at(MpComplex tau) {
        LocalValue<MpComplex> l = logAt(tau);
        MpComplex reference = d7 ? ar.multiply(c, ar.exp(ar.multiply(tau, ar.ratio(1, 3)))) : c;
        MpComplex slope = d7 ? ar.multiply(ar.exp(ar.negate(tau)), ar.ratio(1, 3)) : ar.zero();
        MpComplex w = ar.multiply(reference, ar.exp(l.w()));
        MpComplex total = ar.add(l.dw(), slope);
        MpComplex dw = ar.multiply(w, total);
        double aw = ar.abs(w);
        double eps = ar.epsilon();
        return new LocalValue<>(l.z(), w, dw, aw * l.errW() + 4 * eps * aw,
                aw * (l.errDw() + ar.abs(total) * l.errW()) + 8 * eps * ar.abs(dw));
    }

    /**
     * The point r e^(i angle) with its parts rounded to {@code digits() + GUARD} significant digits (relative to r) as
     * an exact decimal number: the start point that is printed and replayed, off the ray by less than 10^-(digits +
     * GUARD) r (the transseries is evaluated at this point itself, so the start data belong to it exactly).
     *
     * @param angle the argument of the ray at the working precision (for example pi/2 computed here)
     */
    public ExactNumber pointOnRay(BigDecimal radius, MpComplex angle) {
        MpComplex r = ctx().fromExact(ExactNumber.parse("radius", radius.toPlainString()));
        MpComplex z = ar.multiply(r, ar.exp(ar.multiply(ar.of(0, 1), angle)));
        BigDecimal[] parts = MpContext.exactDecimal(z);
        int keep = digits + GUARD;
        int scale = keep - 1 - (radius.precision() - radius.scale() - 1);
        BigInteger[] num = new BigInteger[2];
        BigInteger den = BigInteger.TEN.pow(Math.max(scale, 0));
        for (int i = 0; i < 2; i++) {
            BigDecimal x = parts[i].setScale(Math.max(scale, 0), RoundingMode.HALF_EVEN);
            num[i] = x.unscaledValue();
        }
        return ExactNumber.ofComplexRational(num[0], den, num[1], den);
    }

    /** w and w' at an exact point z on the sheet {@code sheet} (log z = principal log + 2 pi i sheet). */
    public LocalValue<MpComplex> startData(ExactNumber z, int sheet) {
        MpComplex turn = ar.multiply(ar.of(0, 2 * sheet), ar.pi());
        return at(ar.add(ar.log(ctx().fromExact(z)), turn));
    }

    private MpContext ctx() {
        return ar.context();
    }

    /**
     * The smallest radius of the list {@code radii} (increasing) on the ray with log-coordinate phase {@code phase}
     * (arg x + 2 pi sheet) where w and w' reach {@link #digits()} digits relative to 1 + |value|, or -1 if none.
     */
    public double reach(double[] radii, double phase) {
        double target = Math.pow(10, -digits);
        for (double r : radii) {
            LocalValue<MpComplex> v = at(ar.of(Math.log(r), phase));
            if (v.relativeError(ar) <= target) {
                return r;
            }
        }
        return -1;
    }
}
