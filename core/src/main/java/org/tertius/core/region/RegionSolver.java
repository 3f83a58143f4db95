package org.tertius.core.region;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.EngineView;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;

/**
 * A solution over a whole grid, in three passes (after Fornberg and Weideman, J. Comput. Phys. 230 (2011)):
 * <ol>
 *   <li>tree: a coarse subset of the grid, taken in order of distance from the start point, is evaluated one
 *   by one; each target is reached by a path from the nearest stored node, so the tree grows outwards;</li>
 *   <li>grid: every point is evaluated from the stored approximant that covers it best (read-only, on all
 *   threads);</li>
 *   <li>rest: the few points that no stored node covers to the accuracy get their own paths, one by one.</li>
 * </ol>
 * Passes 1 and 3 are sequential and pass 2 does not change the tree, so the values do not depend on the number
 * of threads.
 */
public final class RegionSolver {
    /** Target spacing of the coarse pass in units of |z| (a fraction of the typical pole spacing). */
    private static final double COARSE_SPACING = 0.45;

    private RegionSolver() {
    }

    /** Computes the solution on the grid. */
    public static GridResult solve(Painleve3Solution solution, Grid grid, RegionSettings settings) {
        grid.checkMemory("grid");
        EngineView view = EngineView.of(solution);
        int nx = grid.nx();
        int ny = grid.ny();
        int total = nx * ny;
        double[] wRe = new double[total];
        double[] wIm = new double[total];
        double[] dwRe = new double[total];
        double[] dwIm = new double[total];
        double[] err = new double[total];
        java.util.Arrays.fill(err, Double.POSITIVE_INFINITY);
        java.util.Arrays.fill(wRe, Double.NaN);
        java.util.Arrays.fill(wIm, Double.NaN);
        java.util.Arrays.fill(dwRe, Double.NaN);
        java.util.Arrays.fill(dwIm, Double.NaN);
        int nodesBefore = solution.nodeCount();
        AtomicLong done = new AtomicLong();
        long work = total + (long) total / 4;

        // pass 1: the tree, from a coarse subset in order of distance from the start
        long t0 = System.nanoTime();
        int stride = Math.max(1, (int) Math.round(COARSE_SPACING / Math.max(grid.zSpacing(), 1e-300)));
        List<int[]> coarse = new ArrayList<>();
        for (int j = 0; j < ny; j += stride) {
            for (int i = 0; i < nx; i += stride) {
                coarse.add(new int[] {i, j});
            }
        }
        SurfacePoint start = view.startPoint();
        coarse.sort(Comparator.comparingDouble((int[] c) -> distance(grid, c[0], c[1], start))
                .thenComparingInt(c -> c[1]).thenComparingInt(c -> c[0]));
        int failed = 0;
        for (int[] c : coarse) {
            checkCancelled(settings);
            SurfacePoint p = grid.point(c[0], c[1]);
            if (p != null) {
                try {
                    view.engine().extendTo(p.logRe(), p.logIm());
                } catch (TertiusException e) {
                    // left for pass 3, which reports it
                }
            }
            settings.progress().update(done.addAndGet(total / 4 / Math.max(1, coarse.size())), work);
        }
        long t1 = System.nanoTime();

        // pass 2: every point from the stored tree, in parallel by rows
        List<Integer> missing = java.util.Collections.synchronizedList(new ArrayList<>());
        ExecutorService pool = Executors.newFixedThreadPool(settings.threads(), r -> {
            Thread t = new Thread(r, "tertius-grid");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<?>> rows = new ArrayList<>();
            for (int j = 0; j < ny; j++) {
                final int row = j;
                rows.add(pool.submit(() -> {
                    for (int i = 0; i < nx; i++) {
                        if (settings.cancelled().getAsBoolean()) {
                            return;
                        }
                        SurfacePoint p = grid.point(i, row);
                        int k = row * nx + i;
                        if (p == null) {
                            continue;
                        }
                        Painleve3Value v = view.evaluateStored(p, settings.maxRelativeError());
                        if (v == null) {
                            missing.add(k);
                        } else {
                            store(v, k, wRe, wIm, dwRe, dwIm, err);
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
        int served = total - missing.size();

        // pass 3: the rest, one by one in a fixed order
        List<Integer> rest = new ArrayList<>(missing);
        rest.sort(Comparator.comparingDouble((Integer k) -> distance(grid, k % nx, k / nx, start))
                .thenComparingInt(k -> k));
        int integrated = 0;
        for (int k : rest) {
            checkCancelled(settings);
            SurfacePoint p = grid.point(k % nx, k / nx);
            try {
                store(solution.evaluate(p), k, wRe, wIm, dwRe, dwIm, err);
                integrated++;
            } catch (TertiusException e) {
                failed++;
            }
        }
        long t2 = System.nanoTime();
        settings.progress().update(work, work);
        RegionStatistics stats = new RegionStatistics(solution.nodeCount(), solution.nodeCount() - nodesBefore,
                served, integrated, failed, t1 - t0, t2 - t1, view.engine().footprint());
        return new GridResult(grid, wRe, wIm, dwRe, dwIm, err, stats);
    }

    /**
     * Grows the tree of a solution towards a list of points (for example a line) the way the first pass of
     * {@link #solve} does: a subset spaced about {@value #COARSE_SPACING} apart, taken in order of distance from
     * the start, so that paths radiate from the start point instead of chaining along the list (a chain that
     * hugs a line of poles and zeros gathers error at every one of them).
     */
    public static void growTowards(Painleve3Solution solution, List<SurfacePoint> points) {
        EngineView view = EngineView.of(solution);
        SurfacePoint start = view.startPoint();
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
                view.engine().extendTo(p.logRe(), p.logIm());
            } catch (TertiusException e) {
                // the point itself will report it when evaluated
            }
        }
    }

    private static void store(Painleve3Value v, int k, double[] wRe, double[] wIm, double[] dwRe, double[] dwIm,
                              double[] err) {
        wRe[k] = v.w().getReal();
        wIm[k] = v.w().getImaginary();
        dwRe[k] = v.dw().getReal();
        dwIm[k] = v.dw().getImaginary();
        err[k] = Math.max(v.errW(), v.errDw());
    }

    private static double distance(Grid g, int i, int j, SurfacePoint start) {
        SurfacePoint p = g.point(i, j);
        if (p == null) {
            return 0;
        }
        return org.tertius.core.number.Cx.abs(p.re() - start.re(), p.im() - start.im())
                + Math.abs(p.sheet() - start.sheet()) * 10.0;
    }

    private static void checkCancelled(RegionSettings s) {
        if (s.cancelled().getAsBoolean() || Thread.currentThread().isInterrupted()) {
            throw new CancellationException("region computation cancelled");
        }
    }
}
