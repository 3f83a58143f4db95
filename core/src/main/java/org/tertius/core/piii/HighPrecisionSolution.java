package org.tertius.core.piii;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.Future;
import java.util.concurrent.FutureTask;
import java.util.function.DoubleConsumer;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.mp.SegmentIntegrator;
import org.tertius.core.mp.Workers;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.step.Node;
import org.tertius.core.step.SolverSettings;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * A Painleve III solution evaluated to a requested number of significant digits, from exact parameters and
 * start data. The double-precision engine plans the path (its path tree in tau = log z, around the poles); the
 * path from the start to the node nearest the target, and on to the target, is then integrated again in
 * arbitrary precision with the same recurrence plan, the same polynomial form and its conversions.
 *
 * <p>Every value comes with its estimated number of correct digits: the path is integrated at two accuracies
 * (about D/3 and D plus guard digits, side by side on two processors); their difference measures how much the
 * path amplifies errors, and the guard digits of the accurate run are widened and the run repeated when the
 * estimate falls short of D.
 *
 * <p>The states reached at the nodes of the path tree are kept (per accuracy), so later evaluations and
 * tabulations start from the nearest of them instead of from the start point. Thread-safe; a long run can be
 * cancelled by interrupting its thread ({@link org.tertius.core.TertiusException}).
 */
public final class HighPrecisionSolution {
    /** The smallest and largest number of digits accepted. */
    public static final int MIN_DIGITS = 16;
    public static final int MAX_DIGITS = 5000;
    private static final int MAX_REFINEMENTS = 3;

    private final ExactNumber[] parameters;
    private final ExactNumber z0;
    private final ExactNumber w0;
    private final ExactNumber dw0;
    private final int digits;
    private final DoubleConsumer progress;
    private final Solution engine;
    private final EngineView view;
    private final RecurrencePlan plan;
    private final double planningTolerance;
    private final Map<Integer, Level> levels = new ConcurrentHashMap<>();
    /** The first series at the root per level (tolerance digits), expanded once (see {@link Level#rootStart}). */
    private final Map<Integer, Future<SegmentIntegrator.Start>> rootStarts =
            new ConcurrentHashMap<>();
    private final java.util.concurrent.atomic.AtomicReference<Statistics> statistics =
            new java.util.concurrent.atomic.AtomicReference<>();

    private HighPrecisionSolution(Builder b) {
        this.parameters = b.parameters.clone();
        this.z0 = b.z0;
        this.w0 = b.w0;
        this.dw0 = b.dw0;
        this.digits = b.digits;
        this.progress = b.progress;
        Painleve3 eq = Painleve3.of(parameters[0].toComplex(), parameters[1].toComplex(), parameters[2].toComplex(),
                parameters[3].toComplex());
        Painleve3Solution planner = Painleve3Solution.builder(eq).settings(b.planning)
                .start(z0.toComplex(), w0.toComplex(), dw0.toComplex()).build();
        this.view = EngineView.of(planner);
        this.engine = view.engine();
        this.plan = RecurrencePlan.compile(engine.system());
        this.planningTolerance = b.planning.tolerance();
    }

    /** A builder for the equation with the given exact parameters (decimals or rationals p/q, see {@link ExactNumber}). */
    public static Builder builder(String alpha, String beta, String gamma, String delta) {
        return new Builder(ExactNumber.parse("alpha", alpha), ExactNumber.parse("beta", beta),
                ExactNumber.parse("gamma", gamma), ExactNumber.parse("delta", delta));
    }

    public static Builder builder(ExactNumber alpha, ExactNumber beta, ExactNumber gamma, ExactNumber delta) {
        return new Builder(alpha, beta, gamma, delta);
    }

    /** The requested number of significant digits. */
    public int digits() {
        return digits;
    }

    /** The polynomial form integrated (from the planning solution). */
    public String formDescription() {
        return view.formDescription();
    }

    /**
     * The value at a point of the Riemann surface (the point's coordinates are taken as exact binary numbers).
     *
     * @throws org.tertius.core.UnreachableTargetException if the point cannot be reached
     */
    public HighPrecisionValue evaluate(SurfacePoint point) {
        return compute(level -> List.of(level.valueAt(point)), List.of(point)).get(0);
    }

