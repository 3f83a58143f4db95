package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.tertius.cli.Main;
import org.tertius.connection.closed.InfinityMonodromyBridge;
import org.tertius.connection.closed.InfinityMonodromyBridge.Oscillation;
import org.tertius.connection.closed.MonodromyFromZero;
import org.tertius.connection.closed.ZeroMonodromyBridge;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;
import org.tertius.hierarchy.monodromy.Estimate;

/**
 * The bridge between the behaviour at 0 and the monodromy data from the command line (derived here,
 * connection/README.md, section "Monodromy data at z = 0"): {@code connect --from-zero SIGMA,B --monodromy-data}
 * prints the library's closed forms, and the member-1 solution selected by those data has, read off at 0 by the
 * fits, the typed sigma and B, with the closed forms beside them; the oscillation at infinity in closed form
 * (section "Monodromy data at infinity"); bad input refused in one line with exit 2.
 */
class BridgeCommandTest {
    private static final String[] EQ = {"--alpha", "0.7+0.2i", "--beta", "-0.4+0.1i", "--gamma", "1", "--delta", "-1"};
    private static final Complex SIGMA = new Complex(0.3, 0.2);
    private static final Complex B = new Complex(0.8, -0.1);

    private static Map<String, String[]> rows(int status, String... args) {
        return ConnectCommandTest.rows(status, args);
    }

    private static String[] connect(String... more) {
        String[] out = new String[1 + EQ.length + more.length];
        out[0] = "connect";
        System.arraycopy(EQ, 0, out, 1, EQ.length);
        System.arraycopy(more, 0, out, 1 + EQ.length, more.length);
        return out;
    }

    private static Complex closed(Map<String, String[]> rows, String q) {
        return ComplexText.parse(q, rows.get(q)[4]);
    }

    @Test
    void fromZeroPrintsTheLibrarysMonodromyData() {
        Map<String, String[]> r = rows(0, connect("--from-zero", "0.3+0.2i,0.8-0.1i", "--monodromy-data"));
        ZeroMonodromyBridge bridge = ZeroMonodromyBridge.of(Painleve3.of(new Complex(0.7, 0.2), new Complex(-0.4, 0.1),
                Complex.ONE, new Complex(-1)), new Complex(0.25));
        MonodromyFromZero d = MonodromyFromZero.of(bridge, SIGMA, B);
        Complex[] expected = {d.stokesAtInfinity(1), d.stokesAtInfinity(2), d.stokesAtZero(1), d.stokesAtZero(2),
            d.connection(1, 1), d.connection(1, 2), d.connection(2, 1), d.connection(2, 2), d.chi()};
        String[] names = {"s_inf_1", "s_inf_2", "s_0_1", "s_0_2", "E11", "E12", "E21", "E22", "chi"};
        for (int i = 0; i < names.length; i++) {
            assertEquals(0, closed(r, names[i]).subtract(expected[i]).norm(), 1e-15 * (1 + expected[i].norm()),
                    names[i]);
            assertTrue(r.get(names[i])[2].isEmpty(), names[i] + ": no numerical value is claimed");
        }
        // derived here (README section above): tr M_0 = 2 sin(pi sigma / 2), and the cyclic relation's trace
        Complex trace = ZeroMonodromyBridge.traceAtZero(bridge.m0(), d.stokesAtZero(1), d.stokesAtZero(2));
        assertEquals(0, trace.subtract(ZeroMonodromyBridge.trace(SIGMA)).norm(), 1e-13);
        Complex traceInf = ZeroMonodromyBridge.traceAtInfinity(bridge.m(), d.stokesAtInfinity(1),
                d.stokesAtInfinity(2));
        assertEquals(0, traceInf.subtract(trace).norm(), 1e-13);
        // the bridge's inverse gives B back from chi
        assertEquals(0, bridge.amplitude(SIGMA, d.chi()).subtract(B).norm(), 1e-13);
    }

