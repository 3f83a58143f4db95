package org.tertius.core.solution;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.equation.Term;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.path.PathSelector;
import org.tertius.core.step.Node;
import org.tertius.core.step.SolverSettings;
import org.tertius.core.step.TaylorPadeStepper;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * One solution of a polynomial system, fixed by its state at a start point, with dense output. It keeps the
 * nodes of its path tree (each with its Pade approximants); an evaluation is answered from a stored node whose
 * disk holds the point when its error estimate allows, otherwise a path is integrated from the nearest stored
 * node (Fornberg-Weideman path selection) and its nodes are added to the tree.
 *
 * <p>Thread-safe: the tree only grows, under a lock, and readers work on immutable snapshots; each thread has
 * its own stepper. Values do not depend on which thread asks, but a point may be reached along a different
 * path depending on what was evaluated before; values agree within their error estimates.
 */
public final class Solution {
    private final PolynomialSystem system;
    private final RecurrencePlan plan;
    private final SolverSettings settings;
    private final StateProjection projection;
    private final ThreadLocal<TaylorPadeStepper> steppers;
    /** Steps towards a target already inside the disk of the current node before its value is accepted. */
    private static final int MAX_APPROACHES = 6;
    /** Steps without getting closer to the target before it is declared unreachable. */
    private static final int STALL_STEPS = 60;
    /** Carried relative error above which a node is penalised as the start of a new path. */
    private static final double PENALTY_FROM = 1e-10;
    private final Object lock = new Object();
    private final boolean singularAtOrigin;
    private volatile Node[] nodes;
    private final NodeIndex index = new NodeIndex();

    private Solution(PolynomialSystem system, RecurrencePlan plan, SolverSettings settings,
                     StateProjection projection, Node root) {
        this.system = system;
        this.plan = plan;
        this.settings = settings;
        this.projection = projection;
        this.steppers = ThreadLocal.withInitial(() -> new TaylorPadeStepper(system, plan, settings, projection));
        this.nodes = new Node[] {root};
        if (root != null) {
            index.add(root);
        }
        boolean neg = false;
        for (int i = 0; i < system.dimension(); i++) {
            for (Term t : system.terms(i)) {
                neg |= t.basePower() < 0;
            }
        }
        this.singularAtOrigin = system.variable() == IndependentVariable.PLAIN && neg;
    }

    /**
     * Starts a solution at tau0 with the given state.
     *
     * @param system the system
     * @param settings integrator settings
     * @param projection invariant-manifold projection (or {@link StateProjection#NONE})
     * @param tau0Re start point (integration variable), real part
     * @param tau0Im imaginary part
     * @param y0Re start state, real parts
     * @param y0Im start state, imaginary parts
     */
    public static Solution start(PolynomialSystem system, SolverSettings settings, StateProjection projection,
                                 double tau0Re, double tau0Im, double[] y0Re, double[] y0Im) {
        return start(system, settings, projection, tau0Re, tau0Im, y0Re, y0Im, new double[y0Re.length],
                new double[y0Re.length]);
    }

    /**
     * Starts a solution whose start state is itself uncertain: {@code e0} is the absolute error vector of the
     * start state (for example from a series summed at a small x0, or from moving along another flow); it is
     * carried by the flow like every later error.
     */
    public static Solution start(PolynomialSystem system, SolverSettings settings, StateProjection projection,
                                 double tau0Re, double tau0Im, double[] y0Re, double[] y0Im, double[] e0Re,
                                 double[] e0Im) {
        if (y0Re.length != system.dimension() || y0Im.length != system.dimension()) {
            throw new InvalidInputException("start state", "expected " + system.dimension() + " components");
        }
        for (int i = 0; i < y0Re.length; i++) {
            InvalidInputException.requireFinite("start state " + system.unknowns().get(i), y0Re[i]);
            InvalidInputException.requireFinite("start state " + system.unknowns().get(i), y0Im[i]);
        }
        InvalidInputException.requireFinite("start point", tau0Re);
        InvalidInputException.requireFinite("start point", tau0Im);
        RecurrencePlan plan = RecurrencePlan.compile(system);
        TaylorPadeStepper stepper = new TaylorPadeStepper(system, plan, settings, projection);
        double[] re = y0Re.clone();
        double[] im = y0Im.clone();
        projection.project(tau0Re, tau0Im, re, im);
        Solution probe = new Solution(system, plan, settings, projection, null);
        double maxR = probe.maxRadius(tau0Re, tau0Im);
        if (e0Re.length != system.dimension() || e0Im.length != system.dimension()) {
            throw new InvalidInputException("start error", "expected " + system.dimension() + " components");
        }
        Node root = stepper.expand(0, -1, tau0Re, tau0Im, re, im, e0Re.clone(), e0Im.clone(),
                Math.min(settings.initialStep(), maxR), maxR);
        return new Solution(system, plan, settings, projection, root);
    }

    public PolynomialSystem system() {
        return system;
    }

    public SolverSettings settings() {
        return settings;
    }

