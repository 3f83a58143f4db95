package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.cli.CsvRows;
import org.tertius.cli.Main;
import org.tertius.connection.family.Families;
import org.tertius.connection.infinity.OscillatingExpansion;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/**
 * The oscillating family of PIII(0, 0, -1, 1) at +infinity (expansion derived here in
 * {@link OscillatingExpansion}). No outside reference: the derivation is not trusted, the checks are the core
 * engine (org.tertius.core.piii.Painleve3Solution) started from the expansion, and the expansion refitted to the
 * engine's values.
 */
class OscillatingFamilyTest {
    private static final Painleve3 EQ = Painleve3.of(0, 0, -1, 1);
    private static final SolverSettings SETTINGS = SolverSettings.defaults();
    /**
     * The engine's share of every budget: local tolerance 1e-13 relative to 1 + |y| per step, times 20 for the
     * accumulation over the ~10 oscillation periods between x1 and x2 (no exponential growth: perturbations of
     * an oscillating solution stay of their size, up to the slow phase drift A dA log(x2/x1)).
     */
    private static final double ENGINE = 20 * SETTINGS.tolerance();

    private static OscillatingExpansion expansion(double a, double phi) {
        return OscillatingExpansion.create(a, phi, 40);
    }

    /** Coefficients by hand (derived here): a_01 = A/2, a_13 = A^3/96 (so u has (A^3/48) x^(-3/2) cos 3 theta). */
    @Test
    void leadingCoefficients() {
        OscillatingExpansion e = expansion(1.7, 0.2);
        assertEquals(0.85, e.coefficient(0, 1).getReal(), 1e-15);
        assertEquals(0, e.coefficient(0, 1).getImaginary(), 0);
        assertEquals(Math.pow(1.7, 3) / 96, e.coefficient(1, 3).getReal(), 1e-15);
        assertEquals(0, e.coefficient(1, 3).getImaginary(), 1e-16);
    }

    /**
     * The family started by the expansion at x1 = 30 (default), evaluated by the engine at x2 = 45 and 20,
     * against the expansion at x2, for amplitudes up to the limit 3. Budget (reason): the two expansion
     * estimates (first omitted order) plus the engine share {@link #ENGINE} times 1 + |w|. Measured: 3e-15 ..
     * 9e-14 (w'), estimates 1e-16 .. 3e-15. The leading term alone misses by more than 1e-5 (the check has teeth).
     */
    @Test
    void engineAgreesWithTheExpansionAtASecondLargeAbscissa() {
        double[][] cases = {{0.3, 0.7}, {1, -1.2}, {2, 2.5}, {3, 0.1}, {-1.5, 0.9}};
        for (double[] c : cases) {
            OscillatingExpansion e = expansion(c[0], c[1]);
            Painleve3Solution s = Families.create(EQ, "oscillating",
                    Map.of("A", Double.toString(c[0]), "phi", Double.toString(c[1])), SETTINGS);
            LocalValue<Complex> start = e.at(Families.OSCILLATING_X0);
            for (double x2 : new double[] {45, 20}) {
                LocalValue<Complex> v = e.at(x2);
                Painleve3Value ev = s.evaluate(SurfacePoint.of(x2, 0));
                double bw = 2 * (v.errW() + start.errW()) + ENGINE * (1 + v.w().norm());
                double bd = 2 * (v.errDw() + start.errDw() + start.errW()) + ENGINE * (1 + v.w().norm());
                assertTrue(v.errW() < 1e-14 && v.errDw() < 1e-14, "estimate " + v);
                assertEquals(0, v.w().subtract(ev.w()).norm(), bw, "w, A = " + c[0] + ", x = " + x2);
                assertEquals(0, v.dw().subtract(ev.dw()).norm(), bd, "w', A = " + c[0] + ", x = " + x2);
                double theta = 2 * x2 + c[0] * c[0] / 2 * Math.log(x2) + c[1];
                double leading = c[0] / Math.sqrt(x2) * Math.cos(theta);
                assertTrue(Math.abs(leading - Math.log(ev.w().getReal())) > 1e-5 * Math.abs(c[0]) * c[0] * c[0],
                        "leading term alone, A = " + c[0]);
            }
        }
    }

