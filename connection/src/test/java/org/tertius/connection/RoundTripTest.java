package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.closed.BesselFamily;
import org.tertius.connection.infinity.AlgebraicExpansion;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.match.InfinityBehaviourFit;
import org.tertius.connection.match.ZeroBehaviourFit;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;

/**
 * Round trips between the data at 0 and at infinity through the numerical connection (fits of solutions built from
 * the other end's data): what comes back agrees with what went out within the summed error estimates. A check of
 * the start data, the fits and their estimates together (no outside reference).
 */
class RoundTripTest {
    private static final SolverSettings SETTINGS = SolverSettings.defaults();

    private static void sameZero(ZeroBehaviour a, ZeroBehaviour b) {
        assertEquals(a.kind(), b.kind(), a + " vs " + b);
        assertEquals(0, a.sigma().subtract(b.sigma()).norm(), 3 * (a.sigmaError() + b.sigmaError()) + 1e-14,
                a + " vs " + b);
        assertEquals(0, a.secondParameter().subtract(b.secondParameter()).norm(),
                3 * (a.secondParameterError() + b.secondParameterError()) + 1e-14, a + " vs " + b);
    }

    private static void sameInfinity(InfinityBehaviour a, InfinityBehaviour b) {
        assertEquals(a.kind(), b.kind(), a + " vs " + b);
        assertEquals(0, a.background().subtract(b.background()).norm(), 1e-15, a + " vs " + b);
        assertEquals(0, a.p().subtract(b.p()).norm(), 3 * (a.errP() + b.errP()) + 1e-14, a + " vs " + b);
        assertEquals(0, a.q().subtract(b.q()).norm(), 3 * (a.errQ() + b.errQ()) + 1e-14, a + " vs " + b);
    }

    /**
     * Generic complex D6 on an oscillating ray: data at infinity -> solution -> data at 0 -> solution -> data at
     * infinity -> solution -> data at 0 (so 0 -> infinity -> 0 is included).
     */
    @Test
    void genericD6ZeroInfinityZero() {
        Painleve3 eq = Painleve3.of(new Complex(0.7, 0.2), new Complex(-0.4, 0.1), new Complex(1.2, 0.3),
                new Complex(-0.8, 0.5));
        Complex c = AlgebraicExpansion.backgrounds(eq.gamma(), eq.delta()).get(1);
        double angle = InfinityBehaviour.oscillatingRays(eq, c).get(0);
        InfinityBehaviour start = InfinityBehaviour.of(eq, c, new Complex(0.15, 0.1), new Complex(-0.1, 0.2), angle, 0);
        ZeroBehaviour zero = ZeroBehaviourFit.analyse(start.solution(eq, 30, 1e-13, SETTINGS), angle, 0);
        assertTrue(zero.kind() != ZeroBehaviour.Kind.UNDECIDED && zero.sigmaError() < 1e-8, zero.toString());
        InfinityBehaviour inf = InfinityBehaviourFit.analyse(zero.solution(eq, angle, 1e-13, SETTINGS), angle, 0);
        sameInfinity(start, inf);
        assertTrue(inf.errP() < 1e-6 && inf.errQ() < 1e-6, inf.toString());
        ZeroBehaviour back = ZeroBehaviourFit.analyse(inf.solution(eq, 30, 1e-10, SETTINGS), angle, 0);
        sameZero(zero, back);
    }

    /** The real oscillating family of PIII(0, 0, -1, 1) on the positive axis: A, phi -> sigma, B -> A, phi. */
    @Test
    void oscillatingFamilyZeroInfinityZero() {
        Painleve3 eq = Painleve3.of(0, 0, -1, 1);
        Complex p = new Complex(0, 0.5).exp().multiply(0.5);
        InfinityBehaviour start = InfinityBehaviour.of(eq, Complex.ONE, p, p.conjugate(), 0, 0);
        ZeroBehaviour zero = ZeroBehaviourFit.analyse(start.solution(eq, 30, 1e-13, SETTINGS), 0, 0);
        assertEquals(0, zero.sigma().getImaginary(), 3 * zero.sigmaError(), "real solution: real sigma " + zero);
        InfinityBehaviour inf = InfinityBehaviourFit.analyse(zero.solution(eq, 0, 1e-13, SETTINGS), 0, 0, 15, 60);
        sameInfinity(start, inf);
        assertEquals(1, inf.amplitude().getReal(), 3 * inf.amplitudeError(), inf.toString());
        assertEquals(0.5, inf.phase().getReal(), 3 * inf.phaseError(), inf.toString());
        ZeroBehaviour back = ZeroBehaviourFit.analyse(inf.solution(eq, 30, 1e-10, SETTINGS), 0, 0);
        sameZero(zero, back);
    }

    /**
     * A Bessel member (exponentially small at infinity): closed-form data at 0 -> solution -> amplitude at infinity
     * near the anti-Stokes ray -> solution started where the amplitude is best resolved -> data at 0.
     */
    @Test
    void exponentiallySmallFamilyZeroInfinityZero() {
        BesselFamily f = BesselFamily.of(-1, 1, new Complex(-0.4, 0.2), new Complex(-1.3, 0.4));
        Painleve3 eq = f.equation();
        double angle = Math.PI / 2 - 0.08;
        ZeroBehaviour zero = ZeroBehaviour.power(f.sigma(), f.amplitudeAtZero());
        InfinityBehaviour inf = InfinityBehaviourFit.analyse(zero.solution(eq, angle, 1e-13, SETTINGS), angle, 0, 8, 25);
        assertEquals(InfinityBehaviour.Kind.EXPONENTIALLY_SMALL, inf.kind(), inf.toString());
        Complex q = f.amplitudesAtInfinity(angle)[1];
        assertEquals(0, inf.q().subtract(q).norm(), 3 * inf.errQ(), inf.toString());
        ZeroBehaviour back = ZeroBehaviourFit.analyse(inf.solution(eq, SETTINGS), angle, 0);
        assertEquals(0, back.sigma().subtract(zero.sigma()).norm(), 3 * back.sigmaError(), back.toString());
        assertEquals(0, back.secondParameter().subtract(zero.secondParameter()).norm(),
                3 * back.secondParameterError(), back.toString());
    }
}
