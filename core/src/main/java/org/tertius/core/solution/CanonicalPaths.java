package org.tertius.core.solution;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.Cx;
import org.tertius.core.step.Node;
import org.tertius.core.step.SolverSettings;
import org.tertius.core.step.TaylorPadeStepper;

/**
 * Paths that depend on their target alone: the canonical path to tau runs from the root through a chain of
 * waypoints on nested square lattices about the root (spacings 1, 1/2, 1/4, 1/8 in the integration variable),
 * then to tau. With x = tau - tau_root, the waypoint of level l is {@code tau_root + h_l trunc(x / h_l)} per
 * coordinate (truncation towards the root), so each waypoint lies between the root and the target and the
 * waypoint of level l - 1 is a function of the one of level l alone: the chain of a waypoint, and the nodes of
 * its legs, do not depend on which target asked for it. A leg is the path traced from the end node of the
 * previous level towards the waypoint ({@link PathTracer}); a leg that cannot be traced is skipped (the next
 * level starts where the previous one ended), which is again a function of the waypoint alone.
 *
 * <p>The legs are cached (up to {@link #FOOTPRINT_CAP} bytes of nodes): reusing one gives exactly the nodes that
 * tracing it again would give, so the cache changes the cost of an answer, never the answer. Thread-safe: two
 * threads that trace the same leg at once obtain identical nodes and one of them is kept.
 */
final class CanonicalPaths {
    /** Spacing of the coarsest lattice (a power of two, so that the levels nest exactly). */
    static final double COARSEST_SPACING = 1.0;
    /** Number of lattice levels. */
    static final int LEVELS = 4;
    /** Bytes of nodes the cache may hold; legs beyond it are traced again when asked. */
    static final long FOOTPRINT_CAP = 64L << 20;

    private final Node root;
    private final SolverSettings settings;
    private final boolean singularAtOrigin;
    private final Leg rootLeg;
    private final ConcurrentHashMap<Waypoint, Leg> legs = new ConcurrentHashMap<>();
    private final AtomicLong footprint = new AtomicLong();

    CanonicalPaths(Node root, SolverSettings settings, boolean singularAtOrigin) {
        this.root = root;
        this.settings = settings;
        this.singularAtOrigin = singularAtOrigin;
        this.rootLeg = new Leg(null, new Node[0], root);
    }

    /** A waypoint: lattice level and integer coordinates relative to the root. */
    private static final class Waypoint {
        private final int level;
        private final long i;
        private final long j;

        Waypoint(int level, long i, long j) {
            this.level = level;
            this.i = i;
            this.j = j;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Waypoint && ((Waypoint) o).level == level && ((Waypoint) o).i == i
                    && ((Waypoint) o).j == j;
        }

        @Override
        public int hashCode() {
            return Objects.hash(level, i, j);
        }
    }

    /** The nodes of one leg and the leg before it; {@code end} serves the waypoint. */
    private static final class Leg {
        private final Leg previous;
        private final Node[] nodes;
        private final Node end;

        Leg(Leg previous, Node[] nodes, Node end) {
            this.previous = previous;
            this.nodes = nodes;
            this.end = end;
        }
    }

    /**
     * The canonical path to tau, from the root; its last node serves tau. The number of steps traced by this call
     * (legs not found in the cache and the last leg) goes to stepsOut[0].
     *
     * @throws UnreachableTargetException if neither the last leg from the chain nor the direct path from the root
     *     reaches tau (the message is the one of the former)
     */
    List<Node> path(double tauRe, double tauIm, TaylorPadeStepper stepper, int[] stepsOut) {
        int[] steps = new int[1];
        Leg chain = chainTo(tauRe, tauIm, stepper, steps);
        PathTracer.Trace last;
        try {
            last = PathTracer.trace(chain.end, tauRe, tauIm, stepper, settings, singularAtOrigin);
        } catch (UnreachableTargetException fromChain) {
            // the direct path from the root is the one other canonical route
            try {
                chain = rootLeg;
                last = PathTracer.trace(root, tauRe, tauIm, stepper, settings, singularAtOrigin);
            } catch (UnreachableTargetException direct) {
                throw fromChain;
            }
        }
        Deque<Node> out = new ArrayDeque<>(last.nodes().size() + 16);
        for (int k = last.nodes().size() - 1; k >= 0; k--) {
            out.addFirst(last.nodes().get(k));
        }
        for (Leg l = chain; l != null; l = l.previous) {
            for (int k = l.nodes.length - 1; k >= 0; k--) {
                out.addFirst(l.nodes[k]);
            }
        }
        out.addFirst(root);
        stepsOut[0] = steps[0] + last.steps();
        return new ArrayList<>(out);
    }

    /** Bytes of nodes held by the cache. */
    long footprint() {
        return footprint.get();
    }

    /** The leg of the finest waypoint of tau. */
    private Leg chainTo(double tauRe, double tauIm, TaylorPadeStepper stepper, int[] steps) {
        int level = LEVELS - 1;
        double h = spacing(level);
        // x / h is exact (h is a power of two), and truncation nests: trunc(trunc(y) / 2) = trunc(y / 2)
        long i = (long) ((tauRe - root.tauRe()) / h);
        long j = (long) ((tauIm - root.tauIm()) / h);
        return leg(level, i, j, stepper, steps);
    }

    private Leg leg(int level, long i, long j, TaylorPadeStepper stepper, int[] steps) {
        if (level < 0) {
            return rootLeg;
        }
        Waypoint key = new Waypoint(level, i, j);
        Leg cached = legs.get(key);
        if (cached != null) {
            return cached;
        }
        Leg previous = level == 0 ? rootLeg : leg(level - 1, i / 2, j / 2, stepper, steps);
        boolean samePoint = level == 0 ? i == 0 && j == 0 : i % 2 == 0 && j % 2 == 0;
        double h = spacing(level);
        double wRe = root.tauRe() + h * i;
        double wIm = root.tauIm() + h * j;
        Leg made = previous;
        if (!samePoint && !(singularAtOrigin && Cx.abs(wRe, wIm) < h)) {
            try {
                PathTracer.Trace t = PathTracer.trace(previous.end, wRe, wIm, stepper, settings, singularAtOrigin);
                if (t.steps() > 0) {
                    made = new Leg(previous, t.nodes().toArray(new Node[0]), t.end());
                    steps[0] += t.steps();
                }
            } catch (UnreachableTargetException e) {
                // skipped: the next level starts from the end of this one's predecessor
            }
        }
        long bytes = 64;
        for (Node n : made == previous ? new Node[0] : made.nodes) {
            bytes += n.footprint();
        }
        if (footprint.get() + bytes <= FOOTPRINT_CAP) {
            Leg raced = legs.putIfAbsent(key, made);
            if (raced != null) {
                return raced;
            }
            footprint.addAndGet(bytes);
        }
        return made;
    }

    private static double spacing(int level) {
        return COARSEST_SPACING / (1L << level);
    }
}
