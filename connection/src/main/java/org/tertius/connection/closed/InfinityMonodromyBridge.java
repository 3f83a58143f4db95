package org.tertius.connection.closed;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.hipparchus.complex.Complex;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.core.InvalidInputException;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Type;
import org.tertius.hierarchy.Member1Map;
import org.tertius.hierarchy.monodromy.Estimate;

/**
 * The bridge between the monodromy data of a D6 solution (member 1 through {@link Member1Map#forEquation}, s real
 * and positive; conventions of the monodromy map, README.md "Monodromy data") and its oscillation about a background
 * along a ray z = r e^(i angle) on which mu z is imaginary (the transseries of {@link TransseriesAtInfinity}:
 * w = c e^u, u ~ z^(-1/2) (p E + q/E), E = e^(mu z) z^kappa, kappa = kappa0 + mu p q). connection/README.md, section
 * "Monodromy data at infinity", has the derivation and the measurements. In short:
 * <pre>
 *   x = (z / c_map)^2 on the cover, psi = arg x = 2 (angle - arg c_map);   canonical background C = c K0 c0 / (K c_map)
 *   (K, c_map of the map, K0 = i/(4s), c0 = 4 sqrt(s): the image under w -> w K0 c0/(K c_map) in PIII(., ., 1, -1)),
 *   C = i e^(i pi a), j = a + psi/(2 pi), k = a - psi/(2 pi)   (integers on an oscillating ray),
 *   X = (Y^inf_j)^-1 Y^0_k,   Q = X11 X22 (C = +-i) or -X12 X21 (C = +-1),
 *   kappa - kappa0 = mu p q = -2 sigma eps Log(Q) / (2 pi i),
 * </pre>
 * sigma = sign Im(mu_C e^(i psi/2)) (mu_C = 2 or 2i, the exponent of the canonical image), eps = mu c_map / (mu_C c0)
 * = +-1 (whether E is the image's E or 1/E), principal Log (n = 0 on every measured set). The two saddle points
 * lambda = +-sqrt(s/x) of the exponent x lambda + s/lambda are where the canonical solutions at infinity and at 0 meet
 * (the exponent is the same at both ends), and the local parabolic-cylinder problem there has its exponent from the
 * diagonal of the connection matrix between them (WKB matching as in the isomonodromy method of Its, Kitaev and
 * Novokshenov, recalled from memory); which pair (j, k), the diagonal or anti-diagonal form, and the factor 2 of the
 * two saddles were identified numerically (connection/README.md). Of the two backgrounds c, -c oscillating on a ray
 * the data select the one whose kappa lies in the strip |Re kappa| &lt; 1/2 where the transseries holds; data for which
 * neither (or both) does are refused. The ratio p/q (the phase) is {@link OscillationPhase}'s. Double precision.
 * Immutable.
 */
public final class InfinityMonodromyBridge {
    private static final double TOLERANCE = 1e-6;

    private final Painleve3 equation;
    private final double angle;
    private final Complex s;
    private final Complex m;
    private final Complex m0;
    private final List<Complex> backgrounds;
    private final List<Geometry> geometries;
    private final Complex logScale;

    /** Where the saddle connection matrix sits for one background. */
    private record Geometry(int j, int k, boolean antiDiagonal, int sigma, int eps, Complex mu, Complex kappa0) {
    }

    /**
     * What the data give on the ray: the selected background, kappa, the drift mu p q, p q, A = 2 sqrt(p q), and
     * the ratio p/q with the phase log(p/q)/(2i) (principal log; both null where {@link OscillationPhase} does not
     * cover the configuration, see {@link #ratioCovered}).
     */
    public record Oscillation(Complex background, Estimate<Complex> kappa, Estimate<Complex> drift,
                              Estimate<Complex> product, Estimate<Complex> amplitude, Estimate<Complex> ratio,
                              Estimate<Complex> phase) {
    }

