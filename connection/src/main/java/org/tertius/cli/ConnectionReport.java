package org.tertius.cli;

import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import org.hipparchus.complex.Complex;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.connection.match.InfinityBehaviourFit;
import org.tertius.connection.match.PoleFreeSector;
import org.tertius.connection.match.StartSensitivity;
import org.tertius.connection.match.ZeroBehaviourFit;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;

/**
 * The four directions of {@code connect} in double precision, each writing its rows: the behaviour at 0 or along a
 * ray at infinity of a computed solution (the library's fits {@link ZeroBehaviourFit}, {@link InfinityBehaviourFit},
 * {@link PoleFreeSector}), and start data from the data at 0 ({@link ZeroBehaviour}) or at infinity
 * ({@link InfinityBehaviour}). Closed forms are put beside the numbers where one is known: the decaying family of
 * PIII(0, 0, 1, -1) at 0 (McCoy, Tracy and Wu, J. Math. Phys. 18 (1977) 1058).
 */
final class ConnectionReport {
    /** Where the series at 0 hands over by default, and the accuracy it must reach there (relative to 1 + |w|). */
    static final double ZERO_START_RADIUS = 0.25;
    static final double ZERO_START_TOLERANCE = 1e-14;

    private ConnectionReport() {
    }

    /**
     * The behaviour at 0 on the ray (angle, sheet).
     *
     * @param moved solutions started from uncertain start data moved by their errors (StartSensitivity), or empty
     * @param decayingLambda lambda of the decaying family of PIII(0, 0, 1, -1) when the solution is one (its closed
     *     form is then written beside the numbers), else null
     * @param bridge the closed forms from the monodromy data that selected the solution, else null
     * @return whether the kind was decided
     */
    static boolean atZero(Painleve3Solution s, List<Painleve3Solution> moved, double angle, int sheet,
                          Double decayingLambda, BridgeRows.ClosedAtZero bridge, ConnectionRows rows) {
        ZeroBehaviour b = StartSensitivity.atZero(s, moved, angle, sheet);
        rows.comment("behaviour at z = 0 of " + s.equation() + ", read on arg z = " + angle
                + (sheet == 0 ? "" : " of sheet " + sheet) + " for |z| in [" + ZeroBehaviourFit.R_MIN + ", "
                + ZeroBehaviourFit.R_MAX + "]");
        rows.comment(describe(b.kind()));
        if (!b.note().isEmpty()) {
            rows.comment(b.note());
        }
        rows.addLabel("kind", b.kind().name().toLowerCase(Locale.ROOT));
        boolean closed = decayingLambda != null && Math.abs(decayingLambda) < McCoyTracyWu.EDGE
                && b.kind() == ZeroBehaviour.Kind.POWER;
        if (closed) {
            rows.comment("closed form: McCoy, Tracy and Wu, J. Math. Phys. 18 (1977) 1058, sigma = (2/pi)"
                    + " arcsin(pi lambda), B = 2^(-2 sigma) Gamma((1 - sigma)/2)/Gamma((1 + sigma)/2), lambda = "
                    + decayingLambda);
            double cs = McCoyTracyWu.sigma(decayingLambda);
            double cb = McCoyTracyWu.amplitude(decayingLambda);
            rows.add("sigma", b.sigma(), b.sigmaError(), new Complex(cs), 2e-16 * Math.abs(cs));
            rows.add("B", b.secondParameter(), b.secondParameterError(), new Complex(cb), 2e-16 * Math.abs(cb));
            if (bridge != null) {
                // the columns hold McCoy-Tracy-Wu; the bridge's values (asked for) go into a comment
                bridge.comments().forEach(rows::comment);
                if (bridge.sigma() != null) {
                    rows.comment("the bridge gives sigma = " + ConnectionRows.complex(bridge.sigma().value()) + " +- "
                            + ConnectionRows.error(bridge.sigma().error()) + (bridge.b() == null ? "" : ", B = "
                            + ConnectionRows.complex(bridge.b().value()) + " +- "
                            + ConnectionRows.error(bridge.b().error())));
                }
            }
            return true;
        }
        if (bridge != null) {
            bridge.comments().forEach(rows::comment);
            if (b.kind() == ZeroBehaviour.Kind.POWER && bridge.sigma() != null) {
                rows.add("sigma", b.sigma(), b.sigmaError(), bridge.sigma().value(), bridge.sigma().error());
                if (bridge.b() != null) {
                    rows.add("B", b.secondParameter(), b.secondParameterError(), bridge.b().value(),
                            bridge.b().error());
                } else {
                    rows.add("B", b.secondParameter(), b.secondParameterError());
                }
                return true;
            }
            if (bridge.sigma() != null) {
                rows.comment("the closed form applies to the power kind (|Re sigma| < 1); it gives sigma = "
                        + ConnectionRows.complex(bridge.sigma().value()));
            }
        }
        if (Double.isFinite(b.sigma().norm()) && Double.isFinite(b.sigmaError())) {
            rows.add("sigma", b.sigma(), b.sigmaError());
        } else if (Double.isFinite(b.sigma().norm())) {
            // a number without an error estimate is not a result: say it in a comment only
            rows.comment("sigma appears to be near " + ComplexText.format(b.sigma())
                    + ", but no error estimate could be formed, so it is not reported as a value");
        }
        switch (b.kind()) {
            case LOGARITHMIC:
                rows.add("t0", b.secondParameter(), b.secondParameterError());
                rows.add("branch", "exact", Integer.toString(b.branch()), "0", "", "");
                return true;
            case UNDECIDED:
                return false;
            default:
                rows.add("B", b.secondParameter(), b.secondParameterError());
                return true;
        }
    }

