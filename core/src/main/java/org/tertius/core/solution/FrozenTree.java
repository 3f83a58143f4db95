package org.tertius.core.solution;

import java.util.List;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.step.Node;
import org.tertius.core.step.TaylorPadeStepper;

/**
 * A path tree as it stood when it was frozen ({@link Solution#freeze()}): nothing is ever added to it, so every
 * value it gives is a function of its nodes and the point alone, whatever was asked before, on whatever thread.
 * Built from a declared set of points in a fixed order (a grid, a line), a frozen tree is itself canonical: the
 * same set gives the same tree, and a resumed computation over the set gives the values of an uninterrupted one.
 *
 * <p>Immutable and thread-safe.
 */
public final class FrozenTree {
    private final Solution owner;
    private final Node[] nodes;
    private final NodeIndex index;

    FrozenTree(Solution owner, Node[] nodes, NodeIndex index) {
        this.owner = owner;
        this.nodes = nodes;
        this.index = index;
    }

    /** The nodes (index = node id). */
    public List<Node> nodes() {
        return List.of(nodes);
    }

    public int nodeCount() {
        return nodes.length;
    }

    /**
     * The value at tau from the stored nodes alone (dense output, no new step): the covering nodes in order of
     * relative distance, the first whose local truncation error is below {@code maxRelativeError} (relative to
     * 1 + |y|) serves.
     *
     * @return the estimate, or null if no node covers tau to that accuracy
     */
    public StateEstimate evaluateStored(double tauRe, double tauIm, double maxRelativeError) {
        return TreeReader.stored(nodes, index, tauRe, tauIm, maxRelativeError);
    }

    /**
     * The value at tau: from the stored node that covers it with a local error below the tolerance and the
     * least total error, else from a detached path traced from the nearest node of the tree (Fornberg-Weideman
     * start rule), or from the root if that path fails, whose nodes are dropped afterwards. The answer depends on
     * the frozen nodes and tau only.
     *
     * @throws UnreachableTargetException as {@link Solution#evaluate}
     * @throws PoleProximityException as {@link Solution#evaluateCanonical}
     */
    public StateEstimate evaluate(double tauRe, double tauIm) {
        owner.checkTarget(tauRe, tauIm);
        TaylorPadeStepper stepper = owner.stepper();
        Node served = TreeReader.bestCovering(nodes, index, tauRe, tauIm, stepper, owner.settings().tolerance());
        if (served != null) {
            return owner.finish(served, tauRe, tauIm, 0);
        }
        Node start = TreeReader.nearest(nodes, tauRe, tauIm);
        PathTracer.Trace t;
        try {
            t = PathTracer.trace(start, tauRe, tauIm, stepper, owner.settings(), owner.singularAtOrigin());
        } catch (UnreachableTargetException fromNearest) {
            // the path from the root, as a fresh solution would take it
            if (start == nodes[0]) {
                throw fromNearest;
            }
            try {
                t = PathTracer.trace(nodes[0], tauRe, tauIm, stepper, owner.settings(), owner.singularAtOrigin());
            } catch (UnreachableTargetException fromRoot) {
                throw fromNearest;
            }
        }
        return owner.finish(t.end(), tauRe, tauIm, t.steps());
    }
}
