package org.tertius.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.AuxCounters;
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
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;

/**
 * Steps per second of the stepper: a fresh solution of the scenario integrated to 7 + 8i (distance 10 from
 * z0 = 1, through the pole field). The score is paths per second; the auxiliary counter {@code nodes} is the
 * number of nodes (expansion points, one per step) created per second, i.e. steps per second.
 */
@BenchmarkMode(Mode.Throughput)
@OutputTimeUnit(TimeUnit.SECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx4g"})
public class StepperBenchmark {

    /** Nodes created, reported per second. */
    @State(Scope.Thread)
    @AuxCounters(AuxCounters.Type.OPERATIONS)
    public static class Steps {
        public long nodes;

        @Setup(Level.Iteration)
        public void reset() {
            nodes = 0;
        }
    }

    @Benchmark
    public Painleve3Value freshPathToDistance10(Steps steps) {
        Painleve3Solution s = Scenario.fresh();
        Painleve3Value v = s.evaluate(Scenario.FAR_TARGET);
        steps.nodes += s.nodeCount() - 1;
        return v;
    }
}
