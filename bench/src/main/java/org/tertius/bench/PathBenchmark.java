package org.tertius.bench;

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
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;

/**
 * The solution evaluated on the 100-point path z_k = 1 + (6 + 8i)(k + 1)/100 through the pole field:
 * {@code fresh} builds a new solution every invocation (the path tree is grown on the way), {@code warm}
 * evaluates on a solution whose tree already covers the path (dense output only).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class PathBenchmark {
    private List<SurfacePoint> path;
    private Painleve3Solution warm;

    @Setup(Level.Trial)
    public void setUp() {
        path = Scenario.path();
        warm = Scenario.fresh();
        warm.evaluate(path);
    }

    @Benchmark
    public List<Painleve3Value> fresh() {
        return Scenario.fresh().evaluate(path);
    }

    @Benchmark
    public List<Painleve3Value> warm() {
        return warm.evaluate(path);
    }
}
