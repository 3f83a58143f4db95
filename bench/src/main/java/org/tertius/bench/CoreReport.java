package org.tertius.bench;

import java.lang.ref.Reference;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apfloat.Apcomplex;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.RegionStatistics;
import org.tertius.core.solution.Solution;
import org.tertius.core.step.Node;
import org.tertius.core.taylor.DoubleTaylorKernel;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * The derived figures of the double-precision engine that JMH scores do not show: node and expansion counts,
 * the coefficient-generation lower bound and the ratio of the grid time to it, the tree's size (its own
 * accounting and a measured heap delta), and the accuracy-matched comparison with DormandPrince853. Times here
 * are medians of repeated runs after warm-up runs in this JVM (the JMH benchmarks give the same quantities
 * with proper forks and statistics).
 *
 * <pre>  java -cp bench/target/tertius-benchmarks.jar org.tertius.bench.CoreReport [grid-runs] </pre>
 */
public final class CoreReport {
    private static final int WARM = 3;

    private CoreReport() {
    }

    public static void main(String[] args) throws Exception {
        int gridRuns = args.length > 0 ? Integer.parseInt(args[0]) : 5;
        machine();
        double coefNs = coefficients();
        section("stepper", CoreReport::stepper);
        section("path", CoreReport::path);
        section("grid", () -> grid(coefNs, gridRuns));
        section("segment", () -> segment(coefNs));
    }

    /** Runs one part of the report; a failure of the engine is reported and the next part runs. */
    private static void section(String name, Runnable part) {
        try {
            part.run();
        } catch (RuntimeException e) {
            p("   %s FAILED: %s", name, e);
        }
    }

    private static void machine() throws Exception {
        String cpu = Files.readAllLines(Path.of("/proc/cpuinfo")).stream().filter(l -> l.startsWith("model name"))
                .findFirst().map(l -> l.substring(l.indexOf(':') + 1).trim()).orElse("?");
        String load = Files.readString(Path.of("/proc/loadavg")).trim();
        Runtime rt = Runtime.getRuntime();
        p("== machine: %d processors, %s, load average %s, java %s, max heap %d MB", rt.availableProcessors(), cpu,
                load, System.getProperty("java.version"), rt.maxMemory() >> 20);
    }

    /** Cost of one coefficient generation at the engine's order, and the multiply-add count behind it. */
    private static double coefficients() {
        Solution engine = Scenario.fresh().engineReading().orElseThrow().tree();
        PolynomialSystem system = engine.system();
        RecurrencePlan plan = RecurrencePlan.compile(system);
        int order = engine.settings().order();
        DoubleTaylorKernel kernel = new DoubleTaylorKernel(plan, system, order);
        Node root = engine.root();
        int n = root.dimension();
        double[] yr = new double[n];
        double[] yi = new double[n];
        for (int i = 0; i < n; i++) {
            yr[i] = root.stateRe(i);
            yi[i] = root.stateIm(i);
        }
        double[][] or = new double[n][order + 1];
        double[][] oi = new double[n][order + 1];
        int reps = 20000;
        double[] t = new double[WARM + 7];
        double sink = 0;
        for (int r = 0; r < t.length; r++) {
            long t0 = System.nanoTime();
            for (int k = 0; k < reps; k++) {
                kernel.coefficients(root.tauRe(), root.tauIm(), yr, yi, 0.25, or, oi);
                sink += or[0][order];
            }
            t[r] = (System.nanoTime() - t0) / (double) reps;
        }
        double ns = median(t, WARM);
        long convolutions = plan.productCount() + plan.baseConvolutionCount();
        long macs = convolutions * (long) order * (order + 1) / 2;
        p("== coefficient generation (DoubleTaylorKernel.coefficients, order %d, %d unknowns, %d products +"
                + " %d base convolutions)", order, n, plan.productCount(), plan.baseConvolutionCount());
        p("   %.2f us per expansion; %d complex multiply-adds (convolutions x N(N+1)/2) -> %.2f ns each"
                + "   [sink %.1e]", ns / 1e3, macs, ns / macs, sink == 0 ? 0.0 : 1.0);
        return ns;
    }

