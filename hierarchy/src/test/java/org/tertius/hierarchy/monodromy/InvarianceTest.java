package org.tertius.hierarchy.monodromy;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;

/**
 * Isomonodromy as the self-check of the direct map: the data of one solution computed at several points (along x,
 * across poles, on another sheet of x, along t_n) agree within their error estimates, and every self-check (det Y = 1,
 * unit-triangular Stokes matrices, cyclic relation) holds. The invariance itself is the defining property of the
 * Lax pair (hierarchy/README.md); the members are scenarios of our own.
 */
class InvarianceTest {
    private static final MonodromyMap<Complex> MAP = MonodromyMap.doublePrecision();

    private static List<MonodromyData<Complex>> dataAt(MemberSolution solution, SurfacePoint... points) {
        List<MonodromyData<Complex>> all = new ArrayList<>();
        for (SurfacePoint x : points) {
            MonodromyData<Complex> d = MAP.compute(solution, x);
            assertTrue(d.checksHold(), "self-checks at " + x + ": " + d.checks());
            all.add(d);
        }
        return all;
    }

    private static void assertAgree(String what, List<MonodromyData<Complex>> reference, List<MonodromyData<Complex>> all) {
        double worst = 0;
        for (MonodromyData<Complex> d : all) {
            double ratio = d.deviationRatio(reference.get(0));
            assertTrue(ratio <= 1, what + ": data differ by " + ratio + " times their estimates:\n" + d + "\n"
                    + reference.get(0));
            worst = Math.max(worst, Samples.relativeDisagreement(d, reference.get(0)));
        }
        System.out.printf("%s: largest relative disagreement %.2g%n", what, worst);
    }

    /** The point of largest |q| on a grid of spacing 0.05 within 0.3 of the guess. */
    private static Complex poleNear(MemberSolution solution, Complex guess) {
        Complex best = guess;
        double largest = 0;
        for (int i = -6; i <= 6; i++) {
            for (int j = -6; j <= 6; j++) {
                Complex x = guess.add(new Complex(0.05 * i, 0.05 * j));
                double q = solution.evaluate(x).q().norm();
                if (q > largest) {
                    largest = q;
                    best = x;
                }
            }
        }
        assertTrue(largest > 10, "no pole of q near " + guess + " (largest |q| " + largest + ")");
        return best;
    }

    private static double distanceToSegment(Complex p, Complex a, Complex b) {
        Complex d = b.subtract(a);
        double t = Math.max(0, Math.min(1, p.subtract(a).multiply(d.conjugate()).getReal() / (d.norm() * d.norm())));
        return p.subtract(a.add(d.multiply(t))).norm();
    }

    @Test
    void member1DataAgreeAlongXAcrossPolesAndOnAnotherSheet() {
        MemberSolution sol = Samples.member1();
        Complex start = new Complex(0.5);
        Complex beyondFirst = new Complex(1.4, -1.6);
        Complex beyondSecond = new Complex(-2.2, -0.8);
        // the segments from the start cross the neighbourhoods of two poles of q
        assertTrue(distanceToSegment(poleNear(sol, new Complex(1.0, -1.0)), start, beyondFirst) < 0.3);
        assertTrue(distanceToSegment(poleNear(sol, new Complex(-1.5, -0.5)), start, beyondSecond) < 0.3);
        List<MonodromyData<Complex>> all = dataAt(sol, SurfacePoint.of(start, 0), SurfacePoint.of(1.0, 0.2, 0),
                SurfacePoint.of(beyondFirst, 0), SurfacePoint.of(beyondSecond, 0), SurfacePoint.of(-1.5, 0.5, 0),
                SurfacePoint.of(0.3, 0.1, 1), SurfacePoint.of(0.8, -0.4, -1));
        assertAgree("member 1 along x", all, all);
    }

    @Test
    void member2DataAgreeAlongXAndAlongTheTopTime() {
        MemberSolution sol = Samples.member2();
        List<MonodromyData<Complex>> all = dataAt(sol, SurfacePoint.of(0.3, 0, 0), SurfacePoint.of(-2, 1, 0));
        all.addAll(dataAt(sol.withTopTime(new Complex(0.65)), SurfacePoint.of(0.9, 0, 0)));
        all.addAll(dataAt(sol.withTopTime(new Complex(0.4, 0.3)), SurfacePoint.of(0.3, 0, 0)));
        assertAgree("member 2 along x and t_2", all, all);
    }

    @Test
    void member3DataAgreeAlongXAndAlongTheTopTime() {
        MemberSolution sol = Samples.member3();
        List<MonodromyData<Complex>> all = dataAt(sol, SurfacePoint.of(-0.2, 0.1, 0));
        all.addAll(dataAt(sol.withTopTime(new Complex(0.5, 0.1)), SurfacePoint.of(1, 0.5, 0)));
        assertAgree("member 3 along x and t_3", all, all);
    }

    @Test
    @Tag("slow")
    void member3DataAgreeAtMorePoints() {
        MemberSolution sol = Samples.member3();
        List<MonodromyData<Complex>> all = dataAt(sol, SurfacePoint.of(-0.2, 0.1, 0), SurfacePoint.of(1.5, 0.5, 0),
                SurfacePoint.of(0.5, 2.5, 0), SurfacePoint.of(-1.5, -1, 0));
        all.addAll(dataAt(sol.withTopTime(new Complex(0.5, 0.1)), SurfacePoint.of(-0.2, 0.1, 0),
                SurfacePoint.of(1, 0.5, 0)));
        all.addAll(dataAt(sol.withTopTime(new Complex(0.3, -0.2)), SurfacePoint.of(0.4, 0, 0)));
        assertAgree("member 3 at more points", all, all);
    }

    @Test
    @Tag("slow")
    void member4DataAgreeAlongX() {
        MemberParameters p = MemberParameters.builder(4).times(new Complex(0.1), new Complex(0.2, 0.1),
                new Complex(0.3)).s(new Complex(0.7)).m(new Complex(0.2, 0.1)).build();
        List<Complex> partial = new ArrayList<>();
        for (int i = 0; i < 15; i++) {
            partial.add(new Complex(0.1 * Math.sin(i + 1), 0.1 * Math.cos(2 * i)));
        }
        Complex s = p.s();
        partial.set(0, s.multiply(s).negate().subtract(partial.get(1).multiply(partial.get(2))).sqrt());
        Complex x0 = new Complex(0.2);
        MemberSolution sol = MemberSolution.builder(p).start(x0, HierarchyMember.of(4).completeDiagonal(p, x0,
                partial)).build();
        List<MonodromyData<Complex>> all = dataAt(sol, SurfacePoint.of(0.2, 0, 0), SurfacePoint.of(0.8, 0.4, 0));
        assertAgree("member 4 along x", all, all);
    }

    @Test
    void dataChangeWhenTheSolutionChanges() {
        // the contrast: a state moved off the solution by 1e-6 gives data outside the estimates
        List<Complex> moved = new ArrayList<>(Samples.member1State());
        moved.set(4, moved.get(4).add(1e-6));
        MemberSolution other = MemberSolution.builder(Samples.MEMBER1).start(new Complex(0.5), moved).build();
        MonodromyData<Complex> a = MAP.compute(Samples.member1(), SurfacePoint.of(0.5, 0, 0));
        MonodromyData<Complex> b = MAP.compute(other, SurfacePoint.of(1.0, 0.2, 0));
        assertTrue(b.deviationRatio(a) > 100, "ratio " + b.deviationRatio(a));
    }
}
