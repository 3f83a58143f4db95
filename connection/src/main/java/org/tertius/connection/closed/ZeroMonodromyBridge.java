package org.tertius.connection.closed;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import java.util.function.Supplier;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;
import org.tertius.hierarchy.Member1Map;
import org.tertius.hierarchy.monodromy.Estimate;

/**
 * The bridge between the behaviour {@code w ~ B z^sigma} (|Re sigma| &lt; 1) of a Painleve III (D6) solution at z = 0
 * and the monodromy data of its lambda-equation (member 1 of the hierarchy through {@link Member1Map#forEquation},
 * conventions of the monodromy map, README.md "Monodromy data"). Derived here by the method of Jimbo (Publ. RIMS 18
 * (1982) 1137: as z -> 0 the lambda-equation splits into two confluent hypergeometric systems, whose connection
 * matrices are Gamma functions; the method is recalled from memory, his formulas could not be read); the derivation
 * is written out in connection/README.md, section "Monodromy data at z = 0". With
 * <pre>
 *   nu = (1 - sigma)/4,   m = alpha / (4 sqrt(gamma)) - 1/2,   m0 = beta / (4 i sqrt(delta))
 *   (gamma = 1, delta = -1: m = (alpha - 2)/4, m0 = -beta/4), the formal exponents at lambda = infinity and 0:
 *
 *   tr M_0 = e^(2 pi i m0) + e^(-2 pi i m0) (1 + s_0_1 s_0_2) = 2 sin(pi sigma / 2)            (exponent)
 *
 *   chi = 1 - s_inf_1 E11 / E21        (free of the gauges; = E'21 / E21 with E' = (Y^inf_2)^-1 Y^0_1)
 *   B = G(sigma) (e^(2 pi i (m + nu)) - chi) / (e^(2 pi i (m - nu)) - chi),                      (second parameter)
 *   G(sigma) = F 2^(-sigma) e^(-2 pi i nu) [Gamma(2 nu) / Gamma(1 - 2 nu)]^2
 *              Gamma(1 + m0 - nu) Gamma(-nu - m) / (Gamma(nu + m0) Gamma(nu - m)),
 *   F = -4 i K s exp(2 nu (Log c^2 - Log(16 s)))  with the map's K = sqrt(delta)/(4s), c^2 = 4i/(K sqrt(gamma))
 *   (F = 1 for gamma = 1, delta = -1; for s &gt; 0, F = -i sqrt(delta) (i / (sqrt(gamma) sqrt(delta)))^(2 nu)).
 * </pre>
 * The trace is invariant; so is chi under the gauge (q, r) -> (e^g q, e^-g r) and the diagonal factor of the
 * solutions at 0, so both can be read from the data of any point. For gamma = 1, delta = -1 the second line reads
 * {@code B = 2^(-sigma) e^(-i pi (1 - sigma)/2) [Gamma((1-sigma)/2) / Gamma((1+sigma)/2)]^2 Gamma((3+sigma-beta)/4)
 * Gamma((1+sigma-alpha)/4) / (Gamma((1-sigma-beta)/4) Gamma((3-sigma-alpha)/4)) (e^(i pi (alpha-1-sigma)/2) - chi) /
 * (e^(i pi (alpha-3+sigma)/2) - chi)}; at alpha = beta = 0 and chi = 1 (E11 = 0) it is the formula of McCoy, Tracy
 * and Wu ({@link McCoyTracyWu}). Confirmed numerically against the monodromy map and the expansion at 0 (tests
 * ZeroMonodromyBridgeTest). Evaluated in 40 digits (Apfloat), returned in double precision. Immutable.
 */
public final class ZeroMonodromyBridge {
    static final long PRECISION = 40;
    /** Digits the working precision keeps beyond those lost to e^(2 pi i m), e^(2 pi i m0): double's 16 and 4 more. */
    private static final long MARGIN_DIGITS = 20;
    private static final double STEP = 1e-7;

    private final Painleve3 equation;
    private final Complex s;
    private final Complex m;
    private final Complex m0;
    private final Complex ks;
    private final Complex cSquared;

    private ZeroMonodromyBridge(Painleve3 equation, Complex s, Member1Map map) {
        this.equation = equation;
        this.s = s;
        this.m = map.m(equation);
        this.m0 = map.traceIntegral(equation).divide(Complex.I.multiply(2).multiply(s));
        this.ks = map.k().multiply(s);
        this.cSquared = map.cSquared();
    }

