package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.closed.InfinityMonodromyBridge;
import org.tertius.connection.closed.InfinityMonodromyBridge.Oscillation;
import org.tertius.connection.closed.MonodromyFromZero;
import org.tertius.connection.closed.ZeroMonodromyBridge;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.monodromy.Estimate;
import org.tertius.hierarchy.monodromy.LaxMatrix;
import org.tertius.hierarchy.monodromy.MonodromyData;
import org.tertius.hierarchy.monodromy.MonodromyMap;

/**
 * The bridge between the behaviour w ~ B z^sigma at 0 and the monodromy data (ZeroMonodromyBridge,
 * MonodromyFromZero; derived in connection/README.md, "Monodromy data at z = 0") in the rows of connect: the closed
 * forms of sigma and B beside --at-zero of a member-1 solution selected by its monodromy data or, with
 * --at-zero --monodromy-data, of any D6 solution from its monodromy data computed at a point; and the monodromy data
 * in closed form with --from-zero --monodromy-data, and there also the oscillation at infinity along --ray in closed
 * form.
 */
final class BridgeRows {
    /** The member-1 constant s of the map used by the commands for Painleve III (Member1Map.forEquation). */
    static final Complex PAINLEVE3_S = new Complex(0.25);

    /**
     * sigma and B in closed form with their comment lines; sigma or B is null where the data given do not fix it
     * (the comments say why).
     */
    record ClosedAtZero(List<String> comments, Estimate<Complex> sigma, Estimate<Complex> b) {
    }

    private BridgeRows() {
    }

    /** The closed forms from the data that selected a member-1 solution (exact data: only rounding errors). */
    static ClosedAtZero fromSelection(MemberParameters member, MonodromyOptions data) {
        List<String> comments = new ArrayList<>();
        Complex m0 = data.m0Value();
        Complex traceIntegral = Complex.I.multiply(2).multiply(member.s()).multiply(m0);
        ZeroMonodromyBridge bridge = ZeroMonodromyBridge.ofMember1(member.s(), member.m(), traceIntegral);
        List<Complex> zero = data.stokesZeroValues();
        List<Complex> inf = data.stokesInfinityValues(1);
        List<Complex> e = data.connectionValues();
        if (zero == null && inf == null) {
            comments.add("closed form (bridge to the monodromy data): sigma needs --stokes-zero or --stokes-infinity,"
                    + " not given");
            return new ClosedAtZero(comments, null, null);
        }
        List<Estimate<Complex>> found;
        try {
            found = bridge.zeroData(exact(zero, 0), exact(zero, 1), exact(inf, 0), exact(inf, 1), exact(e, 0),
                    exact(e, 2));
        } catch (InvalidInputException ex) {
            comments.add("closed form (bridge to the monodromy data) not available: " + ex.reason());
            return new ClosedAtZero(comments, null, null);
        }
        comments.add("closed form: the bridge to the monodromy data given (derived here, connection/README.md"
                + " 'Monodromy data at z = 0', method of Jimbo, Publ. RIMS 18 (1982) 1137): tr M_0 = 2 sin(pi sigma/2)"
                + (found.get(1) == null ? "; B needs all of --stokes-infinity and --connection"
                : "; B = G(sigma) (e^(2 pi i (m + nu)) - chi)/(e^(2 pi i (m - nu)) - chi), nu = (1 - sigma)/4,"
                + " chi = 1 - s_inf_1 E11/E21 = " + ConnectionRows.complex(ZeroMonodromyBridge.chi(inf.get(0),
                        e.get(0), e.get(2)))));
        return new ClosedAtZero(comments, found.get(0), found.get(1));
    }