    /** Steps per second on the path to distance 10; expansions per node. */
    private static void stepper() {
        Painleve3Solution probe = Scenario.fresh();
        Painleve3Value v = probe.evaluate(Scenario.FAR_TARGET);
        int nodes = probe.nodeCount();
        EngineDriver.Work work = EngineDriver.integrate(Scenario.fresh(), Scenario.FAR_TARGET);
        double errW = v.w().subtract(Scenario.FAR_W).norm();
        double errDw = v.dw().subtract(Scenario.FAR_DW).norm();
        double[] t = new double[WARM + 7];
        for (int r = 0; r < t.length; r++) {
            long t0 = System.nanoTime();
            int reps = 20;
            for (int k = 0; k < reps; k++) {
                Scenario.fresh().evaluate(Scenario.FAR_TARGET);
            }
            t[r] = (System.nanoTime() - t0) / (double) reps;
        }
        double ns = median(t, WARM);
        p("== fresh solution to z = 7+8i (distance 10 through the pole field)");
        p("   %d nodes (counting driver: %d nodes, %d Taylor expansions, %.2f per node); %.2f ms per path,"
                + " %.0f steps/s, %.1f us per node", nodes, work.nodes, work.expansions, work.expansionsPerNode(),
                ns / 1e6, (nodes - 1) / (ns / 1e9), ns / nodes / 1e3);
        p("   error vs reference data: |dw| %.1e (estimate %.1e), |dw'| %.1e (estimate %.1e)", errW, v.errW(), errDw,
                v.errDw());
    }

    private static void path() {
        List<SurfacePoint> path = Scenario.path();
        Painleve3Solution probe = Scenario.fresh();
        List<Painleve3Value> vals = probe.evaluate(path);
        double worst = vals.stream().mapToDouble(Painleve3Value::relativeError).max().orElse(0);
        double[] tf = new double[WARM + 7];
        double[] tw = new double[WARM + 7];
        for (int r = 0; r < tf.length; r++) {
            long t0 = System.nanoTime();
            for (int k = 0; k < 10; k++) {
                Scenario.fresh().evaluate(path);
            }
            tf[r] = (System.nanoTime() - t0) / 10.0;
            t0 = System.nanoTime();
            for (int k = 0; k < 100; k++) {
                probe.evaluate(path);
            }
            tw[r] = (System.nanoTime() - t0) / 100.0;
        }
        p("== 100-point path z_k = 1 + (6+8i)(k+1)/100: %d nodes, largest relative error estimate %.1e",
                probe.nodeCount(), worst);
        p("   fresh solution: %.2f ms per path (%.1f us per point); warm tree: %.1f us per path (%.2f us per point)",
                median(tf, WARM) / 1e6, median(tf, WARM) / 1e5, median(tw, WARM) / 1e3, median(tw, WARM) / 1e5);
    }

    private static void grid(double coefNs, int runs) {
        int threads = Runtime.getRuntime().availableProcessors();
        p("== 401 x 401 grid over [-10,10]^2, sheet 0, max relative error 1e-10, %d threads", threads);
        double[] t = new double[WARM + runs];
        GridResult last = null;
        for (int r = 0; r < t.length; r++) {
            long t0 = System.nanoTime();
            last = RegionSolver.solve(Scenario.fresh(), Scenario.grid(), Scenario.regionSettings(threads));
            t[r] = System.nanoTime() - t0;
            p("   %s %d: %.3f s  (%s)", r < WARM ? "warm-up" : "run", r < WARM ? r + 1 : r - WARM + 1, t[r] / 1e9,
                    last.statistics());
        }
        double ns = median(t, WARM);
        RegionStatistics s = last.statistics();
        double bound = coefNs * s.nodes();
        p("   median %.3f s; %d nodes, %.0f steps/s over the whole grid, %.0f steps/s in the tree passes",
                ns / 1e9, s.nodes(), s.newNodes() / (ns / 1e9), s.newNodes() / (s.treeNanos() / 1e9));
        p("   served from stored approximants %d, own path %d, failed %d; largest error estimate %.1e (relative"
                + " to 1+|w|)", s.servedFromTree(), s.integrated(), s.failed(), last.maxRelativeError());
        p("   lower bound (coefficient generation x nodes) %.1f ms; time / bound = %.1f", bound / 1e6, ns / bound);
        heap(s.treeBytes());
    }

