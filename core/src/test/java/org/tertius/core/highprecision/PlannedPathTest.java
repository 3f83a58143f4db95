package org.tertius.core.highprecision;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

class PlannedPathTest {
    @Test
    void straighteningDropsCollinearNodesAndKeepsCornersAndTheTarget() {
        // common practice (polyline simplification): points on the line between their neighbours are dropped
        List<double[]> straight = List.of(new double[] {0, 0}, new double[] {1, 0.001}, new double[] {2, 0},
                new double[] {3, -0.002}, new double[] {4, 0});
        assertEquals(List.of(4), toList(PlannedPath.straightened(straight)));
        // a corner that bends around a pole stays
        List<double[]> bent = List.of(new double[] {0, 0}, new double[] {1, 0}, new double[] {2, 1},
                new double[] {3, 2});
        assertEquals(List.of(1, 3), toList(PlannedPath.straightened(bent)));
        // repeated points are kept as they are (no line through them)
        List<double[]> repeated = List.of(new double[] {0, 0}, new double[] {0, 0}, new double[] {1, 1});
        List<Integer> kept = toList(PlannedPath.straightened(repeated));
        assertEquals(2, kept.get(kept.size() - 1));
    }

    private static List<Integer> toList(int[] a) {
        List<Integer> l = new ArrayList<>();
        for (int x : a) {
            l.add(x);
        }
        return l;
    }
}