    /**
     * The closed forms from the monodromy data of a Painleve III (D6) solution computed at the first point of the ray
     * (|z| = 1, 0.75, 1.5, 0.5, 2) where the solution is known to 1e-10 relative and the data pass their self-checks;
     * their errors (the solution's error carried through the map, and the lambda-integration) are propagated.
     *
     * @throws InvalidInputException (--monodromy-data) for a non-D6 equation or a sheet other than 0 (the bridge is
     *     derived on the principal sheet), or when no such point is found
     */
    static ClosedAtZero fromSolution(Painleve3Solution s, double angle, int sheet) {
        Painleve3 eq = s.equation();
        if (sheet != 0) {
            throw new InvalidInputException("--monodromy-data", "the bridge at 0 is derived on the principal sheet;"
                    + " use --sheet 0");
        }
        ZeroMonodromyBridge bridge;
        try {
            bridge = ZeroMonodromyBridge.of(eq, PAINLEVE3_S);
        } catch (InvalidInputException e) {
            throw new InvalidInputException("--monodromy-data", "(" + e.argument() + ") " + e.reason());
        }
        PointData at = dataOnRay(s, angle);
        if (at.data() == null) {
            throw new InvalidInputException("--monodromy-data", at.failure() + "; choose another --ray");
        }
        MonodromyData<Complex> d = at.data();
        List<String> comments = new ArrayList<>();
        List<Estimate<Complex>> found;
        try {
            found = bridge.zeroData(d.stokesAtZero(1), d.stokesAtZero(2), d.stokesAtInfinity(1),
                    d.stokesAtInfinity(2), d.connection(1, 1), d.connection(2, 1));
        } catch (InvalidInputException e) {
            comments.add("closed form (bridge to the monodromy data) not available: " + e.reason());
            return new ClosedAtZero(comments, null, null);
        }
        comments.add("closed form: sigma and B from the monodromy data of the solution computed at z = "
                + ComplexText.format(at.point().z()) + " (member 1 with s = 1/4) through the bridge derived here"
                + " (connection/README.md 'Monodromy data at z = 0', method of Jimbo, Publ. RIMS 18 (1982) 1137):"
                + " tr M_0 = 2 sin(pi sigma/2),"
                + " B = G(sigma) (e^(2 pi i (m + nu)) - chi)/(e^(2 pi i (m - nu)) - chi);"
                + " errors: those of the data (the solution's, carried through the map) propagated");
        return new ClosedAtZero(comments, found.get(0), found.get(1));
    }

    /** The monodromy data at a point of a ray, or (data null) why no point of the ray gave them. */
    private record PointData(SurfacePoint point, MonodromyData<Complex> data, String failure) {
    }

    /**
     * The monodromy data (member 1 with s = 1/4) of a Painleve III solution at the first point of the ray (|z| = 1,
     * 0.75, 1.5, 0.5, 2) where the solution is known to 1e-10 relative and the data pass their self-checks.
     */
    private static PointData dataOnRay(Painleve3Solution s, double angle) {
        Painleve3 eq = s.equation();
        MonodromyMap<Complex> map = MonodromyMap.doublePrecision();
        String last = "";
        for (double r : new double[] {1, 0.75, 1.5, 0.5, 2}) {
            SurfacePoint p = SurfacePoint.fromLog(Math.log(r), angle);
            MonodromyData<Complex> d;
            try {
                Painleve3Value v = s.evaluate(p);
                if (!(v.errW() <= 1e-10 * (1 + v.w().norm())) || !(v.errDw() <= 1e-10 * (1 + v.dw().norm()))) {
                    last = "the solution is known only to " + v.errW() + " at " + p;
                    continue;
                }
                d = map.compute(LaxMatrix.ofPainleve3(eq, v, PAINLEVE3_S));
            } catch (TertiusException e) {
                last = e.getMessage();
                continue;
            }
            if (!d.checksHold()) {
                last = "the self-checks of the data at " + p + " fail: " + d.checks();
                continue;
            }
            return new PointData(p, d, null);
        }
        return new PointData(null, null, "no point of the ray at |z| in {1, 0.75, 1.5, 0.5, 2} gave monodromy data"
                + " that pass their checks (last: " + last + ")");
    }

