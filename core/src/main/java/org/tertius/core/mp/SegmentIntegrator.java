package org.tertius.core.mp;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Future;
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
 * tolerance.
 *
 * <p>This is the high-precision engine shared by every equation: it runs the equation's {@link RecurrencePlan}
 * (the same compiled recurrence as the double-precision kernel) in fixed-point arithmetic; the equation layer
 * plans the path in double precision and converts its data to and from the polynomial form.
 *
 * <p>Immutable; a run allocates its own work arrays, so one integrator serves several threads.
 */
public final class SegmentIntegrator {
    /** Safety factor on the Taylor step (the truncation error then lies a few digits below the tolerance). */
    private static final double TAYLOR_SAFETY = 0.95;
    /** Pade is tried when Taylor would need more than this many steps for the rest of the segment (Pade steps are typically several times longer than Taylor steps of the same order). */
    private static final double PADE_TRIGGER = 1.5;
    /** Extra digits for the continued fractions (Viskovatov's algorithm loses some to cancellation). */
    private static final int PADE_EXTRA_DIGITS = 10;
    private static final int MAX_STEPS = 100000;
    /** Later waypoints a Pade step tries to reach directly, and their largest distance in units of the scale. */
    private static final int SHORTCUT_CANDIDATES = 3;
    private static final double SHORTCUT_REACH = 1.2;
    /** First Pade trial length in units of the scale, before any step has told how far the fractions reach. */
    private static final double FIRST_REACH = 2.0;
    /**
     * Factors by which the trial length shrinks after a rejected trial and grows for the next step (a rejected
     * trial costs a double-precision screen, so the lengths may lie close).
     */
    private static final double SHRINK = 0.95;
    private static final double GROW = 1.25;
    /**
     * Row growth (bits) of a continued fraction above which it is built again in more digits. The fractions are
     * built about 60 bits above the tolerance (PADE_EXTRA_DIGITS and the guard digits); measured at 100 to 300
     * digits, the bits lost stayed below 20 for growths up to 34 bits and below growth + 10 above (46 to 55 bits
     * for growths of 47 to 176), so growths above 40 bits are not covered by the margin alone.
     */
    private static final double ROW_GROWTH_CHECK = 40;
    /** Bits by which the screen of a trial may exceed the tolerance and still go to the full evaluation. */
    private static final double SCREEN_MARGIN_BITS = 1;
    /** Orders from which the continued fractions of the components are built in parallel. */
    private static final int PARALLEL_ORDER = 40;

    private final FixedPointKernel kernel;
    private final MpContext ctx;
    /** log2 of the local tolerance (kept as a logarithm: 10^-D underflows a double beyond D = 307). */
    private final double log2Tolerance;
    private final int toleranceDigits;
    /** Complex products of series coefficients done so far (recurrence and continued fractions). */
    private final AtomicLong products = new AtomicLong();

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


