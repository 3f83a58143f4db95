package org.tertius.core.solution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.Node;

/**
 * A tree grown over a declared set of points in a fixed order, from the root alone, does not depend on what the
 * solution was asked before; frozen, it answers every point (dense output or a detached path) the same whatever
 * the order and the threads: the engine side of a resumed table that equals an uninterrupted one.
 */
class FrozenTreeTest {
    private static final long SEED = 20260516L;

    /** A 9 x 9 grid over [-4, 4]^2 without 0, in order of distance from the start z = 1 (then row, column). */
    private static List<double[]> declaredSet() {
        List<double[]> out = new ArrayList<>();
        for (int j = 0; j < 9; j++) {
            for (int i = 0; i < 9; i++) {
                if (i != 4 || j != 4) {
                    SurfacePoint p = SurfacePoint.of(-4 + i, -4 + j, 0);
                    out.add(new double[] {p.logRe(), p.logIm(), Math.hypot(-5 + i, -4 + j)});
                }
            }
        }
        out.sort((a, b) -> Double.compare(a[2], b[2]));
        return out;
    }

    private static FrozenTree grow(Solution s) {
        Solution tree = s.withRootOnly();
        for (double[] p : declaredSet()) {
            try {
                tree.extendTo(p[0], p[1]);
            } catch (RuntimeException refused) {
                // left to the evaluation of the point
            }
        }
        return tree.freeze();
    }

    @Test
    void treesFromTheSameDeclaredSetAreEqualAndAnswerIndependentlyOfOrderAndThreads() {
        Solution used = DemoSolutions.demo();
        for (double[] p : DemoSolutions.randomPoints(new Random(3), 12)) {
            used.evaluate(p[0], p[1]);
        }
        FrozenTree a = grow(DemoSolutions.demo());
        FrozenTree b = grow(used);
        assertEquals(a.nodeCount(), b.nodeCount());
        for (int k = 0; k < a.nodeCount(); k++) {
            Node x = a.nodes().get(k);
            Node y = b.nodes().get(k);
            assertEquals(Double.doubleToRawLongBits(x.tauRe()), Double.doubleToRawLongBits(y.tauRe()));
            assertEquals(Double.doubleToRawLongBits(x.radius()), Double.doubleToRawLongBits(y.radius()));
            assertEquals(Double.doubleToRawLongBits(x.stateRe(0)), Double.doubleToRawLongBits(y.stateRe(0)));
        }
        int nodes = a.nodeCount();
        // the dense output of a stored node serves a grid point
        assertNotNull(a.evaluateStored(declaredSet().get(5)[0], declaredSet().get(5)[1], 1e-10));
        qt().withFixedSeed(SEED).withExamples(10)
                .forAll(longs().all(), integers().between(1, 4))
                .checkAssert((seed, threads) -> {
                    Random rnd = new Random(seed);
                    List<double[]> points = DemoSolutions.randomPoints(rnd, 8);
                    List<String> first = DemoSolutions.outcomes(points, new int[] {0, 1, 2, 3, 4, 5, 6, 7}, 1,
                            a::evaluate);
                    List<String> second = DemoSolutions.outcomes(points, DemoSolutions.permutation(rnd, 8), threads,
                            b::evaluate);
                    assertEquals(first, second, "seed " + seed + ", " + threads + " threads");
                    // the grid way: dense output where a stored node serves, else a detached path
                    List<String> third = DemoSolutions.outcomes(points, DemoSolutions.permutation(rnd, 8), threads,
                            (re, im) -> storedOrDetached(a, re, im));
                    List<String> fourth = DemoSolutions.outcomes(points, DemoSolutions.permutation(rnd, 8), 1,
                            (re, im) -> storedOrDetached(b, re, im));
                    assertEquals(third, fourth, "seed " + seed + ", " + threads + " threads");
                });
        assertEquals(nodes, a.nodeCount(), "a frozen tree never grows");
        assertEquals(nodes, b.nodeCount(), "a frozen tree never grows");
    }

    private static StateEstimate storedOrDetached(FrozenTree t, double re, double im) {
        StateEstimate e = t.evaluateStored(re, im, 1e-10);
        return e != null ? e : t.evaluate(re, im);
    }
}
