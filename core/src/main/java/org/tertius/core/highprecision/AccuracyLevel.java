package org.tertius.core.highprecision;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.Future;
import java.util.concurrent.FutureTask;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.mp.SegmentIntegrator;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.step.Node;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * Everything of a high-precision replay that depends on one accuracy: the precision, the integrator, the start
 * state, and the states reached at nodes of the planned paths (kept, so that later points start from the nearest
 * of them). Thread-safe.
 */
final class AccuracyLevel {
    final int tolDigits;
    final MpContext ctx;
    final SegmentIntegrator integrator;
    private final HighPrecisionForm form;
    private final Solution planner;
    private final PathState root;
    private final Map<Integer, PathState> reached = new ConcurrentHashMap<>();
    /**
     * The first series at the reached nodes that runs started from, expanded once and shared by every later run
     * from the same node (with the continued fractions built from it): points beyond one node cost only their own
     * last steps. The series is the one a fresh run would expand there, so sharing it changes no value.
     */
    private final Map<Integer, SegmentIntegrator.Start> nodeStarts = new ConcurrentHashMap<>();
    /** The first series at the root per level (shared with the owner, which may expand it ahead). */
    private final Map<Integer, Future<SegmentIntegrator.Start>> rootStarts;
    private final ThreadLocal<ReplayProgress> meter = new ThreadLocal<>();

    AccuracyLevel(int tolDigits, HighPrecisionForm form, RecurrencePlan plan,
                  Map<Integer, Future<SegmentIntegrator.Start>> rootStarts) {
        this.tolDigits = tolDigits;
        this.form = form;
        this.planner = form.planner();
        this.rootStarts = rootStarts;
        this.ctx = new MpContext(tolDigits + 6);
        this.integrator = new SegmentIntegrator(plan, form.coefficients(ctx), ctx, tolDigits);
        this.root = new PathState(form.startTau(ctx), form.startState(ctx), PlannedPath.startScale(planner.root()),
                0);
    }

    /** A state reached at a node of the path tree: tau, the state, the scale to start from, steps from the root. */
    private static final class PathState {
        final MpComplex tau;
        final MpComplex[] y;
        final double scale;
        final int steps;

        PathState(MpComplex tau, MpComplex[] y, double scale, int steps) {
            this.tau = tau;
            this.y = y;
            this.scale = scale;
            this.steps = steps;
        }
    }

    /**
     * The first series at the root, expanded once per level and shared by every run from the root (ahead, or here
     * on first use); null when its expansion failed (the run then meets the failure again).
     */
    private SegmentIntegrator.Start rootStart() {
        Future<SegmentIntegrator.Start> f = rootStarts.get(tolDigits);
        if (f == null) {
            FutureTask<SegmentIntegrator.Start> mine = new FutureTask<>(this::expandRoot);
            f = rootStarts.putIfAbsent(tolDigits, mine);
            if (f == null) {
                mine.run();
                f = mine;
            }
        }
        try {
            return f.get();
        } catch (InterruptedException e) {
            // the expansion may serve other callers, so it is not cancelled; this caller's run sees the interrupt
            Thread.currentThread().interrupt();
            return null;
        } catch (ExecutionException e) {
            // failed (e.g. a singularity at the start): the run from the root meets the same failure
            return null;
        }
    }

    /** Expands the first series at the root (from the start scale the planner's root node suggests). */
    SegmentIntegrator.Start expandRoot() {
        return integrator.start(root.tau, root.y, root.scale);
    }

    /** This level with progress reported to p by the calling thread. */
    AccuracyLevel withProgress(ReplayProgress p) {
        meter.set(p);
        return this;
    }

    private SegmentIntegrator.Advance advance() {
        ReplayProgress p = meter.get();
        return p == null ? null : p::advanced;
    }

    /** The values at the point, integrated along the planned path. */
    Outcome valueAt(ExactPoint point) {
        MpComplex u = ctx.fromExact(point.z());
        PathState s = stateAt(point.toSurfacePoint(), form.tau(ctx, u, point.sheet()));
        return new Outcome(ctx, form.values(ctx, u, s.y), s.steps);
    }