    /**
     * n >= 2 values at equally spaced points of the straight segment from a to b in tau = log z (a segment of
     * the Riemann surface), from one pass of high-precision steps along it: the path is not integrated again per
     * point. The values belong to the exact points tau_a + (i / (n-1)) (tau_b - tau_a); the {@link
     * HighPrecisionValue#point()} of an interior point is that point rounded to double precision.
     */
    public List<HighPrecisionValue> tabulate(SurfacePoint a, SurfacePoint b, int n) {
        if (n < 2 || n > 1000000) {
            throw new InvalidInputException("n", "the number of points must be in [2, 1000000], got " + n);
        }
        List<SurfacePoint> points = new ArrayList<>();
        points.add(a);
        for (int i = 1; i < n - 1; i++) {
            double t = (double) i / (n - 1);
            points.add(SurfacePoint.fromLog(a.logRe() + t * (b.logRe() - a.logRe()),
                    a.logIm() + t * (b.logIm() - a.logIm())));
        }
        points.add(b);
        return compute(level -> level.line(a, b, n), points);
    }

    /** Figures of the last computation (for benchmarks), or null before the first. */
    public Statistics statistics() {
        return statistics.get();
    }

    /** Figures of one computation: order, steps, fixed-point bits and complex products of its accurate pass. */
    public static final class Statistics {
        private final int order;
        private final int steps;
        private final int totalSteps;
        private final int fractionBits;
        private final long productCount;

        Statistics(int order, int steps, int totalSteps, int fractionBits, long productCount) {
            this.order = order;
            this.steps = steps;
            this.totalSteps = totalSteps;
            this.fractionBits = fractionBits;
            this.productCount = productCount;
        }

        /** Taylor order of the accurate pass. */
        public int order() {
            return order;
        }

        /** Steps of the accurate pass from the start to the (first) point. */
        public int steps() {
            return steps;
        }

        /** Steps of the cheap and the accurate pass together. */
        public int totalSteps() {
            return totalSteps;
        }

        /** Fractional bits of the fixed-point coefficients of the accurate pass. */
        public int fractionBits() {
            return fractionBits;
        }

        /** Complex products of coefficients done by the accurate pass (recurrence and continued fractions). */
        public long productCount() {
            return productCount;
        }
    }

    /** One integration pass at some accuracy, returning {w, w'} per point and the steps taken. */
    private interface Pass {
        List<Outcome> run(Level level);
    }

    /** {w, w'} of one point from one pass (at the pass's precision), with the number of steps on its path. */
    static final class Outcome {
        final MpContext ctx;
        final MpComplex w;
        final MpComplex dw;
        final int steps;

        Outcome(MpContext ctx, MpComplex w, MpComplex dw, int steps) {
            this.ctx = ctx;
            this.w = w;
            this.dw = dw;
            this.steps = steps;
        }
    }

    /**
     * Runs a cheap pass and an accurate pass; the relative difference d of their results measures the error
     * amplification of the path, A = d / (steps * tol_cheap), and the accurate result is credited with
     * 10 * steps * tol * max(1, A) (each step contributes at most the local tolerance, amplified alike).
     */
    private List<HighPrecisionValue> compute(Pass pass, List<SurfacePoint> points) {
        int cheapDigits = Math.max(20, digits / 3 + 5);
        Progress meter = new Progress(progress);
        // the two accuracies run side by side when there is more than one processor; the guard digits of the
        // accurate pass then come from the planned path (its nodes, doubled for the extra Pade and Taylor steps)
        // instead of the steps of the cheap pass, and a shortfall is caught by the refinement rounds below
        Future<List<Outcome>> cheapRun = null;
        List<Outcome> cheap = null;
        int expectedSteps;
        if (Workers.PARALLEL) {
            // the first series of both passes is expanded on other processors while this thread plans the path (it
            // needs only the start data); the accurate pass is guessed to take 10 to 99 steps (two guard digits for
            // them), and a plan outside that range leaves the expansion ahead unused
            expandRootAhead(accurateDigits(TYPICAL_EXPECTED_STEPS));
            expandRootAhead(cheapDigits);
            expectedSteps = 2 * plannedSteps(points) + 2;
            int cd = cheapDigits;
            cheapRun = Workers.submit(() -> pass.run(level(cd, null)));
            meter.phase(0, 1);
        } else {
            meter.phase(0, 0.15);
            cheap = pass.run(level(cheapDigits, meter));
            expectedSteps = 1;
            for (Outcome o : cheap) {
                expectedSteps = Math.max(expectedSteps, o.steps);
            }
        }
        try {
            return refine(pass, points, meter, cheapRun, cheap, cheapDigits, accurateDigits(expectedSteps));
        } finally {
            if (cheapRun != null && !cheapRun.isDone()) {
                cheapRun.cancel(true);
            }
        }
    }

