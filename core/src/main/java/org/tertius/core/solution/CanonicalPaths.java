package org.tertius.core.solution;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.atomic.AtomicLong;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.step.Node;
import org.tertius.core.step.SolverSettings;
import org.tertius.core.step.TaylorPadeStepper;

/**
 * Paths that depend on their target alone: the canonical path to tau runs from the root out along the ray
 * towards tau through waypoints on rings about the root ({@link #RING} apart in the integration variable), then
 * to tau. Ring k is cut into 2^m(k) angular bins whose arcs are at most {@link #ARC} long, m(k) not decreasing
 * outwards, and its waypoint for tau is the middle of the bin that holds the direction of tau. The bins nest (the
 * bin of ring k - 1 is the bin of ring k shifted right), so the waypoint of ring k - 1 is a function of the one
 * of ring k alone: the chain of a waypoint, and the nodes of its legs, do not depend on which target asked for
 * it, while the chain stays within half an arc of the straight ray (a detour of a few per cent). A leg is the
 * path traced from the end node of the previous ring towards the waypoint ({@link PathTracer}); a leg that cannot
 * be traced is skipped (the next ring starts where the previous one ended), which is again a function of the
 * waypoint alone.
 *
 * <p>The legs are cached (up to {@link #FOOTPRINT_CAP} bytes of nodes): reusing one gives exactly the nodes that
 * tracing it again would give, so the cache changes the cost of an answer, never the answer. Thread-safe: two
 * threads that trace the same leg at once obtain identical nodes and one of them is kept.
 */
final class CanonicalPaths {
    /** Distance between the rings of waypoints about the root (integration variable). */
    static final double RING = 0.25;
    /** Largest arc between neighbouring waypoints of one ring. */
    static final double ARC = 0.25;
    /** Rings beyond this many are not used (targets further out go the rest of the way in one leg). */
    static final int MAX_RINGS = 4096;
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

    /** A waypoint: ring and angular bin (the third field is unused). */
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

    /** The leg of the outermost waypoint of tau (the root's when tau lies within the first ring). */
    private Leg chainTo(double tauRe, double tauIm, TaylorPadeStepper stepper, int[] steps) {
        double xRe = tauRe - root.tauRe();
        double xIm = tauIm - root.tauIm();
        int rings = (int) Math.min(MAX_RINGS, Math.floor(ComplexPairs.abs(xRe, xIm) / RING));
        if (rings == 0) {
            return rootLeg;
        }
        // the angle as a fraction of the turn in [0, 1); bins of 2^m per turn nest: the bin of a coarser ring is
        // the bin of a finer one shifted right, exactly (u 2^m is an exact scaling)
        double u = (Math.atan2(xIm, xRe) + Math.PI) / (2 * Math.PI);
        u = u >= 1 ? 0 : u;
        long[] bins = new long[rings + 1];
        for (int k = 1; k <= rings; k++) {
            bins[k] = (long) Math.floor(u * (1L << binsExponent(k)));
        }
        // the outermost waypoint already cached, then the legs beyond it, ring by ring
        int k = rings;
        Leg known = null;
        while (k > 0 && (known = legs.get(new Waypoint(k, bins[k], 0))) == null) {
            k--;
        }
        Leg previous = k == 0 ? rootLeg : known;
        for (int ring = k + 1; ring <= rings; ring++) {
            previous = leg(ring, bins[ring], previous, stepper, steps);
        }
        return previous;
    }

    /** The leg to waypoint (ring, bin) from the end of its parent's leg; cached while the cap allows. */
    private Leg leg(int ring, long bin, Leg previous, TaylorPadeStepper stepper, int[] steps) {
        Waypoint key = new Waypoint(ring, bin, 0);
        double angle = -Math.PI + (bin + 0.5) * (2 * Math.PI / (1L << binsExponent(ring)));
        double wRe = root.tauRe() + RING * ring * Math.cos(angle);
        double wIm = root.tauIm() + RING * ring * Math.sin(angle);
        Leg made = previous;
        if (!(singularAtOrigin && ComplexPairs.abs(wRe, wIm) < RING)) {
            try {
                PathTracer.Trace t = PathTracer.trace(previous.end, wRe, wIm, stepper, settings, singularAtOrigin);
                if (t.steps() > 0) {
                    made = new Leg(previous, t.nodes().toArray(new Node[0]), t.end());
                    steps[0] += t.steps();
                }
            } catch (UnreachableTargetException e) {
                // skipped: the next ring starts from the end of this one's predecessor
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

    /**
     * log2 of the number of angular bins of ring k: the smallest power of two (at least 4) whose arcs on the
     * ring are at most {@link #ARC} long; it does not decrease outwards, so the bins nest.
     */
    static int binsExponent(int ring) {
        double needed = 2 * Math.PI * RING * ring / ARC;
        int m = 2;
        while ((1L << m) < needed && m < 62) {
            m++;
        }
        return m;
    }
}