    /**
     * The state at the point: first at the last node of its planned chain (the node nearest the point), from the
     * deepest node of the chain reached before, then from that node to the point. Every point whose chain ends at
     * the same node starts from the same kept series there ({@link #nodeStart}), so the points of a line or of a
     * cluster cost one Pade evaluation each once their node is reached.
     */
    private PathState stateAt(SurfacePoint point, MpComplex target) {
        double targetRe = form.coordinate().tauRe(point);
        double targetIm = form.coordinate().tauIm(point);
        int[] ids = PlannedPath.chain(planner, targetRe, targetIm);
        int from = 0;
        for (int i = ids.length - 1; i > 0; i--) {
            if (reached.containsKey(ids[i])) {
                from = i;
                break;
            }
        }
        PathState s = from == 0 ? root : reached.get(ids[from]);
        List<Node> nodes = planner.nodes();
        int last = ids.length - 1;
        ReplayProgress p = meter.get();
        if (p != null) {
            double len = 0;
            double[] prev = {s.tau.toComplex().getReal(), s.tau.toComplex().getImaginary()};
            for (int i = from + 1; i < ids.length; i++) {
                Node n = nodes.get(ids[i]);
                len += Math.hypot(n.tauRe() - prev[0], n.tauIm() - prev[1]);
                prev = new double[] {n.tauRe(), n.tauIm()};
            }
            len += Math.hypot(targetRe - prev[0], targetIm - prev[1]);
            p.expect(len);
        }
        if (from < last) {
            Node end = nodes.get(ids[last]);
            s = run(s, ids, from, last, ctx.fromDouble(end.tauRe(), end.tauIm()), ids[last]);
            reached.putIfAbsent(ids[last], s);
            s = reached.get(ids[last]);
            from = last;
        }
        return run(s, ids, from, last, target, -1);
    }

    /**
     * Integrates from the state at node {@code ids[from]} (the root when from is 0) through the nodes after it up
     * to {@code ids[upTo - 1]}, then to the end point ({@code endNode} its node id, or -1 for a point). Nodes that lie
     * on the straight line between their neighbours are dropped (a step need not stop there); states reached at
     * kept nodes are kept for later calls.
     */
    private PathState run(PathState s, int[] ids, int from, int upTo, MpComplex end, int endNode) {
        List<Node> nodes = planner.nodes();
        List<double[]> planned = new ArrayList<>();
        planned.add(new double[] {s.tau.toComplex().getReal(), s.tau.toComplex().getImaginary()});
        for (int i = from + 1; i < upTo; i++) {
            Node n = nodes.get(ids[i]);
            planned.add(new double[] {n.tauRe(), n.tauIm()});
        }
        planned.add(new double[] {end.toComplex().getReal(), end.toComplex().getImaginary()});
        int[] kept = PlannedPath.straightened(planned);
        List<MpComplex> waypoints = new ArrayList<>();
        int[] nodeOf = new int[kept.length];
        for (int k = 0; k < kept.length; k++) {
            int i = kept[k];
            boolean isEnd = i == planned.size() - 1;
            waypoints.add(isEnd ? end : ctx.fromDouble(planned.get(i)[0], planned.get(i)[1]));
            nodeOf[k] = isEnd ? endNode : ids[from + i];
        }
        PathState start = s;
        SegmentIntegrator.Landing landing = (j, y, scale, steps) -> {
            if (nodeOf[j] >= 0 && j < kept.length - 1) {
                reached.putIfAbsent(nodeOf[j], new PathState(waypoints.get(j), y, scale, start.steps + steps));
            }
        };
        SegmentIntegrator.Start firstSeries = s == root ? rootStart() : nodeStart(ids[from], s);
        SegmentIntegrator.Result r = firstSeries != null
                ? integrator.run(firstSeries, waypoints, false, advance(), landing)
                : integrator.run(s.tau, s.y, waypoints, s.scale, false, advance(), landing);
        return new PathState(end, r.state(), r.scale(), s.steps + r.steps());
    }

    /** The first series at a reached node, expanded on first use and kept. */
    private SegmentIntegrator.Start nodeStart(int node, PathState s) {
        SegmentIntegrator.Start start = nodeStarts.get(node);
        if (start == null) {
            start = integrator.start(s.tau, s.y, s.scale);
            SegmentIntegrator.Start other = nodeStarts.putIfAbsent(node, start);
            start = other != null ? other : start;
        }
        return start;
    }

    /**
     * n equally spaced points of the straight line from a to b in the engine variable, from one pass of steps
     * with its nodes kept.
     */
    List<Outcome> line(ExactPoint a, ExactPoint b, int n) {
        MpComplex ua = ctx.fromExact(a.z());
        PathState s = stateAt(a.toSurfacePoint(), form.tau(ctx, ua, a.sheet()));
        MpComplex tb = form.tau(ctx, ctx.fromExact(b.z()), b.sheet());
        ReplayProgress p = meter.get();
        if (p != null) {
            p.expect(ctx.subtract(tb, s.tau).abs());
        }
        SegmentIntegrator.Result r = integrator.run(s.tau, s.y, tb, s.scale, true, advance());
        MpComplex delta = ctx.subtract(tb, s.tau);
        List<Outcome> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            MpComplex t = i == n - 1 ? tb : ctx.add(s.tau, ctx.divide(ctx.multiply(delta, i), n - 1));
            SegmentIntegrator.Result d = integrator.denseState(r, s.tau, t);
            MpComplex u = i == 0 ? ua : i == n - 1 ? ctx.fromExact(b.z()) : form.coordinateOf(ctx, t);
            out.add(new Outcome(ctx, form.values(ctx, u, d.state()), s.steps + d.steps()));
        }
        return out;
    }
}
