package org.tertius.connection.family;

import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.hipparchus.complex.Complex;
import org.tertius.connection.infinity.AlgebraicExpansion;
import org.tertius.connection.infinity.OscillatingExpansion;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.LogarithmicAtZero;
import org.tertius.connection.zero.PowerSeriesAtZero;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;

/**
 * Solutions fixed by connection data instead of start data. Families:
 * <ul>
 *   <li>{@code decaying} (lambda, real): PIII(0, 0, 1, -1), w ~ 1 - 2 lambda K0(2x) at +infinity (McCoy, Tracy
 *       and Wu, J. Math. Phys. 18 (1977) 1058); every real lambda (pole-free on the positive axis only for
 *       |lambda| &lt; 1/pi), started from its data at +infinity; for the logarithmic member lambda = 1/pi an
 *       optional {@code x0} in (0, 0.2] starts it instead from the log-series at 0 ({@link LogarithmicAtZero},
 *       estimated error 2e-15 relative at x0 = 1e-3, 5e-14 at 0.01);</li>
 *   <li>{@code power} (sigma, B, complex, |Re sigma| &lt; 1): w ~ B z^sigma at 0, any equation;</li>
 *   <li>{@code analytic} (w0 != 0): analytic at 0 with w(0) = w0, any equation (the power family with
 *       sigma = 0);</li>
 *   <li>{@code algebraic} (background: {@code c} a value with gamma c^4 + delta = 0, or {@code root} 0..3 the index
 *       in {@link AlgebraicExpansion#backgrounds}; optional {@code x0} the start abscissa, default the smallest
 *       x &gt;= 4 where the expansion's estimate is below 1e-15 relative): w ~ c + sum a_k x^-k at +infinity, any
 *       equation with gamma delta != 0 ({@link AlgebraicExpansion}). The expansion fixes the solution only up
 *       to exponentially small terms O(e^(-|mu| x0)), mu = 2 sqrt(gamma) c: the member given here is the one
 *       whose data at x0 are the optimally truncated series; integrating away from x0 can amplify that
 *       ambiguity like e^(|Re mu| |x - x0|).</li>
 *   <li>{@code oscillating} (A, phi real, |A| &lt;= {@link OscillatingExpansion#MAX_AMPLITUDE}; optional {@code x0},
 *       default {@value #OSCILLATING_X0}): PIII(0, 0, -1, 1), the real solutions with
 *       log w ~ A x^(-1/2) cos(2x + (A^2/2) log x + phi) at +infinity ({@link OscillatingExpansion}), started
 *       from the expansion at x0 (refused where its estimate exceeds 1e-8 relative).</li>
 * </ul>
 */
public final class Families {
    /** Family names. */
    public static final List<String> NAMES = List.of("decaying", "power", "analytic", "algebraic", "oscillating");
    /** Default start abscissa of the oscillating family (expansion estimate about 1e-15 there for |A| &lt;= 3). */
    public static final double OSCILLATING_X0 = 30;
    /** Orders of the oscillating expansion. */
    static final int OSCILLATING_ORDERS = 40;
    /** Error of the start data of the algebraic family at its default start abscissa, relative to 1 + |w|. */
    static final double ALGEBRAIC_TOLERANCE = 1e-15;
    /** Number of coefficients of the algebraic expansion (enough for optimal truncation up to |mu| x ~ 150). */
    static final int ALGEBRAIC_TERMS = 160;
    /** Largest |z| tried for start data of the families at 0. */
    static final double START_RADIUS = 0.25;
    /** Error of the start data of the families at 0, relative to 1 + |w| (the floor of the conservative rounding estimate of w'). */
    static final double START_TOLERANCE = 4e-15;

    private Families() {
    }

