package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tertius.hierarchy.algebra.Evaluation;
import org.tertius.hierarchy.algebra.GaussianRational;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * The flow in t_n against the x-flow, exactly, on the constraint manifold: the two flows commute (the
 * compatibility of the three Lax equations), and both keep every first integral and constraint.
 */
class TimeFlowTest {
    @Test
    void xFlowAndTopTimeFlowCommuteOnTheConstraintManifoldForMembers2To4() {
        for (int n = 2; n <= 4; n++) {
            MemberEquations eq = new MemberEquations(n);
            List<Polynomial> bracket = new ArrayList<>();
            for (int i = 0; i < eq.unknownCount(); i++) {
                // d/dt (dy_i/dx) - d/dx (dy_i/dt) along the two flows
                bracket.add(eq.xFlow().get(i).derivativeAlong(eq.tFlow(), eq.timeIndex(n))
                        .subtract(eq.tFlow().get(i).derivativeAlong(eq.xFlow(), eq.timeIndex(1))));
            }
            int order = n;
            qt().withExamples(8).forAll(longs().all()).checkAssert(seed -> {
                List<GaussianRational> v = ExactPoints.manifoldPoint(eq, new Random(seed));
                for (int i = 0; i < bracket.size(); i++) {
                    GaussianRational b = bracket.get(i).evaluate(Evaluation.EXACT, v);
                    assertTrue(b.isZero(), "member " + order + ", unknown " + eq.names().get(i) + ": bracket " + b);
                }
            });
        }
    }

    @Test
    void bothFlowsKeepTheFirstIntegralsAndConstraintsExactly() {
        for (int n = 1; n <= 4; n++) {
            MemberEquations eq = new MemberEquations(n);
            List<Polynomial> kept = new ArrayList<>(eq.constraints().values());
            kept.add(eq.detA2());
            kept.add(eq.traceForm());
            List<Polynomial> rates = new ArrayList<>();
            for (Polynomial c : kept) {
                rates.add(c.derivativeAlong(eq.xFlow(), eq.timeIndex(1)));
                if (n >= 2) {
                    rates.add(c.derivativeAlong(eq.tFlow(), eq.timeIndex(n)));
                }
            }
            int order = n;
            qt().withExamples(8).forAll(longs().all()).checkAssert(seed -> {
                List<GaussianRational> v = ExactPoints.manifoldPoint(eq, new Random(seed));
                for (Polynomial rate : rates) {
                    GaussianRational d = rate.evaluate(Evaluation.EXACT, v);
                    assertTrue(d.isZero(), "member " + order + ": an integral changes at rate " + d);
                }
            });
        }
    }

    @Test
    void detA2AndTraceFormAreKeptByTheXFlowEvenOffTheManifold() {
        for (int n = 1; n <= 4; n++) {
            MemberEquations eq = new MemberEquations(n);
            assertTrue(eq.detA2().derivativeAlong(eq.xFlow(), eq.timeIndex(1)).isZero(), "det a_-2, member " + n);
            assertTrue(eq.traceForm().derivativeAlong(eq.xFlow(), eq.timeIndex(1)).isZero(), "trace form, member " + n);
        }
    }
}
