package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.match.ZeroBehaviourFit;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.LogSeriesAtZero;
import org.tertius.connection.zero.PowerSeriesAtZero;
import org.tertius.connection.zero.StripSeriesAtZero;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.connection.zero.ZeroExpansion;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/**
 * The expansions at 0 on the strip, on its edges and at the resonance, and the behaviour at 0 read off computed
 * solutions. References: the expansions are derived here (connection/README.md); they are checked against the core
 * engine started from them and evaluated elsewhere (other radii, rays and sheets), and the fits against the data
 * the solutions were built from.
 */
class ZeroBehaviourTest {
    private static final ComplexArithmetic AR = ComplexArithmetic.INSTANCE;
    private static final Painleve3 EQ = Painleve3.of(new Complex(0.7, 0.2), new Complex(-0.4, 0.1), Complex.ONE,
            new Complex(-1));

    private static List<Complex> params(Painleve3 eq) {
        return List.of(eq.alpha(), eq.beta(), eq.gamma(), eq.delta());
    }

    /** Inside the strip the row sums equal the total-degree sums of PowerSeriesAtZero (both derived here). */
    @Test
    void stripSeriesAgreesWithPowerSeriesInsideTheStrip() {
        qt().withFixedSeed(11).withExamples(6).withShrinkCycles(0)
                .forAll(doubles().between(-0.9, 0.9), doubles().between(-0.8, 0.8), doubles().between(-3, 3))
                .checkAssert((re, im, arg) -> {
                    Complex sigma = new Complex(re, im);
                    Complex b = new Complex(0.9, -0.3);
                    Complex tau = new Complex(Math.log(1e-3), arg);
                    LocalValue<Complex> a = PowerSeriesAtZero.create(AR, params(EQ), sigma, b, 40).at(tau.exp());
                    LocalValue<Complex> s = ZeroExpansion.power(AR, params(EQ), sigma, b, 16).at(tau);
                    assertEquals(0, a.w().subtract(s.w()).norm(), 10 * (a.errW() + s.errW()), "w");
                    assertEquals(0, a.dw().subtract(s.dw()).norm(), 10 * (a.errDw() + s.errDw()), "w'");
                });
    }

    /**
     * The rows are polynomials of degree 2a + 2 in Y (2a + 1 in Y^2 for alpha = beta = 0): the column after the band,
     * computed as a check, vanishes within its rounding bound (observed property, random complex parameters).
     */
    @Test
    void rowsEndAtTheBand() {
        qt().withFixedSeed(12).withExamples(8).withShrinkCycles(0)
                .forAll(doubles().between(-0.9, 1.0), doubles().between(-2, 2), doubles().between(-2, 2))
                .checkAssert((re, im, p) -> {
                    boolean even = p > 0;
                    Painleve3 eq = even ? Painleve3.of(Complex.ZERO, Complex.ZERO, new Complex(1.2, p), new Complex(-0.8, 0.3))
                            : Painleve3.of(new Complex(p, 0.4), new Complex(-0.3, p), new Complex(1.2, 0.1), new Complex(-0.8, p));
                    StripSeriesAtZero<Complex> s = StripSeriesAtZero.create(AR, params(eq), new Complex(re, im + 0.01),
                            new Complex(1.1, 0.2), 10);
                    for (int a = 0; a <= 10; a++) {
                        int after = s.band(a) + 1;
                        assertTrue(s.coefficient(a, after).norm() <= 4 * s.coefficientRoundingBound(a, after) + 1e-300,
                                "row " + a + ": " + s.coefficient(a, after) + " vs bound "
                                        + s.coefficientRoundingBound(a, after));
                    }
                });
    }