    /**
     * The solution of {@code equation} in family {@code name} with its parameters (texts: real or complex
     * numbers a+bi, p/q).
     *
     * @throws InvalidInputException for an unknown family, a missing or extra parameter, a parameter outside
     *     the family's range, or an equation the family does not belong to
     */
    public static Painleve3Solution create(Painleve3 equation, String name, Map<String, String> parameters,
                                           SolverSettings settings) {
        String n = name == null ? "" : name.trim().toLowerCase(Locale.ROOT);
        switch (n) {
            case "decaying":
                return decaying(equation, parameters, settings);
            case "power":
                allow(parameters, Set.of("sigma", "B"));
                return atZero(equation, value(parameters, "sigma"), value(parameters, "B"), settings);
            case "analytic":
                allow(parameters, Set.of("w0"));
                Complex w0 = value(parameters, "w0");
                if (w0.norm() == 0) {
                    throw new InvalidInputException("w0", "must be non-zero for the family analytic at 0 (w(0) = 0"
                            + " is not a value an analytic solution takes at z = 0 unless w vanishes identically"
                            + " there; use the power family for w ~ B z^sigma)");
                }
                return atZero(equation, Complex.ZERO, w0, settings);
            case "algebraic":
                return algebraic(equation, parameters, settings);
            case "oscillating":
                return oscillating(equation, parameters, settings);
            default:
                throw new InvalidInputException("family", "unknown family '" + name + "'; known: " + NAMES);
        }
    }

    private static Painleve3Solution decaying(Painleve3 equation, Map<String, String> parameters,
                                              SolverSettings settings) {
        Map<String, String> rest = new HashMap<>(parameters);
        String x0text = rest.remove("x0");
        allow(rest, Set.of("lambda"));
        if (!equation.equals(DecayingConnection.equation())) {
            throw new InvalidInputException("family", "the decaying family belongs to alpha = 0, beta = 0, gamma = 1,"
                    + " delta = -1, got " + equation + " (rescale z and w to reach that equation)");
        }
        Complex lambda = value(parameters, "lambda");
        if (lambda.getImaginary() != 0) {
            throw new InvalidInputException("lambda", "must be real for the decaying family on the positive axis,"
                    + " got " + lambda);
        }
        if (x0text == null) {
            return DecayingConnection.solution(lambda.getReal(), settings);
        }
        if (!(Math.abs(lambda.getReal() * Math.PI - 1) <= 1e-15)) {
            throw new InvalidInputException("x0", "a start abscissa near 0 is available only for the logarithmic"
                    + " member lambda = 1/pi (other members start from their data at +infinity), got lambda = "
                    + lambda.getReal());
        }
        Complex x0 = value(parameters, "x0");
        if (x0.getImaginary() != 0) {
            throw new InvalidInputException("x0", "must be real, got " + x0);
        }
        LocalValue<Complex> v = LogarithmicAtZero.at(x0.getReal());
        return Painleve3Solution.builder(equation).start(v.z(), v.w(), v.dw()).startErrors(v.errW(), v.errDw())
                .startComputedBy("the logarithmic series at 0 of the decaying family").settings(settings).build();
    }

    private static Painleve3Solution algebraic(Painleve3 equation, Map<String, String> parameters,
                                               SolverSettings settings) {
        for (String k : parameters.keySet()) {
            if (!Set.of("c", "root", "x0").contains(k)) {
                throw new InvalidInputException(k, "is not a parameter of the algebraic family; its parameters are"
                        + " c (a background, gamma c^4 + delta = 0) or root (0..3), and optionally x0");
            }
        }
        if (parameters.containsKey("c") == parameters.containsKey("root")) {
            throw new InvalidInputException("background", "the algebraic family needs exactly one of c (the value"
                    + " of the background, gamma c^4 + delta = 0) or root (its index 0..3)");
        }
        List<Complex> roots = AlgebraicExpansion.backgrounds(equation.gamma(), equation.delta());
        Complex c;
        if (parameters.containsKey("root")) {
            String r = parameters.get("root").trim();
            if (!r.matches("[0-3]")) {
                throw new InvalidInputException("root", "must be 0, 1, 2 or 3 (the backgrounds " + roots
                        + "), got '" + r + "'");
            }
            c = roots.get(Integer.parseInt(r));
        } else {
            c = value(parameters, "c");
        }
        AlgebraicExpansion e = AlgebraicExpansion.create(equation.alpha(), equation.beta(), equation.gamma(),
                equation.delta(), c, ALGEBRAIC_TERMS);
        LocalValue<Complex> v;
        if (parameters.containsKey("x0")) {
            Complex x0 = value(parameters, "x0");
            if (!(x0.getReal() > 0)) {
                throw new InvalidInputException("x0", "must have a positive real part (the expansion is at"
                        + " +infinity), got " + x0);
            }
            v = e.at(x0);
            double rel = Math.max(v.errW() / (1 + v.w().norm()), v.errDw() / (1 + v.dw().norm()));
            if (!(rel <= 1e-8)) {
                throw new InvalidInputException("x0", "is too small for the algebraic expansion about c = "
                        + e.background() + ": its error estimate there is " + rel + " (relative); start further"
                        + " out, e.g. at x0 = " + e.startData(ALGEBRAIC_TOLERANCE).z().getReal());
            }
        } else {
            v = e.startData(ALGEBRAIC_TOLERANCE);
        }
        return Painleve3Solution.builder(equation).start(v.z(), v.w(), v.dw()).startErrors(v.errW(), v.errDw())
                .startComputedBy("the algebraic expansion at infinity").settings(settings).build();
    }

