package org.tertius.core.highprecision;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.solution.Solution;
import org.tertius.core.step.Node;

/**
 * The double-precision plan of a high-precision path: the chain of nodes of the planner's path tree from the root to
 * the node that serves a target, runs of nearly collinear nodes replaced by straight lines, and the scale of the
 * first series.
 */
final class PlannedPath {
    /** Largest distance of a dropped node from the straight line that replaces it, relative to that line's length. */
    static final double STRAIGHT = 0.01;

    private PlannedPath() {
    }

    /** The chain of node ids from the root to the node of the planner's tree that serves tau. */
    static int[] chain(Solution planner, double tauRe, double tauIm) {
        int served = planner.evaluate(tauRe, tauIm).nodeId();
        List<Node> nodes = planner.nodes();
        List<Integer> ids = new ArrayList<>();
        for (int id = served; id >= 0; id = nodes.get(id).parent()) {
            ids.add(0, id);
        }
        int[] out = new int[ids.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = ids.get(i);
        }
        return out;
    }

    /**
     * The first series scale: the distance from the root node to the nearest singularity its approximants found
     * (an estimate of the radius of convergence), else its disk radius. The series is re-expanded when the scale
     * is far from the radius, so a good guess saves a whole expansion per pass.
     */
    static double startScale(Node root) {
        double nearest = Double.POSITIVE_INFINITY;
        for (int j = 0; j < root.singularityCount(); j++) {
            nearest = Math.min(nearest, Math.hypot(root.singularityRe(j) - root.tauRe(),
                    root.singularityIm(j) - root.tauIm()));
        }
        return nearest > 0 && nearest < Double.POSITIVE_INFINITY ? nearest : root.radius();
    }

    /**
     * The indices (after the first point) of the points of a polyline that are kept when runs of nearly collinear
     * points are replaced by one straight line: a point is dropped when it and every point dropped before it lie
     * within STRAIGHT times the length of the new line from it; the last point is always kept. The planner keeps
     * its nodes at about half a radius of convergence from every pole, so a line this close to the planned path
     * passes the poles on the same side.
     */
    static int[] straightened(List<double[]> p) {
        List<Integer> kept = new ArrayList<>();
        int anchor = 0;
        int end = 1;
        while (end < p.size()) {
            int far = end;
            while (far + 1 < p.size() && withinBand(p, anchor, far + 1)) {
                far++;
            }
            kept.add(far);
            anchor = far;
            end = far + 1;
        }
        return kept.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Whether all points strictly between a and b lie within STRAIGHT |b - a| of the segment from a to b. */
    private static boolean withinBand(List<double[]> p, int a, int b) {
        double ax = p.get(a)[0];
        double ay = p.get(a)[1];
        double dx = p.get(b)[0] - ax;
        double dy = p.get(b)[1] - ay;
        double len2 = dx * dx + dy * dy;
        if (len2 == 0) {
            return false;
        }
        for (int i = a + 1; i < b; i++) {
            double px = p.get(i)[0] - ax;
            double py = p.get(i)[1] - ay;
            double t = Math.max(0, Math.min(1, (px * dx + py * dy) / len2));
            double ex = px - t * dx;
            double ey = py - t * dy;
            if (ex * ex + ey * ey > STRAIGHT * STRAIGHT * len2) {
                return false;
            }
        }
        return true;
    }
}