    /**
     * The oscillation at infinity along the ray in closed form from (sigma, B) at 0 (InfinityMonodromyBridge.fromZero;
     * connection/README.md 'Monodromy data at infinity'): the closed-form cells of background, amplitude, phase and
     * drift beside the numerical ones, and the rows kappa and p_over_q; a comment only where the bridge gives nothing
     * on this ray (no background oscillates along it, or the data select none).
     */
    static void infinityRows(Painleve3 eq, Complex sigma, Complex b, double angle, int sheet, ConnectionRows rows) {
        if (sheet != 0) {
            rows.comment("closed form at infinity: the bridge is derived on the principal sheet; use --sheet 0");
            return;
        }
        Oscillation o;
        InfinityMonodromyBridge bridge;
        try {
            bridge = InfinityMonodromyBridge.of(eq, PAINLEVE3_S, angle);
            o = bridge.fromZero(ZeroMonodromyBridge.of(eq, PAINLEVE3_S), new Estimate<>(sigma, 0),
                    new Estimate<>(b, 0));
        } catch (InvalidInputException e) {
            rows.comment("closed form at infinity not available on this ray: " + e.reason());
            return;
        }
        rows.comment("closed form at infinity: the monodromy data of (sigma, B) in closed form");
        closedRows(bridge, o, rows);
    }

    /**
     * The oscillation at infinity along the ray in closed form from the monodromy data of the solution, computed at
     * the first point of the ray (|z| = 1, 0.75, 1.5, 0.5, 2) where the solution is known to 1e-10 relative and the
     * data pass their self-checks (InfinityMonodromyBridge.oscillation; errors of the data propagated); a comment
     * where the bridge gives nothing on this ray.
     */
    static void infinityFromSolution(Painleve3Solution s, double angle, ConnectionRows rows) {
        Painleve3 eq = s.equation();
        InfinityMonodromyBridge bridge;
        try {
            bridge = InfinityMonodromyBridge.of(eq, PAINLEVE3_S, angle);
        } catch (InvalidInputException e) {
            rows.comment("closed form at infinity not available on this ray: " + e.reason());
            return;
        }
        PointData at = dataOnRay(s, angle);
        if (at.data() == null) {
            rows.comment("closed form at infinity not available: " + at.failure());
            return;
        }
        MonodromyData<Complex> d = at.data();
        Oscillation o;
        try {
            o = bridge.oscillation(d.stokesAtInfinity(1), d.stokesAtInfinity(2), d.stokesAtZero(1),
                    d.stokesAtZero(2), d.connection(1, 1), d.connection(1, 2), d.connection(2, 1),
                    d.connection(2, 2));
        } catch (InvalidInputException e) {
            rows.comment("closed form at infinity not available: " + e.reason());
            return;
        }
        rows.comment("closed form at infinity: from the monodromy data of the solution computed at z = "
                + ComplexText.format(at.point().z()) + " (member 1 with s = 1/4), errors of the data propagated");
        closedRows(bridge, o, rows);
    }

    private static void closedRows(InfinityMonodromyBridge bridge, Oscillation o, ConnectionRows rows) {
        rows.comment("closed form at infinity (connection/README.md 'Monodromy data at infinity'): the saddle"
                + " connection matrices X = (Y^inf_j)^-1 Y^0_k; kappa - kappa0 = mu p q from X11 X22 (or -X12 X21),"
                + " p/q from the two saddles with the Gamma factors of the parabolic-cylinder matching (configuration"
                + " integers identified numerically); drift = -i mu p q as in the numerical rows; the background is"
                + " the one whose kappa has |Re kappa| < 1/2 (identified numerically)");
        rows.closedForm("background", o.background(), 0x1p-51 * o.background().norm());
        rows.closedForm("amplitude", o.amplitude().value(), o.amplitude().error());
        rows.closedForm("kappa", o.kappa().value(), o.kappa().error());
        rows.closedForm("drift", o.drift().value().multiply(Complex.I.negate()), o.drift().error());
        int index = bridge.backgrounds().indexOf(o.background());
        if (o.ratio() == null) {
            rows.comment("closed form of p/q (phase) not available on this ray: " + bridge.ratioCovered(index));
            return;
        }
        rows.closedForm("phase", o.phase().value(), o.phase().error());
        rows.closedForm("p_over_q", o.ratio().value(), o.ratio().error());
    }