    /**
     * Consistency: engine values (u = log w, u') at x = 52 of the member (A, phi) started at x0 = 30, fitted by
     * the expansion at x = 52 (Newton on (A, phi) with difference quotients), give back A and phi. Budget 1e-10:
     * the engine error ~1e-13 in u divided by the sensitivity du/dA ~ x^(-1/2) ~ 0.14 (and du/dphi ~ A x^(-1/2)),
     * with a margin 100 for the difference-quotient Jacobian's effect on the final Newton step.
     */
    @Test
    void parametersAreRecoveredByFittingTheExpansionToTheEngine() {
        double[][] cases = {{1.3, 0.4}, {0.6, -2.0}, {2.4, 1.1}};
        for (double[] c : cases) {
            Painleve3Solution s = Families.create(EQ, "oscillating",
                    Map.of("A", Double.toString(c[0]), "phi", Double.toString(c[1])), SETTINGS);
            double x = 52;
            Painleve3Value ev = s.evaluate(SurfacePoint.of(x, 0));
            double u = Math.log(ev.w().getReal());
            double du = ev.dw().getReal() / ev.w().getReal();
            double a = c[0] + 0.02;
            double phi = c[1] - 0.03;
            for (int it = 0; it < 30; it++) {
                double[] r = residual(a, phi, x, u, du);
                double h = 1e-6;
                double[] ra = residual(a + h, phi, x, u, du);
                double[] rp = residual(a, phi + h, x, u, du);
                double j11 = (ra[0] - r[0]) / h;
                double j21 = (ra[1] - r[1]) / h;
                double j12 = (rp[0] - r[0]) / h;
                double j22 = (rp[1] - r[1]) / h;
                double det = j11 * j22 - j12 * j21;
                double da = (r[0] * j22 - r[1] * j12) / det;
                double dp = (j11 * r[1] - j21 * r[0]) / det;
                a -= da;
                phi -= dp;
                if (Math.abs(da) + Math.abs(dp) < 1e-15) {
                    break;
                }
            }
            assertEquals(c[0], a, 1e-10, "A");
            assertEquals(0, Math.IEEEremainder(phi - c[1], 2 * Math.PI), 1e-10, "phi");
        }
    }

    private static double[] residual(double a, double phi, double x, double u, double du) {
        double[] v = expansion(a, phi).logValue(x);
        return new double[] {v[0] - u, (v[1] - du) / 2}; // u' ~ 2 x^(-1/2) A sin: scaled to the size of u
    }

    /** The command-line options map to the family's parameters (same solution as the library call). */
    @Test
    void commandLineOptionsGiveTheSameSolution() {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.execute(new String[] {"eval", "--alpha", "0", "--beta", "0", "--gamma", "-1", "--delta", "1",
            "--family", "oscillating", "--amplitude-infinity", "0.8", "--phase", "-0.3", "--at", "33"},
                new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(0, status, err.toString());
        // the printed decimals give the double back exactly
        CsvRows rows = CsvRows.of(out.toString());
        Painleve3Value b = Families.create(EQ, "oscillating", Map.of("A", "0.8", "phi", "-0.3"), SETTINGS)
                .evaluate(SurfacePoint.of(33, 0));
        assertEquals(33, rows.number(0, "z_re"), 0);
        assertEquals(b.w().getReal(), rows.number(0, "w_re"), 0);
        assertEquals(b.w().getImaginary(), rows.number(0, "w_im"), 0);
        assertEquals(b.errW(), rows.number(0, "w_err"), 1e-3 * b.errW());
    }

    /** Bad input: amplitude beyond the range, another equation, start abscissa too small, complex or missing data. */
    @Test
    void badInputIsRefusedWithWhatToDo() {
        InvalidInputException big = assertThrows(InvalidInputException.class,
                () -> Families.create(EQ, "oscillating", Map.of("A", "5", "phi", "0"), SETTINGS));
        assertTrue(big.getMessage().contains("|A| <= 3") && big.getMessage().contains("start data"), big.getMessage());
        InvalidInputException other = assertThrows(InvalidInputException.class,
                () -> Families.create(Painleve3.of(0, 0, 1, -1), "oscillating", Map.of("A", "1", "phi", "0"),
                        SETTINGS));
        assertTrue(other.getMessage().contains("gamma = -1, delta = 1") && other.getMessage().contains("rescale"),
                other.getMessage());
        InvalidInputException near = assertThrows(InvalidInputException.class,
                () -> Families.create(EQ, "oscillating", Map.of("A", "3", "phi", "0", "x0", "2"), SETTINGS));
        assertTrue(near.getMessage().contains("start further out"), near.getMessage());
        InvalidInputException complex = assertThrows(InvalidInputException.class,
                () -> Families.create(EQ, "oscillating", Map.of("A", "1+1i", "phi", "0"), SETTINGS));
        assertTrue(complex.getMessage().contains("must be real"), complex.getMessage());
        InvalidInputException missing = assertThrows(InvalidInputException.class,
                () -> Families.create(EQ, "oscillating", Map.of("A", "1"), SETTINGS));
        assertTrue(missing.getMessage().contains("phi"), missing.getMessage());
        assertThrows(InvalidInputException.class, () -> OscillatingExpansion.create(Double.NaN, 0, 40));
    }
}