    private InfinityMonodromyBridge(Painleve3 equation, double angle, Complex s) {
        this.equation = equation;
        this.angle = angle;
        this.s = s;
        Member1Map map = Member1Map.forEquation(equation, s);
        this.m = map.m(equation);
        this.m0 = map.traceIntegral(equation).divide(Complex.I.multiply(2).multiply(s));
        Complex logCMap = map.cSquared().log().multiply(0.5);
        this.logScale = logCMap.subtract(Math.log(4 * Math.sqrt(s.getReal())));
        double psi = 2 * (angle - logCMap.getImaginary());
        double c0 = 4 * Math.sqrt(s.getReal());
        Complex toCanonical = Complex.I.divide(s.multiply(4)).multiply(c0).divide(map.k().multiply(logCMap.exp()));
        this.backgrounds = new ArrayList<>();
        this.geometries = new ArrayList<>();
        for (Complex c : TransseriesAtInfinity.backgrounds(equation)) {
            TransseriesAtInfinity t = TransseriesAtInfinity.create(equation, c, Complex.ZERO, Complex.ZERO, 2);
            if (Math.abs(Math.cos(t.direction(angle))) > 1e-9) {
                continue;
            }
            Complex canonical = c.multiply(toCanonical);
            // C = i e^(i pi a): a = 0 (i), 1/2 (-1), 1 (-i), 3/2 (1)
            double a = (canonical.getArgument() - Math.PI / 2) / Math.PI;
            a = a - 2 * Math.floor(a / 2);
            double jReal = a + psi / (2 * Math.PI);
            if (Math.abs(jReal - Math.rint(jReal)) > TOLERANCE || Math.abs(canonical.norm() - 1) > TOLERANCE) {
                throw new IllegalStateException("the canonical image " + canonical + " of the background " + c
                        + " does not sit on an oscillating ray (psi = " + psi + ")");
            }
            boolean antiDiagonal = Math.abs(a - Math.rint(a)) > 0.25;
            Complex muCanonical = antiDiagonal ? new Complex(2) : new Complex(0, 2);
            double thetaCanonical = psi / 2;
            int sigma = muCanonical.multiply(new Complex(Math.cos(thetaCanonical), Math.sin(thetaCanonical)))
                    .getImaginary() > 0 ? 1 : -1;
            Complex ratio = t.mu().multiply(logCMap.exp()).divide(muCanonical.multiply(c0));
            int eps = ratio.getReal() > 0 ? 1 : -1;
            int j = (int) Math.rint(jReal);
            int k = (int) Math.rint(a - psi / (2 * Math.PI));
            backgrounds.add(c);
            geometries.add(new Geometry(j, k, antiDiagonal, sigma, eps, t.mu(), t.kappa()));
        }
    }

    /**
     * The bridge along the ray arg z = angle (principal sheet) of a D6 equation, for data of member 1 with constant s
     * (real, positive; the commands use 1/4).
     *
     * @throws InvalidInputException if the equation is not D6, s is not real and positive, or no background
     *     oscillates along the ray (mu z not imaginary there for any background)
     */
    public static InfinityMonodromyBridge of(Painleve3 equation, Complex s, double angle) {
        if (equation.type() != Painleve3Type.D6) {
            throw new InvalidInputException("equation", "the bridge at infinity needs D6 (gamma delta != 0), got "
                    + equation);
        }
        if (!(s.getReal() > 0) || s.getImaginary() != 0) {
            throw new InvalidInputException("s", "the bridge at infinity needs a real positive member-1 constant s, got "
                    + s);
        }
        InvalidInputException.requireFinite("ray", angle);
        if (!(angle > -Math.PI && angle <= Math.PI)) {
            throw new InvalidInputException("ray", "the bridge at infinity takes rays of the principal sheet, angle in"
                    + " (-pi, pi], got " + angle);
        }
        InfinityMonodromyBridge bridge = new InfinityMonodromyBridge(equation, angle, s);
        if (bridge.backgrounds.isEmpty()) {
            throw new InvalidInputException("ray", "no background of " + equation + " oscillates along arg z = " + angle
                    + " (mu z is not imaginary there); the oscillating rays are those of InfinityBehaviour.oscillatingRays");
        }
        return bridge;
    }

    public Painleve3 equation() {
        return equation;
    }

    public double angle() {
        return angle;
    }

    /** The two backgrounds that oscillate along this ray (c and -c). */
    public List<Complex> backgrounds() {
        return List.copyOf(backgrounds);
    }

    /**
     * Q of the saddle connection matrix for background index i (0 or 1 in {@link #backgrounds()}) from the data:
     * X11 X22 or -X12 X21 of X = (Y^inf_j)^-1 Y^0_k. Free of the gauges.
     */
    public Complex saddleProduct(int index, Complex sInf1, Complex sInf2, Complex s01, Complex s02, Complex[][] e) {
        Geometry g = geometries.get(index);
        Complex[][] x = saddle(g.j(), g.k(), sInf1, sInf2, s01, s02, e);
        return g.antiDiagonal() ? x[0][1].multiply(x[1][0]).negate() : x[0][0].multiply(x[1][1]);
    }