    private static String describe(ZeroBehaviour.Kind kind) {
        switch (kind) {
            case POWER:
                return "power: w ~ B z^sigma, |Re sigma| < 1";
            case ZEROS_ACCUMULATE:
                return "edge Re sigma = 1: w ~ z (B z^(-k) + beta/k^2 + B' z^k), k = 1 - sigma; zeros accumulate at 0";
            case POLES_ACCUMULATE:
                return "edge Re sigma = -1: the same for 1/w; poles accumulate at 0";
            case LOGARITHMIC:
                return "logarithmic: sigma = +-1, w ~ z P(log z - t0) (side -1: its reciprocal)";
            default:
                return "undecided: the computed solution does not decide the kind to the accuracy reached";
        }
    }

    /**
     * The behaviour along the ray (angle, sheet) at infinity, sampled on |z| in radii, and the pole-free sector
     * around it.
     *
     * @return whether the kind was decided
     * @throws InvalidInputException for a ray through poles (a pole line) or an equation of another type
     */
    static boolean atInfinity(Painleve3Solution s, List<Painleve3Solution> moved, double angle, int sheet,
                              double[] radii, ConnectionRows rows, Consumer<InfinityBehaviour> precise) {
        Painleve3 eq = s.equation();
        InfinityBehaviour b = StartSensitivity.atInfinity(s, moved, angle, sheet, radii[0], radii[1]);
        rows.comment("behaviour at infinity of " + s.equation() + " along arg z = " + angle
                + (sheet == 0 ? "" : " of sheet " + sheet) + ", sampled on |z| in [" + radii[0] + ", " + radii[1]
                + "]: w = c e^u, u ~ x^(-1/2) (p E + q/E) + ..., E = e^(mu x) x^kappa"
                + (TransseriesAtInfinity.backgrounds(eq).size() == 3 ? " (D7: w = c x^(1/3) e^u, x -> x^(2/3) in E)"
                : ""));
        if (!b.note().isEmpty()) {
            rows.comment(b.note());
        }
        rows.addLabel("kind", b.kind().name().toLowerCase(Locale.ROOT));
        if (b.kind() == InfinityBehaviour.Kind.UNDECIDED) {
            precise.accept(b); // refuses digits for an undecided behaviour
            return false;
        }
        List<Complex> roots = TransseriesAtInfinity.backgrounds(eq);
        rows.add("background", b.background(), 0x1p-51 * b.background().norm());
        rows.addLabel("background_index", "root" + roots.indexOf(b.background()));
        rows.add("p", b.p(), b.errP());
        rows.add("q", b.q(), b.errQ());
        if (b.kind() == InfinityBehaviour.Kind.OSCILLATING) {
            rows.comment("oscillating: p E + q/E = A cos(-i (mu x + kappa log x) + phi), A = 2 sqrt(p q), phi ="
                    + " log(p/q)/(2i), drift = -i (kappa(p, q) - kappa(0, 0)), the coefficient of log x in the phase"
                    + " due to the amplitudes");
            rows.add("amplitude", b.amplitude(), b.amplitudeError());
            rows.add("phase", b.phase(), b.phaseError());
            rows.add("drift", b.drift(eq), b.driftError(eq));
        } else {
            rows.comment("exponentially small: only the exponential that decays along the ray is present");
        }
        precise.accept(b);
        PoleFreeSector sector;
        try {
            sector = PoleFreeSector.around(s, angle, sheet, radii[0], radii[1]);
        } catch (InvalidInputException e) {
            // the stricter test of the sector scan fails on the ray itself: no sector is claimed
            rows.comment("pole-free sector: none found around the ray (" + e.getMessage() + ")");
            rows.addLabel("sector_consistent", "false");
            return true;
        }
        rows.comment("pole-free sector: " + sector);
        rows.addLabel("sector_consistent", Boolean.toString(sector.consistent()));
        rows.comment("the sector's edges are the anti-Stokes rays (arg z + 2 pi sheet) beyond which the tests failed;"
                + " an open edge means the scan stopped at its limit (the sector may be wider)");
        rows.addReal("sector_lower", sector.lower(), 0x1p-50 * Math.abs(sector.lower()));
        rows.addReal("sector_upper", sector.upper(), 0x1p-50 * Math.abs(sector.upper()));
        rows.addLabel("sector_open", sector.lowerOpen() && sector.upperOpen() ? "both" : sector.lowerOpen() ? "lower"
                : sector.upperOpen() ? "upper" : "none");
        return true;
    }

