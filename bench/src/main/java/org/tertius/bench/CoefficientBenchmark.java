package org.tertius.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;
import org.openjdk.jmh.infra.Blackhole;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.solution.Solution;
import org.tertius.core.step.Node;
import org.tertius.core.step.TaylorPadeStepper;
import org.tertius.core.taylor.DoubleTaylorKernel;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * The unit of the lower bound: Taylor coefficient generation alone ({@link DoubleTaylorKernel#coefficients} at
 * orders 32 and 40 on the scenario's polynomial form, at the start point), next to the cost of a whole node
 * ({@link TaylorPadeStepper#expandStart}: coefficients, robust Pade approximants of two orders per component,
 * radius control, singularities).
 */
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.NANOSECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(value = 1, jvmArgsAppend = {"-Xms1g", "-Xmx4g"})
@State(Scope.Thread)
public class CoefficientBenchmark {
    @Param({"32", "40"})
    public int order;

    private DoubleTaylorKernel kernel;
    private TaylorPadeStepper stepper;
    private double tauRe;
    private double tauIm;
    private double[] yRe;
    private double[] yIm;
    private double[][] outRe;
    private double[][] outIm;

    @Setup(Level.Trial)
    public void setUp() {
        Solution engine = Scenario.fresh().engineReading().orElseThrow().tree();
        PolynomialSystem system = engine.system();
        RecurrencePlan plan = RecurrencePlan.compile(system);
        kernel = new DoubleTaylorKernel(plan, system, order);
        stepper = new TaylorPadeStepper(system, plan, engine.settings().toBuilder().order(order).build(),
                StateProjection.NONE);
        Node root = engine.root();
        int n = root.dimension();
        yRe = new double[n];
        yIm = new double[n];
        for (int i = 0; i < n; i++) {
            yRe[i] = root.stateRe(i);
            yIm[i] = root.stateIm(i);
        }
        tauRe = root.tauRe();
        tauIm = root.tauIm();
        outRe = new double[n][order + 1];
        outIm = new double[n][order + 1];
    }

    @Benchmark
    public void coefficients(Blackhole bh) {
        kernel.coefficients(tauRe, tauIm, yRe, yIm, 0.25, outRe, outIm);
        bh.consume(outRe[0][order]);
        bh.consume(outIm[1][order]);
    }

    @Benchmark
    public Node expandNode() {
        return stepper.expandStart(0, tauRe, tauIm, yRe, yIm, 0.25, 4.0);
    }
}