    /**
     * Whether the ratio p/q about background index i is identified (connection/README.md): null if it is, else the
     * reason it is not.
     */
    public String ratioCovered(int index) {
        Geometry g = geometries.get(index);
        return OscillationPhase.covers(g.j(), g.k(), g.eps()) ? null : OscillationPhase.reason(g.j(), g.k(), g.eps());
    }

    /** eps of background index i: +1 where the ray's E is the canonical image's E, -1 where it is its 1/E. */
    public int orientation(int index) {
        return geometries.get(index).eps();
    }

    /** p/q about background index i from the data (v as in {@link #oscillation(int, List)}) and kappa (its branch). */
    Complex ratio(int index, List<Complex> v, Complex kappa) {
        Geometry g = geometries.get(index);
        Complex[][] e = {{v.get(4), v.get(5)}, {v.get(6), v.get(7)}};
        Complex[][] x1 = saddle(g.j(), g.k(), v.get(0), v.get(1), v.get(2), v.get(3), e);
        Complex[][] x2 = saddle(g.j() + 1, g.k() + 1, v.get(0), v.get(1), v.get(2), v.get(3), e);
        Complex nu1 = kappa.subtract(g.kappa0()).divide(-2.0 * g.sigma() * g.eps());
        return OscillationPhase.ratio(g.j(), g.k(), g.eps(), g.antiDiagonal(), x1, x2, nu1, kappa, m, m0, logScale);
    }

    private Complex[][] saddle(int j, int k, Complex sInf1, Complex sInf2, Complex s01, Complex s02, Complex[][] e) {
        return multiply(multiply(inverse(path(j, lower(sInf1), upper(sInf2), m)), e), path(k, upper(s01), lower(s02),
                m0));
    }

    /** The value Q must have for an oscillation about background index i with the given drift mu p q (the reverse). */
    public Complex saddleProduct(int index, Complex drift) {
        Geometry g = geometries.get(index);
        Complex nu = drift.divide(-2.0 * g.sigma() * g.eps());
        return Complex.I.multiply(2 * Math.PI).multiply(nu).exp();
    }

    /** kappa for background index i from Q: kappa0 - 2 sigma eps Log(Q) / (2 pi i), principal Log. */
    Complex kappa(int index, Complex q) {
        Geometry g = geometries.get(index);
        Complex nu = q.log().divide(Complex.I.multiply(2 * Math.PI));
        return g.kappa0().add(nu.multiply(-2.0 * g.sigma() * g.eps()));
    }

    /**
     * The background selected by the data and its oscillation constants, from the full data in one gauge (as the
     * monodromy map or {@link MonodromyFromZero} give them) with their errors, propagated to first order. Selection
     * rule (identified numerically, not derived): the principal logarithm gives |Re kappa| &lt; 1/2 for exactly one of
     * the two backgrounds; it held on 27 of 28 measured solutions (connection/README.md), so a selection is a claim to be
     * checked where it matters; {@link #oscillation(int, List)} takes the background as given.
     *
     * @throws InvalidInputException if no background has |Re kappa| &lt; 1/2 (the data describe no solution
     *     oscillating about a background along this ray)
     */
    public Oscillation oscillation(Estimate<Complex> sInf1, Estimate<Complex> sInf2, Estimate<Complex> s01,
                                   Estimate<Complex> s02, Estimate<Complex> e11, Estimate<Complex> e12,
                                   Estimate<Complex> e21, Estimate<Complex> e22) {
        List<Estimate<Complex>> in = List.of(sInf1, sInf2, s01, s02, e11, e12, e21, e22);
        int chosen = -1;
        StringBuilder found = new StringBuilder();
        for (int i = 0; i < geometries.size(); i++) {
            Complex kappa = kappa(i, product(i, values(in)));
            found.append(i == 0 ? "" : ", ").append("c = ").append(backgrounds.get(i)).append(": kappa = ").append(kappa);
            if (Math.abs(kappa.getReal()) < 0.5) {
                if (chosen >= 0) {
                    throw new InvalidInputException("data", "both backgrounds oscillating along arg z = " + angle
                            + " have |Re kappa| < 1/2 for these data (" + found + "): the bridge does not decide");
                }
                chosen = i;
            }
        }
        if (chosen < 0) {
            throw new InvalidInputException("data", "no background oscillating along arg z = " + angle + " has |Re kappa|"
                    + " < 1/2 for these data (" + found + "): they describe no solution oscillating about a background"
                    + " on this ray");
        }
        int index = chosen;
        Geometry g = geometries.get(index);
        return assemble(index, g, v -> kappa(index, product(index, v)), in);
    }

