package org.tertius.hierarchy.monodromy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.MemberValue;

/** Bad input gives one InvalidInputException naming what is violated, never a wrong number. */
class MonodromyBadInputTest {
    private static final ComplexArithmetic AR = ComplexArithmetic.INSTANCE;
    private static final MonodromyMap<Complex> MAP = MonodromyMap.doublePrecision();

    private static void assertRejected(String argument, String words, Executable e) {
        InvalidInputException ex = assertThrows(InvalidInputException.class, e);
        assertEquals(argument, ex.argument(), ex.getMessage());
        assertTrue(ex.getMessage().contains(words), ex.getMessage());
    }

    private static LaxMatrix<Complex> member1(List<Complex> state, Complex x, Complex s) {
        return LaxMatrix.of(AR, 1, x, List.of(), s, state.get(3), state, new double[6], 0);
    }

    @Test
    void aPoleOfTheSolutionIsRejected() {
        MemberSolution sol = Samples.member1();
        // Newton on 1/q towards the pole near 1 - i (q ~ c / (x - p)): the last iterate is at the pole
        Complex x = new Complex(1.0, -1.0);
        for (int i = 0; i < 30; i++) {
            MemberValue v;
            try {
                v = sol.evaluate(x);
            } catch (UnreachableTargetException e) {
                break;
            }
            Complex step = v.q().divide(v.dq());
            x = x.add(step);
            if (step.norm() < 1e-15) {
                break;
            }
        }
        Complex pole = x;
        assertRejected("x", "pole", () -> MAP.compute(sol, SurfacePoint.of(pole, 0)));
    }

    @Test
    void theEquationMustHaveItsTwoIrregularPoints() {
        List<Complex> state = Samples.member1State();
        assertRejected("x", "fixed singular point", () -> member1(state, Complex.ZERO, Complex.ONE));
        assertRejected("s", "D7", () -> member1(state, new Complex(0.5), Complex.ZERO));
    }

    @Test
    void statesViolatingTheirConstraintsAreRejected() {
        List<Complex> state = new ArrayList<>(Samples.member1State());
        state.set(0, state.get(0).add(0.01));
        assertRejected("state", "det a_-2 = s^2", () -> member1(state, new Complex(0.5), Complex.ONE));
        // member 2 with a wrong diagonal entry a(0)11 (it must equal -i x)
        List<Complex> good = Samples.member2().startState();
        List<Complex> bad = new ArrayList<>(good);
        bad.set(6, bad.get(6).add(0.05));
        LaxMatrix<Complex> lax = LaxMatrix.of(AR, 2, new Complex(0.3), List.of(new Complex(0.5)), Complex.ONE,
                new Complex(0, 0.2), bad, new double[9], 0);
        assertRejected("state", "diagonal", () -> MAP.compute(lax));
    }

    @Test
    void aZeroOfThePainleveSolutionIsRejectedByTheMapToMember1() {
        Painleve3 eq = Painleve3.of(new Complex(0.7), new Complex(-0.4), Complex.ONE, new Complex(-1));
        assertRejected("w", "w != 0", () -> LaxMatrix.ofPainleve3(eq, new Painleve3Value(SurfacePoint.of(1, 0, 0),
                Complex.ZERO, Complex.ONE, 0, 0), new Complex(0.25)));
    }

    @Test
    void dataViolatingTheirConstraintsAreRejected() {
        MonodromyData<Complex> d = MAP.compute(member1(Samples.member1State(), new Complex(0.5), Complex.ONE));
        List<Complex> inf = List.of(d.stokesAtInfinity(1).value(), d.stokesAtInfinity(2).value());
        List<Complex> zero = List.of(d.stokesAtZero(1).value(), d.stokesAtZero(2).value());
        Complex m = d.exponentAtInfinity().value();
        Complex m0 = d.exponentAtZero().value();
        Matrix<Complex> e = d.connectionMatrix();
        // the data themselves pass
        MonodromyCondition.allData(AR, inf, zero, e, m, m0, 1e-10);
        Matrix<Complex> scaled = new Matrix<>(e.m11().multiply(1.01), e.m12(), e.m21(), e.m22());
        assertRejected("connection matrix", "det E = 1", () -> MonodromyCondition.allData(AR, inf, zero, scaled, m, m0,
                1e-10));
        List<Complex> wrong = List.of(inf.get(0).add(0.01), inf.get(1));
        assertRejected("monodromy data", "cyclic relation", () -> MonodromyCondition.allData(AR, wrong, zero, e, m, m0,
                1e-10));
        assertRejected("Stokes multipliers at infinity", "2n", () -> MonodromyCondition.allData(AR, List.of(inf.get(0)),
                zero, e, m, m0, 1e-10));
    }

    @Test
    void inverseProblemsNeedConditionsAndSymmetricConstants() {
        assertRejected("conditions", "at least one", () -> InverseMonodromy.builder(MAP, 1).point(new Complex(0.5), 0)
                .constants(Complex.ONE, Complex.ZERO, Complex.ZERO).build());
        assertRejected("x, times and s", "reality", () -> InverseMonodromy.builder(MAP, 1).point(new Complex(0.5), 0)
                .constants(new Complex(1, 0.5), Complex.ZERO, Complex.ZERO).reality(true)
                .condition(MonodromyCondition.trivialStokesAtZero()).build());
        assertRejected("member", "[1, 8]", () -> InverseMonodromy.builder(MAP, 9));
        assertRejected("k", "1 .. 2", () -> MAP.compute(member1(Samples.member1State(), new Complex(0.5), Complex.ONE))
                .stokesAtInfinity(3));
    }

    @Test
    void diagonalCompletionAgreesWithTheGeneratedConstraints() {
        // StateChart completes a(k)11 from the exponents at infinity (FormalSolution); HierarchyMember from det A
        List<Complex> good = Samples.member3().startState();
        List<Complex> times = List.of(new Complex(0.2, 0.1), new Complex(0.4));
        Complex x = new Complex(-0.2, 0.1);
        LaxMatrix<Complex> lax = LaxMatrix.of(AR, 3, x, times, new Complex(0.8, -0.1), new Complex(0.3), good,
                new double[12], 0);
        StateChart<Complex> chart = new StateChart<>(AR, 3, x, times, new Complex(0.8, -0.1), new Complex(0.3),
                lax.traceIntegral(), false, true);
        List<Complex> again = chart.state(chart.coordinates(good));
        List<Complex> reference = HierarchyMember.of(3).completeDiagonal(Samples.member3().parameters(), x, again);
        for (int i = 0; i < good.size(); i++) {
            assertTrue(again.get(i).subtract(good.get(i)).norm() < 1e-12, "entry " + i);
            assertTrue(again.get(i).subtract(reference.get(i)).norm() < 1e-12, "entry " + i);
        }
    }
}
