package org.tertius.core.mp;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * Integrates a polynomial system in arbitrary precision along a straight segment in the integration variable,
 * with the order and the step chosen from the requested accuracy (A. Jorba and M. Zou, "A software package
 * for the numerical integration of ODEs by means of high-order Taylor methods", Experimental Math. 14 (2005):
 * order about 1.15 D for 10^-D, step from the last Taylor coefficients). Far from poles a step is a plain
 * Taylor step; when the coefficients say that a pole near the line would make Taylor steps short, the step is
 * a Pade step (pole vaulting) with continued fractions, accepted where the last convergents agree to the
 * tolerance. The run and the dense output live here; the Taylor side of a step (expansion at a fitted scale,
 * step length) in {@code TaylorStepper}, the Pade side in {@code PadeStepper}.
 *
 * <p>This is the high-precision engine shared by every equation: it runs the equation's {@link RecurrencePlan}
 * (the same compiled recurrence as the double-precision kernel) in fixed-point arithmetic; the equation layer
 * plans the path in double precision and converts its data to and from the polynomial form.
 *
 * <p>Immutable; a run allocates its own work arrays, so one integrator serves several threads.
 */
public final class SegmentIntegrator {
    private static final int MAX_STEPS = 100000;

    private final FixedPointKernel kernel;
    private final MpContext ctx;
    /** log2 of the local tolerance (kept as a logarithm: 10^-D underflows a double beyond D = 307). */
    private final double log2Tolerance;
    private final int toleranceDigits;
    /** Complex products of series coefficients done so far (recurrence and continued fractions). */
    private final AtomicLong products = new AtomicLong();
    /** The Taylor steps, from this integrator's kernel and tolerance. */
    private final TaylorStepper taylor;
    /** The Pade steps, at this integrator's precision and tolerance, counting into its products. */
    private final PadeStepper pade;

    /**
     * @param kernel the recurrence kernel
     * @param ctx the working precision
     * @param toleranceDigits the local tolerance is 10^-toleranceDigits relative to 1 + |y_i|
     */
    SegmentIntegrator(FixedPointKernel kernel, MpContext ctx, int toleranceDigits) {
        this.kernel = kernel;
        this.ctx = ctx;
        this.toleranceDigits = toleranceDigits;
        this.log2Tolerance = -toleranceDigits * MpContext.LOG2_10;
        this.taylor = new TaylorStepper(kernel, toleranceDigits);
        this.pade = new PadeStepper(ctx, log2Tolerance, products);
    }

    /**
     * An integrator for the system compiled into {@code plan}, with the Taylor order chosen from the tolerance
     * ({@link #orderFor(int)}).
     *
     * @param coefficients the coefficient values of the system (its coefficient order), rounded to {@code ctx}
     * @param ctx the working precision (a few digits above the tolerance)
     * @param toleranceDigits the local tolerance is 10^-toleranceDigits relative to 1 + |y_i|
     */
    public SegmentIntegrator(RecurrencePlan plan, MpComplex[] coefficients, MpContext ctx, int toleranceDigits) {
        this(new FixedPointKernel(plan, coefficients, orderFor(toleranceDigits), ctx), ctx, toleranceDigits);
    }

    /** The Taylor order for a tolerance of 10^-d: about 1.15 d (Jorba and Zou 2005, as above). */
    public static int orderFor(int toleranceDigits) {
        return (int) Math.ceil(1.1513 * toleranceDigits) + 2;
    }

    public MpContext context() {
        return ctx;
    }

    /** log2 of the local tolerance 10^-toleranceDigits. */
    public double log2Tolerance() {
        return log2Tolerance;
    }

    public int toleranceDigits() {
        return toleranceDigits;
    }

    public int order() {
        return kernel.order();
    }

    /** Fractional bits of the fixed-point Taylor coefficients. */
    public int fractionBits() {
        return kernel.fractionBits();
    }

    /** Complex products of coefficients done so far by this integrator (for the cost model of benchmarks). */
    public long products() {
        return products.get();
    }


    /** The state at the end of a segment, with the steps taken (and their nodes when asked for). Immutable. */
    public static final class Result {
        final MpComplex[] y;
        final double scale;
        final int steps;
        final List<HpNode> nodes;

        Result(MpComplex[] y, double scale, int steps, List<HpNode> nodes) {
            this.y = y;
            this.scale = scale;
            this.steps = steps;
            this.nodes = nodes == null ? null : List.copyOf(nodes);
        }

        /** The state reached. */
        public MpComplex[] state() {
            return y.clone();
        }

        /** The series scale at the end (a good first scale for a following run). */
        public double scale() {
            return scale;
        }

