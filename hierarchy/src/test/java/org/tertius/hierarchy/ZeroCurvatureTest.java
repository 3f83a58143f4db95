package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tertius.hierarchy.algebra.Evaluation;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * The generated member equations against the Lax pair itself (the isomonodromic pair of Sakka, J. Phys. A 42
 * (2009) 025210, in the convention of hierarchy/README.md), in exact rational arithmetic. The residual
 * {@code A_x - U_lambda + [A, U]} is formed here with plain 2x2 matrices (independently of the generator's
 * symbolic matrices) and must vanish exactly at every power of lambda.
 */
class ZeroCurvatureTest {
    private static final GaussianRational I = GaussianRational.I;

    @Test
    void zeroCurvatureResidualOfTheGeneratedXFlowVanishesExactlyForMembers1To4() {
        for (int n = 1; n <= 4; n++) {
            MemberEquations eq = new MemberEquations(n);
            int order = n;
            qt().withExamples(15).forAll(longs().all()).checkAssert(seed -> assertZeroCurvature(eq, order,
                    ExactPoints.point(eq, new Random(seed))));
        }
    }

    private static void assertZeroCurvature(MemberEquations eq, int n, List<GaussianRational> v) {
        // A(lambda): a_k for k = -2 .. n-1; index k + 2
        GaussianRational[][] a = new GaussianRational[n + 2][];
        GaussianRational[][] ax = new GaussianRational[n + 2][];
        for (int k = -2; k <= n - 2; k++) {
            GaussianRational d = v.get(MemberEquations.index(k, 0));
            a[k + 2] = new GaussianRational[] {d, v.get(MemberEquations.index(k, 1)), v.get(MemberEquations.index(k, 2)),
                d.negate()};
            GaussianRational dd = eq.xFlow().get(MemberEquations.index(k, 0)).evaluate(Evaluation.EXACT, v);
            ax[k + 2] = new GaussianRational[] {dd, eq.xFlow().get(MemberEquations.index(k, 1)).evaluate(Evaluation.EXACT, v),
                eq.xFlow().get(MemberEquations.index(k, 2)).evaluate(Evaluation.EXACT, v), dd.negate()};
        }
        GaussianRational ntn = v.get(eq.timeIndex(n)).multiply(GaussianRational.of(n, 0));
        GaussianRational top = I.negate().multiply(ntn);
        a[n + 1] = new GaussianRational[] {top, GaussianRational.ZERO, GaussianRational.ZERO, top.negate()};
        // d/dx of a_{n-1}: -i sigma3 for n = 1 (t_1 = x), zero otherwise
        GaussianRational dtop = n == 1 ? I.negate() : GaussianRational.ZERO;
        ax[n + 1] = new GaussianRational[] {dtop, GaussianRational.ZERO, GaussianRational.ZERO, dtop.negate()};
        GaussianRational q = v.get(MemberEquations.index(n - 2, 1)).multiply(ntn.reciprocal());
        GaussianRational r = v.get(MemberEquations.index(n - 2, 2)).multiply(ntn.reciprocal());
        GaussianRational[] u0 = {GaussianRational.ZERO, q, r, GaussianRational.ZERO};
        GaussianRational[] u1 = {I.negate(), GaussianRational.ZERO, GaussianRational.ZERO, I};
        assertEquals(q, eq.q().evaluate(Evaluation.EXACT, v), "q read off the top level");
        assertEquals(r, eq.r().evaluate(Evaluation.EXACT, v), "r read off the top level");
        for (int p = -3; p <= n; p++) {
            // [lambda^p]: A_x - U_lambda + [A, U] = a_p' - (p == 0 ? u1 : 0) + [a_p, u0] + [a_{p-1}, u1]
            GaussianRational[] res = {GaussianRational.ZERO, GaussianRational.ZERO, GaussianRational.ZERO,
                GaussianRational.ZERO};
            res = add(res, at(ax, p));
            if (p == 0) {
                res = add(res, scale(u1, GaussianRational.ONE.negate()));
            }
            res = add(res, commutator(at(a, p), u0));
            res = add(res, commutator(at(a, p - 1), u1));
            for (GaussianRational e : res) {
                assertTrue(e.isZero(), "member " + n + ": residual at lambda^" + p + " is " + e);
            }
        }
    }

    @Test
    void membersUpTo6AreGeneratedWithThreeUnknownsPerLevel() {
        qt().withExamples(6).forAll(integers().between(1, 6)).checkAssert(n -> {
            HierarchyMember m = HierarchyMember.of(n);
            assertEquals(3 * (n + 1), m.dimension());
            assertEquals(m.dimension(), m.equations().xFlow().size());
            assertTrue(m.describe().contains("d/dx a(" + (n - 2) + ")12 = "), m.describe());
        });
    }

    private static GaussianRational[] at(GaussianRational[][] a, int p) {
        if (p + 2 < 0 || p + 2 >= a.length) {
            return new GaussianRational[] {GaussianRational.ZERO, GaussianRational.ZERO, GaussianRational.ZERO,
                GaussianRational.ZERO};
        }
        return a[p + 2];
    }

    private static GaussianRational[] add(GaussianRational[] x, GaussianRational[] y) {
        return new GaussianRational[] {x[0].add(y[0]), x[1].add(y[1]), x[2].add(y[2]), x[3].add(y[3])};
    }

    private static GaussianRational[] scale(GaussianRational[] x, GaussianRational c) {
        return new GaussianRational[] {x[0].multiply(c), x[1].multiply(c), x[2].multiply(c), x[3].multiply(c)};
    }

    private static GaussianRational[] multiply(GaussianRational[] x, GaussianRational[] y) {
        return new GaussianRational[] {x[0].multiply(y[0]).add(x[1].multiply(y[2])), x[0].multiply(y[1]).add(x[1].multiply(y[3])),
            x[2].multiply(y[0]).add(x[3].multiply(y[2])), x[2].multiply(y[1]).add(x[3].multiply(y[3]))};
    }

    private static GaussianRational[] commutator(GaussianRational[] x, GaussianRational[] y) {
        return add(multiply(x, y), scale(multiply(y, x), GaussianRational.ONE.negate()));
    }
}