    /**
     * The bridge for a D6 equation (gamma delta != 0) whose monodromy data are those of member 1 with constant s
     * (Member1Map.forEquation(eq, s); the commands use s = 1/4).
     *
     * @throws InvalidInputException if gamma or delta vanishes or s = 0
     */
    public static ZeroMonodromyBridge of(Painleve3 equation, Complex s) {
        ZeroMonodromyBridge bridge = new ZeroMonodromyBridge(equation, s, Member1Map.forEquation(equation, s));
        // the closed forms combine e^(2 pi i m), e^(2 pi i m0) and their inverses: digits lost in cancellation
        double lost = 2 * Math.PI * (Math.abs(bridge.m.getImaginary()) + Math.abs(bridge.m0.getImaginary()))
                / Math.log(10);
        if (!(lost <= PRECISION - MARGIN_DIGITS)) {
            throw new InvalidInputException("equation", "the formal exponents m = " + ComplexText.brief(bridge.m)
                    + ", m0 = " + ComplexText.brief(bridge.m0) + " lose about "
                    + String.format(Locale.ROOT, "%.1f", lost) + " of the bridge's " + PRECISION + " working digits in"
                    + " cancellation; it takes 2 pi (|Im m| + |Im m0|) / ln 10 <= " + (PRECISION - MARGIN_DIGITS));
        }
        return bridge;
    }

    /** The bridge for member 1 itself (s, m and the trace-form integral T), through its canonical image. */
    public static ZeroMonodromyBridge ofMember1(Complex s, Complex m, Complex traceIntegral) {
        return of(Member1Map.canonical(s).equation(m, traceIntegral), s);
    }

    public Painleve3 equation() {
        return equation;
    }

    public Complex s() {
        return s;
    }

    /** The relative rounding error of a closed form of the bridge (its Gamma factors; the Apfloat part is smaller). */
    public static double closedFormRounding() {
        return WhittakerConnection.GAMMA_ROUNDING;
    }

    /** The formal exponent m at lambda = infinity. */
    public Complex m() {
        return m;
    }

    /** The formal exponent m0 at lambda = 0. */
    public Complex m0() {
        return m0;
    }

    /** tr M_0 = 2 sin(pi sigma / 2). */
    public static Complex trace(Complex sigma) {
        return sigma.multiply(Math.PI / 2).sin().multiply(2);
    }

    /** tr M_0 = e^(2 pi i m0) + e^(-2 pi i m0) (1 + s_0_1 s_0_2) from the data at 0. */
    public static Complex traceAtZero(Complex m0, Complex s01, Complex s02) {
        Complex e = Complex.I.multiply(2 * Math.PI).multiply(m0).exp();
        return e.add(Complex.ONE.add(s01.multiply(s02)).divide(e));
    }

    /** tr M_inf = e^(2 pi i m) (1 + s_inf_1 s_inf_2) + e^(-2 pi i m) from the data at infinity (member 1). */
    public static Complex traceAtInfinity(Complex m, Complex sInf1, Complex sInf2) {
        Complex e = Complex.I.multiply(2 * Math.PI).multiply(m).exp();
        return e.multiply(Complex.ONE.add(sInf1.multiply(sInf2))).add(Complex.ONE.divide(e));
    }

    /**
     * sigma = (2/pi) arcsin(tr / 2), the exponent with |Re sigma| &lt; 1 of the trace.
     *
     * @throws InvalidInputException if the trace is real with |tr| &gt;= 2 (sigma on the edges Re sigma = +-1, where
     *     the power behaviour with |Re sigma| &lt; 1 does not apply)
     */
    public static Complex sigma(Complex trace) {
        FixedPrecisionApcomplexHelper h = helper();
        Apcomplex x = h.asin(h.divide(ap(trace), new Apcomplex(new Apfloat(2, PRECISION))));
        Complex sigma = toComplex(h.divide(h.multiply(x, new Apcomplex(new Apfloat(2, PRECISION))),
                new Apcomplex(ApfloatMath.pi(PRECISION))));
        if (!(Math.abs(sigma.getReal()) < 1 - 1e-12)) {
            throw new InvalidInputException("trace", "tr M_0 = " + trace + " gives Re sigma = +-1 (the edge or"
                    + " logarithmic behaviour at 0); the bridge covers |Re sigma| < 1");
        }
        return sigma;
    }

    /** chi = 1 - s_inf_1 E11 / E21 (E in any normalisation; infinite when E21 = 0). */
    public static Complex chi(Complex sInf1, Complex e11, Complex e21) {
        return Complex.ONE.subtract(sInf1.multiply(e11).divide(e21));
    }

    /** G(sigma), the factor of B in front of the Moebius function of chi. */
    public Complex gammaFactor(Complex sigma) {
        requireStrip(sigma);
        return evaluate("sigma", () -> gammaFactor(helper(), ap(sigma)));
    }

