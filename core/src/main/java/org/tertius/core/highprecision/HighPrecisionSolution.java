package org.tertius.core.highprecision;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.DoubleConsumer;
import java.util.function.Function;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.mp.SegmentIntegrator;
import org.tertius.core.mp.Workers;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * A computed solution evaluated to a requested number of significant digits. The double-precision engine plans
 * the path (its path tree, around the poles); the path from the start to the node nearest the target, and on to
 * the target, is then integrated again in arbitrary precision with the same recurrence plan, from the solution's
 * {@link HighPrecisionForm} (exact data rounded once to each working precision).
 *
 * <p>Every value comes with its estimated number of correct digits ({@link DigitEstimate}): the path is integrated
 * at two accuracies (about D/3 and D plus guard digits, side by side on two processors); their difference measures
 * how much the path amplifies errors, and the guard digits of the accurate run are widened and the run repeated
 * when the estimate falls short of D.
 *
 * <p>The states reached at the nodes of the path tree are kept (per accuracy), so later evaluations start from the
 * nearest of them instead of from the start point. Thread-safe; a long run can be cancelled by interrupting its
 * thread ({@link org.tertius.core.TertiusException}).
 */
public final class HighPrecisionSolution {
    /** The smallest and largest number of digits accepted. */
    public static final int MIN_DIGITS = 16;
    public static final int MAX_DIGITS = 5000;
    private static final int MAX_REFINEMENTS = 3;
    /** Steps of the accurate pass guessed before the path is planned (see {@link #compute}). */
    private static final int TYPICAL_EXPECTED_STEPS = 20;

    private final HighPrecisionForm form;
    private final List<String> names;
    private final int digits;
    private final DoubleConsumer progress;
    private final RecurrencePlan plan;
    private final Map<Integer, AccuracyLevel> levels = new ConcurrentHashMap<>();
    /** The first series at the root per level (tolerance digits), expanded once. */
    private final Map<Integer, Future<SegmentIntegrator.Start>> rootStarts = new ConcurrentHashMap<>();
    private final AtomicReference<ReplayStatistics> statistics = new AtomicReference<>();

    private HighPrecisionSolution(HighPrecisionForm form, int digits, DoubleConsumer progress) {
        this.form = form;
        this.names = List.copyOf(form.valueNames());
        this.digits = digits;
        this.progress = progress;
        this.plan = RecurrencePlan.compile(form.planner().system());
    }

    /**
     * The solution to {@code digits} significant digits.
     *
     * @throws InvalidInputException if digits lies outside [{@value #MIN_DIGITS}, {@value #MAX_DIGITS}], the solution
     *     cannot be computed in arbitrary precision, or a datum is known to fewer digits (a binary double)
     */
    public static HighPrecisionSolution of(ComputedSolution solution, int digits) {
        return of(solution, digits, null);
    }

    /** As {@link #of(ComputedSolution, int)}, reporting the fraction of work done, in [0, 1], to {@code progress}. */
    public static HighPrecisionSolution of(ComputedSolution solution, int digits, DoubleConsumer progress) {
        checkDigits(digits);
        HighPrecisionForm form = solution.highPrecisionForm();
        form.requireDigits(digits);
        return new HighPrecisionSolution(form, digits, progress);
    }

    /**
     * The solution given by its high-precision form alone, to {@code digits} significant digits: for a stage of a
     * larger computation that is not itself a {@link ComputedSolution} (for example a flow in another variable that
     * carries a start state to where a solution begins).
     *
     * @throws InvalidInputException as {@link #of(ComputedSolution, int)}
     */
    public static HighPrecisionSolution ofForm(HighPrecisionForm form, int digits) {
        checkDigits(digits);
        form.requireDigits(digits);
        return new HighPrecisionSolution(form, digits, null);
    }

    /** Checks a number of digits against [{@value #MIN_DIGITS}, {@value #MAX_DIGITS}]. */
    public static void checkDigits(int digits) {
        if (digits < MIN_DIGITS || digits > MAX_DIGITS) {
            throw new InvalidInputException("digits", "must be in [" + MIN_DIGITS + ", " + MAX_DIGITS + "], got "
                    + digits);
        }
    }

    /** The requested number of significant digits. */
    public int digits() {
        return digits;
    }

    /** The names of the values. */
    public List<String> valueNames() {
        return names;
    }

    /**
     * The values at an exact point.
     *
     * @throws org.tertius.core.UnreachableTargetException if the point cannot be reached
     */
    public HighPrecisionValue evaluate(ExactPoint point) {
        form.coordinate().check("point", point.toSurfacePoint());
        return compute(level -> List.of(level.valueAt(point)), List.of(point)).get(0);
    }

    /** The values at a point whose coordinates are taken as exact binary numbers. */
    public HighPrecisionValue evaluate(SurfacePoint point) {
        return evaluate(ExactPoint.of(point));
    }