    /** The whole chain: (sigma, B) -> data in closed form -> member-1 solution by the inverse map -> fits at 0. */
    @Test
    @Tag("slow")
    void theSolutionSelectedByTheClosedFormDataHasTheTypedDataAtZero() {
        Map<String, String[]> d = rows(0, connect("--from-zero", "0.3+0.2i,0.8-0.1i", "--monodromy-data"));
        Map<String, String[]> r = rows(0, "connect", "--member", "1", "--s", "0.25", "--m", d.get("m")[4], "--m0",
                d.get("m0")[4], "--x0", "0.0625", "--stokes-infinity", d.get("s_inf_1")[4] + "," + d.get("s_inf_2")[4],
                "--stokes-zero", d.get("s_0_1")[4] + "," + d.get("s_0_2")[4], "--connection", d.get("E11")[4] + ","
                + d.get("E12")[4] + "," + d.get("E21")[4] + "," + d.get("E22")[4], "--at-zero");
        assertEquals("power", r.get("kind")[2]);
        for (String q : new String[] {"sigma", "B"}) {
            Complex typed = q.equals("sigma") ? SIGMA : B;
            Complex numerical = ComplexText.parse(q, r.get(q)[2]);
            double err = Double.parseDouble(r.get(q)[3]);
            assertTrue(numerical.subtract(typed).norm() <= Math.min(2 * err, 1e-8), q + " " + numerical);
            // the closed form from the data typed (derived here, connection/README.md "Monodromy data at z = 0")
            assertEquals(0, closed(r, q).subtract(typed).norm(), 1e-13, q + " closed form");
            // its error is the Gamma budget (exact data): closedFormRounding() relative, twice for rounding around it
            double closedErr = Double.parseDouble(r.get(q)[5]);
            assertTrue(closedErr > 0 && closedErr < 2 * ZeroMonodromyBridge.closedFormRounding() * typed.norm(),
                    q + " closed-form error " + closedErr);
        }
    }

    /**
     * Any D6 solution, given by start data: --at-zero --monodromy-data computes its monodromy data at a point and puts
     * sigma and B from the bridge (derived here, connection/README.md "Monodromy data at z = 0") beside the fitted
     * ones; both agree with the (sigma, B) the start data were made from, within their estimates.
     */
    @Test
    void anySolutionGetsTheClosedFormFromItsComputedData() {
        Map<String, String[]> start = rows(0, connect("--from-zero", "0.3+0.2i,0.8-0.1i"));
        Map<String, String[]> r = rows(0, connect("--z0", start.get("z")[2], "--w0", start.get("w")[2], "--dw0",
                start.get("dw")[2], "--at-zero", "--monodromy-data"));
        assertEquals("power", r.get("kind")[2]);
        for (String q : new String[] {"sigma", "B"}) {
            Complex typed = q.equals("sigma") ? SIGMA : B;
            double startError = 1e-14; // the start data's own errors (series at 0), far below the estimates here
            double closedErr = Double.parseDouble(r.get(q)[5]);
            assertTrue(closedErr > 0 && closedErr < 1e-9, q + " closed-form error " + closedErr);
            assertTrue(closed(r, q).subtract(typed).norm() <= closedErr + startError, q + " " + closed(r, q));
            double err = Double.parseDouble(r.get(q)[3]);
            assertTrue(ComplexText.parse(q, r.get(q)[2]).subtract(typed).norm() <= err + startError, q);
        }
    }

    /**
     * The oscillation at infinity in closed form (connection/README.md "Monodromy data at infinity", identified here):
     * --from-zero --monodromy-data on an oscillating ray prints the library's fromZero values (rays pi and 0 of this
     * equation: two saddle configurations).
     */
    @Test
    void fromZeroPrintsTheOscillationAtInfinity() {
        Painleve3 eq = Painleve3.of(new Complex(0.7, 0.2), new Complex(-0.4, 0.1), Complex.ONE, new Complex(-1));
        Map<String, String[]> r = rows(0, connect("--from-zero", "0.3+0.2i,0.8-0.1i", "--monodromy-data", "--ray",
                "pi"));
        Oscillation o = InfinityMonodromyBridge.of(eq, new Complex(0.25), Math.PI).fromZero(ZeroMonodromyBridge.of(eq,
                new Complex(0.25)), new Estimate<>(SIGMA, 0), new Estimate<>(B, 0));
        assertEquals(0, closed(r, "p_over_q").subtract(o.ratio().value()).norm(), 1e-15 * o.ratio().value().norm());
        assertEquals(0, closed(r, "kappa").subtract(o.kappa().value()).norm(), 1e-15);
        assertTrue(r.get("p_over_q")[2].isEmpty(), "no numerical value is claimed");
        Map<String, String[]> zero = rows(0, connect("--from-zero", "0.3+0.2i,0.8-0.1i", "--monodromy-data", "--ray",
                "0"));
        Oscillation onZero = InfinityMonodromyBridge.of(eq, new Complex(0.25), 0).fromZero(ZeroMonodromyBridge.of(eq,
                new Complex(0.25)), new Estimate<>(SIGMA, 0), new Estimate<>(B, 0));
        assertEquals(0, closed(zero, "p_over_q").subtract(onZero.ratio().value()).norm(),
                1e-15 * onZero.ratio().value().norm());
    }

