package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.step.SolverSettings;

/**
 * Members n >= 2 started at x = t_n = 0: the slice t_n = 0 is member 1, x = 0 and lines through it are regular
 * targets, and different routes to one point agree within their error estimates.
 */
class OriginSolutionTest {
    private static final Complex TWO_I = new Complex(0, 2);

    static OriginSolution profile() {
        return OriginSolution.create(2, new Complex(2), Complex.ZERO, Complex.ZERO, TWO_I, TWO_I,
                SolverSettings.defaults());
    }

    @Test
    void memberTwoReachesXZeroAndLinesThroughIt() {
        MemberParameters p = MemberParameters.builder(2).times(new Complex(0.7)).s(new Complex(2)).build();
        MemberSolution sol = MemberSolution.builder(p).startAtOrigin(Complex.ZERO, TWO_I, TWO_I).build();
        assertEquals(0, sol.startPoint().norm(), 0.0);
        // a line in the complex x-plane through x = 0 (the start point lies on it)
        for (int k = -10; k <= 10; k++) {
            Complex x = new Complex(0.15 * k, 0.05 * k);
            MemberValue v = sol.evaluate(x);
            assertTrue(v.integralsWithinEstimate(), "x = " + x + ": " + v.warning());
            assertTrue(Double.isFinite(v.q().norm()) && v.errorQ() < 1e-10, "x = " + x + ": " + v.q() + " +- "
                    + v.errorQ());
        }
        // the builder and OriginSolution give the same state at x = 0
        MemberValue a = sol.evaluate(Complex.ZERO);
        MemberValue b = profile().atTime(new Complex(0.7)).evaluate(Complex.ZERO);
        assertTrue(a.q().subtract(b.q()).norm() <= a.errorQ() + b.errorQ(), a.q() + " vs " + b.q());
    }

    @Test
    void sliceTZeroIsMemberOne() {
        // q(x, +-k) from the t_2-flow start and the x-flow; their mean tends to member 1's q(x) like k^2 and their
        // central difference to q_t = i (q_xx / 2 + |q|^2 q) of member 1 (NLS at T = 0), also like k^2
        OriginSolution o = profile();
        MemberSolution one = o.memberOne();
        for (double x : new double[] {0.6, 2.5}) {
            Complex q0 = one.evaluate(new Complex(x)).q();
            double h = 1e-3;
            Complex qxx = one.evaluate(new Complex(x + h)).q().add(one.evaluate(new Complex(x - h)).q())
                    .subtract(q0.multiply(2)).divide(h * h);
            Complex qt = Complex.I.multiply(qxx.multiply(0.5).add(q0.multiply(q0.norm() * q0.norm())));
            double[] meanGap = new double[2];
            double[] slopeGap = new double[2];
            double[] steps = {0.04, 0.02};
            for (int i = 0; i < 2; i++) {
                double k = steps[i];
                Complex plus = RealRow.of(o, new Complex(k), 0, x, 1e-15, null).potential(x).q();
                Complex minus = RealRow.of(o, new Complex(-k), 0, x, 1e-15, null).potential(x).q();
                meanGap[i] = plus.add(minus).multiply(0.5).subtract(q0).norm();
                slopeGap[i] = plus.subtract(minus).divide(2 * k).subtract(qt).norm();
            }
            double r1 = meanGap[0] / meanGap[1];
            double r2 = slopeGap[0] / slopeGap[1];
            assertTrue(r1 > 3.5 && r1 < 4.5, "x = " + x + ": mean gaps " + meanGap[0] + ", " + meanGap[1]);
            // q_xx by differences (error ~ 1e-7) limits the second ratio at the finer step
            assertTrue(r2 > 3 && r2 < 5, "x = " + x + ": slope gaps " + slopeGap[0] + ", " + slopeGap[1]);
            assertTrue(meanGap[1] < 1e-2 * (1 + q0.norm()), "x = " + x + ": mean gap " + meanGap[1]);
        }
        // and at t_2 = 0 the solution answers with member 1's values
        MemberValue v = o.evaluate(new Complex(1.0), Complex.ZERO);
        assertEquals(one.evaluate(new Complex(1.0)).q().getReal(), v.q().getReal(), 0.0);
        assertEquals(4.0, o.evaluate(Complex.ZERO, Complex.ZERO).q().getReal(), 1e-15);
    }