    /**
     * n &gt;= 2 values at equally spaced points of the straight segment from a to b in the engine variable (tau = log
     * u on a logarithmic surface: a segment of the Riemann surface), from one pass of steps along it: the path is
     * not integrated again per point. The {@link HighPrecisionValue#point()} of an interior point is that point
     * rounded to double precision.
     */
    public List<HighPrecisionValue> tabulate(ExactPoint a, ExactPoint b, int n) {
        if (n < 2 || n > 1000000) {
            throw new InvalidInputException("n", "the number of points must be in [2, 1000000], got " + n);
        }
        SurfacePoint pa = form.coordinate().check("a", a.toSurfacePoint());
        SurfacePoint pb = form.coordinate().check("b", b.toSurfacePoint());
        double ar = form.coordinate().tauRe(pa);
        double ai = form.coordinate().tauIm(pa);
        double br = form.coordinate().tauRe(pb);
        double bi = form.coordinate().tauIm(pb);
        List<ExactPoint> points = new ArrayList<>();
        points.add(a);
        for (int i = 1; i < n - 1; i++) {
            double t = (double) i / (n - 1);
            points.add(ExactPoint.of(form.coordinate().fromTau(ar + t * (br - ar), ai + t * (bi - ai))));
        }
        points.add(b);
        return compute(level -> level.line(a, b, n), points);
    }

    /** Figures of the last computation (for benchmarks), or null before the first. */
    public ReplayStatistics statistics() {
        return statistics.get();
    }

    /** Runs a cheap and an accurate pass and estimates the correct digits from their difference. */
    private List<HighPrecisionValue> compute(Function<AccuracyLevel, List<Outcome>> pass, List<ExactPoint> points) {
        int cheapDigits = DigitEstimate.cheapDigits(digits);
        ReplayProgress meter = new ReplayProgress(progress);
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
            expandRootAhead(DigitEstimate.accurateDigits(digits, TYPICAL_EXPECTED_STEPS));
            expandRootAhead(cheapDigits);
            expectedSteps = 2 * plannedSteps(points) + 2;
            int cd = cheapDigits;
            cheapRun = Workers.submit(() -> pass.apply(level(cd, null)));
            meter.phase(0, 1);
        } else {
            meter.phase(0, 0.15);
            cheap = pass.apply(level(cheapDigits, meter));
            expectedSteps = 1;
            for (Outcome o : cheap) {
                expectedSteps = Math.max(expectedSteps, o.steps);
            }
        }
        try {
            return refine(pass, points, meter, cheapRun, cheap, cheapDigits,
                    DigitEstimate.accurateDigits(digits, expectedSteps));
        } finally {
            if (cheapRun != null && !cheapRun.isDone()) {
                cheapRun.cancel(true);
            }
        }
    }

    /**
     * The most nodes of the planned path from the start to the first or the last point (the points between lie on
     * a line from the first, and looking each of them up would plan paths that are never taken).
     */
    private int plannedSteps(List<ExactPoint> points) {
        int most = 1;
        for (ExactPoint e : List.of(points.get(0), points.get(points.size() - 1))) {
            SurfacePoint p = e.toSurfacePoint();
            most = Math.max(most, PlannedPath.chain(form.planner(), form.coordinate().tauRe(p),
                    form.coordinate().tauIm(p)).length);
        }
        return most;
    }

    private List<HighPrecisionValue> refine(Function<AccuracyLevel, List<Outcome>> pass, List<ExactPoint> points,
                                            ReplayProgress meter, Future<List<Outcome>> cheapRun, List<Outcome> cheap,
                                            int cheapDigits, int accurateDigits) {
        List<HighPrecisionValue> result = null;
        for (int round = 0; round < MAX_REFINEMENTS; round++) {
            if (round > 0 || cheapRun == null) {
                meter.phase(0.15 + 0.85 * round / MAX_REFINEMENTS, round == 0 ? 0.85 : 0.85 / MAX_REFINEMENTS);
            }
            AccuracyLevel level = level(accurateDigits, meter);
            long products = level.integrator.products();
            List<Outcome> accurate = pass.apply(level);
            if (cheap == null) {
                cheap = Workers.join(cheapRun);
            }
            statistics.set(new ReplayStatistics(level.integrator.order(), accurate.get(0).steps,
                    accurate.get(0).steps + cheap.get(0).steps, level.integrator.fractionBits(),
                    level.integrator.products() - products));
            int worst = Integer.MAX_VALUE;
            result = new ArrayList<>();
            for (int i = 0; i < accurate.size(); i++) {
                Outcome a = accurate.get(i);
                int[] each = DigitEstimate.correctDigitsEach(a, accurateDigits, cheap.get(i), cheapDigits, digits);
                HighPrecisionValue v = new HighPrecisionValue(points.get(i), names, a.ctx, a.values, digits, each);
                worst = Math.min(worst, v.correctDigits());
                result.add(v);
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

    /**
     * Builds the level of that accuracy and expands its first series at the root on a worker thread (once per
     * level), for the first run from the root to start from; a failure there is left to that run to meet again.
     * An expansion ahead that no run uses (a failed or interrupted computation, a plan longer or shorter than
     * guessed) still runs to its end: one expansion, on the other processor.
     */
    private void expandRootAhead(int tolDigits) {
        rootStarts.computeIfAbsent(tolDigits, d -> Workers.submit(() -> levels.computeIfAbsent(d, this::newLevel)
                .expandRoot()));
    }

    private AccuracyLevel newLevel(int tolDigits) {
        return new AccuracyLevel(tolDigits, form, plan, rootStarts);
    }

    private AccuracyLevel level(int tolDigits, ReplayProgress meter) {
        return levels.computeIfAbsent(tolDigits, this::newLevel).withProgress(meter);
    }
}