    private static Painleve3Solution oscillating(Painleve3 equation, Map<String, String> parameters,
                                                SolverSettings settings) {
        Map<String, String> rest = new HashMap<>(parameters);
        String x0text = rest.remove("x0");
        allow(rest, Set.of("A", "phi"));
        if (!equation.equals(Painleve3.of(0, 0, -1, 1))) {
            throw new InvalidInputException("family", "the oscillating family is implemented for alpha = 0, beta = 0,"
                    + " gamma = -1, delta = 1 only (u = log w, u'' + u'/x = -2 sinh 2u), got " + equation
                    + "; for other gamma < 0 < delta with alpha = beta = 0 rescale z and w (w -> s w, z -> t z) to"
                    + " reach gamma = -1, delta = 1 and pass --alpha 0 --beta 0 --gamma -1 --delta 1");
        }
        Complex a = value(parameters, "A");
        Complex phi = value(parameters, "phi");
        if (a.getImaginary() != 0 || phi.getImaginary() != 0) {
            throw new InvalidInputException("A", "A and phi must be real (the family describes real solutions on"
                    + " the positive axis), got A = " + a + ", phi = " + phi);
        }
        double x0 = OSCILLATING_X0;
        if (x0text != null) {
            Complex z = value(parameters, "x0");
            if (z.getImaginary() != 0 || !(z.getReal() > 0) || !Double.isFinite(z.getReal())) {
                throw new InvalidInputException("x0", "must be a real x0 > 0 (the expansion is at +infinity), got "
                        + z);
            }
            x0 = z.getReal();
        }
        OscillatingExpansion e = OscillatingExpansion.create(a.getReal(), phi.getReal(), OSCILLATING_ORDERS);
        LocalValue<Complex> v = e.at(x0);
        double rel = Math.max(v.errW() / (1 + v.w().norm()), v.errDw() / (1 + v.dw().norm()));
        if (!(rel <= 1e-8)) {
            throw new InvalidInputException("x0", "is too small for the oscillating expansion with A = "
                    + a.getReal() + ": its error estimate there is " + rel + " (relative); start further out,"
                    + " e.g. at the default x0 = " + OSCILLATING_X0);
        }
        return Painleve3Solution.builder(equation).start(v.z(), v.w(), v.dw())
                .startComputedBy("the oscillating expansion at infinity").settings(settings).build();
    }

    private static Painleve3Solution atZero(Painleve3 equation, Complex sigma, Complex b, SolverSettings settings) {
        ComplexArithmetic ar = ComplexArithmetic.INSTANCE;
        List<Complex> p = List.of(equation.alpha(), equation.beta(), equation.gamma(), equation.delta());
        PowerSeriesAtZero<Complex> s = PowerSeriesAtZero.create(ar, p, sigma, b, 40);
        LocalValue<Complex> v = s.startData(new Complex(START_RADIUS), START_TOLERANCE);
        return Painleve3Solution.builder(equation).start(v.z(), v.w(), v.dw())
                .startComputedBy("the power series at 0").settings(settings).build();
    }

    private static void allow(Map<String, String> parameters, Set<String> names) {
        for (String k : parameters.keySet()) {
            if (!names.contains(k)) {
                throw new InvalidInputException(k, "is not a parameter of this family; its parameters are " + names);
            }
        }
        for (String k : names) {
            if (!parameters.containsKey(k)) {
                throw new InvalidInputException(k, "is required by this family (parameters " + names + ")");
            }
        }
    }

    private static Complex value(Map<String, String> parameters, String key) {
        return ComplexText.parse(key, parameters.get(key));
    }
}
