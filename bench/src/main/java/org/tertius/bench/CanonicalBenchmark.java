package org.tertius.bench;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;

/**
 * Canonical evaluation (a function of start, settings and point alone) against the tree-growing one, at the
 * engine: one far point (7+8i) on a fresh solution each way, and the 100-point path of {@link PathBenchmark}
 * on a fresh solution and on one whose canonical legs are already cached.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class CanonicalBenchmark {
    private List<double[]> path;
    private Solution warm;

    @Setup(Level.Trial)
    public void setUp() {
        path = new ArrayList<>();
        for (SurfacePoint p : Scenario.path()) {
            path.add(new double[] {p.logRe(), p.logIm()});
        }
        warm = engine();
        pathCanonical(warm);
    }

    private static Solution engine() {
        return Scenario.fresh().engineReading().orElseThrow().tree();
    }

    private List<StateEstimate> pathCanonical(Solution s) {
        List<StateEstimate> out = new ArrayList<>();
        for (double[] p : path) {
            out.add(s.evaluateCanonical(p[0], p[1]));
        }
        return out;
    }

    @Benchmark
    public StateEstimate farPointGrowing() {
        return engine().evaluate(Scenario.FAR_TARGET.logRe(), Scenario.FAR_TARGET.logIm());
    }

    @Benchmark
    public StateEstimate farPointCanonical() {
        return engine().evaluateCanonical(Scenario.FAR_TARGET.logRe(), Scenario.FAR_TARGET.logIm());
    }

    @Benchmark
    public List<StateEstimate> pathGrowingFresh() {
        Solution s = engine();
        List<StateEstimate> out = new ArrayList<>();
        for (double[] p : path) {
            out.add(s.evaluate(p[0], p[1]));
        }
        return out;
    }

    @Benchmark
    public List<StateEstimate> pathCanonicalFresh() {
        return pathCanonical(engine());
    }

    @Benchmark
    public List<StateEstimate> pathCanonicalCached() {
        return pathCanonical(warm);
    }
}
