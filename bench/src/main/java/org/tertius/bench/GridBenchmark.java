package org.tertius.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.RegionSolver;

/**
 * The 401 x 401 grid over [-10, 10]^2 of sheet 0 with at most 1e-10 estimated error, from a fresh solution
 * each time (tree, grid and rest passes), single shots after warm-up shots in the same JVM.
 */
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3)
@Measurement(iterations = 5)
@Fork(value = 1, jvmArgsAppend = {"-Xms2g", "-Xmx4g"})
@State(Scope.Benchmark)
public class GridBenchmark {
    /** Worker threads of the grid pass. */
    @Param({"2"})
    public int threads;

    @Benchmark
    public GridResult grid401() {
        return RegionSolver.solve(Scenario.fresh(), Scenario.grid(), Scenario.regionSettings(threads));
    }
}