    /**
     * --at-infinity --monodromy-data: the closed form from the solution's data computed at a point (identified here,
     * connection/README.md "Monodromy data at infinity") beside the fitted phase, drift and amplitude, within the
     * summed estimates.
     */
    @Test
    void atInfinityPutsTheClosedFormBesideTheFit() {
        Map<String, String[]> start = rows(0, connect("--from-zero", "0.3+0.2i,0.8-0.1i", "--ray", "pi"));
        Map<String, String[]> r = rows(0, connect("--z0", start.get("z")[2], "--w0", start.get("w")[2], "--dw0",
                start.get("dw")[2], "--at-infinity", "--ray", "pi", "--monodromy-data"));
        assertEquals("oscillating", r.get("kind")[2]);
        for (String q : new String[] {"phase", "drift", "amplitude", "background"}) {
            double budget = Double.parseDouble(r.get(q)[3]) + Double.parseDouble(r.get(q)[5]);
            assertTrue(budget < 1e-8, q + " estimates " + budget);
            assertTrue(closed(r, q).subtract(ComplexText.parse(q, r.get(q)[2])).norm() <= budget + 1e-14, q + " "
                    + r.get(q)[2] + " numerically, " + r.get(q)[4] + " closed form");
        }
    }

    @Test
    void badInputIsOneLineAndExitTwo() {
        String[][] cases = {
            {"connect", "--alpha", "1", "--beta", "0", "--gamma", "0", "--delta", "-1", "--from-zero", "0.3,1",
                "--monodromy-data"},
            {"connect", "--alpha", "1", "--beta", "0", "--gamma", "1", "--delta", "-1", "--from-zero", "1+0.5i,1",
                "--monodromy-data"},
            {"connect", "--alpha", "1", "--beta", "0", "--gamma", "1", "--delta", "-1", "--z0", "0.5", "--w0", "1",
                "--dw0", "0", "--at-infinity", "--ray", "pi/2", "--sheet", "1", "--monodromy-data"},
            {"connect", "--alpha", "1", "--beta", "0", "--gamma", "1", "--delta", "-1", "--z0", "0.5", "--w0", "1",
                "--dw0", "0", "--at-zero", "--sheet", "1", "--monodromy-data"},
            {"connect", "--alpha", "1", "--beta", "0", "--gamma", "1", "--delta", "-1", "--z0", "1/2", "--w0", "1",
                "--dw0", "0", "--at-zero", "--monodromy-data", "--digits", "30"},
            {"connect", "--alpha", "1", "--beta", "0", "--gamma", "1", "--delta", "-1", "--from-zero", "0.3,1",
                "--monodromy-data", "--digits", "30"},
            // formal exponent m0 = -25i: e^(2 pi i m0) spans 68 digits, more than the working precision holds
            {"connect", "--alpha", "0.7", "--beta", "100i", "--gamma", "1", "--delta", "-1", "--from-zero", "0.3,0.8",
                "--monodromy-data"},
            // m of size 1.75e149: Gamma factors far beyond double precision
            {"connect", "--alpha", "0.7", "--beta", "-0.4", "--gamma", "1e-300", "--delta", "-1", "--from-zero",
                "0.3,0.8", "--monodromy-data"}};
        for (String[] c : cases) {
            StringWriter out = new StringWriter();
            StringWriter err = new StringWriter();
            assertEquals(2, Main.execute(c, new PrintWriter(out, true), new PrintWriter(err, true)), String.join(" ", c));
            assertTrue(out.toString().isEmpty(), "nothing written: " + out);
            assertEquals(1, err.toString().lines().count(), err.toString());
            assertTrue(err.toString().startsWith("tertius: --monodromy-data"), err.toString());
            assertTrue(!err.toString().contains("Riccati") || c[4].equals("0"), "not called special: " + err);
        }
    }

    @Test
    void gammaFactorsOutsideTheMeasuredSquareComeFromApfloatAndRoundTrip() {
        // alpha = 100: m = 24.5, Gamma arguments beyond |Re z| = 20, where ComplexGamma's error is not measured;
        // round trip (sigma, B) -> monodromy data -> (sigma, B), derived here
        Painleve3 eq = Painleve3.of(new Complex(100), new Complex(-0.4), Complex.ONE, new Complex(-1));
        ZeroMonodromyBridge bridge = ZeroMonodromyBridge.of(eq, new Complex(0.25));
        Complex sigma = new Complex(0.3, 0.2);
        Complex b = new Complex(0.8, -0.1);
        MonodromyFromZero d = MonodromyFromZero.of(bridge, sigma, b);
        assertEquals(0, bridge.amplitude(sigma, d.chi()).subtract(b).norm(), 1e-12);
    }
}