    /** The root node (the start point). */
    public Node root() {
        return nodes[0];
    }

    /** A snapshot of the nodes of the tree (index = node id). */
    public List<Node> nodes() {
        return List.of(nodes);
    }

    public int nodeCount() {
        return nodes.length;
    }

    /** Approximate bytes held by the tree. */
    public long footprint() {
        long s = 0;
        for (Node n : nodes) {
            s += n.footprint();
        }
        return s;
    }

    /**
     * Evaluates the state at tau.
     *
     * @throws UnreachableTargetException if no path reaches tau within the step budget and the error bound
     */
    public StateEstimate evaluate(double tauRe, double tauIm) {
        int[] steps = new int[1];
        Node node = reach(tauRe, tauIm, steps);
        return estimate(node, tauRe, tauIm, steps[0]);
    }

    /**
     * Grows the tree so that it reaches tau, without evaluating there (used to build trees for regions).
     *
     * @throws UnreachableTargetException as {@link #evaluate}
     */
    public void extendTo(double tauRe, double tauIm) {
        reach(tauRe, tauIm, new int[1]);
    }

    /** The node that serves tau, after growing the tree if needed; steps[0] receives the new steps. */
    private Node reach(double tauRe, double tauIm, int[] stepsOut) {
        InvalidInputException.requireFinite("target", tauRe);
        InvalidInputException.requireFinite("target", tauIm);
        if (singularAtOrigin && tauRe == 0 && tauIm == 0) {
            throw new InvalidInputException("target", "x = 0 is a singular point of this system");
        }
        TaylorPadeStepper stepper = steppers.get();
        double tol = settings.tolerance();
        Node[] snapshot = nodes;
        Node served = bestCovering(snapshot, tauRe, tauIm, stepper, tol);
        if (served != null) {
            stepsOut[0] = 0;
            return served;
        }
        Node start = nearest(snapshot, tauRe, tauIm);
        List<Node> path = new ArrayList<>();
        Node current = start;
        int baseId = -1;
        int steps = 0;
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
            if (choice == null || steps >= settings.maxSteps()) {
                throw new UnreachableTargetException("could not reach tau = " + tauRe + (tauIm < 0 ? "" : "+")
                        + tauIm + "i within " + settings.maxSteps() + " steps at tolerance " + tol
                        + " (last node at " + current.tauRe() + "," + current.tauIm() + " with radius "
                        + current.radius() + "); the point may lie on or next to a singularity: move it slightly"
                        + " or loosen the tolerance");
            }
            double maxR = maxRadius(current.tauRe() + current.radius() * choice.sr(),
                    current.tauIm() + current.radius() * choice.si());
            Node next = stepper.step(current, choice.sr(), choice.si(), baseId - steps - 1, maxR);
            if (!(next.accumulatedError() <= settings.maxError())) {
                throw new UnreachableTargetException("the accumulated error estimate " + next.accumulatedError()
                        + " exceeds " + settings.maxError() + " on the way to tau = " + tauRe + "," + tauIm
                        + "; tighten the tolerance or raise the order");
            }
            path.add(next);
            current = next;
            steps++;
            double d = ComplexPairs.abs(tauRe - next.tauRe(), tauIm - next.tauIm());
            if (d < bestDistance * 0.999) {
                bestDistance = d;
                lastProgress = steps;
            } else if (steps - lastProgress > STALL_STEPS) {
                throw new UnreachableTargetException("no progress towards tau = " + tauRe + "," + tauIm + " in "
                        + STALL_STEPS + " steps (last node at " + next.tauRe() + "," + next.tauIm()
                        + "); the target is hemmed in by singularities: move it slightly or loosen the tolerance");
            }
        }
        Node last = current;
        if (!path.isEmpty()) {
            last = merge(start, path);
        }
        stepsOut[0] = steps;
        return last;
    }

    private static boolean inDisk(Node n, double tRe, double tIm) {
        return ComplexPairs.abs(tRe - n.tauRe(), tIm - n.tauIm()) <= n.radius();
    }

    /** Largest radius allowed at tau: half the distance to a singular origin in PLAIN mode. */
    private double maxRadius(double tRe, double tIm) {
        if (singularAtOrigin) {
            return 0.5 * ComplexPairs.abs(tRe, tIm);
        }
        return 4.0;
    }

    private Node merge(Node start, List<Node> path) {
        synchronized (lock) {
            Node[] old = nodes;
            Node[] grown = Arrays.copyOf(old, old.length + path.size());
            int parent = start.id();
            Node last = null;
            for (int i = 0; i < path.size(); i++) {
                int id = old.length + i;
                last = path.get(i).renumbered(id, parent);
                grown[id] = last;
                parent = id;
            }
            nodes = grown;
            for (int i = old.length; i < grown.length; i++) {
                index.add(grown[i]);
            }
            return last;
        }
    }

    private Node bestCovering(Node[] snapshot, double tRe, double tIm, TaylorPadeStepper stepper, double tol) {
        Node best = null;
        double bestErr = Double.POSITIVE_INFINITY;
        for (int id : index.candidates(tRe, tIm)) {
            if (id >= snapshot.length) {
                continue;
            }
            Node n = snapshot[id];
            double d = ComplexPairs.abs(tRe - n.tauRe(), tIm - n.tauIm());
            if (d > n.radius()) {
                continue;
            }
            double e = stepper.localError(n, (tRe - n.tauRe()) / n.radius(), (tIm - n.tauIm()) / n.radius());
            if (e > tol) {
                continue;
            }
            double total = e + n.accumulatedError();
            if (total < bestErr) {
                bestErr = total;
                best = n;
            }
        }
        return best;
    }

    /**
     * The value at tau from the stored tree only (no new steps), with the inherited error bounded over the
     * serving node's disk: the fast path for evaluating many points (grids, tables) once a tree covers them.
     *
     * @param maxRelativeError the largest accepted local truncation error relative to 1 + |y|
     * @return the estimate, or null if no stored node covers tau to that accuracy
     */
    public StateEstimate evaluateStored(double tauRe, double tauIm, double maxRelativeError) {
        Node[] snapshot = nodes;
        int n = system.dimension();
        double[] out = new double[2 * n];
        double[] err = new double[n];
        double[] trunc = new double[n];
        // candidates in order of relative distance d / r: the first whose truncation error is acceptable serves
        int[] ids = index.candidates(tauRe, tauIm);
        double[] rel = new double[ids.length];
        int count = 0;
        int[] order = new int[ids.length];
        for (int id : ids) {
            if (id >= snapshot.length) {
                continue;
            }
            Node c = snapshot[id];
            double d = ComplexPairs.abs(tauRe - c.tauRe(), tauIm - c.tauIm()) / c.radius();
            if (d <= 1) {
                rel[count] = d;
                order[count++] = id;
            }
        }
        for (int pass = 0; pass < count; pass++) {
            int bestK = -1;
            for (int k = 0; k < count; k++) {
                if (order[k] >= 0 && (bestK < 0 || rel[k] < rel[bestK])) {
                    bestK = k;
                }
            }
            Node c = snapshot[order[bestK]];
            order[bestK] = -1;
            double sr = (tauRe - c.tauRe()) / c.radius();
            double si = (tauIm - c.tauIm()) / c.radius();
            c.evaluateScaled(sr, si, out, trunc, err);
            boolean ok = true;
            for (int i = 0; i < n && ok; i++) {
                ok = trunc[i] <= maxRelativeError * (1 + ComplexPairs.abs(out[2 * i], out[2 * i + 1]));
            }
            if (ok) {
                return toEstimate(tauRe, tauIm, out, err, c.id(), 0);
            }
        }
        return null;
    }

    /**
     * The node a new path starts from: the nearest disk, with a penalty for nodes that carry a large error
     * (half a radius per decade above {@link #PENALTY_FROM}), so that paths do not grow from nodes placed next to poles when a
     * cleaner node is almost as near (after the Fornberg-Weideman rule of starting from the nearest node).
     */
    private static Node nearest(Node[] snapshot, double tRe, double tIm) {
        Node best = snapshot[0];
        double bestScore = Double.POSITIVE_INFINITY;
        for (Node n : snapshot) {
            double dx = tRe - n.tauRe();
            double dy = tIm - n.tauIm();
            // the score is at least max(|dx|, |dy|) - radius (the penalty is not negative): a node that cannot
            // beat the best so far is passed over without its distance and logarithm (a margin of 1e-12 keeps
            // rounding from deciding, so the choice is the one of the full comparison)
            if (Math.max(Math.abs(dx), Math.abs(dy)) - n.radius() > bestScore * (1 + 1e-12)) {
                continue;
            }
            double d = ComplexPairs.abs(dx, dy) - n.radius();
            double decades = Math.max(0, Math.log10(Math.max(n.accumulatedError(), 1e-300) / PENALTY_FROM));
            double score = Math.max(d, 0) + 0.5 * n.radius() * decades;
            if (score < bestScore) {
                bestScore = score;
                best = n;
            }
        }
        return best;
    }

    private StateEstimate estimate(Node node, double tRe, double tIm, int steps) {
        int n = system.dimension();
        double[] out = new double[2 * n];
        double[] err = new double[n];
        node.evaluateScaled((tRe - node.tauRe()) / node.radius(), (tIm - node.tauIm()) / node.radius(), out, null, err);
        return toEstimate(tRe, tIm, out, err, node.id(), steps);
    }

    /** Packs interleaved values and their errors (plus a few ulps of the value) into an estimate. */
    private static StateEstimate toEstimate(double tRe, double tIm, double[] out, double[] err, int nodeId, int steps) {
        int n = err.length;
        double[] re = new double[n];
        double[] im = new double[n];
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = out[2 * i];
            im[i] = out[2 * i + 1];
            e[i] = err[i] + 4 * Math.ulp(1.0) * ComplexPairs.abs(re[i], im[i]);
        }
        return new StateEstimate(tRe, tIm, re, im, e, nodeId, steps);
    }
}