    Apcomplex gammaFactor(FixedPrecisionApcomplexHelper h, Apcomplex sigma) {
        Apcomplex one = h.valueOf(Apcomplex.ONE);
        Apcomplex nu = h.divide(h.subtract(one, sigma), new Apcomplex(new Apfloat(4, PRECISION)));
        Apcomplex twoNu = h.add(nu, nu);
        Apcomplex am = ap(m);
        Apcomplex am0 = ap(m0);
        Apcomplex two = new Apcomplex(new Apfloat(2, PRECISION));
        Apcomplex prefactor = h.multiply(h.multiply(new Apcomplex(Apfloat.ZERO, new Apfloat(-4, PRECISION)), ap(ks)),
                h.exp(h.multiply(twoNu, h.subtract(h.log(ap(cSquared)), h.log(h.multiply(ap(s),
                        new Apcomplex(new Apfloat(16, PRECISION))))))));
        Apcomplex ratio = h.divide(gamma(h, twoNu), gamma(h, h.subtract(one, twoNu)));
        Apcomplex gammas = h.divide(h.multiply(gamma(h, h.add(one, h.subtract(am0, nu))),
                gamma(h, h.negate(h.add(nu, am)))), h.multiply(gamma(h, h.add(nu, am0)), gamma(h, h.subtract(nu, am))));
        Apcomplex phase = h.exp(h.negate(h.multiply(twoPiI(h), nu)));
        return h.multiply(h.multiply(h.multiply(prefactor, h.pow(two, h.negate(sigma))), phase),
                h.multiply(h.multiply(ratio, ratio), gammas));
    }

    /**
     * B from sigma and chi.
     *
     * @throws InvalidInputException outside |Re sigma| &lt; 1 or where the formula degenerates (a Gamma function at a
     *     pole, chi = e^(2 pi i (m - nu)))
     */
    public Complex amplitude(Complex sigma, Complex chi) {
        FixedPrecisionApcomplexHelper h = helper();
        Apcomplex[] e = moebiusPoints(h, ap(requireStrip(sigma)));
        Apcomplex c = ap(chi);
        return evaluate("chi", () -> h.divide(h.multiply(gammaFactor(h, ap(sigma)), h.subtract(e[0], c)),
                h.subtract(e[1], c)));
    }

    /** B from sigma, s_inf_1, E11 and E21 (homogeneous in E; E21 = 0 allowed). */
    public Complex amplitude(Complex sigma, Complex sInf1, Complex e11, Complex e21) {
        FixedPrecisionApcomplexHelper h = helper();
        Apcomplex[] e = moebiusPoints(h, ap(requireStrip(sigma)));
        Apcomplex one = h.valueOf(Apcomplex.ONE);
        Apcomplex se = h.multiply(ap(sInf1), ap(e11));
        Apcomplex f21 = ap(e21);
        Apcomplex top = h.add(h.multiply(h.subtract(e[0], one), f21), se);
        Apcomplex bottom = h.add(h.multiply(h.subtract(e[1], one), f21), se);
        return evaluate("connection", () -> h.divide(h.multiply(gammaFactor(h, ap(sigma)), top), bottom));
    }

    /** chi from sigma and B (the inverse of {@link #amplitude(Complex, Complex)}). */
    public Complex chi(Complex sigma, Complex b) {
        FixedPrecisionApcomplexHelper h = helper();
        Apcomplex[] e = moebiusPoints(h, ap(requireStrip(sigma)));
        return evaluate("B", () -> {
            Apcomplex r = h.divide(ap(b), gammaFactor(h, ap(sigma)));
            return h.divide(h.subtract(e[0], h.multiply(r, e[1])), h.subtract(h.valueOf(Apcomplex.ONE), r));
        });
    }

    /** {e^(2 pi i (m + nu)), e^(2 pi i (m - nu))}. */
    private Apcomplex[] moebiusPoints(FixedPrecisionApcomplexHelper h, Apcomplex sigma) {
        Apcomplex nu = h.divide(h.subtract(h.valueOf(Apcomplex.ONE), sigma), new Apcomplex(new Apfloat(4, PRECISION)));
        Apcomplex am = ap(m);
        return new Apcomplex[] {h.exp(h.multiply(twoPiI(h), h.add(am, nu))),
            h.exp(h.multiply(twoPiI(h), h.subtract(am, nu)))};
    }

