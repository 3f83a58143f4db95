package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.HashMap;
import java.util.Map;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.tertius.cli.Main;
import org.tertius.connection.infinity.PreciseTransseries;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.piii.Painleve3;

/**
 * The transseries at infinity in arbitrary precision ({@link PreciseTransseries}) and {@code connect --from-infinity
 * --digits}: the double path agrees with it within the double's estimates, its own estimates hold against more orders
 * and more digits, start data replayed in D digits meet the transseries further out (a round trip through the
 * project's own replay, common practice: no outside reference), and bad input is one line with exit status 2.
 */
class PreciseInfinityTest {
    private static final String[] EQ = {"--alpha", "7/10", "--beta", "-2/5", "--gamma", "1", "--delta", "-1"};

    private static Painleve3 exact(String a, String b, String g, String d) {
        return Painleve3.of(ExactNumber.parse("alpha", a), ExactNumber.parse("beta", b), ExactNumber.parse("gamma", g),
                ExactNumber.parse("delta", d));
    }

    private static PreciseTransseries precise(Painleve3 eq, String p, String q, int digits, int orders) {
        return PreciseTransseries.create(eq, eq.exactParameters(), 0, ExactNumber.parse("p", p),
                ExactNumber.parse("q", q), digits, orders);
    }

    private static double distance(MpComplex a, Complex b) {
        return a.toComplex().subtract(b).norm();
    }

    /**
     * The double path (orders 36, as the fits use it) against the precise sum at the same point: within the double's
     * own estimates, on an exponentially small D6 ray and a D7 ray.
     */
    @Test
    void doublePathAgreesWithinItsEstimates() {
        Object[][] cases = {
            {exact("7/10", "-2/5", "1", "-1"), "0", "3/10", 1.0, 30.0},
            {exact("1", "1/2", "0", "-1"), "0", "1/5", 0.0, 120.0},
        };
        for (Object[] c : cases) {
            Painleve3 eq = (Painleve3) c[0];
            double phase = (double) c[3];
            double r = (double) c[4];
            Complex tau = new Complex(Math.log(r), phase);
            TransseriesAtInfinity d = TransseriesAtInfinity.create(eq, TransseriesAtInfinity.backgrounds(eq).get(0),
                    Complex.ZERO, ExactNumber.parse("q", (String) c[2]).toComplex(), 36);
            LocalValue<Complex> vd = d.at(tau);
            PreciseTransseries t = precise(eq, (String) c[1], (String) c[2], 20, PreciseTransseries.ordersFor(20));
            MpArithmetic ar = t.arithmetic();
            LocalValue<MpComplex> vp = t.at(ar.of(tau.getReal(), tau.getImaginary()));
            assertTrue(vp.errW() < 1e-19 * ar.abs(vp.w()), vp.toString());
            assertEquals(0, distance(vp.w(), vd.w()), vd.errW() + vp.errW(), vd + " / " + vp);
            assertEquals(0, distance(vp.dw(), vd.dw()), vd.errDw() + vp.errDw(), vd + " / " + vp);
        }
    }

    /** The estimates of the precise sum against more orders and more digits (exponentially small ray, fast). */
    @Test
    void preciseEstimatesHoldAgainstMoreOrdersAndDigits() {
        Painleve3 eq = exact("7/10", "-2/5", "1", "-1");
        PreciseTransseries low = precise(eq, "0", "3/10", 20, 40);
        PreciseTransseries high = precise(eq, "0", "3/10", 40, 90);
        MpArithmetic ar = high.arithmetic();
        for (double r : new double[] {15, 25, 40}) {
            LocalValue<MpComplex> a = low.at(low.arithmetic().of(Math.log(r), 1.0));
            LocalValue<MpComplex> b = high.at(ar.of(Math.log(r), 1.0));
            double dw = ar.abs(ar.subtract(ar.context().fromApcomplex(low.arithmetic().context().toApcomplex(a.w())),
                    b.w()));
            assertTrue(dw <= a.errW() + b.errW(), "r = " + r + ": " + dw + " > " + a.errW());
        }
    }

