package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.integers;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.cli.CsvRows;
import org.tertius.cli.Main;
import org.tertius.connection.family.Families;
import org.tertius.connection.infinity.AlgebraicExpansion;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/**
 * The algebraic expansion at +infinity about a constant background (derived in {@link AlgebraicExpansion}):
 * coefficients by substitution, and start data against the core engine. No outside reference: the checks are
 * the equation itself (residual) and the core engine (org.tertius.core.piii.Painleve3Solution).
 */
class AlgebraicExpansionTest {
    /** A generic complex parameter set (no symmetry, Re mu and Im mu both non-zero for every background). */
    private static final Painleve3 GENERIC = Painleve3.of(new Complex(0.7, 0.3), new Complex(-0.4, 0.5),
            new Complex(1.1, -0.2), new Complex(-0.8, 0.35));

    private static AlgebraicExpansion expansion(Painleve3 eq, int root) {
        Complex c = AlgebraicExpansion.backgrounds(eq.gamma(), eq.delta()).get(root);
        return AlgebraicExpansion.create(eq.alpha(), eq.beta(), eq.gamma(), eq.delta(), c, 160);
    }

    /**
     * Substitution: the series truncated after a_n leaves a residual of order x^-(n+1) (the equation is
     * satisfied order by order), so doubling x divides it by 2^(n+1). Budget 15%: the next order changes the
     * ratio by O(|a_(n+2) / a_(n+1)| / x) ~ 0.1 at x = 40. Also a_1 and a_2 by hand (derived here from the
     * t^1 and t^2 coefficients of the equation times w): a_1 = -(alpha c^2 + beta) / (4 gamma c^2),
     * a_2 = -(3 alpha c^2 a_1 + beta a_1 + 6 gamma c^2 a_1^2) / (4 gamma c^3).
     */
    @Test
    void coefficientsSatisfyTheEquationOrderByOrder() {
        for (int r = 0; r < 4; r++) {
            AlgebraicExpansion e = expansion(GENERIC, r);
            Complex c = e.background();
            Complex g = GENERIC.gamma();
            Complex a1 = GENERIC.alpha().multiply(c.multiply(c)).add(GENERIC.beta())
                    .divide(g.multiply(c.multiply(c)).multiply(4)).negate();
            assertEquals(0, e.coefficient(1).subtract(a1).norm(), 1e-14, "a_1, root " + r);
            Complex c2 = c.multiply(c);
            Complex a2 = GENERIC.alpha().multiply(c2).multiply(a1).multiply(3).add(GENERIC.beta().multiply(a1))
                    .add(g.multiply(c2).multiply(a1.multiply(a1)).multiply(6))
                    .divide(g.multiply(c2).multiply(c).multiply(4)).negate();
            assertEquals(0, e.coefficient(2).subtract(a2).norm(), 1e-14, "a_2, root " + r);
            for (int n = 2; n <= 5; n++) {
                double ratio = e.residual(new Complex(40), n).norm() / e.residual(new Complex(80), n).norm();
                assertEquals(1, ratio / Math.pow(2, n + 1), 0.15, "residual order, n = " + n + ", root " + r);
            }
        }
    }

    /**
     * The family "algebraic" started at its default x0 (estimate below 1e-15 relative there, x0 ~ 16 here),
     * evaluated by the engine at x1 = x0 - 4 and x0 + 3 (where the expansion's own estimate is below 2e-12),
     * against the expansion at x1, for all four backgrounds. Budget (reason): 2 est(x1) plus the start error and
     * the engine's local errors (tolerance 1e-13 relative, 10x for the number of steps) carried by the mode
     * e^(|Re mu| |x1 - x0|), the fastest growth of a perturbation about the background. Measured: 2e-16 .. 1e-12.
     */
    @Test
    void startDataAgreeWithTheEngineAtASecondLargeAbscissa() {
        SolverSettings settings = SolverSettings.defaults();
        for (int r = 0; r < 4; r++) {
            AlgebraicExpansion e = expansion(GENERIC, r);
            Painleve3Solution s = Families.create(GENERIC, "algebraic", Map.of("root", Integer.toString(r)), settings);
            LocalValue<Complex> start = e.startData(1e-15);
            double x0 = start.z().getReal();
            for (double dx : new double[] {-4, 3}) {
                LocalValue<Complex> v = e.at(new Complex(x0 + dx));
                Painleve3Value ev = s.evaluate(SurfacePoint.of(v.z(), 0));
                double amp = Math.exp(Math.abs(e.mu().getReal()) * Math.abs(dx));
                double budgetW = 2 * v.errW() + amp * (start.errW() + 10 * settings.tolerance() * (1 + start.w().norm()));
                double budgetD = 2 * v.errDw() + amp * (start.errDw() + start.errW()
                        + 10 * settings.tolerance() * (1 + start.w().norm()));
                assertEquals(0, v.w().subtract(ev.w()).norm(), budgetW, "w, root " + r + ", x = " + v.z());
                assertEquals(0, v.dw().subtract(ev.dw()).norm(), budgetD, "w', root " + r + ", x = " + v.z());
            }
        }
    }

