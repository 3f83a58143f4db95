package org.tertius.core.region;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import org.tertius.core.TertiusException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.PoleProximityException;

/**
 * A solution over a whole grid. For a solution integrated by the engine, in three passes (after Fornberg and
 * Weideman, J. Comput. Phys. 230 (2011)):
 * <ol>
 *   <li>tree: a tree grown for the grid from the solution's root alone, towards a coarse subset and then into the
 *   holes left between its disks ({@link RegionTree}), then frozen;</li>
 *   <li>grid: every point is evaluated from the stored approximant that covers it best (read-only, on all
 *   threads);</li>
 *   <li>rest: the few points that no stored node covers to the accuracy get their own detached paths from the
 *   frozen tree, which are dropped afterwards (on all threads: each depends on the tree and its point alone).</li>
 * </ol>
 * Every value depends on the solution's start, the grid the tree was grown for and the point only: not on the
 * number of threads, not on what was computed before, not on the band of a table being computed (so a resumed
 * table equals an uninterrupted one). A point closer to a pole than the pole's position is known counts as failed
 * and is drawn as a pole. A solution not integrated by the engine (a closed form) is evaluated point by point.
 */
public final class RegionSolver {
    private RegionSolver() {
    }

    /** Computes the solution on the grid, from a tree grown for this grid ({@link RegionTree#grow}). */
    public static GridResult solve(ComputedSolution solution, Grid grid, RegionSettings settings) {
        grid.checkMemory("grid", solution.valueNames().size());
        long t0 = System.nanoTime();
        RegionTree tree = RegionTree.grow(solution, grid, settings.withProgressScaled(0, 0.2));
        long t1 = System.nanoTime();
        return solve(tree, grid, settings.withProgressScaled(0.2, 0.8), t1 - t0);
    }

    /**
     * Computes the solution on a grid from a tree grown before (for instance over a larger grid whose bands are
     * computed one by one: the values do not depend on the band).
     */
    public static GridResult solve(RegionTree tree, Grid grid, RegionSettings settings) {
        return solve(tree, grid, settings, 0);
    }

    private static GridResult solve(RegionTree tree, Grid grid, RegionSettings settings, long treeNanos) {
        ComputedSolution solution = tree.solution();
        int values = solution.valueNames().size();
        grid.checkMemory("grid", values);
        int nx = grid.nx();
        int total = nx * grid.ny();
        Store store = new Store(values, total);
        AtomicLong done = new AtomicLong();
        long t1 = System.nanoTime();

        // pass 2: every point from the stored tree (or, without a tree, directly), in parallel by rows
        List<Integer> missing = Collections.synchronizedList(new ArrayList<>());
        AtomicInteger integrated = new AtomicInteger();
        AtomicInteger failed = new AtomicInteger();
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
                        SurfacePoint p = grid.point(i, row, solution.coordinate());
                        int k = row * nx + i;
                        if (p == null) {
                            continue;
                        }
                        SolutionValue v = tree.stored(p, settings.maxRelativeError());
                        if (v == null) {
                            missing.add(k);
                        } else {
                            store.put(v, k);
                        }
                    }
                    settings.progress().update(done.addAndGet(nx), total);
                }));
            }
            await(rows);
            checkCancelled(settings);

            // pass 3: the rest, each from the frozen tree by a detached path (independent of the others, so in
            // parallel too)
            List<Future<?>> rest = new ArrayList<>();
            for (int k : missing) {
                rest.add(pool.submit(() -> {
                    if (settings.cancelled().getAsBoolean()) {
                        return;
                    }
                    SurfacePoint p = grid.point(k % nx, k / nx, solution.coordinate());
                    try {
                        store.put(tree.value(p), k);
                        integrated.incrementAndGet();
                    } catch (PoleProximityException e) {
                        // closer to a pole than its position is known: the value is infinite for all we know
                        store.putPole(k);
                        failed.incrementAndGet();
                    } catch (TertiusException e) {
                        failed.incrementAndGet();
                    }
                }));
            }
            await(rest);
        } finally {
            pool.shutdownNow();
        }
        checkCancelled(settings);
        int served = total - missing.size();
        long t2 = System.nanoTime();
        settings.progress().update(total, total);
        RegionStatistics stats = new RegionStatistics(tree.nodes().size(), tree.nodesGrown(), served, integrated.get(),
                failed.get(),
                treeNanos, t2 - t1, tree.footprint());
        return new GridResult(grid, tree, store.re, store.im, store.err, stats);
    }

    /** Waits for the tasks of a pass; a failure of one is the failure of the grid. */
    private static void await(List<Future<?>> tasks) {
        try {
            for (Future<?> f : tasks) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("grid computation interrupted");
        } catch (ExecutionException e) {
            throw new TertiusException("grid computation failed: " + e.getCause(), e.getCause());
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

        /** A point next to a pole: the first value infinite (drawn as a pole), no digit known. */
        void putPole(int k) {
            re[0][k] = Double.POSITIVE_INFINITY;
            im[0][k] = 0;
        }
    }

    static void checkCancelled(RegionSettings s) {
        if (s.cancelled().getAsBoolean() || Thread.currentThread().isInterrupted()) {
            throw new CancellationException("region computation cancelled");
        }
    }
}