    /**
     * Start data in 30 digits from exact oscillating data (the D6 equation of the README's round trip, ray pi/2),
     * replayed by {@code eval --digits 30} to 1.6 times the radius: the transseries there within the errors, all
     * below 1e-25. Round trip through the project's own replay.
     */
    @Tag("slow")
    @Test
    void startDataContinueTheSolutionIn30Digits() {
        String data = "root0,-0.18-0.28i,-0.029-0.089i";
        Map<String, String[]> s = rows(args(EQ, "--from-infinity", data, "--ray", "pi/2", "--digits", "30"));
        assertTrue(error(s, "w") < 1e-29 && error(s, "dw") < 1e-29, s.get("w")[3] + " " + s.get("dw")[3]);
        String z0 = s.get("z")[2];
        assertTrue(z0.startsWith("0+") && z0.endsWith("i"), z0); // exactly on the imaginary axis
        double r0 = Double.parseDouble(z0.substring(2, z0.length() - 1));
        String r1 = Double.toString(1.6 * r0);
        Map<String, String[]> far = rows(args(EQ, "--from-infinity", data, "--ray", "pi/2", "--digits", "30",
                "--start-at", r1));
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] eval = {"eval", "--alpha", "7/10", "--beta", "-2/5", "--gamma", "1", "--delta", "-1", "--z0", z0,
            "--w0", s.get("w")[2], "--dw0", s.get("dw")[2], "--at", far.get("z")[2], "--digits", "30"};
        assertEquals(0, Main.execute(eval, new PrintWriter(out, true), new PrintWriter(err, true)), err.toString());
        String[] row = out.toString().lines().filter(l -> !l.startsWith("#") && !l.startsWith("z_re")).findFirst()
                .orElseThrow().split(",");
        int digits = Integer.parseInt(row[9]);
        assertTrue(digits >= 27, out.toString());
        Apcomplex w = new Apcomplex(new Apfloat(row[3], 40), new Apfloat(row[4], 40));
        Apcomplex expected = parse(far.get("w")[2]);
        double diff = Math.hypot(w.subtract(expected).real().doubleValue(), w.subtract(expected).imag().doubleValue());
        double allowed = error(far, "w") + error(s, "w") * 10 + Math.pow(10, -digits) * 2;
        assertTrue(diff <= allowed && diff < 1e-25, diff + " > " + allowed);
    }

    @Test
    void badInputIsOneLine() {
        String e = refused(args(EQ, "--from-infinity", "root0,0,0.3", "--ray", "0.3", "--digits", "1000"));
        assertTrue(e.startsWith("tertius: --digits:") && e.contains("[1, 1e4]"), e);
        e = refused(args(EQ, "--from-infinity", "root0,0,0.3", "--ray", "0.3", "--digits", "20", "--start-at", "0.5"));
        assertTrue(e.startsWith("tertius: --start-at:") && e.contains("[1, 1e4]"), e);
        e = refused(args(EQ, "--from-infinity", "root0,0.1,0.1", "--ray", "0", "--digits", "20"));
        assertTrue(e.contains("grows along the ray"), e);
        // a family's start data are computed in double precision: no digits at infinity from them
        e = refused("connect", "--alpha", "0", "--beta", "0", "--gamma", "-1", "--delta", "1", "--family",
                "oscillating", "--amplitude-infinity", "1.3", "--phase", "0.4", "--at-infinity", "--digits", "30");
        assertTrue(e.startsWith("tertius: --digits:"), e);
    }

    private static Apcomplex parse(String text) {
        String[] parts = text.replace("i", "").split("(?<=[0-9])(?=[+-])");
        return new Apcomplex(new Apfloat(parts[0], 50), new Apfloat(parts[1].replace("+", ""), 50));
    }

    private static double error(Map<String, String[]> rows, String name) {
        return Double.parseDouble(rows.get(name)[3]);
    }

    private static String[] args(String[] a, String... b) {
        String[] out = new String[a.length + b.length + 1];
        out[0] = "connect";
        System.arraycopy(a, 0, out, 1, a.length);
        System.arraycopy(b, 0, out, 1 + a.length, b.length);
        return out;
    }

    private static Map<String, String[]> rows(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(0, Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true)), err.toString());
        Map<String, String[]> m = new HashMap<>();
        for (String line : out.toString().lines().toList()) {
            if (!line.startsWith("#") && !line.startsWith("quantity,")) {
                String[] c = line.split(",", -1);
                m.put(c[0], c);
            }
        }
        return m;
    }

    private static String refused(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        assertEquals(2, Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true)), err.toString());
        assertEquals("", out.toString());
        assertEquals(1, err.toString().lines().count(), err.toString());
        return err.toString();
    }
}
