package org.tertius.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import org.junit.jupiter.api.Test;

/**
 * The separate error columns of value rows next to poles: w_err and dw_err of a double-precision eval each cover
 * the true error of their value, taken against a 30-digit eval of the same exact points, at distances 1e-10 to
 * 1e-13 from two poles of the demo solution (a scenario of our own; the points are those of
 * tests/src/test/resources/reference/piii-near-poles.csv, doubles written exactly). A point closer than its pole's
 * position is known may be refused (err = inf, exit status 3), never reported with a value outside its estimate.
 */
class NearPoleColumnsTest {
    private static final String[] DEMO = {"--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--z0",
        "1", "--w0", "1/2", "--dw0", "1/3"};
    /** Distances 1e-10, 1e-11, 1e-12, 1e-13 from the pole near 5.5248 and 1e-10, 1e-12 from the one near 2.05-1.53i. */
    private static final String[] POINTS = {
        "5.5248040099683262127427951782010495662689208984375"
            + "+0.000000000090929742682568176500139894448252776693042420674828463234007358551025390625i",
        "5.52480401000577980852312975912354886531829833984375"
            + "+0.0000000000090929742682568170037791358877724066760162013878243669751100242137908935546875i",
        "5.52480401000952436874058548710308969020843505859375"
            + "+0.000000000000909297426825681720572752762435142886141871410021764177145087160170078277587890625i",
        "5.52480401000989918003369893995113670825958251953125"
            + "+0.00000000000009092974268256817710598506965798984324924995881200828762302990071475505828857421875i",
        "2.0526016697944324818081440753303468227386474609375-1.5256118014248445380331986598321236670017242431640625i",
        "2.052601669718713051082659148960374295711517333984375-1.525611801488622187861210477421991527080535888671875i",
    };

    private static CommandLineToolTest.Run eval(String... more) {
        String[] args = new String[1 + DEMO.length + 2 + more.length];
        args[0] = "eval";
        System.arraycopy(DEMO, 0, args, 1, DEMO.length);
        args[1 + DEMO.length] = "--at";
        args[2 + DEMO.length] = String.join(",", POINTS);
        System.arraycopy(more, 0, args, 3 + DEMO.length, more.length);
        return CommandLineToolTest.run(args);
    }

    private static double gap(CsvRows a, CsvRows b, int i, String name) {
        BigDecimal re = new BigDecimal(a.text(i, name + "_re")).subtract(new BigDecimal(b.text(i, name + "_re")));
        BigDecimal im = new BigDecimal(a.text(i, name + "_im")).subtract(new BigDecimal(b.text(i, name + "_im")));
        return re.multiply(re).add(im.multiply(im)).sqrt(MathContext.DECIMAL64).doubleValue();
    }

    @Test
    void eachValueErrorColumnCoversTheTrueErrorOfItsValueNextToAPole() {
        CommandLineToolTest.Run plain = eval();
        assertTrue(plain.status == 0 || plain.status == Main.EXIT_UNREACHED, plain.err);
        CommandLineToolTest.Run precise = eval("--digits", "30");
        assertEquals(0, precise.status, precise.err);
        CsvRows d = CsvRows.of(plain.out);
        CsvRows p = CsvRows.of(precise.out);
        assertEquals(POINTS.length, d.size());
        int covered = 0;
        for (int i = 0; i < POINTS.length; i++) {
            // the reference values themselves carry at least 25 correct digits of each value
            assertTrue(p.number(i, "w_digits") >= 25 && p.number(i, "dw_digits") >= 25, String.join(",", p.row(i)));
            assertEquals(Math.min(p.number(i, "w_digits"), p.number(i, "dw_digits")), p.number(i, "digits"), 0.0);
            double errW = d.number(i, "w_err");
            double errDw = d.number(i, "dw_err");
            assertEquals(Math.max(errW, errDw), d.number(i, "err"), 0.0);
            if (Double.isInfinite(d.number(i, "err"))) {
                assertTrue(plain.err.contains("not reached"), plain.err);
                continue;
            }
            String row = String.join(",", d.row(i));
            assertTrue(gap(d, p, i, "w") <= errW, "w: error " + gap(d, p, i, "w") + " > w_err at " + row);
            assertTrue(gap(d, p, i, "dw") <= errDw, "w': error " + gap(d, p, i, "dw") + " > dw_err at " + row);
            // w' ~ -c/(z - p)^2 inherits the pole-position error once more than w: its own column tells w's accuracy
            assertTrue(errW < errDw, row);
            covered++;
        }
        // the points at 1e-10 are well outside the pole's position uncertainty (about 1e-12): they must be computed
        assertTrue(covered >= 2, "computed points: " + covered);
    }
}
