package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;

/**
 * Error bounds of a start state (MemberSolutionBuilder.startErrors) are carried into the error estimates of the
 * values: a start moved within its bounds gives values within the estimates. The member-1 solution is a scenario of
 * our own.
 */
class StartErrorsTest {
    private static final MemberParameters P = MemberParameters.builder(1).s(Complex.ONE).m(new Complex(0.3, 0.1))
            .build();
    private static final Complex X0 = new Complex(0.5);
    private static final Complex AT = new Complex(1.2, 0.7);

    private static List<Complex> state(double shift) {
        Complex a11 = new Complex(0.4, 0.2);
        Complex a12 = new Complex(0.7, -0.1);
        Complex a21 = Complex.ONE.add(a11.multiply(a11)).negate().divide(a12);
        return List.of(a11, a12, a21, P.m(), new Complex(0.2 + shift), new Complex(-0.3, 0.1 + shift));
    }

    @Test
    void startErrorsReachTheValuesAndBoundAMovedStart() {
        double bound = 1e-8;
        double[] errors = new double[6];
        errors[4] = bound;
        errors[5] = bound;
        MemberValue plain = MemberSolution.builder(P).start(X0, state(0)).build().evaluate(AT);
        MemberValue carried = MemberSolution.builder(P).start(X0, 0, state(0)).startErrors(errors).build().evaluate(AT);
        MemberValue moved = MemberSolution.builder(P).start(X0, state(0.7 * bound)).build().evaluate(AT);
        assertEquals(plain.q(), carried.q(), "the bounds do not move the values");
        assertTrue(carried.errorQ() > 100 * plain.errorQ(), carried.errorQ() + " vs " + plain.errorQ());
        double diff = moved.q().subtract(carried.q()).norm();
        assertTrue(diff > 10 * plain.errorQ(), "the move is visible: " + diff);
        assertTrue(diff <= carried.errorQ() + moved.errorQ(), diff + " > " + carried.errorQ());
    }

    @Test
    void aStartWithErrorsIsNotExactAndBadBoundsAreRefused() {
        double[] errors = new double[6];
        errors[0] = 1e-12;
        MemberSolution s = MemberSolution.builder(P).start(X0, 0, state(0)).startErrors(errors).build();
        assertThrows(InvalidInputException.class, s::highPrecisionForm);
        List<double[]> bad = new ArrayList<>(List.of(new double[5], new double[] {0, 0, 0, 0, 0, Double.NaN},
                new double[] {0, 0, -1, 0, 0, 0}));
        for (double[] b : bad) {
            assertThrows(InvalidInputException.class, () -> MemberSolution.builder(P).start(X0, 0, state(0))
                    .startErrors(b).build());
        }
    }
}
