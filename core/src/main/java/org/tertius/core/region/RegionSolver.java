package org.tertius.core.region;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;
import org.tertius.core.TertiusException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.StateEstimate;

/**
 * A solution over a whole grid. For a solution integrated by the engine, in three passes (after Fornberg and
 * Weideman, J. Comput. Phys. 230 (2011)):
 * <ol>
 *   <li>tree: a coarse subset of the grid, taken in order of distance from the start point, is evaluated one
 *   by one; each target is reached by a path from the nearest stored node, so the tree grows outwards;</li>
 *   <li>grid: every point is evaluated from the stored approximant that covers it best (read-only, on all
 *   threads);</li>
 *   <li>rest: the few points that no stored node covers to the accuracy get their own paths, one by one.</li>
 * </ol>
 * Passes 1 and 3 are sequential and pass 2 does not change the tree, so the values do not depend on the number
 * of threads. A solution not integrated by the engine (a closed form) is evaluated point by point on all threads.
 */
public final class RegionSolver {
    /** Target spacing of the coarse pass in units of |z| (a fraction of the typical pole spacing). */
    private static final double COARSE_SPACING = 0.45;

    private RegionSolver() {
    }

    /** Computes the solution on the grid. */
    public static GridResult solve(ComputedSolution solution, Grid grid, RegionSettings settings) {
        int values = solution.valueNames().size();
        grid.checkMemory("grid", values);
        int nx = grid.nx();
        int total = nx * grid.ny();
        Store store = new Store(values, total);
        int nodesBefore = solution.nodeCount();
        AtomicLong done = new AtomicLong();
        long work = total + (long) total / 4;
        EngineReading reading = solution.engineReading().orElse(null);
        SurfacePoint start = reading == null ? null : reading.point(reading.tree().root().tauRe(),
                reading.tree().root().tauIm());

        // pass 1: the tree, from a coarse subset in order of distance from the start
        long t0 = System.nanoTime();
        if (reading != null) {
            growTree(solution, reading, grid, start, settings, done, work);
        }
        long t1 = System.nanoTime();

        // pass 2: every point from the stored tree (or, without a tree, directly), in parallel by rows
        List<Integer> missing = Collections.synchronizedList(new ArrayList<>());
        ExecutorService pool = Executors.newFixedThreadPool(settings.threads(), r -> {
            Thread t = new Thread(r, "tertius-grid");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> rows = new ArrayList<>();
            for (int j = 0; j < grid.ny(); j++) {
                final int row = j;
                rows.add(pool.submit(() -> {
                    for (int i = 0; i < nx; i++) {
                        if (settings.cancelled().getAsBoolean()) {
                            return;
                        }
                        SurfacePoint p = pointOrNull(solution, grid, i, row);
                        int k = row * nx + i;
                        if (p == null) {
                            continue;
                        }
                        SolutionValue v = reading == null ? direct(solution, p) : stored(reading, p, settings);
                        if (v == null) {
                            missing.add(k);
                        } else {
                            store.put(v, k);
                        }
                    }
                    settings.progress().update(done.addAndGet(nx), work);
                }));
            }
            for (Future<?> f : rows) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("grid computation interrupted");
        } catch (ExecutionException e) {
            throw new TertiusException("grid computation failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdownNow();
        }
        checkCancelled(settings);
        int failed = 0;
        int served = total - missing.size();

        // pass 3: the rest, one by one in a fixed order
        List<Integer> rest = new ArrayList<>(missing);
        rest.sort(Comparator.comparingDouble((Integer k) -> distance(solution, grid, k % nx, k / nx, start))
                .thenComparingInt(k -> k));
        int integrated = 0;
        for (int k : rest) {
            checkCancelled(settings);
            SurfacePoint p = pointOrNull(solution, grid, k % nx, k / nx);
            try {
                store.put(solution.valueAt(p), k);
                integrated++;
            } catch (TertiusException e) {
                failed++;
            }
        }
        long t2 = System.nanoTime();
        settings.progress().update(work, work);
        long footprint = reading == null ? 0 : reading.tree().footprint();
        RegionStatistics stats = new RegionStatistics(solution.nodeCount(), solution.nodeCount() - nodesBefore,
                served, integrated, failed, t1 - t0, t2 - t1, footprint);
        return new GridResult(grid, solution.coordinate(), solution.valueNames(), store.re, store.im, store.err, stats);
    }

    private static void growTree(ComputedSolution solution, EngineReading reading, Grid grid, SurfacePoint start,
                                 RegionSettings settings, AtomicLong done, long work) {
        int total = grid.size();
        int stride = Math.max(1, (int) Math.round(COARSE_SPACING / Math.max(grid.zSpacing(), 1e-300)));
        List<int[]> coarse = new ArrayList<>();
        for (int j = 0; j < grid.ny(); j += stride) {
            for (int i = 0; i < grid.nx(); i += stride) {
                coarse.add(new int[] {i, j});
            }
        }
        coarse.sort(Comparator.comparingDouble((int[] c) -> distance(solution, grid, c[0], c[1], start))
                .thenComparingInt(c -> c[1]).thenComparingInt(c -> c[0]));
        for (int[] c : coarse) {
            checkCancelled(settings);
            SurfacePoint p = pointOrNull(solution, grid, c[0], c[1]);
            if (p != null) {
                try {
                    reading.tree().extendTo(reading.tauRe(p), reading.tauIm(p));
                } catch (TertiusException e) {
                    // left for pass 3, which reports it
                }
            }
            settings.progress().update(done.addAndGet(total / 4 / Math.max(1, coarse.size())), work);
        }
    }

    /**
     * Grows the tree of a solution towards a list of points (for example a line) the way the first pass of
     * {@link #solve} does: a subset spaced about {@value #COARSE_SPACING} apart, taken in order of distance from
     * the start, so that paths radiate from the start point instead of chaining along the list (a chain that
     * hugs a line of poles and zeros gathers error at every one of them). Does nothing for a solution not
     * integrated by the engine.
     */
    public static void growTowards(ComputedSolution solution, List<SurfacePoint> points) {
        EngineReading reading = solution.engineReading().orElse(null);
        if (reading == null) {
            return;
        }
        SurfacePoint start = reading.point(reading.tree().root().tauRe(), reading.tree().root().tauIm());
        List<SurfacePoint> coarse = new ArrayList<>();
        SurfacePoint last = null;
        for (SurfacePoint p : points) {
            if (last == null || Math.hypot(p.re() - last.re(), p.im() - last.im()) >= COARSE_SPACING
                    || p.sheet() != last.sheet()) {
                coarse.add(p);
                last = p;
            }
        }
        coarse.sort(Comparator.comparingDouble((SurfacePoint p) -> Math.hypot(p.re() - start.re(), p.im() - start.im())
                + Math.abs(p.sheet() - start.sheet()) * 10.0));
        for (SurfacePoint p : coarse) {
            try {
                reading.tree().extendTo(reading.tauRe(p), reading.tauIm(p));
            } catch (TertiusException e) {
                // the point itself will report it when evaluated
            }
        }
    }

    /** The grid point on the solution's surface, or null where it is not a point of it (the branch point). */
    private static SurfacePoint pointOrNull(ComputedSolution solution, Grid grid, int i, int j) {
        return grid.point(i, j, solution.coordinate());
    }

    private static SolutionValue stored(EngineReading reading, SurfacePoint p, RegionSettings settings) {
        StateEstimate s = reading.tree().evaluateStored(reading.tauRe(p), reading.tauIm(p),
                settings.maxRelativeError());
        return s == null ? null : reading.read(p, s);
    }

    /** A closed-form value, or null (left to pass 3, which reports the failure) when it cannot be computed. */
    private static SolutionValue direct(ComputedSolution solution, SurfacePoint p) {
        try {
            return solution.valueAt(p);
        } catch (TertiusException e) {
            return null;
        }
    }

    /** The value arrays of a grid: per value, real and imaginary parts and errors at every point. */
    private static final class Store {
        final double[][] re;
        final double[][] im;
        final double[][] err;

        Store(int values, int total) {
            re = new double[values][total];
            im = new double[values][total];
            err = new double[values][total];
            for (int v = 0; v < values; v++) {
                Arrays.fill(re[v], Double.NaN);
                Arrays.fill(im[v], Double.NaN);
                Arrays.fill(err[v], Double.POSITIVE_INFINITY);
            }
        }

        void put(SolutionValue v, int k) {
            for (int n = 0; n < re.length; n++) {
                re[n][k] = v.value(n).getReal();
                im[n][k] = v.value(n).getImaginary();
                err[n][k] = v.error(n);
            }
        }
    }

    private static double distance(ComputedSolution solution, Grid g, int i, int j, SurfacePoint start) {
        SurfacePoint p = pointOrNull(solution, g, i, j);
        if (p == null || start == null) {
            return 0;
        }
        return ComplexPairs.abs(p.re() - start.re(), p.im() - start.im()) + Math.abs(p.sheet() - start.sheet()) * 10.0;
    }

    private static void checkCancelled(RegionSettings s) {
        if (s.cancelled().getAsBoolean() || Thread.currentThread().isInterrupted()) {
            throw new CancellationException("region computation cancelled");
        }
    }
}