    /** Steps of the accurate pass guessed before the path is planned (see {@link #compute}). */
    private static final int TYPICAL_EXPECTED_STEPS = 20;

    /**
     * The tolerance digits of the accurate pass for a path of about that many steps: 4 guard digits and those that
     * the accumulation of the local errors over the steps takes.
     */
    private int accurateDigits(int expectedSteps) {
        return digits + 4 + (int) Math.ceil(Math.log10(expectedSteps + 1.0));
    }

    /**
     * The most nodes of the planned path from the start to the first or the last point (the points between lie on
     * a line from the first, and looking each of them up would plan paths that are never taken).
     */
    private int plannedSteps(List<SurfacePoint> points) {
        int most = 1;
        for (SurfacePoint p : List.of(points.get(0), points.get(points.size() - 1))) {
            most = Math.max(most, chain(p.logRe(), p.logIm()).length);
        }
        return most;
    }

    private List<HighPrecisionValue> refine(Pass pass, List<SurfacePoint> points, Progress meter,
                                            Future<List<Outcome>> cheapRun, List<Outcome> cheap,
                                            int cheapDigits, int accurateDigits) {
        List<HighPrecisionValue> result = null;
        for (int round = 0; round < MAX_REFINEMENTS; round++) {
            if (round > 0 || cheapRun == null) {
                meter.phase(0.15 + 0.85 * round / MAX_REFINEMENTS, round == 0 ? 0.85 : 0.85 / MAX_REFINEMENTS);
            }
            Level level = level(accurateDigits, meter);
            long products = level.integrator.products();
            List<Outcome> accurate = pass.run(level);
            if (cheap == null) {
                cheap = Workers.join(cheapRun);
            }
            statistics.set(new Statistics(level.integrator.order(), accurate.get(0).steps,
                    accurate.get(0).steps + cheap.get(0).steps, level.integrator.fractionBits(),
                    level.integrator.products() - products));
            int worst = Integer.MAX_VALUE;
            result = new ArrayList<>();
            for (int i = 0; i < accurate.size(); i++) {
                Outcome a = accurate.get(i);
                Outcome c = cheap.get(i);
                double log10Diff = Math.max(relativeDifference(a.ctx, a.w, c.w), relativeDifference(a.ctx, a.dw, c.dw));
                double log10Amp = Math.max(0, log10Diff + cheapDigits - Math.log10(c.steps + 1.0));
                double log10Err = 1 + Math.log10(a.steps + 1.0) - accurateDigits + log10Amp;
                int correct = (int) Math.max(0, Math.min(digits, Math.floor(-log10Err)));
                worst = Math.min(worst, correct);
                result.add(new HighPrecisionValue(points.get(i), a.ctx, a.w, a.dw, digits, correct));
            }
            if (worst >= digits) {
                break;
            }
            cheap = accurate;
            cheapDigits = accurateDigits;
            accurateDigits = accurateDigits + (digits - worst) + 5;
        }
        meter.done();
        return result;
    }

    /** log10 of |a - b| / |a| (or of |a - b| when a = 0), a at the precision of c. */
    private static double relativeDifference(MpContext c, MpComplex a, MpComplex b) {
        MpComplex d = c.subtract(a, b);
        if (d.isZero()) {
            return -c.digits();
        }
        double l = d.log2Abs() - (a.isZero() ? 0 : a.log2Abs());
        return l / MpContext.LOG2_10;
    }

    /**
     * Builds the level of that accuracy and expands its first series at the root on a worker thread (once per
     * level), for the first run from the root to start from; a failure there is left to that run to meet again.
     * An expansion ahead that no run uses (a failed or interrupted computation, a plan longer or shorter than
     * guessed) still runs to its end: one expansion, on the other processor.
     */
    private void expandRootAhead(int tolDigits) {
        rootStarts.computeIfAbsent(tolDigits,
                d -> Workers.submit(() -> levels.computeIfAbsent(d, Level::new).expandRoot()));
    }