    /**
     * The oscillation about a given background (index in {@link #backgrounds()}): kappa with the branch of the
     * logarithm that puts Re kappa in (-1/2, 1/2] (unique), errors propagated to first order.
     */
    public Oscillation oscillation(int backgroundIndex, List<Estimate<Complex>> data) {
        if (backgroundIndex < 0 || backgroundIndex >= geometries.size()) {
            throw new InvalidInputException("background", "index 0 or 1 of " + backgrounds + ", got " + backgroundIndex);
        }
        Geometry g = geometries.get(backgroundIndex);
        Function<List<Complex>, Complex> kappaOf = v -> {
            Complex k = kappa(backgroundIndex, product(backgroundIndex, v));
            return k.subtract(2 * Math.floor((k.getReal() + 0.5) / 2));
        };
        return assemble(backgroundIndex, g, kappaOf, data);
    }

    private Oscillation assemble(int index, Geometry g, Function<List<Complex>, Complex> kappaOf,
                                 List<Estimate<Complex>> in) {
        Estimate<Complex> kappa = ZeroMonodromyBridge.propagate(kappaOf, in);
        Estimate<Complex> drift = ZeroMonodromyBridge.propagate(v -> kappaOf.apply(v).subtract(g.kappa0()), in);
        Estimate<Complex> pq = ZeroMonodromyBridge.propagate(v -> kappaOf.apply(v).subtract(g.kappa0())
                .divide(g.mu()), in);
        Estimate<Complex> amplitude = ZeroMonodromyBridge.propagate(v -> kappaOf.apply(v).subtract(g.kappa0())
                .divide(g.mu()).sqrt().multiply(2), in);
        Estimate<Complex> ratio = null;
        Estimate<Complex> phase = null;
        if (ratioCovered(index) == null) {
            ratio = ZeroMonodromyBridge.propagate(v -> ratio(index, v, kappaOf.apply(v)), in);
            phase = ZeroMonodromyBridge.propagate(v -> ratio(index, v, kappaOf.apply(v)).log().divide(
                    new Complex(0, 2)), in);
        }
        return new Oscillation(backgrounds.get(index), kappa, drift, pq, amplitude, ratio, phase);
    }

    /** The oscillation of the solution w ~ B z^sigma at 0 (data in closed form by {@link MonodromyFromZero}). */
    public Oscillation oscillation(MonodromyFromZero data) {
        Function<Complex, Estimate<Complex>> exact = v -> new Estimate<>(v, 4 * Math.ulp(1.0) * v.norm());
        return oscillation(exact.apply(data.stokesAtInfinity(1)), exact.apply(data.stokesAtInfinity(2)),
                exact.apply(data.stokesAtZero(1)), exact.apply(data.stokesAtZero(2)), exact.apply(data.connection(1, 1)),
                exact.apply(data.connection(1, 2)), exact.apply(data.connection(2, 1)),
                exact.apply(data.connection(2, 2)));
    }

    /**
     * The composed connection 0 -> infinity: (sigma, B) at 0 with their errors -> data ({@link MonodromyFromZero})
     * -> the oscillation along this ray; errors propagated to first order through the whole chain.
     */
    public Oscillation fromZero(ZeroMonodromyBridge zero, Estimate<Complex> sigma, Estimate<Complex> b) {
        Oscillation centre = oscillation(MonodromyFromZero.of(zero, sigma.value(), b.value()));
        int index = backgrounds.indexOf(centre.background());
        Geometry g = geometries.get(index);
        List<Estimate<Complex>> in = List.of(sigma, b);
        Function<List<Complex>, Complex> kappaOf = v -> {
            MonodromyFromZero d = MonodromyFromZero.of(zero, v.get(0), v.get(1));
            Complex[][] e = {{d.connection(1, 1), d.connection(1, 2)}, {d.connection(2, 1), d.connection(2, 2)}};
            return kappa(index, saddleProduct(index, d.stokesAtInfinity(1), d.stokesAtInfinity(2), d.stokesAtZero(1),
                    d.stokesAtZero(2), e));
        };
        Estimate<Complex> kappa = ZeroMonodromyBridge.propagate(kappaOf, in);
        double error = kappa.error() + centre.kappa().error();
        Estimate<Complex> ratio = null;
        Estimate<Complex> phase = null;
        if (centre.ratio() != null) {
            Function<List<Complex>, Complex> ratioOf = v -> {
                MonodromyFromZero d = MonodromyFromZero.of(zero, v.get(0), v.get(1));
                List<Complex> data = List.of(d.stokesAtInfinity(1), d.stokesAtInfinity(2), d.stokesAtZero(1),
                        d.stokesAtZero(2), d.connection(1, 1), d.connection(1, 2), d.connection(2, 1),
                        d.connection(2, 2));
                return ratio(index, data, kappaOf.apply(v));
            };
            Estimate<Complex> r = ZeroMonodromyBridge.propagate(ratioOf, in);
            ratio = new Estimate<>(r.value(), r.error() + centre.ratio().error());
            double relative = ratio.error() / ratio.value().norm();
            phase = new Estimate<>(ratio.value().log().divide(new Complex(0, 2)), relative / 2);
        }
        Complex drift = kappa.value().subtract(g.kappa0());
        Complex pq = drift.divide(g.mu());
        Complex amplitude = pq.sqrt().multiply(2);
        double errPq = error / g.mu().norm();
        return new Oscillation(centre.background(), new Estimate<>(kappa.value(), error), new Estimate<>(drift, error),
                new Estimate<>(pq, errPq), new Estimate<>(amplitude, errPq / Math.max(pq.sqrt().norm(), 1e-300)), ratio,
                phase);
    }

