package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;

/** Member solutions shared by the monodromy tests (scenarios of our own). */
final class Samples {
    private Samples() {
    }

    static final MemberParameters MEMBER1 = MemberParameters.builder(1).s(new Complex(1.0)).m(new Complex(0.3, 0.1))
            .build();

    /** A generic member-1 state at x0 = 0.5 (det a_-2 = s^2 = 1, a(-1)11 = m). */
    static List<Complex> member1State() {
        Complex a11 = new Complex(0.4, 0.2);
        Complex a12 = new Complex(0.7, -0.1);
        Complex a21 = Complex.ONE.add(a11.multiply(a11)).negate().divide(a12);
        return List.of(a11, a12, a21, MEMBER1.m(), new Complex(0.2), new Complex(-0.3, 0.1));
    }

    /** A generic member-1 solution (a PIII D6 solution through Member1Map); poles near -1.5-0.5i and 1-1i. */
    static MemberSolution member1() {
        return MemberSolution.builder(MEMBER1).start(new Complex(0.5), member1State()).build();
    }

    /** Member 2 with the focusing symmetry (x, t_2, s real, m imaginary). */
    static MemberSolution member2() {
        MemberParameters p = MemberParameters.builder(2).times(new Complex(0.5)).s(new Complex(1.0))
                .m(new Complex(0, 0.2)).build();
        Complex b2 = new Complex(0.3, 0.2);
        Complex b1 = new Complex(0.1, -0.4);
        Complex b0 = new Complex(0.5, 0.1);
        Complex d2 = new Complex(0, Math.sqrt(1 - b2.norm() * b2.norm()));
        List<Complex> partial = List.of(d2, b2, b2.conjugate().negate(), Complex.ZERO, b1, b1.conjugate().negate(),
                Complex.ZERO, b0, b0.conjugate().negate());
        Complex x0 = new Complex(0.3);
        return MemberSolution.builder(p).start(x0, HierarchyMember.of(2).completeDiagonal(p, x0, partial)).build();
    }

    /** A generic member-3 solution (complex times and s). */
    static MemberSolution member3() {
        MemberParameters p = MemberParameters.builder(3).times(new Complex(0.2, 0.1), new Complex(0.4))
                .s(new Complex(0.8, -0.1)).m(new Complex(0.3)).build();
        List<Complex> partial = new ArrayList<>();
        double[] seeds = {0.3, -0.2, 0.5, 0.1, 0.4, -0.3, 0.2, 0.6, -0.1, 0.35, 0.25, -0.45};
        for (int i = 0; i < 12; i++) {
            partial.add(new Complex(seeds[i], 0.5 * seeds[11 - i]));
        }
        Complex s = p.s();
        partial.set(0, s.multiply(s).negate().subtract(partial.get(1).multiply(partial.get(2))).sqrt());
        Complex x0 = new Complex(-0.2, 0.1);
        return MemberSolution.builder(p).start(x0, HierarchyMember.of(3).completeDiagonal(p, x0, partial)).build();
    }

    /** The NLS near-field profile at T = 0: member 1, s = 2, m = 0, a_-2(0) = (0, 2i, 2i). */
    static MemberSolution nlsProfile() {
        MemberParameters p = MemberParameters.builder(1).s(new Complex(2)).m(Complex.ZERO).build();
        return MemberSolution.builder(p).startAtOrigin(Complex.ZERO, new Complex(0, 2), new Complex(0, 2)).build();
    }

    /** Largest |a - b| / |b| over all numbers of two data sets (the measured disagreement). */
    static double relativeDisagreement(MonodromyData<Complex> a, MonodromyData<Complex> b) {
        List<Estimate<Complex>> qa = a.quantities();
        List<Estimate<Complex>> qb = b.quantities();
        double worst = 0;
        for (int i = 0; i < qa.size(); i++) {
            worst = Math.max(worst, qa.get(i).value().subtract(qb.get(i).value()).norm()
                    / Math.max(1, qb.get(i).value().norm()));
        }
        return worst;
    }
}
