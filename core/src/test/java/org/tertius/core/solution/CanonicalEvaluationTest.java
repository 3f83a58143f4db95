package org.tertius.core.solution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tertius.core.step.Node;

/**
 * Canonical evaluation is a function of the start, the settings and the point alone: random point sets asked in
 * random orders on one to four threads, of a fresh solution and of one that has answered many other questions
 * before (and grown its tree), give the same bits.
 */
class CanonicalEvaluationTest {
    private static final long SEED = 20260515L;

    @Test
    void valuesDoNotDependOnOrderThreadsOrHistory() {
        Solution used = DemoSolutions.demo();
        qt().withFixedSeed(SEED).withExamples(12)
                .forAll(longs().all(), integers().between(1, 4))
                .checkAssert((seed, threads) -> {
                    Random rnd = new Random(seed);
                    List<double[]> points = DemoSolutions.randomPoints(rnd, 6);
                    int[] inOrder = {0, 1, 2, 3, 4, 5};
                    Solution fresh = DemoSolutions.demo();
                    List<String> first = DemoSolutions.outcomes(points, inOrder, 1, fresh::evaluateCanonical);
                    // the used solution: its tree grows between the canonical answers, which must not see it
                    for (double[] p : DemoSolutions.randomPoints(rnd, 2)) {
                        try {
                            used.evaluate(p[0], p[1]);
                        } catch (RuntimeException ignored) {
                            // a refused point grows nothing
                        }
                    }
                    List<String> second = DemoSolutions.outcomes(points, DemoSolutions.permutation(rnd, 6), threads,
                            used::evaluateCanonical);
                    assertEquals(first, second, "seed " + seed + ", " + threads + " threads");
                });
    }

    @Test
    void theCanonicalPathEndsAtTheServingNodeAndIsTheSameAfterOtherQueries() {
        Solution s = DemoSolutions.demo();
        double[] target = DemoSolutions.randomPoints(new Random(7), 1).get(0);
        List<Node> before = s.canonicalPath(target[0], target[1]);
        for (double[] p : DemoSolutions.randomPoints(new Random(8), 10)) {
            s.evaluateCanonical(p[0], p[1]);
        }
        List<Node> after = s.canonicalPath(target[0], target[1]);
        assertEquals(positions(before), positions(after));
        assertTrue(before.get(0) == s.root());
        StateEstimate e = s.evaluateCanonical(target[0], target[1]);
        assertEquals(e.nodeId(), after.get(after.size() - 1).id());
        Node last = after.get(after.size() - 1);
        assertTrue(Math.hypot(target[0] - last.tauRe(), target[1] - last.tauIm()) <= last.radius());
        for (int k = 1; k < after.size(); k++) {
            Node a = after.get(k - 1);
            Node b = after.get(k);
            // each node lies in the disk of the one before it (a path, not a jump)
            assertTrue(Math.hypot(b.tauRe() - a.tauRe(), b.tauIm() - a.tauIm()) <= a.radius() * (1 + 1e-12));
        }
    }

    private static List<String> positions(List<Node> path) {
        List<String> out = new ArrayList<>();
        for (Node n : path) {
            out.add(Double.doubleToRawLongBits(n.tauRe()) + "," + Double.doubleToRawLongBits(n.tauIm()));
        }
        return out;
    }
}
