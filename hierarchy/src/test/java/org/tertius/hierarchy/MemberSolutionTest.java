package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.face.InvariantCheck;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.SolverSettings;

/** Member solutions integrated by the core engine: first integrals along paths, and the start at x = 0. */
class MemberSolutionTest {

    /** A member-2 solution with the focusing symmetry (a_k anti-Hermitian: t_2, s, x0 real, m imaginary). */
    static MemberSolution focusingMember2() {
        MemberParameters p = MemberParameters.builder(2).times(new Complex(0.5)).s(new Complex(1.0))
                .m(new Complex(0, 0.2)).build();
        Complex b2 = new Complex(0.3, 0.2);
        Complex b1 = new Complex(0.1, -0.4);
        Complex b0 = new Complex(0.5, 0.1);
        Complex d2 = new Complex(0, Math.sqrt(1 - b2.norm() * b2.norm()));
        List<Complex> partial = List.of(d2, b2, b2.conjugate().negate(), Complex.ZERO, b1, b1.conjugate().negate(),
                Complex.ZERO, b0, b0.conjugate().negate());
        Complex x0 = new Complex(0.3);
        List<Complex> state = HierarchyMember.of(2).completeDiagonal(p, x0, partial);
        return MemberSolution.builder(p).start(x0, state).build();
    }

    @Test
    void firstIntegralsOfMember2StayWithinTheErrorEstimateAlongPathsPastPoles() {
        MemberSolution sol = focusingMember2();
        double maxQ = 0;
        for (int j = 0; j <= 40; j++) {
            // a line in the complex x-plane; poles of q lie off the real axis for this symmetric solution
            MemberValue v = sol.evaluate(new Complex(-3 + 0.15 * j, 1.2 + 0.5 * Math.sin(j)));
            maxQ = Math.max(maxQ, v.q().norm());
            assertTrue(v.integralsWithinEstimate(), v.warning());
        }
        for (InvariantCheck c : sol.integralsAlongPaths()) {
            assertTrue(c.withinEstimate(), c.toString());
        }
        // the paths pass near poles of q (|q| large at some sample point), where the error estimates grow
        assertTrue(maxQ > 5, "max |q| on the samples " + maxQ);
    }

    @Test
    void firstIntegralsOfMember3StayWithinTheErrorEstimate() {
        MemberParameters p = MemberParameters.builder(3).times(new Complex(0.2, 0.1), new Complex(0.4))
                .s(new Complex(0.8, -0.1)).m(new Complex(0.3)).build();
        List<Complex> partial = new ArrayList<>();
        double[] seeds = {0.3, -0.2, 0.5, 0.1, 0.4, -0.3, 0.2, 0.6, -0.1, 0.35, 0.25, -0.45};
        for (int i = 0; i < 12; i++) {
            partial.add(new Complex(seeds[i], 0.5 * seeds[11 - i]));
        }
        // a(-2)11 from det a_-2 = s^2
        Complex s = p.s();
        partial.set(0, s.multiply(s).negate().subtract(partial.get(1).multiply(partial.get(2))).sqrt());
        Complex x0 = new Complex(-0.2, 0.1);
        MemberSolution sol = MemberSolution.builder(p).start(x0, HierarchyMember.of(3).completeDiagonal(p, x0, partial))
                .build();
        for (Complex x : new Complex[] {new Complex(1.5, 0.5), new Complex(-2, -1), new Complex(0.5, 2.5)}) {
            MemberValue v = sol.evaluate(x);
            assertTrue(v.integralsWithinEstimate(), v.warning());
        }
        for (InvariantCheck c : sol.integralsAlongPaths()) {
            assertTrue(c.withinEstimate(), c.toString());
        }
    }

    @Test
    void integralMonitorFlagsAStateMovedOffItsIntegralsByMoreThanItsErrors() {
        MemberSolution sol = focusingMember2();
        MemberValue v = sol.evaluate(new Complex(0.8));
        IntegralMonitor monitor = new IntegralMonitor(HierarchyMember.of(2).equations(), sol.parameters().s(),
                sol.traceIntegral());
        List<Complex> values = new ArrayList<>(v.state());
        values.set(1, values.get(1).add(1e-6));
        values.addAll(sol.parameters().ringValues(v.x()));
        double[] err = new double[v.state().size()];
        Arrays.fill(err, 1e-12);
        assertFalse(monitor.check(values, err).stream().allMatch(InvariantCheck::withinEstimate));
    }