    /**
     * Start data from the data at 0: sigma and B (or, logarithmic, the side and t0 with the branch), at the point
     * {@code startAt} of sheet {@code sheet}, or by default at the largest |z| &lt;= 0.25 on the ray where the series
     * reaches {@link #ZERO_START_TOLERANCE}.
     */
    static void fromZero(Painleve3 eq, ZeroBehaviour data, String startAt, double angle, int sheet,
                         ConnectionRows rows) {
        Complex tau;
        LocalValue<Complex> v;
        if (startAt != null) {
            tau = logOf("--start-at", startAt, sheet);
            v = data.expansion(eq).at(tau);
            if (!(v.errW() <= 1 + v.w().norm()) || !(v.errDw() <= 1 + v.dw().norm())) {
                // not one correct digit: the point lies beyond the reach of the series at 0
                throw new InvalidInputException("--start-at", "the expansion at 0 does not reach z = " + startAt
                        + " (estimated errors of w, w' " + v.errW() + ", " + v.errDw() + "); choose a point closer"
                        + " to 0, or leave --start-at out for the largest |z| <= " + ZERO_START_RADIUS
                        + " where it is accurate");
            }
        } else {
            tau = new Complex(Math.log(ZERO_START_RADIUS), angle + 2 * Math.PI * sheet);
            v = data.expansion(eq).startData(tau, ZERO_START_TOLERANCE);
            tau = new Complex(Math.log(v.z().norm()), tau.getImaginary());
        }
        rows.comment("start data of the solution of " + eq + " with " + data + ", from its expansion at 0");
        startRows(v, tau, rows);
    }

    /**
     * Start data from the data along a ray at infinity, at |z| = radius on the ray (default: where the transseries
     * fixes the amplitudes best).
     */
    static void fromInfinity(Painleve3 eq, InfinityBehaviour data, Double radius, ConnectionRows rows) {
        double r = radius != null ? radius : data.bestStartRadius(eq)[0];
        if (!(r >= 1 && r <= 1e4)) {
            throw new InvalidInputException("--start-at", "for --from-infinity it is the radius |z| on the ray, in"
                    + " [1, 1e4], got " + r);
        }
        LocalValue<Complex> v = data.startData(eq, r);
        // w' on the scale |w'| + |w|/|z|, so that a constant solution (w' = 0) is not refused
        double rel = Math.max(v.errW() / v.w().norm(), v.errDw() / (v.dw().norm() + v.w().norm() / r));
        if (!(rel < 1)) {
            // a value whose estimated error exceeds it (or an overflow) says nothing: refuse rather than print it
            throw new InvalidInputException("--start-at", "the transseries at |z| = " + r + " does not fix the start"
                    + " data (estimated error "
                    + (Double.isFinite(rel) ? String.format(Locale.ROOT, "%.2g", rel) : "unbounded")
                    + " relative to w or w'); choose a radius in [1, 1e4] where it does, or smaller amplitudes");
        }
        rows.comment("start data of the solution of " + eq + " with " + data + ", from its transseries at |z| = " + r);
        startRows(v, new Complex(Math.log(r), data.angle() + 2 * Math.PI * data.sheet()), rows);
    }

    private static void startRows(LocalValue<Complex> v, Complex tau, ConnectionRows rows) {
        rows.comment("the point is z = exp(log z) on the sheet with Im log z = arg z + 2 pi sheet");
        int sheet = (int) Math.round((tau.getImaginary() - v.z().getArgument()) / (2 * Math.PI));
        rows.add("z", v.z(), 0x1p-52 * v.z().norm());
        rows.add("sheet", "exact", Integer.toString(sheet), "0", "", "");
        rows.add("w", v.w(), v.errW());
        rows.add("dw", v.dw(), v.errDw());
    }

    /** log z + 2 pi i sheet for a typed point z != 0 (argument in (-pi, pi]). */
    static Complex logOf(String option, String text, int sheet) {
        Complex z = ComplexText.parse(option, text);
        if (!(z.norm() > 0) || !Double.isFinite(z.norm())) {
            throw new InvalidInputException(option, "must be a finite point z != 0, got " + text);
        }
        return new Complex(Math.log(z.norm()), z.getArgument() + 2 * Math.PI * sheet);
    }
}
