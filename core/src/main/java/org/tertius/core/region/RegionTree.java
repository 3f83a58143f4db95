package org.tertius.core.region;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;
import org.tertius.core.TertiusException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.FrozenTree;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;
import org.tertius.core.step.Node;

/**
 * A path tree grown for one declared set of points — a grid, a strip, a line — from the solution's root alone, in a
 * fixed order (a coarse subset in order of distance from the start, after Fornberg and Weideman, J. Comput. Phys.
 * 230 (2011)), then frozen. Every value read from it depends on the solution's start, the declared set and the point
 * only: not on what was asked before, not on the number of threads, not on where an interrupted table resumes.
 * For a solution not integrated by the engine (a closed form) there is no tree and values are computed directly.
 *
 * <p>Immutable and thread-safe.
 */
public final class RegionTree {
    /** Target spacing of the coarse subset in units of |z| (a fraction of the typical pole spacing). */
    static final double COARSE_SPACING = 0.45;
    /** Spacing in grid points of the sublattice whose holes are filled first. */
    static final int FILL_STRIDE = 8;

    private final ComputedSolution solution;
    private final EngineReading reading;
    private final FrozenTree tree;
    private final int nodesGrown;

    private RegionTree(ComputedSolution solution, EngineReading reading, FrozenTree tree, int nodesGrown) {
        this.solution = solution;
        this.reading = reading;
        this.tree = tree;
        this.nodesGrown = nodesGrown;
    }

    /**
     * The tree the solution holds now (grown by its own evaluations), frozen: for code that has walked the solution
     * along a path of its own in a fixed order and wants the poles and zeros met.
     */
    public static RegionTree current(ComputedSolution solution) {
        EngineReading reading = solution.engineReading().orElse(null);
        if (reading == null) {
            return new RegionTree(solution, null, null, 0);
        }
        return new RegionTree(solution, reading, reading.tree().freeze(), 0);
    }

    /** The tree grown over a grid (a rectangle of one sheet or a strip in log z). */
    public static RegionTree grow(ComputedSolution solution, Grid grid, RegionSettings settings) {
        EngineReading reading = solution.engineReading().orElse(null);
        if (reading == null) {
            return new RegionTree(solution, null, null, 0);
        }
        int stride = Math.max(1, (int) Math.round(COARSE_SPACING / Math.max(grid.zSpacing(), 1e-300)));
        List<SurfacePoint> coarse = new ArrayList<>();
        for (int j = 0; j < grid.ny(); j += stride) {
            for (int i = 0; i < grid.nx(); i += stride) {
                SurfacePoint p = grid.point(i, j, solution.coordinate());
                if (p != null) {
                    coarse.add(p);
                }
            }
        }
        Solution own = grow(reading, coarse, settings);
        fill(own, reading, grid, solution, settings);
        return new RegionTree(solution, reading, own.freeze(), own.nodeCount() - 1);
    }

    /**
     * Extends a tree grown towards the coarse subset of a grid to every point of the grid that still lies outside
     * all disks. Such holes open next to poles, where the disks are small, and at the edges; each extension adds a
     * short path whose last disks cover the hole's neighbours too, so that a grid point rarely needs a path of its
     * own in the grid pass (a detached path per point, dropped afterwards, is what a hole costs there). The points
     * outside the disks of the coarse tree are listed first (on all threads; a point inside a disk stays inside as
     * nodes are added), then taken in a fixed order (the tree stays a function of the grid): the points of a
     * sublattice {@value #FILL_STRIDE} points apart before the others, so that one extension tends to serve a
     * whole hole.
     */
    private static void fill(Solution own, EngineReading reading, Grid grid, ComputedSolution solution,
                             RegionSettings settings) {
        int nx = grid.nx();
        int[][] rows = new int[grid.ny()][];
        ForkJoinPool pool = new ForkJoinPool(settings.threads());
        try {
            pool.submit(() -> IntStream.range(0, grid.ny()).parallel().forEach(j -> {
                int[] holes = new int[nx];
                int count = 0;
                for (int i = 0; i < nx; i++) {
                    SurfacePoint p = grid.point(i, j, solution.coordinate());
                    if (p != null && !own.inStoredDisk(reading.tauRe(p), reading.tauIm(p))) {
                        holes[count++] = i;
                    }
                }
                rows[j] = Arrays.copyOf(holes, count);
            })).get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new CancellationException("tree growth interrupted");
        } catch (ExecutionException e) {
            throw new TertiusException("tree growth failed: " + e.getCause(), e.getCause());
        } finally {
            pool.shutdown();
        }
        List<long[]> holes = new ArrayList<>();
        for (int j = 0; j < rows.length; j++) {
            for (int i : rows[j]) {
                holes.add(new long[] {(long) (j % FILL_STRIDE) * FILL_STRIDE + i % FILL_STRIDE, j, i});
            }
        }
        holes.sort(Comparator.comparingLong((long[] h) -> h[0]).thenComparingLong(h -> h[1])
                .thenComparingLong(h -> h[2]));
        for (long[] h : holes) {
            RegionSolver.checkCancelled(settings);
            SurfacePoint p = grid.point((int) h[2], (int) h[1], solution.coordinate());
            double tauRe = reading.tauRe(p);
            double tauIm = reading.tauIm(p);
            if (own.inStoredDisk(tauRe, tauIm)) {
                continue;
            }
            try {
                own.extendTo(tauRe, tauIm);
            } catch (TertiusException e) {
                // the point itself reports it when it is evaluated
            }
        }
    }