    /**
     * Property over real equations with gamma delta < 0 (real backgrounds +-c0, real mu) and > 0 (mu imaginary
     * for the real backgrounds: oscillatory corrections): the engine from x0 = 18 agrees with the expansion at
     * x = 21 within the budget of the test above.
     */
    @Test
    void engineAgreesForRandomRealEquations() {
        qt().withExamples(8).withShrinkCycles(0).forAll(doubles().between(-1, 1), doubles().between(-1, 1),
                doubles().between(0.5, 2), integers().between(0, 7)).checkAssert((al, be, ga, k) -> {
                    double de = (k < 4 ? -1 : 1) * (0.5 + 0.2 * k);
                    Painleve3 eq = Painleve3.of(al, be, ga, de);
                    int root = k % 4;
                    AlgebraicExpansion e = expansion(eq, root);
                    Painleve3Solution s = Families.create(eq, "algebraic", Map.of("root", Integer.toString(root),
                            "x0", "18"), SolverSettings.defaults());
                    LocalValue<Complex> start = e.at(new Complex(18));
                    LocalValue<Complex> v = e.at(new Complex(21));
                    Painleve3Value ev = s.evaluate(SurfacePoint.of(v.z(), 0));
                    double amp = Math.exp(Math.abs(e.mu().getReal()) * 3);
                    double budget = 2 * v.errW() + amp * (start.errW() + 1e-12 * (1 + start.w().norm()));
                    assertEquals(0, v.w().subtract(ev.w()).norm(), budget, eq + " root " + root);
                });
    }

    /** Bad input: a value that is not a background, gamma delta = 0, x0 too small, both c and root. */
    @Test
    void badInputIsRefusedWithTheReason() {
        SolverSettings st = SolverSettings.defaults();
        InvalidInputException notRoot = assertThrows(InvalidInputException.class,
                () -> Families.create(GENERIC, "algebraic", Map.of("c", "1"), st));
        assertTrue(notRoot.getMessage().contains("gamma c^4 + delta = 0"), notRoot.getMessage());
        InvalidInputException zero = assertThrows(InvalidInputException.class,
                () -> Families.create(Painleve3.of(1, 1, 0, -1), "algebraic", Map.of("root", "0"), st));
        assertTrue(zero.getMessage().contains("gamma delta != 0"), zero.getMessage());
        InvalidInputException near = assertThrows(InvalidInputException.class,
                () -> Families.create(GENERIC, "algebraic", Map.of("root", "0", "x0", "1"), st));
        assertTrue(near.getMessage().contains("too small"), near.getMessage());
        assertThrows(InvalidInputException.class,
                () -> Families.create(GENERIC, "algebraic", Map.of("root", "0", "c", "1"), st));
    }

    /**
     * The command line: {@code eval --family algebraic --background root0} for PIII(0, 0, 1, -1) (background
     * c = 1, and with alpha = beta = 0 the series terminates: w = 1 exactly), and a value background for
     * PIII(1, -1/2, 1, -1), compared with the library at the same point (same start data, so 1e-14).
     */
    @Test
    void commandLineEvaluatesTheAlgebraicFamily() {
        String[] exact = {"eval", "--alpha", "0", "--beta", "0", "--gamma", "1", "--delta", "-1", "--family",
            "algebraic", "--background", "root0", "--at", "3"};
        CsvRows f = rows(exact);
        assertEquals(1, f.number(0, "w_re"), 1e-13);
        assertEquals(0, f.number(0, "dw_re"), 1e-13);
        String[] gen = {"eval", "--alpha", "1", "--beta", "-1/2", "--gamma", "1", "--delta", "-1", "--family",
            "algebraic", "--background", "-1", "--at", "20"};
        CsvRows g = rows(gen);
        Painleve3 eq = Painleve3.of(1, -0.5, 1, -1);
        Painleve3Value ref = Families.create(eq, "algebraic", Map.of("c", "-1"), SolverSettings.defaults())
                .evaluate(SurfacePoint.of(new Complex(20), 0));
        assertEquals(ref.w().getReal(), g.number(0, "w_re"), 1e-14);
        assertEquals(-1 - 0.5 / 4 / 20, g.number(0, "w_re"), 1e-3, "w ~ c + a_1/x");
    }

    private static CsvRows rows(String[] args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int status = Main.execute(args, new PrintWriter(out, true), new PrintWriter(err, true));
        assertEquals(0, status, err.toString());
        return CsvRows.of(out.toString());
    }
}