    private Complex product(int index, List<Complex> v) {
        Complex[][] e = {{v.get(4), v.get(5)}, {v.get(6), v.get(7)}};
        return saddleProduct(index, v.get(0), v.get(1), v.get(2), v.get(3), e);
    }

    private static List<Complex> values(List<Estimate<Complex>> in) {
        List<Complex> v = new ArrayList<>();
        in.forEach(e -> v.add(e.value()));
        return v;
    }

    /**
     * The product R_j with Y_j = Y_1 R_j of the canonical solutions at one end: S_1 ... S_(j-1) for j &gt;= 1,
     * S_0^-1 ... S_j^-1 for j &lt;= 0, with S_(l+2n) = T^-n S_l T^n, T = diag(e^(2 pi i p), e^(-2 pi i p)).
     */
    private static Complex[][] path(int j, Complex[][] first, Complex[][] second, Complex exponent) {
        Complex[][] r = identity();
        if (j >= 1) {
            for (int l = 1; l < j; l++) {
                r = multiply(r, stokes(l, first, second, exponent));
            }
        } else {
            for (int l = 0; l >= j; l--) {
                r = multiply(r, inverse(stokes(l, first, second, exponent)));
            }
        }
        return r;
    }

    private static Complex[][] stokes(int l, Complex[][] first, Complex[][] second, Complex exponent) {
        int base = Math.floorMod(l - 1, 2) + 1;
        int n = (l - base) / 2;
        Complex t = Complex.I.multiply(2 * Math.PI).multiply(exponent).multiply(n).exp();
        Complex[][] s = base == 1 ? first : second;
        // (T^-n S T^n)_12 = S_12 e^(-4 pi i n p), (..)_21 = S_21 e^(4 pi i n p)
        return new Complex[][] {{Complex.ONE, s[0][1].divide(t.multiply(t))}, {s[1][0].multiply(t.multiply(t)),
            Complex.ONE}};
    }

    private static Complex[][] lower(Complex v) {
        return new Complex[][] {{Complex.ONE, Complex.ZERO}, {v, Complex.ONE}};
    }

    private static Complex[][] upper(Complex v) {
        return new Complex[][] {{Complex.ONE, v}, {Complex.ZERO, Complex.ONE}};
    }

    private static Complex[][] identity() {
        return new Complex[][] {{Complex.ONE, Complex.ZERO}, {Complex.ZERO, Complex.ONE}};
    }

    private static Complex[][] multiply(Complex[][] a, Complex[][] b) {
        Complex[][] c = new Complex[2][2];
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j < 2; j++) {
                c[i][j] = a[i][0].multiply(b[0][j]).add(a[i][1].multiply(b[1][j]));
            }
        }
        return c;
    }

    private static Complex[][] inverse(Complex[][] a) {
        Complex d = a[0][0].multiply(a[1][1]).subtract(a[0][1].multiply(a[1][0]));
        return new Complex[][] {{a[1][1].divide(d), a[0][1].negate().divide(d)},
            {a[1][0].negate().divide(d), a[0][0].divide(d)}};
    }

    @Override
    public String toString() {
        return "bridge at infinity of " + equation + " along arg z = " + angle + " (member-1 map with s = " + s + ")";
    }
}