    /**
     * The tree grown towards equally spaced points of a line: a subset spaced about {@value #COARSE_SPACING} apart,
     * so that paths radiate from the start point instead of chaining along the line (a chain that hugs a line of
     * poles and zeros gathers error at every one of them).
     */
    public static RegionTree growAlong(ComputedSolution solution, List<SurfacePoint> points, RegionSettings settings) {
        EngineReading reading = solution.engineReading().orElse(null);
        if (reading == null) {
            return new RegionTree(solution, null, null, 0);
        }
        List<SurfacePoint> coarse = new ArrayList<>();
        SurfacePoint last = null;
        for (SurfacePoint p : points) {
            if (last == null || Math.hypot(p.re() - last.re(), p.im() - last.im()) >= COARSE_SPACING
                    || p.sheet() != last.sheet()) {
                coarse.add(p);
                last = p;
            }
        }
        Solution own = grow(reading, coarse, settings);
        return new RegionTree(solution, reading, own.freeze(), own.nodeCount() - 1);
    }

    /** Grows a root-only copy of the solution's tree towards the points in order of distance from the start. */
    private static Solution grow(EngineReading reading, List<SurfacePoint> targets, RegionSettings settings) {
        Solution own = reading.tree().withRootOnly();
        Node root = own.root();
        SurfacePoint start = reading.point(root.tauRe(), root.tauIm());
        List<SurfacePoint> sorted = new ArrayList<>(targets);
        sorted.sort(Comparator.comparingDouble((SurfacePoint p) -> distance(p, start)).thenComparingDouble(SurfacePoint::im)
                .thenComparingDouble(SurfacePoint::re).thenComparingInt(SurfacePoint::sheet));
        long done = 0;
        for (SurfacePoint p : sorted) {
            RegionSolver.checkCancelled(settings);
            try {
                own.extendTo(reading.tauRe(p), reading.tauIm(p));
            } catch (TertiusException e) {
                // the point itself reports it when it is evaluated
            }
            settings.progress().update(++done, sorted.size());
        }
        return own;
    }

    private static double distance(SurfacePoint p, SurfacePoint start) {
        return ComplexPairs.abs(p.re() - start.re(), p.im() - start.im()) + Math.abs(p.sheet() - start.sheet()) * 10.0;
    }

    /** The solution. */
    public ComputedSolution solution() {
        return solution;
    }

    /** Whether values come from a path tree (false for a closed form). */
    public boolean integrated() {
        return tree != null;
    }

    /** The reading of the engine (null for a closed form). */
    EngineReading reading() {
        return reading;
    }

    /** The nodes of the tree (empty for a closed form). */
    public List<Node> nodes() {
        return tree == null ? List.of() : tree.nodes();
    }

    /** Nodes grown for this region. */
    public int nodesGrown() {
        return nodesGrown;
    }

    /** Bytes held by the tree. */
    public long footprint() {
        long s = 0;
        for (Node n : nodes()) {
            s += n.footprint();
        }
        return s;
    }

    /** The start point of the solution (null for a closed form). */
    SurfacePoint start() {
        if (tree == null) {
            return null;
        }
        Node root = tree.nodes().get(0);
        return reading.point(root.tauRe(), root.tauIm());
    }

    /**
     * The values at a point from the stored nodes alone, or null when no node covers it to {@code maxRelativeError}
     * (a closed form: its value, or null when it cannot be computed).
     */
    public SolutionValue stored(SurfacePoint p, double maxRelativeError) {
        if (tree == null) {
            try {
                return solution.valueAt(p);
            } catch (TertiusException e) {
                return null;
            }
        }
        StateEstimate s = tree.evaluateStored(reading.tauRe(p), reading.tauIm(p), maxRelativeError);
        return s == null ? null : reading.read(p, s);
    }

    /**
     * The values at a point: from a covering node, else from a detached path from the nearest node (dropped
     * afterwards), so that the answer depends on the tree and the point only.
     *
     * @throws org.tertius.core.UnreachableTargetException if the point cannot be reached, or lies next to a pole
     */
    public SolutionValue value(SurfacePoint p) {
        if (tree == null) {
            return solution.valueAt(p);
        }
        return reading.read(p, tree.evaluate(reading.tauRe(p), reading.tauIm(p)));
    }
}