    /**
     * On the edge Re sigma = 1 both descriptions (sigma, B) and (2 - sigma, B') with B' = (beta^2 + delta k^2)/(4 B k^4)
     * give the same function (derived here), on every sheet; the same for Re sigma = -1 through 1/w.
     */
    @Test
    void edgeDescriptionsAgree() {
        for (Complex sigma : new Complex[] {new Complex(1, 0.7), new Complex(1, -0.4), new Complex(-1, 0.5)}) {
            Complex b = new Complex(0.8, 0.3);
            Complex[] other = ZeroExpansion.edgeAlternate(EQ.alpha(), EQ.beta(), EQ.gamma(), EQ.delta(), sigma, b);
            ZeroExpansion<Complex> e1 = ZeroExpansion.power(AR, params(EQ), sigma, b, 16);
            ZeroExpansion<Complex> e2 = ZeroExpansion.power(AR, params(EQ), other[0], other[1], 16);
            for (double arg : new double[] {0.3, 2.5, 0.3 + 2 * Math.PI, -4}) {
                Complex tau = new Complex(Math.log(1e-4), arg);
                LocalValue<Complex> v1 = e1.at(tau);
                LocalValue<Complex> v2 = e2.at(tau);
                assertEquals(0, v1.w().subtract(v2.w()).norm(), 10 * (v1.errW() + v2.errW()), sigma + " at " + tau);
                assertEquals(0, v1.dw().subtract(v2.dw()).norm(), 10 * (v1.errDw() + v2.errDw()), sigma + " at " + tau);
            }
        }
    }

    /**
     * The engine started from the edge expansion (zeros accumulate) and from the logarithmic series agrees with the
     * expansions at other radii, rays and sheets within the summed error estimates.
     */
    @Test
    void edgeAndLogarithmicExpansionsAgreeWithEngine() {
        List<ZeroExpansion<Complex>> expansions = List.of(
                ZeroExpansion.power(AR, params(EQ), new Complex(1, 0.7), new Complex(0.8, 0.3), 16),
                ZeroExpansion.logarithmic(AR, params(EQ), 1, new Complex(0.3, -0.8), 0, 20),
                ZeroExpansion.logarithmic(AR, params(Painleve3.of(0.7, 0, 1, -1)), 1, new Complex(0.3, -0.8), -1, 20));
        List<Painleve3> equations = List.of(EQ, EQ, Painleve3.of(0.7, 0, 1, -1));
        for (int i = 0; i < expansions.size(); i++) {
            LocalValue<Complex> start = expansions.get(i).startData(new Complex(Math.log(0.02), 0.4), 1e-13);
            Painleve3Solution s = Painleve3Solution.builder(equations.get(i)).start(start.z(), start.w(), start.dw())
                    .build();
            for (Complex tau : new Complex[] {new Complex(Math.log(1e-3), 0.4), new Complex(Math.log(1e-6), 2.4),
                new Complex(Math.log(1e-5), -2.6)}) {
                Painleve3Value v = s.evaluate(SurfacePoint.fromLog(tau.getReal(), tau.getImaginary()));
                LocalValue<Complex> e = expansions.get(i).at(tau);
                assertEquals(0, v.w().subtract(e.w()).norm(), e.errW() + v.errW(), "case " + i + " w at " + tau);
                assertEquals(0, v.dw().subtract(e.dw()).norm(), e.errDw() + v.errDw(), "case " + i + " w' at " + tau);
            }
        }
    }

    /** The logarithmic series is consistent: the orders' lowest coefficients agree by themselves (derived here). */
    @Test
    void logarithmicSeriesIsConsistent() {
        for (Painleve3 eq : List.of(EQ, Painleve3.of(0.7, 0, 1, -1), Painleve3.of(0, 0, 1, -1),
                Painleve3.of(Complex.ZERO, new Complex(0.5, 0.5), new Complex(1, 0.3), new Complex(-1, 0.2)))) {
            int branch = eq.beta().norm() == 0 ? 1 : 0;
            LogSeriesAtZero<Complex> s = LogSeriesAtZero.create(AR, params(eq), new Complex(0.2, 0.1), branch, 6);
            assertTrue(s.consistencyResidual() < 1e-13, eq + ": " + s.consistencyResidual());
        }
    }

