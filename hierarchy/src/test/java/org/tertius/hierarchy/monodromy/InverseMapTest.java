package org.tertius.hierarchy.monodromy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.MemberValue;

/** The inverse monodromy map: round trips data -> state -> data, and the NLS profile selected by its data. */
class InverseMapTest {
    private static final MonodromyMap<Complex> MAP = MonodromyMap.doublePrecision();
    private static final ComplexArithmetic AR = ComplexArithmetic.INSTANCE;

    private static MonodromyCondition<Complex> all(MonodromyData<Complex> d) {
        List<Complex> inf = List.of(d.stokesAtInfinity(1).value(), d.stokesAtInfinity(2).value());
        List<Complex> zero = List.of(d.stokesAtZero(1).value(), d.stokesAtZero(2).value());
        return MonodromyCondition.allData(AR, inf, zero, d.connectionMatrix(), d.exponentAtInfinity().value(),
                d.exponentAtZero().value(), 1e-10);
    }

    /**
     * Round trip for a member-1 state: its data, then the state with those data, from a generated first guess (guess
     * null) or from the given one.
     */
    private static void roundTrip(List<Complex> state, Complex x, List<Complex> guess) {
        Complex s = Complex.ONE;
        Complex m = state.get(3);
        MonodromyData<Complex> d = MAP.compute(LaxMatrix.of(AR, 1, x, List.of(), s, m, state, new double[6], 0));
        InverseMonodromyBuilder<Complex> b = InverseMonodromy.builder(MAP, 1).point(x, 0)
                .constants(s, m, d.exponentAtZero().value()).condition(all(d));
        MonodromySolution<Complex> found = (guess == null ? b : b.firstGuess(guess)).build().solve();
        assertEquals(0, found.freeDirections(), "all data fix the state, gauge included");
        for (int i = 0; i < 6; i++) {
            double diff = found.state().get(i).subtract(state.get(i)).norm();
            assertTrue(diff <= found.stateError(i) + 1e-14, "entry " + i + ": " + diff + " > " + found.stateError(i));
            assertTrue(found.stateError(i) < 1e-7 * (1 + state.get(i).norm()), "estimate " + found.stateError(i));
        }
        assertTrue(found.data().deviationRatio(d) <= 1, "data of the result " + found.data());
    }

    @Test
    void roundTripOfAGenericMember1Solution() {
        roundTrip(Samples.member1State(), new Complex(0.5), null);
        // the state found starts the same solution
        Complex x = new Complex(0.5);
        MonodromyData<Complex> d = MAP.compute(Samples.member1(), SurfacePoint.of(x, 0));
        MonodromySolution<Complex> found = InverseMonodromy.builder(MAP, 1).point(x, 0)
                .constants(Complex.ONE, Samples.MEMBER1.m(), d.exponentAtZero().value()).condition(all(d)).build()
                .solve();
        MemberValue a = found.solution(SolverSettings.defaults()).evaluate(new Complex(1.2, 0.7));
        MemberValue b = Samples.member1().evaluate(new Complex(1.2, 0.7));
        assertTrue(a.q().subtract(b.q()).norm() <= 2 * (a.errorQ() + b.errorQ()) + 1e-9, a.q() + " vs " + b.q());
    }

    /**
     * Random generic member-1 states (QuickTheories, fixed seed): data -> state -> data to the estimate, the
     * iteration started from the state moved by about 5 per cent (a generated first guess need not lead to the same
     * preimage: the map from states to a subset of the data is many-to-one).
     */
    @Test
    @Tag("slow")
    void roundTripsOfRandomGenericMember1States() {
        qt().withFixedSeed(19).withExamples(4).withShrinkCycles(0).forAll(doubles().between(-0.8, 0.8),
                doubles().between(-0.8, 0.8), doubles().between(0.3, 1.0), doubles().between(-0.5, 0.5))
                .checkAssert((u, v, w, t) -> {
                    Complex m = new Complex(0.2 * u, 0.1 * v);
                    Complex a11 = new Complex(u, 0.5 * t);
                    Complex a12 = new Complex(w, v);
                    Complex a21 = Complex.ONE.add(a11.multiply(a11)).negate().divide(a12);
                    List<Complex> state = List.of(a11, a12, a21, m, new Complex(t, u), new Complex(v, w));
                    List<Complex> guess = new ArrayList<>();
                    for (Complex c : state) {
                        guess.add(c.multiply(new Complex(1.04, 0.03)));
                    }
                    roundTrip(state, new Complex(0.4 + w, t), guess);
                });
    }