    private Level level(int tolDigits, Progress meter) {
        Level l = levels.computeIfAbsent(tolDigits, Level::new);
        return l.withProgress(meter);
    }

    /**
     * The first series scale: the distance from the root node to the nearest singularity its approximants found
     * (an estimate of the radius of convergence), else its disk radius. The series is re-expanded when the scale
     * is far from the radius, so a good guess saves a whole expansion per pass.
     */
    private static double startScale(Node root) {
        double nearest = Double.POSITIVE_INFINITY;
        for (int j = 0; j < root.singularityCount(); j++) {
            nearest = Math.min(nearest, Math.hypot(root.singularityRe(j) - root.tauRe(),
                    root.singularityIm(j) - root.tauIm()));
        }
        return nearest > 0 && nearest < Double.POSITIVE_INFINITY ? nearest : root.radius();
    }

    /** The double-precision chain of node ids from the root to the node that serves tau. */
    private int[] chain(double tauRe, double tauIm) {
        int served = engine.evaluate(tauRe, tauIm).nodeId();
        List<Node> nodes = engine.nodes();
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

    /** Largest distance of a dropped node from the straight line that replaces it, relative to that line's length. */
    private static final double STRAIGHT = 0.01;

    /**
     * The indices (after the first point) of the points of a polyline that are kept when runs of nearly collinear
     * points are replaced by one straight line: a point is dropped when it and every point dropped before it lie
     * within STRAIGHT times the length of the new line from it; the last point is always kept. The planner keeps
     * its nodes at about half a radius of convergence from every pole, so a line this close to the planned path
     * passes the poles on the same side.
     */
    static int[] straightenedPath(List<double[]> p) {
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

    /** Progress over the phases of a computation, reported as a fraction in [0, 1]. */
    private static final class Progress {
        private final DoubleConsumer sink;
        private double start;
        private double width;
        private double total = 1;
        private double done;

        Progress(DoubleConsumer sink) {
            this.sink = sink;
        }

        void phase(double start, double width) {
            this.start = start;
            this.width = width;
            this.done = 0;
            this.total = 0;
        }

        void expect(double length) {
            total += length;
        }

        void advanced(double d) {
            done += d;
            if (sink != null && total > 0) {
                sink.accept(Math.min(1, start + width * Math.min(1, done / total)));
            }
        }

        void done() {
            if (sink != null) {
                sink.accept(1.0);
            }
        }
    }

    /** Everything that depends on one accuracy: precision, kernel, start state, and the states reached. */
    private final class Level {
        final int tolDigits;
        final MpContext ctx;
        final HighPrecisionParameters hp;
        final SegmentIntegrator integrator;
        final PathState root;
        final Map<Integer, PathState> reached = new ConcurrentHashMap<>();
        private final ThreadLocal<Progress> meter = new ThreadLocal<>();

        Level(int tolDigits) {
            this.tolDigits = tolDigits;
            this.ctx = new MpContext(tolDigits + 6);
            this.hp = new HighPrecisionParameters(ctx, ctx.fromExact(parameters[0]), ctx.fromExact(parameters[1]),
                    ctx.fromExact(parameters[2]), ctx.fromExact(parameters[3]));
            this.integrator = new SegmentIntegrator(plan, view.coefficients(hp), ctx, tolDigits);
            MpComplex z = ctx.fromExact(z0);
            MpComplex[] y0 = view.toState(hp, z, ctx.fromExact(w0), ctx.fromExact(dw0));
            this.root = new PathState(ctx.log(z), y0, startScale(engine.root()), 0);
        }

        /**
         * The first series at the root, expanded once per level and shared by every run from the root (ahead, see
         * {@link #expandRootAhead}, or here on first use); null when its expansion failed (the run then meets the
         * failure again).
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
            } catch (java.util.concurrent.ExecutionException e) {
                // failed (e.g. a singularity at the start): the run from the root meets the same failure
                return null;
            }
        }

        /** Expands the first series at the root (from the start scale the planner's root node suggests). */
        SegmentIntegrator.Start expandRoot() {
            return integrator.start(root.tau, root.y, root.scale);
        }

        Level withProgress(Progress p) {
            meter.set(p);
            return this;
        }

        private SegmentIntegrator.Advance advance() {
            Progress p = meter.get();
            return p == null ? null : p::advanced;
        }

        /** The value at the point, integrated along the planned path. */
        Outcome valueAt(SurfacePoint point) {
            PathState s = stateAt(point);
            return outcome(point, s.y, s.steps);
        }

        PathState stateAt(SurfacePoint point) {
            int[] ids = chain(point.logRe(), point.logIm());
            List<Node> nodes = engine.nodes();
            int from = 0;
            for (int i = ids.length - 1; i > 0; i--) {
                if (reached.containsKey(ids[i])) {
                    from = i;
                    break;
                }
            }
            PathState s = from == 0 ? root : reached.get(ids[from]);
            MpComplex target = tau(point);
            Progress p = meter.get();
            if (p != null) {
                double len = 0;
                double[] prev = {s.tau.toComplex().getReal(), s.tau.toComplex().getImaginary()};
                for (int i = from + 1; i < ids.length; i++) {
                    Node n = nodes.get(ids[i]);
                    len += Math.hypot(n.tauRe() - prev[0], n.tauIm() - prev[1]);
                    prev = new double[] {n.tauRe(), n.tauIm()};
                }
                len += Math.hypot(point.logRe() - prev[0], point.logIm() - prev[1]);
                p.expect(len);
            }
            // the nodes after the start, then the point; nodes that lie on the straight line between their
            // neighbours are dropped (a step need not stop there); states reached at kept nodes are kept for
            // later calls
            List<double[]> planned = new ArrayList<>();
            planned.add(new double[] {s.tau.toComplex().getReal(), s.tau.toComplex().getImaginary()});
            for (int i = from + 1; i < ids.length; i++) {
                Node n = nodes.get(ids[i]);
                planned.add(new double[] {n.tauRe(), n.tauIm()});
            }
            planned.add(new double[] {point.logRe(), point.logIm()});
            int[] kept = straightenedPath(planned);
            List<MpComplex> waypoints = new ArrayList<>();
            int[] nodeOf = new int[kept.length];
            for (int k = 0; k < kept.length; k++) {
                int i = kept[k];
                boolean isTarget = i == planned.size() - 1;
                waypoints.add(isTarget ? target : ctx.fromDouble(planned.get(i)[0], planned.get(i)[1]));
                nodeOf[k] = isTarget ? -1 : ids[from + i];
            }
            PathState start = s;
            SegmentIntegrator.Landing landing = (j, y, scale, steps) -> {
                if (nodeOf[j] >= 0) {
                    reached.putIfAbsent(nodeOf[j], new PathState(waypoints.get(j), y, scale, start.steps + steps));
                }
            };
            SegmentIntegrator.Start first = s == root ? rootStart() : null;
            SegmentIntegrator.Result r = first != null
                    ? integrator.run(first, waypoints, false, advance(), landing)
                    : integrator.run(s.tau, s.y, waypoints, s.scale, false, advance(), landing);
            return new PathState(target, r.state(), r.scale(), s.steps + r.steps());
        }

        /** tau = log|z| + i (Arg z + 2 pi k) of a point, at this precision. */
        MpComplex tau(SurfacePoint p) {
            MpComplex l = ctx.log(ctx.fromDouble(p.re(), p.im()));
            if (p.sheet() != 0) {
                MpComplex twoPiK = ctx.multiply(ctx.pi(), 2L * p.sheet());
                l = ctx.add(l, ctx.multiply(twoPiK, ctx.fromDouble(0, 1)));
            }
            return l;
        }

        Outcome outcome(SurfacePoint point, MpComplex[] y, int steps) {
            return outcome(ctx.fromDouble(point.re(), point.im()), y, steps);
        }

        Outcome outcome(MpComplex z, MpComplex[] y, int steps) {
            MpComplex[] v = view.fromState(hp, z, y);
            return new Outcome(ctx, v[0], v[1], steps);
        }

        /** n equally spaced points of the line from a to b in tau, from one pass of steps with their nodes kept. */
        List<Outcome> line(SurfacePoint a, SurfacePoint b, int n) {
            PathState s = stateAt(a);
            MpComplex tb = tau(b);
            Progress p = meter.get();
            if (p != null) {
                p.expect(Math.hypot(b.logRe() - a.logRe(), b.logIm() - a.logIm()));
            }
            SegmentIntegrator.Result r = integrator.run(s.tau, s.y, tb, s.scale, true, advance());
            MpComplex delta = ctx.subtract(tb, s.tau);
            List<Outcome> out = new ArrayList<>();
            for (int i = 0; i < n; i++) {
                MpComplex t = i == n - 1 ? tb : ctx.add(s.tau, ctx.divide(ctx.multiply(delta, i), n - 1));
                SegmentIntegrator.Result d = integrator.denseState(r, s.tau, t);
                out.add(outcome(ctx.exp(t), d.state(), s.steps + d.steps()));
            }
            return out;
        }
    }

    /** Builder: exact parameters, exact start data, the number of digits, an optional progress callback. */
    public static final class Builder {
        private final ExactNumber[] parameters;
        private ExactNumber z0;
        private ExactNumber w0;
        private ExactNumber dw0;
        private int digits = 50;
        private DoubleConsumer progress;
        private SolverSettings planning = SolverSettings.defaults();

        private Builder(ExactNumber alpha, ExactNumber beta, ExactNumber gamma, ExactNumber delta) {
            this.parameters = new ExactNumber[] {require("alpha", alpha), require("beta", beta),
                require("gamma", gamma), require("delta", delta)};
        }

        /** Exact start data w(z0) = w0, w'(z0) = dw0 (decimals or rationals, complex a+bi allowed). */
        public Builder start(String z0, String w0, String dw0) {
            return start(ExactNumber.parse("z0", z0), ExactNumber.parse("w0", w0), ExactNumber.parse("dw0", dw0));
        }

        public Builder start(ExactNumber z0, ExactNumber w0, ExactNumber dw0) {
            this.z0 = require("z0", z0);
            this.w0 = require("w0", w0);
            this.dw0 = require("dw0", dw0);
            return this;
        }

        /** The number of significant digits wanted, in [16, 5000] (default 50). */
        public Builder digits(int digits) {
            if (digits < MIN_DIGITS || digits > MAX_DIGITS) {
                throw new InvalidInputException("digits", "must be in [" + MIN_DIGITS + ", " + MAX_DIGITS + "], got "
                        + digits);
            }
            this.digits = digits;
            return this;
        }

        /** Receives the fraction of the work done, in [0, 1], from the computing thread. */
        public Builder progress(DoubleConsumer progress) {
            this.progress = progress;
            return this;
        }

        /** Settings of the double-precision run that plans the path (default: the engine's defaults). */
        public Builder planning(SolverSettings settings) {
            this.planning = require("planning", settings);
            return this;
        }

        /**
         * @throws InvalidInputException if data are missing, z0 or w0 is zero, or some datum is known to fewer
         *     digits than requested (for example a binary double for 50 digits)
         */
        public HighPrecisionSolution build() {
            if (z0 == null) {
                throw new InvalidInputException("z0", "start data are missing: give z0, w0 and w'(z0)");
            }
            if (z0.isZero()) {
                throw new InvalidInputException("z0", "z0 = 0 is the branch point of the equation; choose z0 != 0");
            }
            if (w0.isZero()) {
                throw new InvalidInputException("w0", "w0 = 0 is not accepted at high precision: start the solution"
                        + " at a point where w != 0");
            }
            String[] names = {"alpha", "beta", "gamma", "delta"};
            for (int i = 0; i < 4; i++) {
                requireDigits(names[i], parameters[i]);
            }
            requireDigits("z0", z0);
            requireDigits("w0", w0);
            requireDigits("dw0", dw0);
            return new HighPrecisionSolution(this);
        }

        private void requireDigits(String name, ExactNumber x) {
            if (x.significantDigits() < digits) {
                throw new InvalidInputException(name, "is known to about " + x.significantDigits()
                        + " significant digits only (it was given as a binary double), but " + digits + " digits were"
                        + " requested: give it exactly, as a decimal string or a rational p/q such as 1/3");
            }
        }

        private static <T> T require(String name, T x) {
            if (x == null) {
                throw new InvalidInputException(name, "is required");
            }
            return x;
        }
    }
}
