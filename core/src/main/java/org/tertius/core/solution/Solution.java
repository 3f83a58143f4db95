package org.tertius.core.solution;

import java.util.Arrays;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.equation.Term;
import org.tertius.core.step.Node;
import org.tertius.core.step.SolverSettings;
import org.tertius.core.step.TaylorPadeStepper;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * One solution of a polynomial system, fixed by its state at a start point, with dense output. Three ways to
 * evaluate, by what the value may depend on:
 * <ul>
 *   <li>{@link #evaluateCanonical}: a function of the start, the settings and the point only, bit for bit,
 *   whatever was evaluated before and on however many threads: the path is planned from the root through
 *   waypoints fixed by the point ({@link CanonicalPaths}) and never reads the tree.</li>
 *   <li>{@link #freeze()} then {@link FrozenTree#evaluate} or {@link FrozenTree#evaluateStored}: a function of
 *   the frozen tree and the point; a tree grown by {@link #extendTo} over a declared set of points in a fixed
 *   order (from {@link #withRootOnly()}) is itself a function of that set, and its dense output is the fast
 *   way to fill grids.</li>
 *   <li>{@link #evaluate}: answered from a stored node whose disk holds the point when its error estimate
 *   allows, otherwise from a path integrated from the nearest stored node (Fornberg-Weideman path selection)
 *   whose nodes join the tree. The value may then depend on what was evaluated before (in its last digits,
 *   within the error estimates).</li>
 * </ul>
 *
 * <p>Thread-safe: the tree only grows, under a lock, and readers work on immutable snapshots; each thread has
 * its own stepper.
 */
public final class Solution {
    private final PolynomialSystem system;
    private final RecurrencePlan plan;
    private final SolverSettings settings;
    private final StateProjection projection;
    private final ThreadLocal<TaylorPadeStepper> steppers;
    private final Object lock = new Object();
    private final boolean singularAtOrigin;
    private volatile Node[] nodes;
    private final NodeIndex index = new NodeIndex();
    private final CanonicalPaths canonical;

    private Solution(PolynomialSystem system, RecurrencePlan plan, SolverSettings settings,
                     StateProjection projection, Node root, CanonicalPaths canonical) {
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
        this.canonical = canonical != null || root == null ? canonical
                : new CanonicalPaths(root, settings, singularAtOrigin);
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
        Solution probe = new Solution(system, plan, settings, projection, null, null);
        double maxR = PathTracer.maxRadius(probe.singularAtOrigin, tau0Re, tau0Im);
        if (e0Re.length != system.dimension() || e0Im.length != system.dimension()) {
            throw new InvalidInputException("start error", "expected " + system.dimension() + " components");
        }
        Node root = stepper.expand(0, -1, tau0Re, tau0Im, re, im, e0Re.clone(), e0Im.clone(),
                Math.min(settings.initialStep(), maxR), maxR);
        return new Solution(system, plan, settings, projection, root, null);
    }

    /**
     * A solution with the same start, settings and canonical paths whose tree holds the root alone: a tree
     * grown from it over a declared set of points in a fixed order does not depend on what this solution was
     * asked before.
     */
    public Solution withRootOnly() {
        return new Solution(system, plan, settings, projection, root(), canonical);
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

    /** The canonical paths' cache size in bytes. */
    public long canonicalFootprint() {
        return canonical.footprint();
    }

    /**
     * Evaluates the state at tau from the tree, growing it when no stored node serves tau; the value may depend
     * on what was evaluated before (see the class comment; {@link #evaluateCanonical} does not). Next to a pole
     * of a component, closer than the uncertainty of the pole's position, the error estimate of that component
     * is infinite (the other evaluations refuse such a point with a {@link PoleProximityException}); the serving
     * node is still the one a path in more digits may follow.
     *
     * @throws UnreachableTargetException if neither the path from the nearest node nor the one from the root (the
     *     path of a fresh solution, so that a point reachable alone is reachable in any batch) reaches tau within
     *     the step budget and the error bound
     */
    public StateEstimate evaluate(double tauRe, double tauIm) {
        int[] steps = new int[1];
        Node node = reach(tauRe, tauIm, steps);
        return TreeReader.estimate(node, tauRe, tauIm, steps[0]);
    }

    /**
     * Evaluates the state at tau along its canonical path (root, waypoints on nested lattices fixed by tau, tau):
     * the result is a function of the start data, the settings and tau alone, bit for bit, independent of the
     * order of queries, of the tree and of the number of threads. Neither reads nor grows the tree; the legs of
     * the paths are cached where reusing them gives the same nodes. The node id of the estimate is negative (the
     * serving node is not in the tree).
     *
     * @throws UnreachableTargetException if neither the canonical path nor the direct path from the root reaches
     *     tau within the step budget and the error bound
     * @throws PoleProximityException if tau lies next to a pole of a component, closer than the uncertainty of
     *     the pole's position (no digit of that component is known)
     */
    public StateEstimate evaluateCanonical(double tauRe, double tauIm) {
        checkTarget(tauRe, tauIm);
        int[] steps = new int[1];
        List<Node> path = canonical.path(tauRe, tauIm, steppers.get(), steps);
        return finish(path.get(path.size() - 1), tauRe, tauIm, steps[0]);
    }

    /**
     * The nodes of the canonical path to tau, from the root to the node that serves tau (see
     * {@link #evaluateCanonical}); ids other than the root's are negative, each node's parent is the one
     * before it in the list. For layers that integrate again along the same path in another precision.
     */
    public List<Node> canonicalPath(double tauRe, double tauIm) {
        checkTarget(tauRe, tauIm);
        return canonical.path(tauRe, tauIm, steppers.get(), new int[1]);
    }

    /** The tree as it stands now, for evaluations that depend on it and the point alone. */
    public FrozenTree freeze() {
        return new FrozenTree(this, nodes, index);
    }

    /**
     * Grows the tree so that it reaches tau, without evaluating there (used to build trees for regions).
     *
     * @throws UnreachableTargetException as {@link #evaluate}
     */
    public void extendTo(double tauRe, double tauIm) {
        reach(tauRe, tauIm, new int[1]);
    }

    /**
     * Whether the disk of a stored node holds tau (no value is computed): a point outside every disk has no
     * stored approximant, so a tree grown for a region is extended to it ({@code RegionTree}).
     */
    public boolean inStoredDisk(double tauRe, double tauIm) {
        return TreeReader.inSomeDisk(nodes, index, tauRe, tauIm);
    }

    /**
     * The value at tau from the stored tree only (no new steps), with the inherited error bounded over the
     * serving node's disk: the fast path for evaluating many points (grids, tables) once a tree covers them.
     *
     * @param maxRelativeError the largest accepted local truncation error relative to 1 + |y|
     * @return the estimate, or null if no stored node covers tau to that accuracy
     */
    public StateEstimate evaluateStored(double tauRe, double tauIm, double maxRelativeError) {
        return TreeReader.stored(nodes, index, tauRe, tauIm, maxRelativeError);
    }

    /** The node that serves tau, after growing the tree if needed; steps[0] receives the new steps. */
    private Node reach(double tauRe, double tauIm, int[] stepsOut) {
        checkTarget(tauRe, tauIm);
        TaylorPadeStepper stepper = steppers.get();
        Node[] snapshot = nodes;
        Node served = TreeReader.bestCovering(snapshot, index, tauRe, tauIm, stepper, settings.tolerance());
        if (served != null) {
            stepsOut[0] = 0;
            return served;
        }
        Node start = TreeReader.nearest(snapshot, tauRe, tauIm);
        PathTracer.Trace t;
        try {
            t = PathTracer.trace(start, tauRe, tauIm, stepper, settings, singularAtOrigin);
        } catch (UnreachableTargetException fromNearest) {
            // the path a fresh solution would take: a point reachable alone stays reachable in any batch
            if (start == snapshot[0]) {
                throw fromNearest;
            }
            try {
                start = snapshot[0];
                t = PathTracer.trace(start, tauRe, tauIm, stepper, settings, singularAtOrigin);
            } catch (UnreachableTargetException fromRoot) {
                throw fromNearest;
            }
        }
        stepsOut[0] = t.steps();
        return t.steps() == 0 ? t.end() : merge(start, t.nodes());
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

    /** Refuses targets that are not finite or sit on a singular origin. */
    void checkTarget(double tauRe, double tauIm) {
        InvalidInputException.requireFinite("target", tauRe);
        InvalidInputException.requireFinite("target", tauIm);
        if (singularAtOrigin && tauRe == 0 && tauIm == 0) {
            throw new InvalidInputException("target", "x = 0 is a singular point of this system");
        }
    }

    /**
     * The estimate at tau from the node that serves it.
     *
     * @throws PoleProximityException if the error estimate of a component is not finite: next to a pole of
     *     that component, closer than the uncertainty of the pole's position, no digit of it is known
     */
    StateEstimate finish(Node node, double tauRe, double tauIm, int steps) {
        StateEstimate e = TreeReader.estimate(node, tauRe, tauIm, steps);
        for (int i = 0; i < e.dimension(); i++) {
            if (!Double.isFinite(e.error(i)) || !Double.isFinite(e.re(i)) || !Double.isFinite(e.im(i))) {
                throw new PoleProximityException("no digit of " + system.unknowns().get(i) + " is known at tau = "
                        + tauRe + (tauIm < 0 ? "" : "+") + tauIm + "i: the point lies next to a pole of it, closer"
                        + " than the uncertainty of the pole's position in double precision; move it away from the"
                        + " pole or compute in more digits", i);
            }
        }
        return e;
    }

    TaylorPadeStepper stepper() {
        return steppers.get();
    }

    boolean singularAtOrigin() {
        return singularAtOrigin;
    }
}