    /** Tree size: the engine's own accounting and the heap retained by a solution after a grid. */
    private static void heap(long accounted) {
        Runtime rt = Runtime.getRuntime();
        long before = used(rt);
        Painleve3Solution s = Scenario.fresh();
        GridResult g = RegionSolver.solve(s, Scenario.grid(), Scenario.regionSettings(rt.availableProcessors()));
        long withGrid = used(rt);
        Reference.reachabilityFence(g);
        g = null;
        long treeOnly = used(rt);
        Reference.reachabilityFence(s);
        p("   tree bytes: RegionStatistics.treeBytes %.1f MB; measured heap delta %.1f MB for the solution"
                + " (%.1f MB with the grid values)", accounted / 1e6, (treeOnly - before) / 1e6,
                (withGrid - before) / 1e6);
    }

    private static long used(Runtime rt) {
        for (int i = 0; i < 4; i++) {
            System.gc();
        }
        return rt.totalMemory() - rt.freeMemory();
    }

    /** The engine and DormandPrince853 on [1, 2], at matched accuracy. */
    private static void segment(double coefNs) {
        SurfacePoint end = SurfacePoint.of(Scenario.SEGMENT_END, 0);
        HighPrecisionValue ref = HighPrecisionSolution.of(Painleve3Solution.builder(Painleve3.exact("1", "-1/2", "1",
                "-1")).start("1", "1/2", "1/3").build(), 32).evaluate(end);
        double rw = real(ref.value(0));
        double rdw = real(ref.value(1));
        Painleve3Value v = Scenario.fresh().evaluate(end);
        EngineDriver.Work work = EngineDriver.integrate(Scenario.fresh(), end);
        double engErr = Math.max(Math.abs(v.w().getReal() - rw), Math.abs(v.dw().getReal() - rdw));
        double engEst = Math.max(v.errW(), v.errDw());
        double[] t = new double[WARM + 7];
        for (int r = 0; r < t.length; r++) {
            long t0 = System.nanoTime();
            for (int k = 0; k < 200; k++) {
                Scenario.fresh().evaluate(end);
            }
            t[r] = (System.nanoTime() - t0) / 200.0;
        }
        double engNs = median(t, WARM);
        Solution engine = Scenario.fresh().engineReading().orElseThrow().tree();
        RecurrencePlan plan = RecurrencePlan.compile(engine.system());
        int order = engine.settings().order();
        long macs = (plan.productCount() + plan.baseConvolutionCount()) * (long) order * (order + 1) / 2;
        p("== real segment [1, 2] (w has no zero or pole there), reference: 32-digit solution, w(2) = %.17g,"
                + " w'(2) = %.17g", rw, rdw);
        p("   engine: %.1f us, %d nodes, %d Taylor expansions of order %d (%d complex multiply-adds each);"
                + " error %.1e, estimate %.1e", engNs / 1e3, work.nodes, work.expansions, order, macs, engErr, engEst);
        p("   DormandPrince853 (abs = rel tolerance):");
        p("   %-8s %-10s %-8s %-10s", "tol", "error", "RHS", "time us");
        double matchedTol = Double.NaN;
        double matchedNs = 0;
        int matchedEvals = 0;
        for (int k = 0; k < 3000; k++) {
            RealSegment.dormandPrince853(1e-8 * Math.pow(10, -(k % 8)));
        }
        for (double tol : new double[] {1e-8, 1e-9, 1e-10, 1e-11, 1e-12, 1e-13, 1e-14, 1e-15}) {
            RealSegment.Result d = RealSegment.dormandPrince853(tol);
            double err = Math.max(Math.abs(d.w - rw), Math.abs(d.dw - rdw));
            double[] td = new double[WARM + 7];
            for (int r = 0; r < td.length; r++) {
                long t0 = System.nanoTime();
                for (int k = 0; k < 200; k++) {
                    RealSegment.dormandPrince853(tol);
                }
                td[r] = (System.nanoTime() - t0) / 200.0;
            }
            double ns = median(td, WARM);
            p("   %-8.0e %-10.1e %-8d %-10.1f", tol, err, d.evaluations, ns / 1e3);
            if (Double.isNaN(matchedTol) && err <= Math.max(engErr, 1e-300) * 1.5) {
                matchedTol = tol;
                matchedNs = ns;
                matchedEvals = d.evaluations;
            }
        }
        if (Double.isNaN(matchedTol)) {
            p("   no tolerance gives DormandPrince853 the engine's error %.1e", engErr);
        } else {
            p("   matched accuracy: DormandPrince853 at tol %.0e: %.1f us and %d RHS evaluations, against the"
                    + " engine's %.1f us and %d expansions (time ratio DP853/engine %.2f)", matchedTol,
                    matchedNs / 1e3, matchedEvals, engNs / 1e3, work.expansions, matchedNs / engNs);
        }
        double rhsNs = rhsCost();
        p("   one RHS evaluation of the real (w, w') system: %.1f ns timed alone (about 15 flops, 3 of them"
                + " divisions); one expansion of order %d: %d complex multiply-adds = %d real flops, %.1f us,"
                + " i.e. %.0f RHS evaluations by flops and %.0f by time", rhsNs, order, macs, 8 * macs, coefNs / 1e3,
                8.0 * macs / 15, coefNs / rhsNs);
        p("   the engine's %d expansions are worth about %.0f RHS evaluations by time (coefficient generation"
                + " only: %.0f us of the %.0f us)", work.expansions, work.expansions * coefNs / rhsNs,
                work.expansions * coefNs / 1e3, engNs / 1e3);
        double estTol = Double.NaN;
        for (double tol : new double[] {1e-8, 1e-9, 1e-10, 1e-11, 1e-12}) {
            RealSegment.Result d = RealSegment.dormandPrince853(tol);
            if (Math.max(Math.abs(d.w - rw), Math.abs(d.dw - rdw)) <= engEst) {
                estTol = tol;
                break;
            }
        }
        p("   matched to the engine's error estimate %.1e instead of its true error: DormandPrince853 tol %.0e",
                engEst, estTol);
    }

    /** Time of one right-hand-side evaluation of the real system alone. */
    private static double rhsCost() {
        double[] t = new double[WARM + 7];
        double sink = 0;
        for (int r = 0; r < t.length; r++) {
            double w = 0.5;
            double v = 1.0 / 3;
            long t0 = System.nanoTime();
            int reps = 1_000_000;
            for (int k = 0; k < reps; k++) {
                double z = 1 + k * 1e-6;
                double[] d = {v, v * v / w - v / z + (w * w - 0.5) / z + w * w * w - 1 / w};
                sink += d[1];
                w += 1e-9;
            }
            t[r] = (System.nanoTime() - t0) / (double) reps;
        }
        if (sink == 42) {
            System.out.print("");
        }
        return median(t, WARM);
    }

    private static double real(Apcomplex c) {
        return c.real().doubleValue();
    }

    private static double median(double[] t, int skip) {
        double[] m = Arrays.copyOfRange(t, skip, t.length);
        Arrays.sort(m);
        return m[m.length / 2];
    }

    private static void p(String fmt, Object... a) {
        System.out.println(String.format(Locale.ROOT, fmt, a));
    }
}
