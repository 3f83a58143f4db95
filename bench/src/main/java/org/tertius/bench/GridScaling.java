package org.tertius.bench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.RegionTree;

/**
 * Thread scaling of the 401 x 401 grid of the benchmark scenario (not a test): the grid pass alone, from one tree
 * grown beforehand, and the tree growth alone (one thread but for the listing of the holes between its disks),
 * each with 1, 2 and as many threads as the machine has, the thread
 * counts alternating run by run after warm-up runs in this JVM; medians, minima and the ratio to one thread side
 * by side, with the machine and its load average before and after. The values are the same for every thread
 * count (the tree is compared node count and all, the grid value by value), which this report checks too.
 *
 * <pre>  java -cp bench/target/tertius-benchmarks.jar org.tertius.bench.GridScaling [runs] </pre>
 */
public final class GridScaling {
    private static final int WARM = 3;

    private GridScaling() {
    }

    public static void main(String[] args) throws IOException {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 7;
        int cores = Runtime.getRuntime().availableProcessors();
        List<Integer> counts = new ArrayList<>(List.of(1, 2));
        if (cores > 2) {
            counts.add(cores);
        }
        p("== machine: %d processors, %s, java %s; load average before: %s", cores, cpu(),
                System.getProperty("java.version"), load());
        Grid grid = Scenario.grid();
        RegionTree tree = RegionTree.grow(Scenario.fresh(), grid, Scenario.regionSettings(1));
        GridResult reference = RegionSolver.solve(tree, grid, Scenario.regionSettings(1));
        p("   tree: %d nodes; grid pass: %s", tree.nodes().size(), reference.statistics());
        Map<Integer, double[]> pass = new LinkedHashMap<>();
        Map<Integer, double[]> growth = new LinkedHashMap<>();
        for (int t : counts) {
            pass.put(t, new double[runs]);
            growth.put(t, new double[runs]);
        }
        for (int w = 0; w < WARM; w++) {
            for (int t : counts) {
                RegionSolver.solve(tree, grid, Scenario.regionSettings(t));
                RegionTree.grow(Scenario.fresh(), grid, Scenario.regionSettings(t));
            }
        }
        for (int r = 0; r < runs; r++) {
            for (int t : counts) {
                long t0 = System.nanoTime();
                GridResult g = RegionSolver.solve(tree, grid, Scenario.regionSettings(t));
                long t1 = System.nanoTime();
                RegionTree grown = RegionTree.grow(Scenario.fresh(), grid, Scenario.regionSettings(t));
                long t2 = System.nanoTime();
                pass.get(t)[r] = (t1 - t0) / 1e9;
                growth.get(t)[r] = (t2 - t1) / 1e9;
                check(reference, g, grown, tree, t);
            }
        }
        report("grid pass alone (tree grown before)", pass);
        report("tree growth alone", growth);
        p("== load average after: %s", load());
    }

    /** The values do not depend on the thread count: the same tree, the same grid values and errors. */
    private static void check(GridResult reference, GridResult g, RegionTree grown, RegionTree tree, int threads) {
        Grid grid = reference.grid();
        for (int j = 0; j < grid.ny(); j++) {
            for (int i = 0; i < grid.nx(); i++) {
                if (!reference.primary(i, j).equals(g.primary(i, j))
                        || Double.compare(reference.error(i, j), g.error(i, j)) != 0) {
                    throw new IllegalStateException("grid value (" + i + ", " + j + ") differs with " + threads
                            + " threads");
                }
            }
        }
        for (int k = 0; k < tree.nodes().size(); k++) {
            if (grown.nodes().size() != tree.nodes().size()
                    || grown.nodes().get(k).tauRe() != tree.nodes().get(k).tauRe()
                    || grown.nodes().get(k).tauIm() != tree.nodes().get(k).tauIm()
                    || grown.nodes().get(k).radius() != tree.nodes().get(k).radius()) {
                throw new IllegalStateException("the tree grown with " + threads + " threads differs at node " + k);
            }
        }
    }

    private static void report(String what, Map<Integer, double[]> times) {
        p("== %s: seconds per run (%d runs each, thread counts alternating)", what, times.values().iterator().next()
                .length);
        double one = median(times.get(1));
        for (Map.Entry<Integer, double[]> e : times.entrySet()) {
            double m = median(e.getValue());
            p("   %2d threads: median %.3f s, min %.3f s; 1 thread / %d threads = %.2fx (medians)", e.getKey(), m,
                    Arrays.stream(e.getValue()).min().orElse(0), e.getKey(), one / m);
        }
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s[(s.length - 1) / 2];
    }

    static String cpu() throws IOException {
        return Files.readAllLines(Path.of("/proc/cpuinfo")).stream().filter(l -> l.startsWith("model name"))
                .findFirst().map(l -> l.substring(l.indexOf(':') + 1).trim()).orElse("?");
    }

    static String load() throws IOException {
        return Files.readString(Path.of("/proc/loadavg")).trim();
    }

    private static void p(String fmt, Object... a) {
        System.out.println(String.format(Locale.ROOT, fmt, a));
    }
}