    /** The series at tau with scale r; its products are added to {@code counter}. */
    private TaylorSeries expand(MpComplex tau, MpComplex[] y, double r, AtomicLong counter) {
        counter.addAndGet(kernel.productsPerExpansion());
        return kernel.expand(tau, y, r);
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
        TaylorSeries series = expandScaled(tau, y, scaleGuess, count);
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
            TaylorSeries series = steps == 0 && first != null ? first : expandScaled(tau, y, r, products);
            r = series.scale();
            double rho = r * rootRadius(series);
            double hT = r * taylorStep(series, y);
            if (!(hT > 1e-12 * Math.max(1, tau.abs())) || !Double.isFinite(hT)) {
                throw new UnreachableTargetException("the high-precision step size collapsed near tau = "
                        + tau.toComplex() + ": the path runs into a singularity");
            }
            Step step = hT >= dist ? null : padeStep(series, tau, waypoints, next, dist, hT, reach);
            if (step == null) {
                boolean last = hT >= dist;
                MpComplex s = last ? ctx.divide(remaining, ctx.fromDouble(r, 0))
                        : ctx.multiply(remaining, ctx.fromDouble(hT / (dist * r), 0));
                step = new Step(s, series.evaluate(ctx, s), null, last ? next : -1);
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

    /** A step: its scaled length, the state at its end, its fractions (Pade) and the waypoint reached (or -1). */
    private static final class Step {
        final MpComplex s;
        final MpComplex[] y;
        final ContinuedFraction[] fractions;
        final int waypoint;

        Step(MpComplex s, MpComplex[] y, ContinuedFraction[] fractions, int waypoint) {
            this.s = s;
            this.y = y;
            this.fractions = fractions;
            this.waypoint = waypoint;
        }
    }

    /**
     * A Pade step when Taylor steps would be short: to the farthest of the next few waypoints within reach whose
     * convergents meet the tolerance, else along the current line, first to the target or to GROW times the last
     * accepted reach (whichever is nearer), then shrinking by SHRINK; null when no Pade value is accepted farther
     * than 1.5 Taylor steps. Every trial length is screened in double precision first
     * ({@link ContinuedFraction#screenLog2Error}), and only the lengths that pass are evaluated in full, so the
     * lengths can lie close together. {@code reach[0]} carries the accepted length to the next step (NaN before
     * the first: FIRST_REACH times the scale is tried then). The length, not its ratio to the scale, is carried:
     * at high orders the fractions reach well past the radius of convergence, and the scale follows that radius.
     */
    private Step padeStep(TaylorSeries series, MpComplex tau, List<MpComplex> waypoints, int next, double dist,
                          double hT, double[] reach) {
        if (dist <= PADE_TRIGGER * hT) {
            return null;
        }
        ContinuedFraction[] fractions = fractions(series);
        if (fractions == null) {
            return null;
        }
        MpComplex r = ctx.fromDouble(series.scale(), 0);
        int last = Math.min(waypoints.size() - 1, next + SHORTCUT_CANDIDATES);
        for (int j = last; j > next; j--) {
            MpComplex d = ctx.subtract(waypoints.get(j), tau);
            if (d.abs() > SHORTCUT_REACH * series.scale()) {
                continue;
            }
            MpComplex sp = ctx.divide(d, r);
            MpComplex[] v = screened(fractions, sp) ? padeValue(ctx, fractions, sp, log2Tolerance) : null;
            if (v != null) {
                return new Step(sp, v, fractions, j);
            }
        }
        MpComplex remaining = ctx.subtract(waypoints.get(next), tau);
        MpComplex dir = ctx.divide(remaining, ctx.fromDouble(dist, 0));
        double guess = Double.isNaN(reach[0]) ? FIRST_REACH * series.scale() : GROW * reach[0];
        double first = Math.min(dist, Math.max(guess, PADE_TRIGGER * hT));
        // the whole remaining distance first when it is not far beyond the guess: a remainder costs a step of its
        // own (an expansion and its fractions), a failed trial only a screen
        List<Double> trials = new ArrayList<>();
        if (first < dist && (dist <= 2 * first || dist - first < PADE_TRIGGER * hT)) {
            trials.add(dist);
        }
        for (double len = first; ; len *= SHRINK) {
            trials.add(len);
            if (len <= PADE_TRIGGER * hT) {
                break;
            }
        }
        for (double len : trials) {
            boolean whole = len == dist;
            MpComplex sp = whole ? ctx.divide(remaining, r) : ctx.divide(ctx.multiply(dir, ctx.fromDouble(len, 0)), r);
            MpComplex[] v = screened(fractions, sp) ? padeValue(ctx, fractions, sp, log2Tolerance) : null;
            if (v != null) {
                if (!whole || Double.isNaN(reach[0]) || len >= reach[0]) {
                    reach[0] = len;
                }
                return new Step(sp, v, fractions, whole ? next : -1);
            }
        }
        return null;
    }

    /**
     * Whether the double-precision screen of every fraction at s lies within SCREEN_MARGIN_BITS of the tolerance
     * (the screen agrees with the full evaluation to about 1e-12 relative; the margin only keeps rounding from
     * deciding).
     */
    private boolean screened(ContinuedFraction[] fractions, MpComplex s) {
        for (ContinuedFraction f : fractions) {
            if (!(f.screenLog2Error(s) <= log2Tolerance + SCREEN_MARGIN_BITS)) {
                return false;
            }
        }
        return true;
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

    /**
     * Expands at tau with a scale near the radius of convergence (re-expanding once or twice when the root test
     * says that the guess was far off), so that the fixed-point coefficients neither grow nor shrink fast.
     */
    private TaylorSeries expandScaled(MpComplex tau, MpComplex[] y, double r, AtomicLong counter) {
        TaylorSeries series = null;
        // a scale beyond the radius of convergence makes the scaled coefficients grow like (r / rho)^k: the kernel
        // stops early when they grow too fast (or overflow), and the scale shrinks by the growth seen
        for (int shrink = 0; series == null; shrink++) {
            try {
                series = expand(tau, y, r, counter);
            } catch (FixedPointKernel.ScaleTooLarge e) {
                if (shrink >= 12) {
                    throw new UnreachableTargetException("the high-precision series near tau = " + tau.toComplex()
                            + " keeps growing as its scale shrinks: the path runs into a singularity");
                }
                r /= 1.2 * e.growth;
            } catch (UnreachableTargetException e) {
                if (shrink >= 12) {
                    throw e;
                }
                r *= 0.25;
            }
        }
        for (int attempt = 0; attempt < 3; attempt++) {
            double q = rootRadius(series);
            if (q >= 0.4 && q <= 2.5 || !Double.isFinite(q) || q <= 0) {
                break;
            }
            r = r * Math.max(1e-4, Math.min(1e4, q));
            series = expand(tau, y, r, counter);
        }
        return series;
    }

    /**
     * Radius of convergence in units of the scale by the root test, 1 / max_k (|c_k| / (1 + |c_0|))^(1/k) over
     * k in [N/3, N] and all components.
     */
    static double rootRadius(TaylorSeries series) {
        int n = series.order();
        double g = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < series.dimension(); i++) {
            double c0 = MpContext.log2OnePlus(series.log2Coefficient(i, 0));
            for (int k = Math.max(1, n / 3); k <= n; k++) {
                double l = series.log2Coefficient(i, k);
                if (l > Double.NEGATIVE_INFINITY) {
                    g = Math.max(g, (l - c0) / k);
                }
            }
        }
        return g == Double.NEGATIVE_INFINITY ? 1e4 : Math.pow(2, -g);
    }

    /**
     * The Taylor step in units of the scale: the largest |s| with |c_k| |s|^k <= tol (1 + |y|) for the last four
     * orders k of every component, times a safety factor.
     */
    private double taylorStep(TaylorSeries series, MpComplex[] y) {
        int n = series.order();
        double log2Tol = -toleranceDigits * MpContext.LOG2_10;
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < series.dimension(); i++) {
            double allowed = log2Tol + MpContext.log2OnePlus(y[i].log2Abs());
            for (int k = n - 3; k <= n; k++) {
                double l = series.log2Coefficient(i, k);
                if (l > Double.NEGATIVE_INFINITY) {
                    best = Math.min(best, (allowed - l) / k);
                }
            }
        }
        return best == Double.POSITIVE_INFINITY ? 1e4 : TAYLOR_SAFETY * Math.pow(2, best);
    }

    /**
     * The continued fractions of every component (computed in parallel when the order makes it worth a thread),
     * or null when one of them stops before half the order (a Taylor step is taken then).
     */
    private ContinuedFraction[] fractions(TaylorSeries series) {
        MpContext wide = ctx.widen(PADE_EXTRA_DIGITS);
        int n = series.order();
        ContinuedFraction[] out = new ContinuedFraction[series.dimension()];
        if (Workers.PARALLEL && out.length > 1 && n >= PARALLEL_ORDER) {
            List<Future<ContinuedFraction>> others = new ArrayList<>();
            for (int i = 1; i < out.length; i++) {
                int component = i;
                others.add(Workers.submit(() -> fraction(series, wide, component)));
            }
            out[0] = fraction(series, wide, 0);
            for (int i = 1; i < out.length; i++) {
                out[i] = Workers.join(others.get(i - 1));
            }
        } else {
            for (int i = 0; i < out.length; i++) {
                out[i] = fraction(series, wide, i);
            }
        }
        boolean deep = true;
        for (ContinuedFraction f : out) {
            products.addAndGet(f.productCount());
            deep &= f.depth() >= n / 2;
        }
        return deep ? out : null;
    }

    /**
     * The fraction of one component, built PADE_EXTRA_DIGITS above the working precision, and built again wider
     * when its rows grew beyond ROW_GROWTH_CHECK bits (cancellation in the leading entries, which costs the value
     * of the fraction bits of its precision; see {@link ContinuedFraction#rowGrowth}): by the growth seen.
     */
    static ContinuedFraction fraction(TaylorSeries series, MpContext wide, int component) {
        ContinuedFraction f = fraction(series, wide, component, 0);
        if (f.rowGrowth() > ROW_GROWTH_CHECK) {
            f = fraction(series, wide, component, (int) Math.ceil(f.rowGrowth() / MpContext.LOG2_10)).replacing(f);
        }
        return f;
    }

    private static ContinuedFraction fraction(TaylorSeries series, MpContext wide, int component, int extraDigits) {
        MpContext c = extraDigits == 0 ? wide : wide.widen(extraDigits);
        MpComplex[] coefficients = new MpComplex[series.order() + 1];
        for (int k = 0; k < coefficients.length; k++) {
            coefficients[k] = series.coefficient(c, component, k);
        }
        return ContinuedFraction.of(c, coefficients);
    }

    /**
     * The Pade value at s of every component (see {@link ContinuedFraction#valueWithin}), rounded to ctx; null when
     * one of them misses the tolerance 2^log2Tol.
     */
    static MpComplex[] padeValue(MpContext ctx, ContinuedFraction[] fractions, MpComplex s, double log2Tol) {
        MpComplex[] out = new MpComplex[fractions.length];
        for (int i = 0; i < fractions.length; i++) {
            MpComplex v = fractions[i].valueWithin(s, log2Tol);
            if (v == null) {
                return null;
            }
            out[i] = ctx.round(v);
        }
        return out;
    }
}