    /** Without E11 E22 the conditions leave the gauge phase and one real parameter (see below). */
    @Test
    @Tag("slow")
    void trivialMonodromyAtZeroWithRealityLeavesAFamily() {
        MonodromySolution<Complex> family = InverseMonodromy.builder(MAP, 1).point(new Complex(0.5), 0)
                .constants(new Complex(2), Complex.ZERO, Complex.ZERO).reality(true)
                .condition(MonodromyCondition.trivialStokesAtZero()).build().solve();
        assertEquals(2, family.freeDirections(), "trivial monodromy at 0 with reality: gauge phase and one parameter");
        Estimate<Complex> p = family.data().connectionProduct();
        assertTrue(Math.abs(p.value().getImaginary()) <= 2 * p.error() && p.value().getReal() > 0
                && p.value().getReal() < 1, "E11 E22 = (2 + a)/4 in (0, 1): " + p.value());
    }

    /**
     * The NLS profile (member 1, s = 2, m = 0; Samples.nlsProfile) selected by its monodromy: trivial Stokes matrices
     * at 0 (with m0 = 0: trivial monodromy around lambda = 0) and the reality symmetry r = -conj(q) leave one real
     * parameter besides the gauge phase (the origin data a_-2(0) = [[i a, b], [-conj b, -i a]], a^2 + |b|^2 = 4, have
     * E11 E22 = (2 + a)/4, derived from Phi = exp(-a_-2 / lambda) at x = 0); E11 E22 = 1/2 selects the profile, whose
     * origin data (0, 2i, 2i) are reproduced up to the gauge phase: Psi(0) = |q(0)| = 4.
     */
    @Test
    void nlsProfileIsSelectedByItsMonodromy() {
        Complex x = new Complex(0.5);
        Complex two = new Complex(2);
        MonodromySolution<Complex> found = InverseMonodromy.builder(MAP, 1).point(x, 0)
                .constants(two, Complex.ZERO, Complex.ZERO).reality(true)
                .condition(MonodromyCondition.trivialStokesAtZero())
                .condition(MonodromyCondition.connectionProduct(new Complex(0.5))).build().solve();
        assertEquals(1, found.freeDirections(), "only the gauge phase is left");
        MemberValue profile = Samples.nlsProfile().evaluate(x);
        List<Complex> a = found.state();
        List<Complex> b = profile.state();
        // gauge-invariant comparison at x = 0.5: a(-2)11, a(-2)12 a(-2)21, a(-1)12 a(-2)21, a(-1)12 a(-1)21
        Complex[][] pairs = {{a.get(0), b.get(0)}, {a.get(1).multiply(a.get(2)), b.get(1).multiply(b.get(2))},
            {a.get(4).multiply(a.get(2)), b.get(4).multiply(b.get(2))}, {a.get(4).multiply(a.get(5)),
                b.get(4).multiply(b.get(5))}};
        for (Complex[] p : pairs) {
            double allowed = 4 * (found.stateError(1) + found.stateError(4) + profile.error(1) + profile.error(4))
                    * (1 + p[1].norm()) + 1e-12;
            assertTrue(p[0].subtract(p[1]).norm() <= allowed, p[0] + " vs " + p[1] + " (allowed " + allowed + ")");
        }
        // back to the origin: the solution started from the state found is analytic at 0 with |q(0)| = Psi(0,0) = 4
        MemberSolution sol = found.solution(SolverSettings.defaults());
        Complex tiny = new Complex(1e-3);
        MemberValue near = sol.evaluate(tiny);
        MemberValue origin = Samples.nlsProfile().evaluate(tiny);
        // q is even in x: |q(0.001)| = |q(0)| + O(1e-6)
        assertTrue(Math.abs(near.q().norm() - 4) < 1e-4, "|q(0.001)| = " + near.q().norm());
        // a_-2 next to 0 as for the solution started from the origin data (0, 2i, 2i), up to the gauge phase
        double allowed = 4 * (near.error(0) + near.error(1) + origin.error(0) + origin.error(1)) + 1e-11;
        assertTrue(near.state().get(0).subtract(origin.state().get(0)).norm() <= allowed, near.state().get(0) + " vs "
                + origin.state().get(0));
        assertTrue(Math.abs(near.state().get(1).norm() - origin.state().get(1).norm()) <= allowed,
                near.state().get(1) + " vs " + origin.state().get(1));
    }
}
