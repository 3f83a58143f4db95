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
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Value;

/**
 * Side by side on the real pole-free segment [1, 2] of the scenario: the engine (a fresh solution evaluated at
 * z = 2) and Hipparchus's DormandPrince853 on the real (w, w') system at several tolerances. Which tolerance
 * gives the engine's accuracy, and the evaluation counts, are printed by {@link CoreReport}.
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx4g"})
@State(Scope.Benchmark)
public class SegmentBenchmark {
    private static final SurfacePoint END = SurfacePoint.of(Scenario.SEGMENT_END, 0);

    /** Tolerances of DormandPrince853 (absolute = relative). */
    @State(Scope.Benchmark)
    public static class Tolerance {
        @Param({"1e-9", "1e-12", "1e-14"})
        public double value;
    }

    @Benchmark
    public Painleve3Value engine() {
        return Scenario.fresh().evaluate(END);
    }

    @Benchmark
    public RealSegment.Result dormandPrince853(Tolerance tolerance) {
        return RealSegment.dormandPrince853(tolerance.value);
    }
}