    private static final MemberParameters MEMBER1 = MemberParameters.builder(1).s(new Complex(1.0))
            .m(new Complex(0.3, 0.1)).build();
    private static final Complex A11 = new Complex(0.4, 0.2);
    private static final Complex A12 = new Complex(0.7, -0.1);
    /** a(-2)21 from det a_-2 = s^2 = 1. */
    private static final Complex A21 = Complex.ONE.add(A11.multiply(A11)).negate().divide(A12);

    @Test
    void member1StartedAtTheOriginIsSingleValuedAroundIt() {
        // analytic at x = 0: the value after one turn around x = 0 (sheet 1) equals the value on sheet 0
        MemberParameters p = MEMBER1;
        Complex a11 = A11;
        MemberSolution sol = MemberSolution.builder(p).startAtOrigin(A11, A12, A21).build();
        assertTrue(sol.traceIntegral().subtract(p.m().multiply(a11).multiply(2)).norm() < 1e-12,
                "trace form 2 m a11 at x = 0, got " + sol.traceIntegral());
        for (Complex x : new Complex[] {new Complex(0.5, 0.3), new Complex(-0.4, 0.6)}) {
            MemberValue v0 = sol.evaluate(x, 0);
            MemberValue v1 = sol.evaluate(x, 1);
            for (int i = 0; i < 6; i++) {
                double d = v0.state().get(i).subtract(v1.state().get(i)).norm();
                // the engine's error estimates are first-order estimates; allowed slack as for the integrals
                assertTrue(d <= InvariantCheck.SAFETY * (v0.error(i) + v1.error(i)), "component " + i
                        + " at " + x + ": " + d + " > " + (v0.error(i) + v1.error(i)));
            }
            assertTrue(v0.integralsWithinEstimate() && v1.integralsWithinEstimate(), v0.warning() + v1.warning());
        }
    }

    @Test
    void member1StartedAwayFromTheAnalyticFamilyIsMultivaluedAroundTheOrigin() {
        // the contrast to the test above: generic data at x0 pick up monodromy x^{+-2m} around x = 0
        List<Complex> state = List.of(A11, A12, A21, MEMBER1.m(), new Complex(0.2), new Complex(-0.3, 0.1));
        MemberSolution sol = MemberSolution.builder(MEMBER1).start(new Complex(0.5), state).build();
        Complex x = new Complex(0.5, 0.3);
        MemberValue v0 = sol.evaluate(x, 0);
        MemberValue v1 = sol.evaluate(SurfacePoint.of(x, 1));
        assertTrue(v0.q().subtract(v1.q()).norm() > 1e-3, "q on sheets 0 and 1: " + v0.q() + ", " + v1.q());
    }

    @Test
    void topTimeFlowCarriesAStateThatKeepsTheConstraintsAtTheNewTime() {
        MemberSolution sol = focusingMember2().withTopTime(new Complex(0.65));
        MemberValue v = sol.evaluate(new Complex(0.9));
        assertTrue(v.integralsWithinEstimate(), v.warning());
        // the focusing symmetry r = -conj(q) is kept by both flows
        assertTrue(v.r().add(v.q().conjugate()).norm() <= InvariantCheck.SAFETY * (v.errorQ() + v.errorR()),
                v.q() + " " + v.r());
    }

    @Test
    void tighterSettingsReproduceMember2Values() {
        MemberSolution a = focusingMember2();
        MemberParameters p = a.parameters();
        MemberSolution b = MemberSolution.builder(p).settings(SolverSettings.builder().tolerance(1e-15).build())
                .start(a.startPoint(), a.startState()).build();
        MemberValue va = a.evaluate(new Complex(2.0, 0.5));
        MemberValue vb = b.evaluate(new Complex(2.0, 0.5));
        // the two runs differ by at most their combined error estimates (with the slack of the estimates)
        assertTrue(va.q().subtract(vb.q()).norm() <= InvariantCheck.SAFETY * (va.errorQ() + vb.errorQ()),
                va.q() + " vs " + vb.q());
    }
}