    /**
     * sigma and B from monodromy data given with errors (null entries: not known). sigma needs s_0_1, s_0_2 (with
     * this bridge's m0) or else s_inf_1, s_inf_2 (with m); B needs also s_inf_1, E11 and E21. The errors are the
     * given ones propagated to first order (derivatives by differences) plus the rounding of the result.
     *
     * @return {sigma, B}; B is null when the data do not fix it
     */
    public List<Estimate<Complex>> zeroData(Estimate<Complex> s01, Estimate<Complex> s02, Estimate<Complex> sInf1,
                                            Estimate<Complex> sInf2, Estimate<Complex> e11, Estimate<Complex> e21) {
        List<Estimate<Complex>> in = new ArrayList<>();
        Function<List<Complex>, Complex> sigmaOf;
        if (s01 != null && s02 != null) {
            in.add(s01);
            in.add(s02);
            sigmaOf = v -> sigma(traceAtZero(m0, v.get(0), v.get(1)));
        } else if (sInf1 != null && sInf2 != null) {
            in.add(sInf1);
            in.add(sInf2);
            sigmaOf = v -> sigma(traceAtInfinity(m, v.get(0), v.get(1)));
        } else {
            throw new InvalidInputException("stokes", "the exponent sigma needs the Stokes multipliers at 0 (or those"
                    + " at infinity)");
        }
        List<Estimate<Complex>> out = new ArrayList<>();
        out.add(propagate(sigmaOf, in));
        if (sInf1 == null || e11 == null || e21 == null) {
            out.add(null);
            return out;
        }
        int k = in.size();
        in.add(sInf1);
        in.add(e11);
        in.add(e21);
        out.add(propagate(v -> amplitude(sigmaOf.apply(v), v.get(k), v.get(k + 1), v.get(k + 2)), in));
        return out;
    }

    /** A value with the first-order propagation of the input errors and its own rounding. */
    static Estimate<Complex> propagate(Function<List<Complex>, Complex> f, List<Estimate<Complex>> in) {
        List<Complex> x = new ArrayList<>();
        in.forEach(e -> x.add(e.value()));
        Complex value = f.apply(x);
        double error = WhittakerConnection.GAMMA_ROUNDING * value.norm();
        for (int i = 0; i < x.size(); i++) {
            double given = in.get(i).error() + Math.ulp(1.0) * x.get(i).norm();
            double h = STEP * Math.max(1, x.get(i).norm());
            List<Complex> moved = new ArrayList<>(x);
            moved.set(i, x.get(i).add(h));
            error += f.apply(moved).subtract(value).norm() / h * given;
        }
        return new Estimate<>(value, error);
    }

    private static Complex requireStrip(Complex sigma) {
        if (!(Math.abs(sigma.getReal()) < 1)) {
            throw new InvalidInputException("sigma", "the bridge needs |Re sigma| < 1, got "
                    + ComplexText.brief(sigma));
        }
        return sigma;
    }

    /**
     * An Apfloat evaluation in double; a pole or a zero division, and a value beyond the range of double precision, are
     * refused with one line naming the argument.
     */
    static Complex evaluate(String argument, Supplier<Apcomplex> formula) {
        Apcomplex exact;
        try {
            exact = formula.get();
        } catch (ArithmeticException e) {
            throw new InvalidInputException(argument, "the bridge formula degenerates here (a Gamma function at a"
                    + " pole or a vanishing denominator: a special, e.g. Riccati, solution, or a value that cancels"
                    + " to zero in the working precision)");
        }
        Complex value = toComplex(exact);
        if (!Double.isFinite(value.getReal()) || !Double.isFinite(value.getImaginary())) {
            throw new InvalidInputException(argument, "the closed form is of size 1e" + exact.scale()
                    + ", beyond double precision (the bridge is evaluated in double; smaller parameters are needed)");
        }
        return value;
    }

    private static Apcomplex gamma(FixedPrecisionApcomplexHelper h, Apcomplex z) {
        return WhittakerConnection.gamma(h, z);
    }

    static FixedPrecisionApcomplexHelper helper() {
        return new FixedPrecisionApcomplexHelper(PRECISION);
    }

    static Apcomplex twoPiI(FixedPrecisionApcomplexHelper h) {
        return new Apcomplex(Apfloat.ZERO, ApfloatMath.pi(PRECISION).multiply(new Apfloat(2, PRECISION)));
    }

    static Apcomplex ap(Complex c) {
        return new Apcomplex(new Apfloat(c.getReal(), PRECISION), new Apfloat(c.getImaginary(), PRECISION));
    }

    static Complex toComplex(Apcomplex a) {
        return new Complex(a.real().doubleValue(), a.imag().doubleValue());
    }

    Complex ks() {
        return ks;
    }

    Complex cSquared() {
        return cSquared;
    }

    @Override
    public String toString() {
        return "bridge at z = 0 of " + equation + " (member-1 map with s = " + s + ")";
    }
}
