package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.function.Executable;
import org.tertius.core.InvalidInputException;
import org.tertius.core.piii.Painleve3;

/** Bad input is rejected with an {@link InvalidInputException} that names the argument. */
class BadInputTest {

    private static void assertRejected(String argument, Executable call) {
        InvalidInputException e = assertThrows(InvalidInputException.class, call);
        assertEquals(argument, e.argument(), e.getMessage());
    }

    @Test
    void memberOutsideTheGeneratedRangeIsRejected() {
        assertRejected("member", () -> HierarchyMember.of(0));
        assertRejected("member", () -> HierarchyMember.of(HierarchyMember.MAX_ORDER + 1));
    }

    @Test
    void vanishingTopTimeIsRejectedBecauseTheMemberDegenerates() {
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> MemberParameters.builder(3)
                .times(new Complex(1), Complex.ZERO).s(Complex.ONE).build());
        assertEquals("t_3", e.argument());
        assertTrue(e.getMessage().contains("degenerates"), e.getMessage());
    }

    @Test
    void wrongNumberOfTimesIsRejected() {
        assertRejected("times", () -> MemberParameters.builder(3).times(new Complex(1)).s(Complex.ONE).build());
        assertRejected("times", () -> MemberParameters.builder(1).times(new Complex(1)).s(Complex.ONE).build());
    }

    @Test
    void missingOrNonFiniteConstantsAreRejected() {
        assertRejected("s", () -> MemberParameters.builder(2).times(Complex.ONE).build());
        assertRejected("m", () -> MemberParameters.builder(2).times(Complex.ONE).s(Complex.ONE)
                .m(new Complex(Double.NaN)).build());
    }

    @Test
    void startStateViolatingTheDiagonalConstraintsIsRejected() {
        MemberSolution good = MemberSolutionTest.focusingMember2();
        List<Complex> bad = new ArrayList<>(good.startState());
        bad.set(6, bad.get(6).add(1e-3)); // a(0)11 is fixed by x0: a(0)11 = -i x0
        assertRejected("start state", () -> MemberSolution.builder(good.parameters()).start(good.startPoint(), bad)
                .build());
    }

    @Test
    void startStateWithDetA2DifferentFromSSquaredIsRejected() {
        MemberSolution good = MemberSolutionTest.focusingMember2();
        List<Complex> bad = new ArrayList<>(good.startState());
        bad.set(0, bad.get(0).multiply(1.01));
        assertRejected("s", () -> MemberSolution.builder(good.parameters()).start(good.startPoint(), bad).build());
    }

    @Test
    void startStateOfTheWrongSizeIsRejected() {
        MemberSolution good = MemberSolutionTest.focusingMember2();
        assertRejected("start state", () -> MemberSolution.builder(good.parameters())
                .start(good.startPoint(), good.startState().subList(0, 6)).build());
    }

    @Test
    void member1AtTheSingularPointNeedsTheOriginStart() {
        MemberParameters p = MemberParameters.builder(1).s(Complex.ONE).m(new Complex(0.2)).build();
        List<Complex> state = List.of(Complex.ZERO, Complex.ONE, Complex.ONE.negate(), p.m(), Complex.ONE, Complex.ONE);
        assertRejected("x0", () -> MemberSolution.builder(p).start(Complex.ZERO, state).build());
    }

    @Test
    void originStartIsRejectedForResonantMAndWrongDeterminantAndNonZeroLowerTimes() {
        MemberParameters resonant = MemberParameters.builder(1).s(Complex.ONE).m(new Complex(0.5)).build();
        assertRejected("m", () -> MemberSolution.builder(resonant).startAtOrigin(Complex.ZERO, Complex.ONE,
                Complex.ONE.negate()).build());
        MemberParameters p = MemberParameters.builder(1).s(Complex.ONE).m(new Complex(0.2)).build();
        assertRejected("s", () -> MemberSolution.builder(p).startAtOrigin(Complex.ZERO, Complex.ONE,
                new Complex(-2)).build());
        // members n >= 2 start at x = t_n = 0 only with the lower times zero
        MemberParameters p3 = MemberParameters.builder(3).times(Complex.ONE, Complex.ONE).s(Complex.ONE).build();
        assertRejected("times", () -> MemberSolution.builder(p3).startAtOrigin(Complex.ZERO, Complex.ONE,
                Complex.ONE.negate()).build());
    }

    @Test
    void sheetsOtherThanZeroAreRejectedForSingleValuedMembers() {
        MemberSolution sol = MemberSolutionTest.focusingMember2();
        assertRejected("sheet", () -> sol.evaluate(Complex.ONE, 1));
    }

    @Test
    void mapToPainleve3NeedsNonZeroSAndAD6Equation() {
        assertRejected("s", () -> Member1Map.canonical(Complex.ZERO));
        assertRejected("delta", () -> Member1Map.forEquation(Painleve3.of(1, 1, 1, 0), Complex.ONE));
        Member1Map map = Member1Map.canonical(Complex.ONE);
        assertRejected("equation", () -> map.parameters(Painleve3.of(1, 1, 2, -1)));
    }

    @Test
    void timeFlowIsRejectedForMember1() {
        MemberParameters p = MemberParameters.builder(1).s(Complex.ONE).m(new Complex(0.2)).build();
        assertRejected("member", () -> HierarchyMember.of(1).timeFlow(p, Complex.ONE));
    }
}
