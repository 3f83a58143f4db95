package org.tertius.core.solution;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.path.PathSelector;
import org.tertius.core.step.Node;
import org.tertius.core.step.SolverSettings;
import org.tertius.core.step.TaylorPadeStepper;

/**
 * One path from a given node towards a target: the steps chosen by {@link PathSelector} until the target lies in
 * the disk of the last node with a local error below the tolerance. The new nodes are returned, not stored: the
 * caller decides whether they join a tree ({@link Solution#evaluate}), a cache whose reuse cannot change any
 * answer ({@link CanonicalPaths}) or nothing ({@link FrozenTree#evaluate}).
 *
 * <p>The result is a function of the start node, the target and the settings only (the stepper's work arrays
 * carry nothing from one expansion to the next), so the same call gives the same nodes bit for bit on any
 * thread.
 */
final class PathTracer {
    /** Steps towards a target already inside the disk of the current node before its value is accepted. */
    static final int MAX_APPROACHES = 6;
    /** Steps without getting closer to the target before it is declared unreachable. */
    static final int STALL_STEPS = 60;
    /**
     * The tolerance below which tightening it further is no advice: the local errors of double-precision Pade
     * values are then bounded by the rounding of their coefficients and of their evaluation (common practice).
     */
    static final double ROUNDING_TOLERANCE = 1e-14;

    private PathTracer() {
    }

    /** The new nodes of a path (ids negative, each the parent of the next), the last one serving the target. */
    static final class Trace {
        private final Node end;
        private final List<Node> nodes;

        Trace(Node end, List<Node> nodes) {
            this.end = end;
            this.nodes = nodes;
        }

        /** The node whose disk holds the target (the start node when no step was needed). */
        Node end() {
            return end;
        }

        /** The new nodes in path order (empty when no step was needed). */
        List<Node> nodes() {
            return nodes;
        }

        int steps() {
            return nodes.size();
        }
    }

    /**
     * Steps from {@code start} until the target is served.
     *
     * @param singularAtOrigin whether tau = 0 is a singular point (radii then stay below half the distance to it)
     * @throws UnreachableTargetException if the step budget is spent, no admissible step exists, the path stalls
     *     or its carried error exceeds {@link SolverSettings#maxError()}
     */
    static Trace trace(Node start, double tauRe, double tauIm, TaylorPadeStepper stepper, SolverSettings settings,
                       boolean singularAtOrigin) {
        double tol = settings.tolerance();
        List<Node> path = new ArrayList<>();
        Node current = start;
        int approaches = 0;
        double bestDistance = Double.POSITIVE_INFINITY;
        int lastProgress = 0;
        while (true) {
            PathSelector.Choice choice = PathSelector.choose(current, tauRe, tauIm, stepper, tol);
            if (choice != null && choice.reachesTarget()) {
                break;
            }
            if (inDisk(current, tauRe, tauIm)) {
                // the target is in the disk but its local error is above the tolerance (it lies next to a
                // singularity of some component): approach it a few times, then accept the value with its
                // larger, honest error estimate rather than circling for ever
                if (++approaches > MAX_APPROACHES) {
                    break;
                }
            }
            if (choice == null || path.size() >= settings.maxSteps()) {
                throw new UnreachableTargetException("could not reach tau = " + point(tauRe, tauIm) + " within "
                        + settings.maxSteps() + " steps at tolerance " + tol + " (last node at "
                        + point(current.tauRe(), current.tauIm()) + " with radius " + current.radius()
                        + "); the point may lie on or next to a singularity: move it slightly or loosen the"
                        + " tolerance");
            }
            double maxR = maxRadius(singularAtOrigin, current.tauRe() + current.radius() * choice.sr(),
                    current.tauIm() + current.radius() * choice.si());
            Node next = stepper.step(current, choice.sr(), choice.si(), -path.size() - 2, maxR);
            if (!(next.accumulatedError() <= settings.maxError())) {
                throw new UnreachableTargetException("the accumulated error estimate " + next.accumulatedError()
                        + " exceeds " + settings.maxError() + " on the way to tau = " + point(tauRe, tauIm) + "; "
                        + errorAdvice(settings));
            }
            path.add(next);
            current = next;
            double d = ComplexPairs.abs(tauRe - next.tauRe(), tauIm - next.tauIm());
            if (d < bestDistance * 0.999) {
                bestDistance = d;
                lastProgress = path.size();
            } else if (path.size() - lastProgress > STALL_STEPS) {
                // near the target a small move helps; far from it the way itself is blocked (a target many
                // sheets away, or a dense pole field in between)
                boolean near = bestDistance <= 4 * next.radius();
                throw new UnreachableTargetException("no progress towards tau = " + point(tauRe, tauIm) + " in "
                        + STALL_STEPS + " steps (last node at " + point(next.tauRe(), next.tauIm()) + ", closest "
                        + String.format(Locale.ROOT, "%.3g", bestDistance) + " from the target); " + (near
                        ? "the target is hemmed in by singularities: move it slightly"
                        : "singularities block the way there, far from the target: choose a nearer point or"
                        + " sheet"));
            }
        }
        return new Trace(current, path);
    }

    /**
     * What may help when the carried error grows too large: a tighter tolerance or a higher order while the
     * tolerance is above the rounding level of double precision, else only more digits.
     */
    static String errorAdvice(SolverSettings settings) {
        if (settings.tolerance() > ROUNDING_TOLERANCE) {
            return "tighten the tolerance (now " + settings.tolerance() + ") or raise the order (now "
                    + settings.order() + ")";
        }
        return "the tolerance " + settings.tolerance() + " is already at the rounding level of double precision,"
                + " so that a tighter one or a higher order cannot lower it: compute in more digits";
    }

    static boolean inDisk(Node n, double tRe, double tIm) {
        return ComplexPairs.abs(tRe - n.tauRe(), tIm - n.tauIm()) <= n.radius();
    }

    /** Largest radius allowed at tau: half the distance to a singular origin, else 4. */
    static double maxRadius(boolean singularAtOrigin, double tRe, double tIm) {
        if (singularAtOrigin) {
            return 0.5 * ComplexPairs.abs(tRe, tIm);
        }
        return 4.0;
    }

    private static String point(double re, double im) {
        return re + (im < 0 || Double.isNaN(im) ? "" : "+") + im + "i";
    }
}
