package org.tertius.core.path;

import org.tertius.core.number.Cx;
import org.tertius.core.step.Node;
import org.tertius.core.step.TaylorPadeStepper;

/**
 * The choice of the next step towards a target, after the Fornberg-Weideman rule (B. Fornberg and
 * J.A.C. Weideman, "A numerical methodology for the Painleve equations", J. Comput. Phys. 230 (2011)):
 * a few candidate directions around the direction to the target are tried and the one whose end point lies
 * furthest from the singularities is taken. Here the singularities are the poles of the Pade approximants of
 * every component of the system, so that zeros of w (poles of the companion unknowns) are avoided as well as
 * poles of w. Progress comes first: the candidate closest to the direction of the target whose end point meets
 * the local tolerance and keeps a clearance of half the step length is taken; failing that, the one with the
 * largest clearance; and the step is shortened (rather than turned further aside) until one qualifies, which
 * avoids the back-and-forth that a pure clearance rule shows next to a target surrounded by singularities.
 *
 * <p>Stateless and thread-safe.
 */
public final class PathSelector {
    /** Offsets from the direction to the target (radians). */
    private static final double[] OFFSETS = {0, Math.PI / 8, -Math.PI / 8, Math.PI / 4, -Math.PI / 4,
        3 * Math.PI / 8, -3 * Math.PI / 8};
    /**
     * Clearance from the singularities, as a fraction of the step length, that a candidate end point needs to
     * be taken on progress alone.
     */
    private static final double MIN_CLEARANCE = 0.5;

    private PathSelector() {
    }

    /** A chosen step: the scaled end point s, and whether it is the target itself. */
    public static final class Choice {
        private final double sr;
        private final double si;
        private final boolean reachesTarget;

        Choice(double sr, double si, boolean reachesTarget) {
            this.sr = sr;
            this.si = si;
            this.reachesTarget = reachesTarget;
        }

        public double sr() {
            return sr;
        }

        public double si() {
            return si;
        }

        public boolean reachesTarget() {
            return reachesTarget;
        }
    }

    /**
     * Chooses the next step from {@code node} towards the target tau.
     *
     * @return the choice; {@code reachesTarget} when the target lies in the node's disk and its value there
     *     meets the tolerance (then no further step is needed)
     */
    public static Choice choose(Node node, double targetRe, double targetIm, TaylorPadeStepper stepper,
                                double tol) {
        double r = node.radius();
        double dr = (targetRe - node.tauRe()) / r;
        double di = (targetIm - node.tauIm()) / r;
        double dist = Cx.abs(dr, di);
        if (dist <= 1.0 && stepper.localError(node, dr, di) <= tol) {
            return new Choice(dr, di, true);
        }
        double theta = Math.atan2(di, dr);
        double length = Math.min(1.0, dist <= 1.0 ? 0.5 * dist : 1.0);
        Choice fallback = null;
        double fallbackClearance = -1;
        for (int attempt = 0; attempt < 12; attempt++) {
            // candidates in order of increasing deviation: the first admissible one that keeps clear of the
            // singularities is taken (progress first); otherwise the one with the largest clearance
            for (int c = 0; c < OFFSETS.length; c++) {
                double a = theta + OFFSETS[c];
                double cr = length * Math.cos(a);
                double ci = length * Math.sin(a);
                double clearance = clearance(node, cr, ci);
                if (stepper.localError(node, cr, ci) > tol) {
                    continue;
                }
                if (clearance >= MIN_CLEARANCE * length && Math.abs(OFFSETS[c]) <= Math.PI / 4 + 1e-9) {
                    return new Choice(cr, ci, false);
                }
                if (clearance > fallbackClearance) {
                    fallbackClearance = clearance;
                    fallback = new Choice(cr, ci, false);
                }
            }
            if (fallback != null && fallbackClearance >= MIN_CLEARANCE * length) {
                return fallback;
            }
            length *= 0.6;
        }
        return fallback;
    }

    /** Distance from the scaled point s to the nearest recorded singularity, in units of the radius. */
    static double clearance(Node node, double sr, double si) {
        double best = Double.POSITIVE_INFINITY;
        double r = node.radius();
        for (int j = 0; j < node.singularityCount(); j++) {
            double xr = (node.singularityRe(j) - node.tauRe()) / r - sr;
            double xi = (node.singularityIm(j) - node.tauIm()) / r - si;
            best = Math.min(best, Cx.abs(xr, xi));
        }
        return best;
    }
}