        /** The steps taken. */
        public int steps() {
            return steps;
        }
    }

    /** Receives the distance advanced along the segment (for progress reports). */
    public interface Advance {
        void advanced(double distance);
    }

    /** Receives the states reached at waypoints (for caching them). */
    public interface Landing {
        void landed(int waypoint, MpComplex[] y, double scale, int steps);
    }

    /**
     * The state at t on the line of a run made with {@code keepNodes} from {@code from}, from the kept step that
     * covers t (its Taylor series or Pade approximants); where the approximants of that step miss the tolerance
     * at t, a short run from the step's centre reaches t. The steps of the result count from the start of the run.
     *
     * @throws org.tertius.core.InvalidInputException if the run kept no nodes
     */
    public Result denseState(Result run, MpComplex from, MpComplex t) {
        if (run.nodes == null) {
            throw new InvalidInputException("run", "was made without keepNodes: no dense output");
        }
        if (run.nodes.isEmpty()) {
            return new Result(run.y, run.scale, 0, null);
        }
        // the nodes follow each other along the line: the first whose end lies beyond t covers it
        double dt = ctx.subtract(t, from).abs();
        int lo = 0;
        int hi = run.nodes.size() - 1;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (ctx.subtract(end(run.nodes.get(mid)), from).abs() >= dt) {
                hi = mid;
            } else {
                lo = mid + 1;
            }
        }
        HpNode node = run.nodes.get(lo);
        TaylorSeries ts = node.series();
        MpComplex sp = ctx.divide(ctx.subtract(t, ts.center()), ctx.fromDouble(ts.scale(), 0));
        MpComplex[] y = node.evaluate(ctx, sp, log2Tolerance);
        if (y != null) {
            return new Result(y, ts.scale(), lo + 1, null);
        }
        MpComplex[] y0 = new MpComplex[ts.dimension()];
        for (int c = 0; c < y0.length; c++) {
            y0[c] = ts.coefficient(ctx, c, 0);
        }
        Result q = run(ts.center(), y0, t, ts.scale(), false, null);
        return new Result(q.y, q.scale, lo + 1 + q.steps, null);
    }

    private MpComplex end(HpNode n) {
        TaylorSeries ts = n.series();
        return ctx.add(ts.center(), ctx.multiply(n.endS(), ctx.fromDouble(ts.scale(), 0)));
    }

    /**
     * Integrates from (tau, y) to target along the straight line.
     *
     * @param scaleGuess first scale of the series (about the radius of convergence)
     * @param keepNodes whether to return the nodes (dense output)
     * @throws UnreachableTargetException if the step size collapses (the line runs into a singularity)
     * @throws TertiusException if the thread is interrupted (cancellation)
     */
    public Result run(MpComplex tau, MpComplex[] y, MpComplex target, double scaleGuess, boolean keepNodes,
               Advance advance) {
        return run(tau, y, List.of(target), scaleGuess, keepNodes, advance, null);
    }

    /**
     * A state with its first series already expanded by one integrator ({@link #start}): a run of that integrator
     * from it begins with a step. Made ahead of a run, e.g. on another thread while the path is still being
     * planned, and may serve several runs. Thread-safe.
     */
    public static final class Start {
        final SegmentIntegrator owner;
        final MpComplex tau;
        final MpComplex[] y;
        final TaylorSeries series;
        /** Products of the expansion, charged to the integrator's count by the first run that uses it. */
        private final long productCount;
        private final AtomicBoolean charged = new AtomicBoolean();

        private Start(SegmentIntegrator owner, MpComplex tau, MpComplex[] y, TaylorSeries series, long productCount) {
            this.owner = owner;
            this.tau = tau;
            this.y = y.clone();
            this.series = series;
            this.productCount = productCount;
        }
    }

    /**
     * The first series of a run from (tau, y), expanded now. Its products are counted ({@link #products()}) when
     * a run first uses it, not before.
     *
     * @param scaleGuess first scale of the series (about the radius of convergence)
     * @throws UnreachableTargetException if no scale gives a usable series (a singularity at tau)
     */
    public Start start(MpComplex tau, MpComplex[] y, double scaleGuess) {
        AtomicLong count = new AtomicLong();
        TaylorSeries series = taylor.expandScaled(tau, y, scaleGuess, count);
        return new Start(this, tau, y, series, count.get());
    }

    /**
     * As {@link #run(MpComplex, MpComplex[], List, double, boolean, Advance, Landing)}, from a prepared start.
     *
     * @throws IllegalArgumentException if the start was made by another integrator (another precision or order)
     */
    public Result run(Start start, List<MpComplex> waypoints, boolean keepNodes, Advance advance, Landing landing) {
        if (start.owner != this) {
            throw new IllegalArgumentException("the start was expanded by another integrator (precision "
                    + start.owner.ctx.digits() + " digits, order " + start.owner.order() + "), not by this one ("
                    + ctx.digits() + " digits, order " + order() + ")");
        }
        if (start.charged.compareAndSet(false, true)) {
            products.addAndGet(start.productCount);
        }
        return run(start.tau, start.y, waypoints, start.series.scale(), keepNodes, advance, landing, start.series);
    }

    /**
     * Integrates from (tau, y) through the waypoints to the last one, along the straight lines between them. A
     * Pade step may go straight on to a later waypoint when its continued fractions meet the tolerance there: the
     * solutions are meromorphic in tau, so the value does not depend on the side on which a line passes a pole.
     *
     * @param landing receives the state at every waypoint the run stops at (may be null)
     * @throws UnreachableTargetException if the step size collapses (the line runs into a singularity)
     * @throws TertiusException if the thread is interrupted (cancellation)
     */
    public Result run(MpComplex tau, MpComplex[] y, List<MpComplex> waypoints, double scaleGuess, boolean keepNodes,
               Advance advance, Landing landing) {
        return run(tau, y, waypoints, scaleGuess, keepNodes, advance, landing, null);
    }

    /** The run, with the series of its first step given (null: expanded here). */
    private Result run(MpComplex tau, MpComplex[] y, List<MpComplex> waypoints, double scaleGuess, boolean keepNodes,
               Advance advance, Landing landing, TaylorSeries first) {
        List<HpNode> nodes = keepNodes ? new ArrayList<>() : null;
        double r = scaleGuess;
        // the last accepted Pade length (NaN before the first): the next step starts its trials near it
        double[] reach = {Double.NaN};
        int steps = 0;
        int next = 0;
        while (true) {
            if (Thread.currentThread().isInterrupted()) {
                throw new TertiusException("high-precision computation cancelled (thread interrupted)");
            }
            MpComplex target = waypoints.get(next);
            MpComplex remaining = ctx.subtract(target, tau);
            double dist = remaining.abs();
            if (dist == 0) {
                if (landing != null) {
                    landing.landed(next, y, r, steps);
                }
                if (++next == waypoints.size()) {
                    return new Result(y, r, steps, nodes);
                }
                continue;
            }
            if (steps >= MAX_STEPS) {
                throw new UnreachableTargetException("more than " + MAX_STEPS + " high-precision steps on one segment");
            }
            TaylorSeries series = steps == 0 && first != null ? first : taylor.expandScaled(tau, y, r, products);
            r = series.scale();
            double rho = r * TaylorStepper.rootRadius(series);
            double hT = r * taylor.taylorStep(series, y);
            if (!(hT > 1e-12 * Math.max(1, tau.abs())) || !Double.isFinite(hT)) {
                throw new UnreachableTargetException("the high-precision step size collapsed near tau = "
                        + tau.toComplex() + ": the path runs into a singularity");
            }
            SegmentStep step = hT >= dist ? null : pade.padeStep(series, tau, waypoints, next, dist, hT, reach);
            if (step == null) {
                boolean last = hT >= dist;
                MpComplex s = last ? ctx.divide(remaining, ctx.fromDouble(r, 0))
                        : ctx.multiply(remaining, ctx.fromDouble(hT / (dist * r), 0));
                step = new SegmentStep(s, series.evaluate(ctx, s), null, last ? next : -1);
            }
            if (keepNodes) {
                nodes.add(new HpNode(series, step.fractions, step.s));
            }
            MpComplex end = step.waypoint >= 0 ? waypoints.get(step.waypoint)
                    : ctx.add(tau, ctx.multiply(step.s, ctx.fromDouble(r, 0)));
            if (advance != null) {
                advance.advanced(pathLength(tau, end, waypoints, next, step.waypoint));
            }
            tau = end;
            y = step.y;
            steps++;
            r = Math.max(rho, 1e-3 * r);
            if (step.waypoint >= 0) {
                next = step.waypoint;
            }
        }
    }

    /** Length of the path from tau to end: straight when end is not a waypoint, else along the waypoints. */
    private double pathLength(MpComplex tau, MpComplex end, List<MpComplex> waypoints, int next, int reached) {
        if (reached < 0) {
            return ctx.subtract(end, tau).abs();
        }
        double len = ctx.subtract(waypoints.get(next), tau).abs();
        for (int j = next + 1; j <= reached; j++) {
            len += ctx.subtract(waypoints.get(j), waypoints.get(j - 1)).abs();
        }
        return len;
    }
}
