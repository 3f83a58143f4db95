package org.tertius.tests;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.function.Predicate;
import java.util.stream.Stream;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.params.provider.Arguments;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.monodromy.Estimate;
import org.tertius.hierarchy.monodromy.LaxMatrix;
import org.tertius.hierarchy.monodromy.MonodromyData;
import org.tertius.hierarchy.monodromy.MonodromyMap;

/**
 * Random D6 solutions given at infinity by the constants (c, p, q) of an oscillation along one of its oscillating
 * rays (a scenario of our own), shared by the tests of the bridge at infinity. The draws are in a fixed order, so a
 * seed gives the same sets in every test that uses it.
 */
final class RandomOscillations {
    /** One draw: the equation, the background, the amplitudes and the ray. */
    record Draw(Painleve3 equation, Complex background, Complex p, Complex q, double angle) {
        /** Whether the transseries holds (|Re kappa| &lt; 1/2): an oscillating solution with these amplitudes. */
        boolean oscillates() {
            try {
                InfinityBehaviour.of(equation, background, p, q, angle, 0);
                return true;
            } catch (RuntimeException e) {
                return false;
            }
        }

        /**
         * The monodromy data (member 1 with constant s) of the solution at |z| = 6 on the ray, where it is computed
         * from the transseries; their self-checks are for the caller.
         */
        MonodromyData<Complex> monodromyData(MonodromyMap<Complex> map, Complex s) {
            Painleve3Solution solution = InfinityBehaviour.of(equation, background, p, q, angle, 0)
                    .solution(equation, SolverSettings.defaults());
            Painleve3Value v = solution.evaluate(SurfacePoint.fromLog(Math.log(6), angle));
            return map.compute(LaxMatrix.ofPainleve3(equation, v, s));
        }

        /** The prefix of a failure message. */
        String describe(int index) {
            return "set " + index + " (" + equation + ", c " + background + ", p " + p + ", q " + q + ", ray " + angle
                    + "): ";
        }

        Arguments arguments(int index) {
            return Arguments.of(index, equation, background, p, q, angle);
        }
    }

    private RandomOscillations() {
    }

    /** The eight entries of the data in the order the bridge at infinity takes them. */
    static List<Estimate<Complex>> bridgeData(MonodromyData<Complex> d) {
        return List.of(d.stokesAtInfinity(1), d.stokesAtInfinity(2), d.stokesAtZero(1), d.stokesAtZero(2),
                d.connection(1, 1), d.connection(1, 2), d.connection(2, 1), d.connection(2, 2));
    }

    /** gamma = 1, delta = -1 unless general; alpha, beta, p, q complex; c and the ray drawn among those possible. */
    static Draw draw(Random r, boolean general) {
        Complex alpha = new Complex(r.nextDouble(-1.5, 1.5), r.nextDouble(-0.5, 0.5));
        Complex beta = new Complex(r.nextDouble(-1.5, 1.5), r.nextDouble(-0.5, 0.5));
        Complex gamma = general ? new Complex(r.nextDouble(0.3, 2), r.nextDouble(-1, 1)) : Complex.ONE;
        Complex delta = general ? new Complex(r.nextDouble(-2, 2), r.nextDouble(-2, 2)) : new Complex(-1);
        Painleve3 eq = Painleve3.of(alpha, beta, gamma, delta);
        Complex c = TransseriesAtInfinity.backgrounds(eq).get(r.nextInt(4));
        List<Double> rays = InfinityBehaviour.oscillatingRays(eq, c);
        double angle = rays.get(r.nextInt(rays.size()));
        Complex p = new Complex(r.nextDouble(-0.4, 0.4), r.nextDouble(-0.4, 0.4));
        Complex q = new Complex(r.nextDouble(-0.4, 0.4), r.nextDouble(-0.4, 0.4));
        return new Draw(eq, c, p, q, angle);
    }

    /** count oscillating sets, alternately with gamma = 1, delta = -1 and general gamma, delta; indices from 0. */
    static Stream<Arguments> alternating(long seed, int count) {
        Random r = new Random(seed);
        List<Arguments> sets = new ArrayList<>();
        while (sets.size() < count) {
            Draw d = draw(r, sets.size() % 2 == 1);
            if (d.oscillates()) {
                sets.add(d.arguments(sets.size()));
            }
        }
        return sets.stream();
    }

    /** count oscillating sets with general gamma, delta that pass the filter; indices from first. */
    static Stream<Arguments> general(long seed, int count, int first, Predicate<Draw> filter) {
        Random r = new Random(seed);
        List<Arguments> sets = new ArrayList<>();
        while (sets.size() < count) {
            Draw d = draw(r, true);
            if (filter.test(d) && d.oscillates()) {
                sets.add(d.arguments(first + sets.size()));
            }
        }
        return sets.stream();
    }
}