    @Test
    void threeRoutesToOnePointAgreeWithinTheirEstimates() {
        OriginSolution o = profile();
        double x = 2.0;
        Complex t = new Complex(0.3);
        // route 1: t_2-flow on x = 0 to t, then the x-flow (core engine path tree)
        PotentialValue one = o.atTime(t).potential(new Complex(x));
        // route 2: t_2-flow to 0.8, x-flow to x, then the t_2-flow at that x back to t (commuting flows)
        MemberSolution at08 = o.atTime(new Complex(0.8));
        MemberValue mid = at08.evaluate(new Complex(x));
        double[] err = new double[mid.state().size()];
        for (int i = 0; i < err.length; i++) {
            err[i] = mid.error(i);
        }
        MemberSolution moved = MemberSolution.started(o.member(), o.parameters(new Complex(0.8)),
                SolverSettings.defaults(), new Complex(x), mid.state(), err, null).withTopTime(t);
        MemberValue two = moved.evaluate(new Complex(x));
        // route 3: Taylor lines along the real axis
        PotentialValue three = RealRow.of(o, t, 0, x, 1e-14, null).potential(x);
        assertTrue(one.q().subtract(two.q()).norm() <= one.error() + two.errorQ(), one.q() + " vs " + two.q());
        assertTrue(one.q().subtract(three.q()).norm() <= one.error() + three.error(), one.q() + " vs " + three.q());
        // the estimates themselves stay small (the engine reports inherited errors with a factor 2, see its README)
        assertTrue(one.error() < 5e-11 && two.errorQ() < 1e-10, one.error() + ", " + two.errorQ());
        // route 4, from member 1 data: member 1 along x to x, then the small-time series in t_2
        NlsTimeSeries series = new NlsTimeSeries(o.memberOne().parameters());
        Complex small = new Complex(0.02);
        MemberValue m1 = o.memberOne().evaluate(new Complex(x));
        double[] e1 = new double[6];
        for (int i = 0; i < 6; i++) {
            e1[i] = m1.error(i);
        }
        PotentialValue four = series.at(new Complex(x), m1.state(), e1, small, 1.0);
        PotentialValue five = RealRow.of(o, small, 0, x, 1e-14, null).potential(x);
        assertTrue(four.q().subtract(five.q()).norm() <= four.error() + five.error(), four.q() + " +- "
                + four.error() + " vs " + five.q() + " +- " + five.error());
        assertTrue(four.error() < 1e-10, "small-time series error " + four.error());
    }

    @Test
    void memberThreeStartsAtTheOriginToo() {
        OriginSolution o = OriginSolution.create(3, Complex.ONE, new Complex(0.1), new Complex(0, 0.6),
                new Complex(0, 0.8), new Complex(0, 0.8), SolverSettings.defaults());
        MemberSolution sol = o.atTime(new Complex(0.25));
        for (double x : new double[] {-0.8, 0, 0.5, 1.2}) {
            MemberValue v = sol.evaluate(new Complex(x));
            assertTrue(v.integralsWithinEstimate(), "x = " + x + ": " + v.warning());
        }
        // small t_3: close to member 1 (the slice t_3 = 0)
        Complex q1 = o.memberOne().evaluate(new Complex(0.5)).q();
        Complex q3 = o.atTime(new Complex(1e-3)).evaluate(new Complex(0.5)).q();
        assertTrue(q1.subtract(q3).norm() < 1e-2, q1 + " vs " + q3);
    }

    @Test
    void badInputIsRefusedWithTheArgumentNamed() {
        OriginSolution o = profile();
        assertEquals("t_2", assertThrows(InvalidInputException.class, () -> o.atTime(Complex.ZERO)).argument());
        assertEquals("origin", assertThrows(InvalidInputException.class, () -> OriginSolution.create(2,
                new Complex(2), Complex.ZERO, Complex.ZERO, TWO_I, Complex.ONE, SolverSettings.defaults()))
                .argument());
        assertEquals("m", assertThrows(InvalidInputException.class, () -> OriginSolution.create(2, Complex.ONE,
                new Complex(-1.5), Complex.ZERO, Complex.ONE, Complex.ONE.negate(), SolverSettings.defaults()))
                .argument());
        assertEquals("member", assertThrows(InvalidInputException.class, () -> OriginSolution.create(1, Complex.ONE,
                Complex.ZERO, Complex.ZERO, Complex.ONE, Complex.ONE.negate(), SolverSettings.defaults())).argument());
        assertEquals("times", assertThrows(InvalidInputException.class, () -> PlaneGrid.of(o, new double[] {0},
                new Complex[] {new Complex(0.5, 0.1)})).argument());
        // member 2 at t_2 = 0 is still refused where it is singular (only the series start reaches it)
        assertEquals("t_2", assertThrows(InvalidInputException.class, () -> MemberParameters.builder(2)
                .times(Complex.ZERO).s(Complex.ONE).build()).argument());
        List<Complex> state = new ArrayList<>();
        assertThrows(InvalidInputException.class, () -> o.axisPotential(Complex.ZERO));
        assertTrue(state.isEmpty());
    }
}