    /**
     * The behaviour at 0 read off solutions built from known data, on three sheets and two rays each: the kind, and
     * sigma and the second parameter within the reported errors (which must be below 1e-8). The edge data come back
     * in the description with Im sigma &gt; 0.
     */
    @Test
    void fitRecoversTheDataOnEverySheet() {
        List<ZeroBehaviour> cases = List.of(
                ZeroBehaviour.power(new Complex(0.6, 0.3), new Complex(1.1, -0.2)),
                ZeroBehaviour.power(new Complex(-0.3, -0.5), new Complex(0.4, 0.9)),
                ZeroBehaviour.power(new Complex(1, 0.7), new Complex(0.8, 0.3)),
                ZeroBehaviour.power(new Complex(-1, 0.5), new Complex(0.8, 0.3)),
                ZeroBehaviour.logarithmic(1, new Complex(0.3, -0.8), 0),
                ZeroBehaviour.logarithmic(-1, new Complex(-0.5, 0.2), 0));
        List<ZeroBehaviour.Kind> kinds = List.of(ZeroBehaviour.Kind.POWER, ZeroBehaviour.Kind.POWER,
                ZeroBehaviour.Kind.ZEROS_ACCUMULATE, ZeroBehaviour.Kind.POLES_ACCUMULATE,
                ZeroBehaviour.Kind.LOGARITHMIC, ZeroBehaviour.Kind.LOGARITHMIC);
        for (int i = 0; i < cases.size(); i++) {
            ZeroBehaviour truth = cases.get(i);
            Painleve3Solution s = truth.solution(EQ, 0.5, 1e-13, SolverSettings.defaults());
            for (int sheet : new int[] {0, 1, -1}) {
                ZeroBehaviour f = ZeroBehaviourFit.analyse(s, sheet == 0 ? 0.5 : 2.0, sheet);
                assertEquals(kinds.get(i), f.kind(), truth + " on sheet " + sheet + ": " + f);
                assertTrue(f.sigmaError() < 1e-8 && f.secondParameterError() < 1e-8, f.toString());
                assertEquals(0, f.sigma().subtract(truth.sigma()).norm(), 3 * f.sigmaError() + 1e-15, f.toString());
                assertEquals(0, f.secondParameter().subtract(truth.secondParameter()).norm(),
                        3 * f.secondParameterError() + 1e-15, f.toString());
            }
        }
    }

    /**
     * Near the resonance (sigma = 1 - k, k small, B ~ 1/k^2 so that the solution stays O(1)) the data are either
     * recovered within their errors or the answer is undecided, never a wrong kind.
     */
    @Test
    void nearResonanceIsRightOrUndecided() {
        for (double k : new double[] {1e-3, 1e-5, 1e-7}) {
            ZeroBehaviour truth = ZeroBehaviour.power(new Complex(1 - k), new Complex(-0.2 / (k * k)));
            ZeroBehaviour f = ZeroBehaviourFit.analyse(truth.solution(EQ, 0.5, 1e-10, SolverSettings.defaults()), 0.5, 0);
            if (f.kind() != ZeroBehaviour.Kind.UNDECIDED) {
                assertEquals(ZeroBehaviour.Kind.POWER, f.kind(), f.toString());
                assertEquals(0, f.sigma().subtract(truth.sigma()).norm(), 3 * f.sigmaError(), f.toString());
                assertEquals(0, f.secondParameter().subtract(truth.secondParameter()).norm(),
                        3 * f.secondParameterError(), f.toString());
            }
        }
    }

    /** Bad input names what is wrong. */
    @Test
    void badInputIsRefusedWithTheReason() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> ZeroBehaviour.power(new Complex(1), new Complex(0.5)));
        assertTrue(e.getMessage().contains("resonance set") && e.getMessage().contains("t0"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> ZeroBehaviour.power(new Complex(-1), new Complex(0.5)));
        assertEquals("sigma", e.argument());
        e = assertThrows(InvalidInputException.class, () -> ZeroBehaviour.power(new Complex(1.2, 0.3), Complex.ONE));
        assertTrue(e.getMessage().contains("|Re sigma| <= 1"), e.getMessage());
        e = assertThrows(InvalidInputException.class, () -> ZeroBehaviour.power(new Complex(0.2), Complex.ZERO));
        assertEquals("B", e.argument());
        e = assertThrows(InvalidInputException.class,
                () -> ZeroExpansion.logarithmic(AR, params(Painleve3.of(0.7, 0, 1, -1)), 1, Complex.ZERO, 0, 10));
        assertEquals("branch", e.argument());
        e = assertThrows(InvalidInputException.class,
                () -> ZeroExpansion.logarithmic(AR, params(Painleve3.of(0.7, 0, 1, 0)), 1, Complex.ZERO, 1, 10));
        assertTrue(e.getMessage().contains("beta = delta = 0"), e.getMessage());
    }
}
