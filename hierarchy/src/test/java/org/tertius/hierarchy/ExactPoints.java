package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.tertius.hierarchy.algebra.Evaluation;
import org.tertius.hierarchy.algebra.GaussianRational;
import org.tertius.hierarchy.algebra.Polynomial;

/** Random exact points (Gaussian rationals) of a member's ring, optionally on the constraint manifold. */
final class ExactPoints {
    private ExactPoints() {
    }

    static GaussianRational random(Random rnd) {
        long den = 1 + rnd.nextInt(7);
        return GaussianRational.rational(rnd.nextInt(19) - 9, den)
                .add(GaussianRational.I.multiply(GaussianRational.rational(rnd.nextInt(19) - 9, 1 + rnd.nextInt(7))));
    }

    /** Values of all ring variables (unknowns, x, t_2 .. t_n, m); t_n is never zero. */
    static List<GaussianRational> point(MemberEquations eq, Random rnd) {
        List<GaussianRational> v = new ArrayList<>();
        for (int i = 0; i < eq.variableCount(); i++) {
            GaussianRational g = random(rnd);
            if (i == eq.timeIndex(eq.order()) && g.isZero()) {
                g = GaussianRational.ONE;
            }
            v.add(g);
        }
        return v;
    }

    /**
     * A point on the constraint manifold: the diagonal entries a(k)11, k >= -1, solved exactly from the
     * constraints (each is linear in its entry).
     */
    static List<GaussianRational> manifoldPoint(MemberEquations eq, Random rnd) {
        List<GaussianRational> v = point(eq, rnd);
        for (Map.Entry<Integer, Polynomial> c : eq.constraints().entrySet()) {
            int slot = MemberEquations.index(c.getKey() - eq.order() + 1, 0);
            v.set(slot, GaussianRational.ZERO);
            GaussianRational c0 = c.getValue().evaluate(Evaluation.EXACT, v);
            v.set(slot, GaussianRational.ONE);
            GaussianRational c1 = c.getValue().evaluate(Evaluation.EXACT, v);
            v.set(slot, c0.negate().multiply(c1.subtract(c0).reciprocal()));
        }
        return v;
    }
}