    private static Estimate<Complex> exact(List<Complex> values, int index) {
        return values == null ? null : new Estimate<>(values.get(index), 0);
    }

    /**
     * The monodromy data of the solution with sigma and B at 0 in closed form, as rows with the closed_form columns
     * filled (member 1 through Member1Map.forEquation with s = 1/4; the gauge of MonodromyFromZero).
     */
    static void monodromyRows(Painleve3 eq, Complex sigma, Complex b, ConnectionRows rows) {
        ZeroMonodromyBridge bridge;
        MonodromyFromZero d;
        try {
            bridge = ZeroMonodromyBridge.of(eq, PAINLEVE3_S);
            d = MonodromyFromZero.of(bridge, sigma, b);
        } catch (InvalidInputException e) {
            throw new InvalidInputException("--monodromy-data", "(" + e.argument() + ") " + e.reason()
                    + " (the bridge covers D6, gamma delta != 0, with |Re sigma| < 1)");
        }
        rows.comment("monodromy data in closed form (derived here, connection/README.md 'Monodromy data at z = 0'):"
                + " member 1 with s = 1/4 (Member1Map.forEquation), in the gauge where x^(m sigma3) a_-1 x^(-m sigma3)"
                + " -> C with C12 = 1 as x -> 0; the products s_inf_1 s_inf_2, s_0_1 s_0_2, E11 E22 and chi are free"
                + " of the gauges (the monodromy command prints the data of a point in its own gauge)");
        Complex[] values = {bridge.m(), bridge.m0(), d.stokesAtInfinity(1), d.stokesAtInfinity(2), d.stokesAtZero(1),
            d.stokesAtZero(2), d.connection(1, 1), d.connection(1, 2), d.connection(2, 1), d.connection(2, 2),
            d.connectionProduct(), d.chi(), ZeroMonodromyBridge.trace(sigma)};
        String[] names = {"m", "m0", "s_inf_1", "s_inf_2", "s_0_1", "s_0_2", "E11", "E12", "E21", "E22", "E11_E22",
            "chi", "trace_M0"};
        // rounding: the formulas are evaluated in Apfloat from the double inputs with Gamma values good to
        // ComplexGamma.RELATIVE_ERROR each; their conditioning is that of the inputs, estimated by a relative change of
        // sigma and B of 1e-15
        MonodromyFromZero moved = MonodromyFromZero.of(bridge, sigma.multiply(1 + 1e-15), b.multiply(1 + 1e-15));
        Complex[] other = {bridge.m(), bridge.m0(), moved.stokesAtInfinity(1), moved.stokesAtInfinity(2),
            moved.stokesAtZero(1), moved.stokesAtZero(2), moved.connection(1, 1), moved.connection(1, 2),
            moved.connection(2, 1), moved.connection(2, 2), moved.connectionProduct(), moved.chi(),
            ZeroMonodromyBridge.trace(sigma.multiply(1 + 1e-15))};
        for (int i = 0; i < values.length; i++) {
            // m and m0 come from the parameters by a few roundings, the rest through Gamma values
            double rounding = i < 2 ? 4 * Math.ulp(1.0) : ZeroMonodromyBridge.closedFormRounding();
            double err = rounding * values[i].norm() + 2 * values[i].subtract(other[i]).norm();
            rows.add(names[i], "double", "", "", ConnectionRows.complex(values[i]), ConnectionRows.error(err));
        }
    }
}
